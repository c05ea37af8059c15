package org.wordclass.adaptation;

import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.function.Consumer;
import org.wordclass.training.Transitions;

/**
 * Everything that shapes an adaptation besides its inputs; every value goes into the adapted
 * model's provenance.
 *
 * @param maxIterations re-estimation steps at most (each costs one pass over the text)
 * @param minRelativeGain stop once an iteration raises the log-likelihood of the text by less
 *     than this share of its magnitude; 0 runs every iteration
 * @param newWeight λ: weight of the re-estimated parameters against the starting model's, {@code
 *     p = λ p_new + (1 - λ) p_start}; 1 is plain Baum-Welch, 0 keeps the starting model
 * @param lexiconConstraint known words keep to the tags the starting lexicon gives them; when
 *     false, each known word may also take any open tag, starting from {@code relaxedFloor}
 * @param relaxedFloor with the constraint off, a known word's emission for an open tag it lacks
 *     starts as this fraction of the emission of a word seen once with that tag
 * @param addWordsMinCount unknown words seen at least this often in the text join the lexicon
 *     with their expected tag counts after the first pass; 0 adds none
 * @param newPairMinShare a word/tag pair the starting lexicon lacks (an added word's, or one
 *     opened by the relaxed constraint) is kept only if it carries at least this share of the
 *     word's expected count
 * @param smoothing how re-estimated transitions combine orders; maximum likelihood is exact EM
 * @param threads worker threads for the expected counts; each has its own decoder and counts
 * @param batchSentences sentences handed to a worker at a time
 */
public record AdaptationOptions(
    int maxIterations,
    double minRelativeGain,
    double newWeight,
    boolean lexiconConstraint,
    double relaxedFloor,
    int addWordsMinCount,
    double newPairMinShare,
    Transitions.Smoothing smoothing,
    int threads,
    int batchSentences) {

  /**
   * The safeguarded defaults: lexicon constraint, half-weight interpolation, at most 5
   * iterations, and unknown words seen 3 times or more added (the one setting that raised
   * accuracy in docs/adaptation.md).
   */
  public static final AdaptationOptions DEFAULTS = new AdaptationOptions(
      Defaults.ITERATIONS, Defaults.MIN_RELATIVE_GAIN, Defaults.NEW_WEIGHT, Defaults.LEXICON_CONSTRAINT, 0.1,
      Defaults.ADD_WORDS_MIN_COUNT, 0.1, Transitions.Smoothing.DELETED_INTERPOLATION,
      Runtime.getRuntime().availableProcessors(), 256);

  /**
   * The defaults as compile-time constants, so that a command line can name them in its option
   * declarations and never drift from {@link #DEFAULTS}.
   */
  public static final class Defaults {
    public static final int ITERATIONS = 5;
    public static final double MIN_RELATIVE_GAIN = 1e-4;
    public static final double NEW_WEIGHT = 0.5;
    public static final boolean LEXICON_CONSTRAINT = true;
    public static final int ADD_WORDS_MIN_COUNT = 3;

    private Defaults() {}
  }

  public AdaptationOptions {
    if (maxIterations < 1) {
      throw new IllegalArgumentException("at least one iteration is needed: " + maxIterations);
    }
    if (!(minRelativeGain >= 0)) {
      throw new IllegalArgumentException("minimum relative gain must not be negative: " + minRelativeGain);
    }
    if (!(newWeight >= 0 && newWeight <= 1)) {
      throw new IllegalArgumentException("weight of the new estimate must be in [0, 1]: " + newWeight);
    }
    if (!(relaxedFloor > 0 && relaxedFloor <= 1)) {
      throw new IllegalArgumentException("relaxed emission floor must be in (0, 1]: " + relaxedFloor);
    }
    if (addWordsMinCount < 0) {
      throw new IllegalArgumentException("minimum count of added words must not be negative: " + addWordsMinCount);
    }
    if (!(newPairMinShare >= 0 && newPairMinShare < 1)) {
      throw new IllegalArgumentException("minimum share of a new word/tag pair must be in [0, 1): " + newPairMinShare);
    }
    if (threads < 1 || batchSentences < 1) {
      throw new IllegalArgumentException("threads and batch size must be positive");
    }
  }

  /** Plain Baum-Welch (exact EM): the new estimate alone, maximum-likelihood transitions, no words added, all iterations. */
  public static AdaptationOptions plainBaumWelch(int iterations) {
    return DEFAULTS.withIterations(iterations, 0).withNewWeight(1).withAddedWords(0).withSmoothing(Transitions.Smoothing.MAXIMUM_LIKELIHOOD);
  }

  public AdaptationOptions withIterations(int max, double minGain) {
    return copy(e -> {
      e.maxIterations = max;
      e.minRelativeGain = minGain;
    });
  }

  public AdaptationOptions withNewWeight(double weight) {
    return copy(e -> e.newWeight = weight);
  }

  public AdaptationOptions withLexiconConstraint(boolean constraint) {
    return copy(e -> e.lexiconConstraint = constraint);
  }

  public AdaptationOptions withAddedWords(int minCount) {
    return copy(e -> e.addWordsMinCount = minCount);
  }

  public AdaptationOptions withSmoothing(Transitions.Smoothing newSmoothing) {
    return copy(e -> e.smoothing = newSmoothing);
  }

  public AdaptationOptions withThreads(int count) {
    return copy(e -> e.threads = count);
  }

  /** These options with the changes {@code edit} makes, checked like any others. */
  private AdaptationOptions copy(Consumer<Editable> edit) {
    Editable e = new Editable(this);
    edit.accept(e);
    return e.build();
  }

  /** The components as fields, so that each with-method states only what it changes. */
  private static final class Editable {
    int maxIterations;
    double minRelativeGain;
    double newWeight;
    boolean lexiconConstraint;
    double relaxedFloor;
    int addWordsMinCount;
    double newPairMinShare;
    Transitions.Smoothing smoothing;
    int threads;
    int batchSentences;

    Editable(AdaptationOptions o) {
      maxIterations = o.maxIterations;
      minRelativeGain = o.minRelativeGain;
      newWeight = o.newWeight;
      lexiconConstraint = o.lexiconConstraint;
      relaxedFloor = o.relaxedFloor;
      addWordsMinCount = o.addWordsMinCount;
      newPairMinShare = o.newPairMinShare;
      smoothing = o.smoothing;
      threads = o.threads;
      batchSentences = o.batchSentences;
    }

    AdaptationOptions build() {
      return new AdaptationOptions(maxIterations, minRelativeGain, newWeight, lexiconConstraint, relaxedFloor,
          addWordsMinCount, newPairMinShare, smoothing, threads, batchSentences);
    }
  }

  /** The options as provenance entries. */
  public Map<String, String> describe() {
    Map<String, String> m = new LinkedHashMap<>();
    m.put("adapt.option.maxIterations", Integer.toString(maxIterations));
    m.put("adapt.option.minRelativeGain", Double.toString(minRelativeGain));
    m.put("adapt.option.newWeight", Double.toString(newWeight));
    m.put("adapt.option.lexiconConstraint", Boolean.toString(lexiconConstraint));
    m.put("adapt.option.relaxedFloor", Double.toString(relaxedFloor));
    m.put("adapt.option.addWordsMinCount", Integer.toString(addWordsMinCount));
    m.put("adapt.option.newPairMinShare", Double.toString(newPairMinShare));
    m.put("adapt.option.smoothing", smoothing.name().toLowerCase(Locale.ROOT).replace('_', '-'));
    return m;
  }
}
