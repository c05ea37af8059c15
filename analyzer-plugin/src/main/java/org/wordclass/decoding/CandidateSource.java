package org.wordclass.decoding;

/** How the candidate classes of a token were chosen; see {@link Lattice#source}. */
public enum CandidateSource {
  /** The word is in the model's lexicon as written: its own classes. */
  KNOWN,
  /** A capitalised first word found in the lexicon in lower case ("Stir" as "stir"). */
  LOWERCASED_FIRST_WORD,
  /** Not in the lexicon: the open classes, scored by the word's ending and spelling shape. */
  UNKNOWN,
  /** Listed by a user lexicon: exactly the classes listed there. */
  USER_LEXICON;

  private static final CandidateSource[] VALUES = values();

  static CandidateSource of(int ordinal) {
    return VALUES[ordinal];
  }
}
