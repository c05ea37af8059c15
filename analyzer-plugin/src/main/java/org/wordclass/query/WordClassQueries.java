package org.wordclass.query;

import java.util.List;
import org.apache.lucene.index.Term;
import org.apache.lucene.queries.payloads.MaxPayloadFunction;
import org.apache.lucene.queries.payloads.PayloadDecoder;
import org.apache.lucene.queries.payloads.PayloadScoreQuery;
import org.apache.lucene.queries.payloads.SpanPayloadCheckQuery;
import org.apache.lucene.queries.spans.SpanOrQuery;
import org.apache.lucene.queries.spans.SpanQuery;
import org.apache.lucene.queries.spans.SpanTermQuery;
import org.apache.lucene.search.BooleanClause;
import org.apache.lucene.search.BooleanQuery;
import org.apache.lucene.search.Query;
import org.apache.lucene.search.TermQuery;
import org.apache.lucene.util.BytesRef;
import org.wordclass.analysis.ClassWeights;
import org.wordclass.analysis.PayloadEncoding;
import org.wordclass.analysis.WordClasses;
import org.wordclass.model.TagSet;

/**
 * Builds queries over fields analyzed with {@link org.wordclass.analysis.WordClassFilter}: a word
 * restricted to some word classes, through the payload or through the class-qualified terms, and
 * a word scored by the weight of the class it has where it matched.
 *
 * <p>Words must be given as the index holds them: if the analyzer lowercases after tagging, pass
 * them lowercased, and lowercase the class names of qualified terms too ({@code book_verb}).
 *
 * <p>A class-restricted query only finds the occurrences the tagger classed as asked, so it loses
 * recall wherever the tagger is wrong: on every token it misclasses, which happens more often on
 * text unlike its training text (headlines, lists, product names). Use it to rank or to narrow,
 * and keep an unrestricted query at hand when recall matters. Class weighting degrades more
 * gently: a misclassed occurrence still matches, only with another weight.
 */
public final class WordClassQueries {
  private WordClassQueries() {}

  /**
   * {@code word} in {@code field} where its payload names one of {@code classes}; the field must
   * have been indexed with {@link PayloadEncoding#TAG} or {@link PayloadEncoding#INDEX} payloads
   * of a model with tag set {@code tags}. Cost: a span query reading the payload of every
   * position of the word.
   */
  public static SpanQuery byPayload(String field, String word, PayloadEncoding encoding, TagSet tags, String... classes) {
    if (encoding != PayloadEncoding.TAG && encoding != PayloadEncoding.INDEX) {
      throw new IllegalArgumentException("payloads say the class only with the TAG or INDEX encoding, not " + encoding);
    }
    requireClasses(classes);
    // TAG and INDEX payloads do not depend on weights
    ClassWeights noWeights = ClassWeights.uniform(tags);
    SpanQuery[] alternatives = new SpanQuery[classes.length];
    for (int i = 0; i < classes.length; i++) {
      BytesRef payload = encoding.encode(tags, WordClasses.require(tags, classes[i], "classes"), noWeights);
      alternatives[i] = new SpanPayloadCheckQuery(new SpanTermQuery(new Term(field, word)), List.of(payload));
    }
    return alternatives.length == 1 ? alternatives[0] : new SpanOrQuery(alternatives);
  }

  /**
   * {@code word} in {@code field} where it was classed as one of {@code classes}, through the
   * qualified terms ({@code word + separator + class}); the field must have been indexed with
   * qualified terms on. Cost: one term query per class, as cheap as any term query.
   */
  public static Query byQualifiedTerm(String field, String word, String separator, String... classes) {
    requireClasses(classes);
    if (classes.length == 1) {
      return new TermQuery(new Term(field, word + separator + classes[0]));
    }
    BooleanQuery.Builder any = new BooleanQuery.Builder();
    for (String wordClass : classes) {
      any.add(new TermQuery(new Term(field, word + separator + wordClass)), BooleanClause.Occur.SHOULD);
    }
    return any.build();
  }

  /**
   * {@code word} in {@code field}, each document's score multiplied by the largest class weight
   * among the occurrences matched, as {@code decoder} reads it from the payloads (see {@link
   * ClassWeightPayloadDecoder}). Matches exactly what a term query matches: no loss of recall.
   */
  public static SpanQuery classWeighted(String field, String word, PayloadDecoder decoder) {
    return classWeighted(new SpanTermQuery(new Term(field, word)), decoder);
  }

  /** {@code query} with each match's score multiplied by the largest class weight in its span. */
  public static SpanQuery classWeighted(SpanQuery query, PayloadDecoder decoder) {
    return new PayloadScoreQuery(query, new MaxPayloadFunction(), decoder, true);
  }

  private static void requireClasses(String[] classes) {
    if (classes.length == 0) {
      throw new IllegalArgumentException("name at least one word class");
    }
  }
}
