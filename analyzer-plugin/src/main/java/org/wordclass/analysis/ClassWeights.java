package org.wordclass.analysis;

import java.util.Arrays;
import java.util.Map;
import org.wordclass.model.TagSet;

/**
 * A weight per word class, for boosting matches by the class of the matched token: the index
 * side writes it into payloads ({@link PayloadEncoding#WEIGHT}) and the query side maps a class
 * back to it ({@code org.wordclass.query.ClassWeightPayloadDecoder}). Classes without an entry
 * get the default weight.
 *
 * <p>Immutable; one array lookup per weight.
 */
public final class ClassWeights {
  /** Weight of classes not listed, unless another default is configured. */
  public static final float DEFAULT_WEIGHT = 1.0f;

  private final TagSet tags;
  private final float[] weights;
  private final float defaultWeight;

  private ClassWeights(TagSet tags, float[] weights, float defaultWeight) {
    this.tags = tags;
    this.weights = weights;
    this.defaultWeight = defaultWeight;
  }

  /** Every class weighs {@link #DEFAULT_WEIGHT}. */
  public static ClassWeights uniform(TagSet tags) {
    return of(tags, Map.of(), DEFAULT_WEIGHT, "weights");
  }

  /**
   * Weights given by class name; {@code setting} names where they were configured, for the
   * error message when a name is not one of the model's classes.
   */
  public static ClassWeights of(TagSet tags, Map<String, Float> byName, float defaultWeight, String setting) {
    requireFinite(defaultWeight, "default weight");
    float[] weights = new float[tags.size()];
    Arrays.fill(weights, defaultWeight);
    for (Map.Entry<String, Float> entry : byName.entrySet()) {
      weights[WordClasses.require(tags, entry.getKey(), setting)] = requireFinite(entry.getValue(), entry.getKey());
    }
    return new ClassWeights(tags, weights, defaultWeight);
  }

  private static float requireFinite(float weight, String what) {
    if (!Float.isFinite(weight)) {
      throw new IllegalArgumentException("the weight of " + what + " must be a finite number, not " + weight);
    }
    return weight;
  }

  public TagSet tags() {
    return tags;
  }

  /** Weight of the class at {@code tag}, or the default weight for {@link WordClassAttribute#NO_CLASS}. */
  public float weight(int tag) {
    return tag < 0 ? defaultWeight : weights[tag];
  }

  public float defaultWeight() {
    return defaultWeight;
  }

  @Override
  public String toString() {
    StringBuilder out = new StringBuilder();
    for (int tag = 0; tag < weights.length; tag++) {
      out.append(tag == 0 ? "" : ",").append(tags.name(tag)).append(':').append(weights[tag]);
    }
    return out.toString();
  }
}
