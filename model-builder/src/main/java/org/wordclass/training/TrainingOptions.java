package org.wordclass.training;

import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.function.Consumer;
import org.wordclass.model.EndingAlphabet;

/**
 * Everything that shapes a trained model besides its corpus. Every value is written into the
 * model's provenance, so a model says how it was built. The defaults give the most accurate
 * model; each cue can be switched off for a simpler or smaller one.
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
 * @param capitalisationStates split each tag into a state for words written with a capital in
 *     mid-sentence and one for the rest, so transitions can tell them apart (Brants 2000)
 * @param contextEmissions let a known word's emission depend on the previous state as well
 *     (second-order lexical probabilities, Thede and Harper 1999)
 * @param lowercaseFirstWord look an unknown capitalised sentence-initial word up in lower case
 * @param contextMinCount a word's emission after a particular previous state is kept only if
 *     that context was seen at least this often
 * @param latentRounds rounds of split-merge training: each splits every hidden state in two,
 *     fits the halves to the tagged corpus by EM and merges back the splits that help least (see
 *     {@code LatentStates}); 0 keeps the states of the supervised model. A model with latent
 *     states has no context-dependent emissions, whatever {@code contextEmissions} says
 * @param unknownWordPrior what the suffix model's {@code P(t | ending)} is divided by to give an
 *     unknown word's emission: the prior of the tag or of the hidden state, over all tokens or
 *     over rare words
 * @param lowerCaseForms weigh the tags of an unknown capitalised word by what its lower-case
 *     form, where known, mostly is ("Customer" by "customer", a noun); see {@code
 *     org.wordclass.model.LowerCaseFormCue}; a model with latent states goes without it
 * @param maxPrefixLength longest word beginning whose tag distribution (over rare words) weighs
 *     an unknown word's tags beside its ending; 0 to look at endings only
 * @param lowercaseMidSentenceFirstWord look a capitalised sentence-initial word up in lower case
 *     also when it is known only from mid-sentence (needs capitalisation states to tell)
 * @param minTagShare a known word keeps a tag only if at least this share of its training
 *     occurrences carry it; rarer word/tag pairs, mostly annotation slips in frequent words
 *     ("the" as a proper noun), are left out of the lexicon, which spares the decoder their
 *     candidates. With n occurrences a pair seen once goes only where n exceeds 1 / share, so
 *     rare words are never touched. 0 keeps every pair
 * @param endingAlphabet how the unknown-word model spells the endings it counts and looks up: as
 *     written, or with the vowels of a language's vowel harmony folded ({@link EndingAlphabet})
 */
public record TrainingOptions(
    int order,
    int maxSuffixLength,
    int rareWordMaxCount,
    SuffixWeightRule suffixWeightRule,
    double suffixWeight,
    double openClassMinShare,
    boolean shapeClasses,
    boolean capitalisationStates,
    boolean contextEmissions,
    boolean lowercaseFirstWord,
    int contextMinCount,
    int latentRounds,
    UnknownWordPrior unknownWordPrior,
    boolean lowerCaseForms,
    int maxPrefixLength,
    double minTagShare,
    boolean lowercaseMidSentenceFirstWord,
    EndingAlphabet endingAlphabet) {

  public static final TrainingOptions DEFAULTS = new Builder().order(2).maxSuffixLength(10).rareWordMaxCount(10)
      .suffixWeightRule(SuffixWeightRule.HELD_OUT).openClassMinShare(0.002).shapeClasses(false)
      .capitalisationStates(true).contextEmissions(true).lowercaseFirstWord(true).contextMinCount(3).latentRounds(0)
      .unknownWordPrior(UnknownWordPrior.LOWER_CASE_STATE).lowerCaseForms(true).maxPrefixLength(4).minTagShare(0.002)
      .lowercaseMidSentenceFirstWord(true).endingAlphabet(EndingAlphabet.AS_WRITTEN).build();

  /** The classic second-order model with a suffix model and none of the later cues. */
  public static final TrainingOptions CLASSIC =
      DEFAULTS.withCues(false, false, false).withUnknownWordPrior(UnknownWordPrior.TAG).withLowerCaseForms(false)
          .withMaxPrefixLength(0).withMinTagShare(0).withLowercaseMidSentenceFirstWord(false);

  /** How θ of the suffix model is chosen. */
  public enum SuffixWeightRule {
    /** Leave-one-out over the rare training words (see {@code SuffixWeightSelection}). */
    HELD_OUT,
    /** The standard deviation of the unconditional tag probabilities, as Brants (2000) proposes. */
    TAG_SPREAD,
    /** A value given by the user. */
    FIXED
  }

  /**
   * What an unknown word's tag probability from its ending is divided by to become an emission
   * ({@code P(w|s) ∝ P(s|w) / P(s)}, Bayes' rule).
   */
  public enum UnknownWordPrior {
    /** {@code P(t)}, the tag's share of all training tokens, whatever the state (Brants 2000). */
    TAG,
    /**
     * {@code P(s)}, the share of the hidden state: the tag together with whether the word is
     * written with a capital, the state the decoder admits for the word.
     */
    STATE,
    /**
     * {@code P(s)} for words not written with a capital, {@code P(t)} for the others: the
     * state's prior where the spelling alone says the state, whatever the word's place.
     */
    LOWER_CASE_STATE,
    /** {@code P(t)} over the tokens of rare words only. */
    RARE_TAG,
    /** {@code P(s)} over the tokens of rare words only. */
    RARE_STATE
  }

  public TrainingOptions {
    if (unknownWordPrior == null) {
      throw new IllegalArgumentException("an unknown-word prior must be given");
    }
    if (endingAlphabet == null) {
      throw new IllegalArgumentException("an ending alphabet must be given");
    }
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
    if (latentRounds < 0 || latentRounds > LatentStates.MAX_ROUNDS) {
      throw new IllegalArgumentException("latent rounds must be in 0.." + LatentStates.MAX_ROUNDS + ": " + latentRounds);
    }
    if (maxPrefixLength < 0) {
      throw new IllegalArgumentException("maximum prefix length must not be negative: " + maxPrefixLength);
    }
    if (!(minTagShare >= 0 && minTagShare < 1)) {
      throw new IllegalArgumentException("minimum tag share must be in [0, 1): " + minTagShare);
    }
    if (contextMinCount < 1) {
      throw new IllegalArgumentException("context count must be at least 1: " + contextMinCount);
    }
    if (!(openClassMinShare >= 0 && openClassMinShare < 1)) {
      throw new IllegalArgumentException("open-class share must be in [0, 1): " + openClassMinShare);
    }
  }

  public TrainingOptions withOrder(int newOrder) {
    return copy(b -> b.order = newOrder);
  }

  /** A fixed θ. */
  public TrainingOptions withSuffixWeight(double weight) {
    return copy(b -> {
      b.suffixWeightRule = SuffixWeightRule.FIXED;
      b.suffixWeight = weight;
    });
  }

  /** θ chosen by a rule rather than given. */
  public TrainingOptions withSuffixWeightRule(SuffixWeightRule rule) {
    return copy(b -> {
      b.suffixWeightRule = rule;
      b.suffixWeight = Double.NaN;
    });
  }

  public TrainingOptions withShapeClasses(boolean shapes) {
    return copy(b -> b.shapeClasses = shapes);
  }

  public TrainingOptions withSuffix(int maxLength, int rareMaxCount) {
    return copy(b -> {
      b.maxSuffixLength = maxLength;
      b.rareWordMaxCount = rareMaxCount;
    });
  }

  public TrainingOptions withOpenClassMinShare(double share) {
    return copy(b -> b.openClassMinShare = share);
  }

  /** The three cues beyond the classic model, each on or off. */
  public TrainingOptions withCues(boolean capitalisation, boolean context, boolean lowercaseFirst) {
    return copy(b -> {
      b.capitalisationStates = capitalisation;
      b.contextEmissions = context;
      b.lowercaseFirstWord = lowercaseFirst;
    });
  }

  /** Rounds of latent sub-state splitting (0 for none). */
  public TrainingOptions withLatentRounds(int rounds) {
    return copy(b -> b.latentRounds = rounds);
  }

  /** What the ending-based tag probability of an unknown word is divided by. */
  public TrainingOptions withUnknownWordPrior(UnknownWordPrior prior) {
    return copy(b -> b.unknownWordPrior = prior);
  }

  /** Whether unknown capitalised words are weighed by the tag of their lower-case form. */
  public TrainingOptions withLowerCaseForms(boolean use) {
    return copy(b -> b.lowerCaseForms = use);
  }

  /** Longest word beginning the unknown-word model counts; 0 for none. */
  public TrainingOptions withMaxPrefixLength(int length) {
    return copy(b -> b.maxPrefixLength = length);
  }

  /** Whether capitalised first words known only from mid-sentence are looked up in lower case. */
  public TrainingOptions withLowercaseMidSentenceFirstWord(boolean use) {
    return copy(b -> b.lowercaseMidSentenceFirstWord = use);
  }

  /** How the unknown-word model spells endings. */
  public TrainingOptions withEndingAlphabet(EndingAlphabet alphabet) {
    return copy(b -> b.endingAlphabet = alphabet);
  }

  /** The lexicon's minimum tag share (0 keeps every word/tag pair). */
  public TrainingOptions withMinTagShare(double share) {
    return copy(b -> b.minTagShare = share);
  }

  /** These options with the changes {@code edit} makes, checked like any others. */
  private TrainingOptions copy(Consumer<Builder> edit) {
    Builder b = toBuilder();
    edit.accept(b);
    return b.build();
  }

  /** A builder starting from the defaults, {@link #DEFAULTS}. */
  public static Builder builder() {
    return DEFAULTS.toBuilder();
  }

  /** A builder starting from these options. */
  public Builder toBuilder() {
    return new Builder(this);
  }

  /**
   * The options by name rather than by position; {@link #build} checks them together, as the
   * record's constructor does. Each setter is named after the component it sets (see the record's
   * parameters for their meaning).
   */
  public static final class Builder {
    private int order;
    private int maxSuffixLength;
    private int rareWordMaxCount;
    private SuffixWeightRule suffixWeightRule;
    private double suffixWeight;
    private double openClassMinShare;
    private boolean shapeClasses;
    private boolean capitalisationStates;
    private boolean contextEmissions;
    private boolean lowercaseFirstWord;
    private int contextMinCount;
    private int latentRounds;
    private UnknownWordPrior unknownWordPrior;
    private boolean lowerCaseForms;
    private int maxPrefixLength;
    private double minTagShare;
    private boolean lowercaseMidSentenceFirstWord;
    private EndingAlphabet endingAlphabet;

    private Builder() {
      suffixWeight = Double.NaN;
    }

    private Builder(TrainingOptions o) {
      order = o.order;
      maxSuffixLength = o.maxSuffixLength;
      rareWordMaxCount = o.rareWordMaxCount;
      suffixWeightRule = o.suffixWeightRule;
      suffixWeight = o.suffixWeight;
      openClassMinShare = o.openClassMinShare;
      shapeClasses = o.shapeClasses;
      capitalisationStates = o.capitalisationStates;
      contextEmissions = o.contextEmissions;
      lowercaseFirstWord = o.lowercaseFirstWord;
      contextMinCount = o.contextMinCount;
      latentRounds = o.latentRounds;
      unknownWordPrior = o.unknownWordPrior;
      lowerCaseForms = o.lowerCaseForms;
      maxPrefixLength = o.maxPrefixLength;
      minTagShare = o.minTagShare;
      lowercaseMidSentenceFirstWord = o.lowercaseMidSentenceFirstWord;
      endingAlphabet = o.endingAlphabet;
    }

    public Builder order(int value) {
      order = value;
      return this;
    }

    public Builder maxSuffixLength(int value) {
      maxSuffixLength = value;
      return this;
    }

    public Builder rareWordMaxCount(int value) {
      rareWordMaxCount = value;
      return this;
    }

    /** θ chosen by {@code rule}; a fixed θ is given with {@link #suffixWeight}. */
    public Builder suffixWeightRule(SuffixWeightRule rule) {
      suffixWeightRule = rule;
      suffixWeight = Double.NaN;
      return this;
    }

    /** A fixed θ (the rule {@link SuffixWeightRule#FIXED}). */
    public Builder suffixWeight(double weight) {
      suffixWeightRule = SuffixWeightRule.FIXED;
      suffixWeight = weight;
      return this;
    }

    public Builder openClassMinShare(double value) {
      openClassMinShare = value;
      return this;
    }

    public Builder shapeClasses(boolean value) {
      shapeClasses = value;
      return this;
    }

    public Builder capitalisationStates(boolean value) {
      capitalisationStates = value;
      return this;
    }

    public Builder contextEmissions(boolean value) {
      contextEmissions = value;
      return this;
    }

    public Builder lowercaseFirstWord(boolean value) {
      lowercaseFirstWord = value;
      return this;
    }

    public Builder contextMinCount(int value) {
      contextMinCount = value;
      return this;
    }

    public Builder latentRounds(int value) {
      latentRounds = value;
      return this;
    }

    public Builder unknownWordPrior(UnknownWordPrior value) {
      unknownWordPrior = value;
      return this;
    }

    public Builder lowerCaseForms(boolean value) {
      lowerCaseForms = value;
      return this;
    }

    public Builder maxPrefixLength(int value) {
      maxPrefixLength = value;
      return this;
    }

    public Builder minTagShare(double value) {
      minTagShare = value;
      return this;
    }

    public Builder lowercaseMidSentenceFirstWord(boolean value) {
      lowercaseMidSentenceFirstWord = value;
      return this;
    }

    public Builder endingAlphabet(EndingAlphabet value) {
      endingAlphabet = value;
      return this;
    }

    /** @throws IllegalArgumentException for a value or a combination the record refuses */
    public TrainingOptions build() {
      return new TrainingOptions(order, maxSuffixLength, rareWordMaxCount, suffixWeightRule, suffixWeight,
          openClassMinShare, shapeClasses, capitalisationStates, contextEmissions, lowercaseFirstWord, contextMinCount,
          latentRounds, unknownWordPrior, lowerCaseForms, maxPrefixLength, minTagShare, lowercaseMidSentenceFirstWord,
          endingAlphabet);
    }
  }

  /**
   * The options as provenance entries. The ending alphabet is named only where endings are
   * folded: a model with endings as written keeps the provenance, and the bytes, it had before
   * the option existed ({@link #describeAll()} names it always).
   */
  public Map<String, String> describe() {
    Map<String, String> m = describeAll();
    if (endingAlphabet == EndingAlphabet.AS_WRITTEN) {
      m.remove("option.endingAlphabet");
    }
    return m;
  }

  /** Every option by name, as {@link #describe()} writes them, the ending alphabet included. */
  public Map<String, String> describeAll() {
    Map<String, String> m = new LinkedHashMap<>();
    m.put("option.order", Integer.toString(order));
    m.put("option.maxSuffixLength", Integer.toString(maxSuffixLength));
    m.put("option.maxPrefixLength", Integer.toString(maxPrefixLength));
    m.put("option.rareWordMaxCount", Integer.toString(rareWordMaxCount));
    m.put("option.suffixWeight", suffixWeightRule == SuffixWeightRule.FIXED
        ? Double.toString(suffixWeight) : suffixWeightRule.name().toLowerCase(Locale.ROOT).replace('_', '-'));
    m.put("option.openClassMinShare", Double.toString(openClassMinShare));
    m.put("option.shapeClasses", Boolean.toString(shapeClasses));
    m.put("option.capitalisationStates", Boolean.toString(capitalisationStates));
    m.put("option.contextEmissions", Boolean.toString(contextEmissions));
    m.put("option.lowercaseFirstWord", Boolean.toString(lowercaseFirstWord));
    m.put("option.lowercaseMidSentenceFirstWord", Boolean.toString(lowercaseMidSentenceFirstWord));
    m.put("option.contextMinCount", Integer.toString(contextMinCount));
    m.put("option.latentRounds", Integer.toString(latentRounds));
    m.put("option.lowerCaseForms", Boolean.toString(lowerCaseForms));
    m.put("option.unknownWordPrior", unknownWordPrior.name().toLowerCase(Locale.ROOT).replace('_', '-'));
    m.put("option.minTagShare", Double.toString(minTagShare));
    m.put("option.endingAlphabet", endingAlphabet.optionName());
    return m;
  }
}
