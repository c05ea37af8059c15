package org.wordclass.analysis;

import java.util.Objects;
import org.wordclass.decoding.SentenceBoundaries;
import org.wordclass.model.HmmModel;

/**
 * What a {@link WordClassFilter} does, bound to the model it decodes with. Immutable and
 * validated on construction, so one instance built from configuration serves every filter of
 * every thread. Start from {@link #of(HmmModel)} and change settings with the {@code with}
 * methods.
 *
 * @param model the model to decode with
 * @param order 1 (bigram) or 2 (trigram) transitions; the model's own order by default
 * @param confidence whether to compute each token's posterior probability; roughly triples the
 *     decoding cost (a forward-backward pass besides Viterbi)
 * @param payload how to write the class into the payload
 * @param weights class weights for {@link PayloadEncoding#WEIGHT}
 * @param qualifiedTerms whether to add {@code word + separator + CLASS} at each position
 * @param separator joins word and class in qualified terms
 * @param maxWindow most tokens buffered and decoded together; a longer sentence is cut
 * @param explain whether to say in a {@link WordClassExplanationAttribute} why each token got its
 *     class, for tools; costs what {@code confidence} costs plus a tag-set-sized array copy and a
 *     few small strings per token, and nothing when off
 * @param boundaries where a window may hold sentence boundaries besides those the tokenizer marks:
 *     {@link SentenceBoundaries#DECODED} lets the decoder find them before capitalised tokens (a
 *     heading, a line or a sentence without its full stop before the next), choosing them with
 *     the classes; {@link SentenceBoundaries#TOKENIZER} decodes each marked sentence as one
 */
public record WordClassOptions(
    HmmModel model,
    int order,
    boolean confidence,
    PayloadEncoding payload,
    ClassWeights weights,
    boolean qualifiedTerms,
    String separator,
    int maxWindow,
    boolean explain,
    SentenceBoundaries boundaries) {
  /** Default of {@link #maxWindow}: long enough for nearly every real sentence. */
  public static final int DEFAULT_MAX_WINDOW = 512;

  /** Default of {@link #boundaries}: decoded, which scored higher on EWT dev in every chain measured (docs/accuracy.md). */
  public static final SentenceBoundaries DEFAULT_BOUNDARIES = SentenceBoundaries.DECODED;

  /** Default of {@link #separator}. */
  public static final String DEFAULT_SEPARATOR = "_";

  public WordClassOptions {
    Objects.requireNonNull(model, "model");
    Objects.requireNonNull(payload, "payload");
    Objects.requireNonNull(weights, "weights");
    Objects.requireNonNull(separator, "separator");
    Objects.requireNonNull(boundaries, "boundaries");
    if (order != 1 && order != 2) {
      throw new IllegalArgumentException("order must be 1 or 2, not " + order);
    }
    if (maxWindow < 1) {
      throw new IllegalArgumentException("maxWindow must be at least 1, not " + maxWindow);
    }
    if (separator.isEmpty()) {
      throw new IllegalArgumentException("separator must not be empty");
    }
    if (!weights.tags().equals(model.tags())) {
      throw new IllegalArgumentException("the weights are for another tag set than the model's");
    }
  }

  /** Defaults: the model's order, no confidence, no payload, no qualified terms, windows of 512, no explanations, decoded sentence boundaries. */
  public static WordClassOptions of(HmmModel model) {
    return new WordClassOptions(
        model, model.order(), false, PayloadEncoding.NONE, ClassWeights.uniform(model.tags()), false, DEFAULT_SEPARATOR, DEFAULT_MAX_WINDOW,
        false, DEFAULT_BOUNDARIES);
  }

  public WordClassOptions withOrder(int order) {
    return new WordClassOptions(model, order, confidence, payload, weights, qualifiedTerms, separator, maxWindow, explain, boundaries);
  }

  public WordClassOptions withConfidence(boolean confidence) {
    return new WordClassOptions(model, order, confidence, payload, weights, qualifiedTerms, separator, maxWindow, explain, boundaries);
  }

  public WordClassOptions withPayload(PayloadEncoding payload) {
    return new WordClassOptions(model, order, confidence, payload, weights, qualifiedTerms, separator, maxWindow, explain, boundaries);
  }

  public WordClassOptions withWeights(ClassWeights weights) {
    return new WordClassOptions(model, order, confidence, payload, weights, qualifiedTerms, separator, maxWindow, explain, boundaries);
  }

  public WordClassOptions withQualifiedTerms(boolean qualifiedTerms) {
    return new WordClassOptions(model, order, confidence, payload, weights, qualifiedTerms, separator, maxWindow, explain, boundaries);
  }

  public WordClassOptions withSeparator(String separator) {
    return new WordClassOptions(model, order, confidence, payload, weights, qualifiedTerms, separator, maxWindow, explain, boundaries);
  }

  public WordClassOptions withMaxWindow(int maxWindow) {
    return new WordClassOptions(model, order, confidence, payload, weights, qualifiedTerms, separator, maxWindow, explain, boundaries);
  }

  public WordClassOptions withExplain(boolean explain) {
    return new WordClassOptions(model, order, confidence, payload, weights, qualifiedTerms, separator, maxWindow, explain, boundaries);
  }

  public WordClassOptions withBoundaries(SentenceBoundaries boundaries) {
    return new WordClassOptions(model, order, confidence, payload, weights, qualifiedTerms, separator, maxWindow, explain, boundaries);
  }
}
