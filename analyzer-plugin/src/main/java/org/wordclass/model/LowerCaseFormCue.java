package org.wordclass.model;

import java.io.IOException;
import org.apache.lucene.store.DataInput;
import org.apache.lucene.store.DataOutput;

/**
 * What the lower-case form of an unknown capitalised word says about its tag: "Customer" is
 * unknown, but "customer" is a known noun, and capitalised words whose lower-case form is mostly
 * a noun are far more often nouns (and less often proper nouns) than capitalised words in
 * general. The suffix model's {@code P(t | ending)} of such a word is multiplied by
 * {@code P(t | capitalised, lower-case form mostly X) / P(t | capitalised)}, both counted over the
 * rare capitalised training words, X being the most probable tag of the lower-case form (see
 * {@link LowerCaseForms}). Words whose lower-case form is unknown keep their distribution.
 *
 * <p>Holds the per-state priors that pick the lower-case form's tag and the factors, one row of
 * open-tag factors per tag X; the lookup table is derived from the lexicon on first use. Safe to
 * share between threads.
 */
public final class LowerCaseFormCue {
  private final double[] logStatePrior;
  private final double[] factors;
  private final double[] logFactors;
  private final int openCount;
  private final Lexicon lexicon;
  private final StateSpace states;
  /**
   * Built from the lexicon on first use rather than when the model is loaded: it is derived data
   * that takes a tenth of a cold load, and many documents never contain an unknown capitalised
   * word. Threads racing to build it build equal tables; the volatile field publishes one whole.
   */
  private volatile LowerCaseForms forms;

  /**
   * @param logStatePrior {@code log P(s)} over all training tokens, one per state
   * @param factors row-major, {@code tagCount} rows of {@code openCount} positive finite factors:
   *     row X multiplies the distribution of a word whose lower-case form is mostly X
   * @param lexicon the known words, whose lower-case ones are looked up
   * @param states the model's states
   */
  public LowerCaseFormCue(double[] logStatePrior, double[] factors, int tagCount, int openCount, Lexicon lexicon,
      StateSpace states) {
    if (factors.length != (long) tagCount * openCount || states.tagCount() != tagCount) {
      throw new IllegalArgumentException("lower-case form factors: " + tagCount + " rows of " + openCount + " expected");
    }
    for (double f : factors) {
      if (!(f > 0) || Double.isInfinite(f)) {
        throw new IllegalArgumentException("lower-case form factors must be positive and finite: " + f);
      }
    }
    this.logStatePrior = logStatePrior.clone();
    this.factors = factors.clone();
    this.logFactors = new double[factors.length];
    for (int i = 0; i < factors.length; i++) {
      logFactors[i] = Math.log(factors[i]);
    }
    this.openCount = openCount;
    if (logStatePrior.length != states.size()) {
      // checked here, when the model is read, although the table that uses them is built later
      throw new IllegalArgumentException("one state prior per state expected, not " + logStatePrior.length);
    }
    this.lexicon = lexicon;
    this.states = states;
  }

  /**
   * Multiplies {@code dist} (one entry per open tag) by the factors of the word's lower-case
   * form, if the word is written with a capital and that form is known.
   *
   * @return the tag of the lower-case form that was used, or -1 if none was
   */
  public int apply(char[] buf, int off, int len, double[] dist) {
    int tag = tagOfLowerCaseForm(buf, off, len);
    for (int k = 0, row = tag * openCount; tag >= 0 && k < openCount; k++) {
      dist[k] *= factors[row + k];
    }
    return tag;
  }

  /**
   * As {@link #apply}, in logarithms: adds the logarithms of the factors to {@code logDist}, as
   * a decoder scoring unknown words does; {@code shape} is the word's, classified once by the
   * caller.
   *
   * @return the tag of the lower-case form that was used, or -1 if none was
   */
  public int addLogFactors(WordShape shape, char[] buf, int off, int len, double[] logDist) {
    int tag = shape.capitalisationOnly() == WordShape.CAPITALISED ? forms().tagOfLowerCased(buf, off, len) : -1;
    for (int k = 0, row = tag * openCount; tag >= 0 && k < openCount; k++) {
      logDist[k] += logFactors[row + k];
    }
    return tag;
  }

  /** The most probable tag of the word's lower-case form if it is written with a capital and that form is known, else -1. */
  private int tagOfLowerCaseForm(char[] buf, int off, int len) {
    if (WordShape.classify(buf, off, len).capitalisationOnly() != WordShape.CAPITALISED) {
      return -1;
    }
    return forms().tagOfLowerCased(buf, off, len);
  }

  /** The factor of open tag {@code k} for words whose lower-case form is mostly {@code tag}. */
  public double factor(int tag, int k) {
    return factors[tag * openCount + k];
  }

  double[] logStatePrior() {
    return logStatePrior;
  }

  double[] factors() {
    return factors;
  }

  /**
   * Writes the cue in the model file's layout ({@code docs/model-format.md}): the state priors,
   * then the factors row by row. Whether a model has the cue at all is the unknown-word model's
   * flag byte, written before.
   */
  void writeTo(DataOutput out) throws IOException {
    ModelFile.writeDoubles(out, logStatePrior);
    ModelFile.writeDoubles(out, factors);
  }

  /**
   * Reads a cue {@link #writeTo} wrote, checking both sizes against the bytes left before
   * allocating; the constructor checks the values.
   */
  static LowerCaseFormCue readFrom(DataInput in, ModelFile.Limits limits, int tagCount, int openCount, Lexicon lexicon,
      StateSpace states) throws IOException {
    double[] logStatePrior = ModelFile.readDoubles(in, limits.count(states.size(), 8, "state priors"));
    double[] factors = ModelFile.readDoubles(in, limits.count((long) tagCount * openCount, 8, "lower-case form factors"));
    return new LowerCaseFormCue(logStatePrior, factors, tagCount, openCount, lexicon, states);
  }

  /** The lower-case words and their tags. */
  public LowerCaseForms forms() {
    LowerCaseForms built = forms;
    if (built == null) {
      built = new LowerCaseForms(lexicon, states, logStatePrior);
      forms = built;
    }
    return built;
  }

  /** Approximate heap size in bytes. */
  public long ramBytesUsed() {
    return 8L * (logStatePrior.length + 2L * factors.length) + forms().ramBytesUsed();
  }
}
