package org.wordclass.model;

/**
 * Coarse spelling classes of a word, used by the unknown-word model: each class keeps its own
 * suffix statistics, because endings mean different things in "Running" (a name or a sentence
 * start), "running" and "RUNNING", and numbers or symbols are told apart by their shape alone.
 *
 * <p>Classification reads the characters once and allocates nothing.
 */
public enum WordShape {
  /** No upper-case letter and no digit: {@code walked}, {@code e-mail}. */
  LOWER,
  /** First letter upper case, not all letters upper case: {@code Paris}, {@code McDonald}. */
  CAPITALISED,
  /** At least two letters, all upper case: {@code NASA}, {@code USB-C}. */
  ALL_CAPS,
  /** Contains a digit: {@code 2026}, {@code 3.5mm}, {@code A4}. */
  HAS_DIGIT,
  /** Neither a letter nor a digit: {@code ...}, {@code :-)}, {@code §}. */
  NO_LETTER;

  private static final WordShape[] VALUES = values();

  public static WordShape of(int ordinal) {
    return VALUES[ordinal];
  }

  /** Shape of {@code buf[off..off+len)}. */
  public static WordShape classify(char[] buf, int off, int len) {
    int letters = 0;
    int upper = 0;
    boolean firstLetterUpper = false;
    for (int i = off, end = off + len; i < end; i++) {
      char c = buf[i];
      if (Character.isDigit(c)) {
        return HAS_DIGIT;
      }
      if (Character.isLetter(c)) {
        if (letters == 0) {
          firstLetterUpper = Spelling.isCapital(c);
        }
        letters++;
        if (Character.isUpperCase(c)) {
          upper++;
        }
      }
    }
    if (letters == 0) {
      return NO_LETTER;
    }
    if (letters >= 2 && upper == letters) {
      return ALL_CAPS;
    }
    return firstLetterUpper ? CAPITALISED : LOWER;
  }

  /**
   * The shape as seen by a model that only distinguishes capitalised from lower-case words, the
   * original split of the suffix model.
   */
  public WordShape capitalisationOnly() {
    return (this == CAPITALISED || this == ALL_CAPS) ? CAPITALISED : LOWER;
  }
}
