package org.wordclass.model;

/**
 * The most probable tag of each lower-case word of a lexicon, looked up by a word written in any
 * case: what "Customer" or "CUSTOMER" most often is as "customer". The most probable tag of a
 * word is that of its state {@code s} with the highest {@code P(w|s) P(s)}, that is the state it
 * was seen with most often in training.
 *
 * <p>Lookups go through the lexicon's own hash table ({@link Lexicon#lookupLowerCased}), which
 * lower-cases the token on the fly by {@link Spelling#lowerCase(char)}, so a lookup allocates
 * nothing and no second table is kept: this class holds one int per lexicon word. Built once
 * from the lexicon (derived data: a model file does not store it). Immutable and safe to share
 * between threads.
 */
public final class LowerCaseForms {
  private final Lexicon lexicon;
  /** Per lexicon word: its most probable tag if it is written in lower case, else -1. */
  private final int[] tagOfWord;
  private final int size;

  /**
   * @param lexicon the known words
   * @param states the states the lexicon's entries list
   * @param logStatePrior {@code log P(s)} for every state
   */
  public LowerCaseForms(Lexicon lexicon, StateSpace states, double[] logStatePrior) {
    if (logStatePrior.length != states.size()) {
      throw new IllegalArgumentException("one state prior per state expected, not " + logStatePrior.length);
    }
    this.lexicon = lexicon;
    this.tagOfWord = new int[lexicon.size()];
    int count = 0;
    for (int w = 0; w < lexicon.size(); w++) {
      tagOfWord[w] = lexicon.isLowerCase(w) ? states.tagOf(mostProbableState(lexicon, w, logStatePrior)) : -1;
      count += tagOfWord[w] >= 0 ? 1 : 0;
    }
    this.size = count;
  }

  private static int mostProbableState(Lexicon lexicon, int w, double[] logStatePrior) {
    int best = -1;
    double bestScore = Double.NEGATIVE_INFINITY;
    for (int k = 0; k < lexicon.stateCount(w); k++) {
      int state = lexicon.state(w, k);
      double score = lexicon.logEmission(w, k) + logStatePrior[state];
      if (best < 0 || score > bestScore) {
        best = state;
        bestScore = score;
      }
    }
    return best;
  }

  /**
   * The most probable tag of the lower-case form of {@code buf[off..off+len)}, or -1 if that
   * form is not a known word.
   */
  public int tagOfLowerCased(char[] buf, int off, int len) {
    int word = lexicon.lookupLowerCased(buf, off, len);
    return word < 0 ? -1 : tagOfWord[word];
  }

  /** Number of lower-case words held. */
  public int size() {
    return size;
  }

  /** Approximate heap size in bytes. */
  public long ramBytesUsed() {
    return 4L * tagOfWord.length;
  }
}
