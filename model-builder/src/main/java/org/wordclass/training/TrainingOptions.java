package org.wordclass.training;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Everything that shapes a trained model besides its corpus. Every value is written into the
 * model's provenance, so a model says how it was built.
 *
 * @param order 1 (bigram) or 2 (trigram) HMM; both tables are estimated, this is the default
 *     decoding order
 * @param maxSuffixLength longest word ending the unknown-word model counts
 * @param rareWordMaxCount words seen at most this often feed the unknown-word model
 * @param suffixWeightRule how θ, the weight of shorter endings in successive abstraction, is set
 * @param suffixWeight θ when the rule is {@link SuffixWeightRule#FIXED}; ignored otherwise
 * @param openClassMinShare a tag is open (a candidate for unknown words) when at least this
 *     share of the words seen once in training carry it
 * @param shapeClasses keep separate ending counts for each {@link org.wordclass.model.WordShape};
 *     when false, only capitalised and lower-case words are told apart, as in Brants (2000)
 */
public record TrainingOptions(
    int order,
    int maxSuffixLength,
    int rareWordMaxCount,
    SuffixWeightRule suffixWeightRule,
    double suffixWeight,
    double openClassMinShare,
    boolean shapeClasses) {

  public static final TrainingOptions DEFAULTS = new TrainingOptions(2, 10, 10, SuffixWeightRule.HELD_OUT, Double.NaN, 0.002, false);

  /** How θ of the suffix model is chosen. */
  public enum SuffixWeightRule {
    /** Leave-one-out over the rare training words (see {@code SuffixWeightSelection}). */
    HELD_OUT,
    /** The standard deviation of the unconditional tag probabilities, as Brants (2000) proposes. */
    TAG_SPREAD,
    /** A value given by the user. */
    FIXED
  }

  public TrainingOptions {
    if (order != 1 && order != 2) {
      throw new IllegalArgumentException("order must be 1 or 2, not " + order);
    }
    if (maxSuffixLength < 0) {
      throw new IllegalArgumentException("maximum suffix length must not be negative: " + maxSuffixLength);
    }
    if (rareWordMaxCount < 1) {
      throw new IllegalArgumentException("rare-word count must be at least 1: " + rareWordMaxCount);
    }
    if (suffixWeightRule == SuffixWeightRule.FIXED && !(suffixWeight > 0 && suffixWeight < Double.POSITIVE_INFINITY)) {
      throw new IllegalArgumentException("suffix weight must be positive: " + suffixWeight);
    }
    if (!(openClassMinShare >= 0 && openClassMinShare < 1)) {
      throw new IllegalArgumentException("open-class share must be in [0, 1): " + openClassMinShare);
    }
  }

  public TrainingOptions withOrder(int newOrder) {
    return new TrainingOptions(newOrder, maxSuffixLength, rareWordMaxCount, suffixWeightRule, suffixWeight, openClassMinShare, shapeClasses);
  }

  /** A fixed θ. */
  public TrainingOptions withSuffixWeight(double weight) {
    return new TrainingOptions(order, maxSuffixLength, rareWordMaxCount, SuffixWeightRule.FIXED, weight, openClassMinShare, shapeClasses);
  }

  /** θ chosen by a rule rather than given. */
  public TrainingOptions withSuffixWeightRule(SuffixWeightRule rule) {
    return new TrainingOptions(order, maxSuffixLength, rareWordMaxCount, rule, Double.NaN, openClassMinShare, shapeClasses);
  }

  public TrainingOptions withShapeClasses(boolean shapes) {
    return new TrainingOptions(order, maxSuffixLength, rareWordMaxCount, suffixWeightRule, suffixWeight, openClassMinShare, shapes);
  }

  public TrainingOptions withSuffix(int maxLength, int rareMaxCount) {
    return new TrainingOptions(order, maxLength, rareMaxCount, suffixWeightRule, suffixWeight, openClassMinShare, shapeClasses);
  }

  public TrainingOptions withOpenClassMinShare(double share) {
    return new TrainingOptions(order, maxSuffixLength, rareWordMaxCount, suffixWeightRule, suffixWeight, share, shapeClasses);
  }

  /** The options as provenance entries. */
  public Map<String, String> describe() {
    Map<String, String> m = new LinkedHashMap<>();
    m.put("option.order", Integer.toString(order));
    m.put("option.maxSuffixLength", Integer.toString(maxSuffixLength));
    m.put("option.rareWordMaxCount", Integer.toString(rareWordMaxCount));
    m.put("option.suffixWeight", suffixWeightRule == SuffixWeightRule.FIXED
        ? Double.toString(suffixWeight) : suffixWeightRule.name().toLowerCase(java.util.Locale.ROOT).replace('_', '-'));
    m.put("option.openClassMinShare", Double.toString(openClassMinShare));
    m.put("option.shapeClasses", Boolean.toString(shapeClasses));
    return m;
  }
}
