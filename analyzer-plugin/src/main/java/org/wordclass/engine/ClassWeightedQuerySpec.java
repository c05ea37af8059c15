package org.wordclass.engine;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.TreeMap;
import org.apache.lucene.search.Query;
import org.wordclass.analysis.ClassWeights;
import org.wordclass.analysis.PayloadEncoding;
import org.wordclass.analysis.WordClassOptions;
import org.wordclass.query.ClassWeightPayloadDecoder;
import org.wordclass.query.WordClassQueries;

/**
 * The query type "a word, each match scored by the weight of the class it was tagged with", as
 * engines expose it under the name {@value #NAME} with the parameters {@value
 * QueryParameters#FIELD}, {@value QueryParameters#WORD} and, for fields whose payloads name the class, {@value #WEIGHTS} and {@value
 * #DEFAULT_WEIGHT}. It matches exactly what a term query on the word matches, so it loses no
 * recall; see {@link WordClassQueries#classWeighted} and {@link ClassWeightPayloadDecoder}.
 *
 * <p>A field indexed with {@code payload=weight} holds the weights chosen at index time, and
 * the query takes no weights. A field with {@code payload=tag} or {@code index} holds the class,
 * and the query chooses the weights: {@value #WEIGHTS} maps class names to weights, {@value
 * #DEFAULT_WEIGHT} weighs the rest (default {@value ClassWeights#DEFAULT_WEIGHT}).
 *
 * <p>The parameters are checked on construction; class names against the field's model in
 * {@link #toQuery}.
 *
 * @param field the field to search
 * @param word the word as the index holds it
 * @param weights class name to weight; empty when not given
 * @param defaultWeight weight of classes {@code weights} does not list; null when not given
 */
public record ClassWeightedQuerySpec(String field, String word, Map<String, Float> weights, Float defaultWeight)
    implements QuerySpec {
  /** Name engines register the query type under. */
  public static final String NAME = "class_weighted_term";
  /** Parameter mapping class names to weights. */
  public static final String WEIGHTS = "weights";
  /** Parameter giving the weight of unlisted classes. */
  public static final String DEFAULT_WEIGHT = "default_weight";

  /** Checks the parameters, naming the one at fault. */
  public ClassWeightedQuerySpec {
    QueryParameters.requireText(field, QueryParameters.FIELD);
    QueryParameters.requireText(word, QueryParameters.WORD);
    if (weights == null) {
      weights = Map.of();
    }
    weights.forEach((name, weight) -> requireFinite(weight, WEIGHTS + "." + QueryParameters.requireText(name, WEIGHTS)));
    weights = Map.copyOf(weights);
    if (defaultWeight != null) {
      requireFinite(defaultWeight, DEFAULT_WEIGHT);
    }
  }

  /**
   * A spec from weights as a JSON parser gives them: values that are numbers or numeric text.
   *
   * @throws IllegalArgumentException naming the class whose weight is not a finite number
   */
  public static ClassWeightedQuerySpec of(String field, String word, Map<String, ?> weights, Float defaultWeight) {
    Map<String, Float> parsed = new LinkedHashMap<>();
    if (weights != null) {
      weights.forEach((name, value) -> parsed.put(name, toWeight(value, WEIGHTS + "." + name)));
    }
    return new ClassWeightedQuerySpec(field, word, parsed, defaultWeight);
  }

  private static Float toWeight(Object value, String parameter) {
    try {
      if (value instanceof Number) {
        return ((Number) value).floatValue();
      }
      if (value instanceof String) {
        return Float.parseFloat((String) value);
      }
    } catch (NumberFormatException e) {
      // reported below, naming the parameter
    }
    throw new IllegalArgumentException("'" + parameter + "' must be a number, not " + value);
  }

  private static void requireFinite(Float weight, String parameter) {
    if (weight == null || !Float.isFinite(weight)) {
      throw new IllegalArgumentException("'" + parameter + "' must be a finite number, not " + weight);
    }
  }

  @Override
  public String name() {
    return NAME;
  }

  /** Field and word, then the weights (sorted by class) and the default weight where given. */
  @Override
  public Map<String, Object> parameters() {
    Map<String, Object> parameters = new LinkedHashMap<>();
    parameters.put(QueryParameters.FIELD, field);
    parameters.put(QueryParameters.WORD, word);
    if (!weights.isEmpty()) {
      parameters.put(WEIGHTS, new TreeMap<>(weights));
    }
    if (defaultWeight != null) {
      parameters.put(DEFAULT_WEIGHT, defaultWeight);
    }
    return parameters;
  }

  /**
   * The Lucene query over a field indexed with {@code indexed} (see {@link IndexedClasses}).
   *
   * @throws IllegalArgumentException if the field has no class payloads, if weights are given for
   *     a field that stores them, or a class is not one of its model's
   */
  @Override
  public Query toQuery(WordClassOptions indexed) {
    PayloadEncoding payload = indexed.payload();
    if (payload == PayloadEncoding.NONE) {
      throw refused("is indexed without class payloads (payload=none); index it with payload=weight, tag or index");
    }
    boolean weightsGiven = !weights.isEmpty() || defaultWeight != null;
    if (payload == PayloadEncoding.WEIGHT && weightsGiven) {
      throw refused("stores its weights in the index (payload=weight); '" + WEIGHTS + "' and '" + DEFAULT_WEIGHT
          + "' apply only to fields indexed with payload=tag or payload=index");
    }
    ClassWeights chosen;
    try {
      chosen = payload == PayloadEncoding.WEIGHT ? indexed.weights()
          : ClassWeights.of(indexed.model().tags(), weights, defaultWeight == null ? ClassWeights.DEFAULT_WEIGHT : defaultWeight, WEIGHTS);
    } catch (IllegalArgumentException e) {
      throw refused(": " + e.getMessage());
    }
    return WordClassQueries.classWeighted(field, word, new ClassWeightPayloadDecoder(payload, chosen));
  }

  private IllegalArgumentException refused(String reason) {
    return new IllegalArgumentException("[" + NAME + "] field [" + field + "]" + (reason.startsWith(":") ? "" : " ") + reason);
  }
}
