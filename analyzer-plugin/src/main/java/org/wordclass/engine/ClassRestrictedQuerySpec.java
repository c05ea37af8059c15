package org.wordclass.engine;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.lucene.search.Query;
import org.wordclass.analysis.PayloadEncoding;
import org.wordclass.analysis.WordClassOptions;
import org.wordclass.query.WordClassQueries;

/**
 * The query type "a word where it was tagged as one of some classes", as engines expose it
 * under the name {@value #NAME} with the parameters {@value QueryParameters#FIELD}, {@value
 * QueryParameters#WORD} and {@value #CLASSES}. It reads the class from the payload, so the field
 * must be indexed with {@code payload} {@code tag} or {@code index}; see {@link
 * WordClassQueries#byPayload}.
 *
 * <p>The parameters are checked on construction (the engine's parse step, so a malformed query
 * is refused before it reaches a shard); the class names are checked against the field's model
 * in {@link #toQuery}, since only the shard knows the field's analyzer.
 *
 * <p>Such a query finds only the occurrences the tagger classed as asked, so it loses recall
 * wherever the tagger is wrong (see docs/accuracy.md for the per-class error rates).
 *
 * @param field the field to search
 * @param word the word as the index holds it (lowercased if the analyzer lowercases)
 * @param classes the word classes, any of which matches
 */
public record ClassRestrictedQuerySpec(String field, String word, List<String> classes) implements QuerySpec {
  /** Name engines register the query type under. */
  public static final String NAME = "word_class_term";
  /** Parameter listing the classes. */
  public static final String CLASSES = "classes";

  /** Checks the parameters, naming the one at fault. */
  public ClassRestrictedQuerySpec {
    QueryParameters.requireText(field, QueryParameters.FIELD);
    QueryParameters.requireText(word, QueryParameters.WORD);
    classes = QueryParameters.requireNames(classes, CLASSES);
  }

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public Map<String, Object> parameters() {
    Map<String, Object> parameters = new LinkedHashMap<>();
    parameters.put(QueryParameters.FIELD, field);
    parameters.put(QueryParameters.WORD, word);
    parameters.put(CLASSES, classes);
    return parameters;
  }

  /**
   * The Lucene query over a field indexed with {@code indexed} (see {@link IndexedClasses}).
   *
   * @throws IllegalArgumentException if the field's payloads do not name classes, or a class is
   *     not one of its model's
   */
  @Override
  public Query toQuery(WordClassOptions indexed) {
    PayloadEncoding payload = indexed.payload();
    if (payload != PayloadEncoding.TAG && payload != PayloadEncoding.INDEX) {
      throw new IllegalArgumentException("[" + NAME + "] field [" + field + "] is indexed with payload="
          + QueryParameters.argumentName(payload) + "; the query reads classes from payloads written with "
          + "payload=tag or payload=index");
    }
    try {
      return WordClassQueries.byPayload(field, word, payload, indexed.model().tags(), classes.toArray(String[]::new));
    } catch (IllegalArgumentException e) {
      throw new IllegalArgumentException("[" + NAME + "] field [" + field + "]: " + e.getMessage(), e);
    }
  }
}
