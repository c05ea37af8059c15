package org.wordclass.decoding;

import java.util.Locale;

/**
 * Where a decoded token sequence may hold sentence boundaries besides its ends: only where the
 * caller cut it (the tokenizer's sentences), or also where the model finds one itself.
 */
public enum SentenceBoundaries {
  /** Only the sequence's ends: each sequence is decoded as one sentence. */
  TOKENIZER,
  /**
   * Also before any capitalised token after the first: such a token gets, beside its
   * mid-sentence candidates, those it would get as the first word of a sentence, entered through
   * the end of one sentence and the start of the next. Viterbi then chooses the boundaries and the
   * tags together, exactly; the tokenizer's boundaries stay. Costs, for each capitalised token,
   * the candidates of a second reading (one more lexicon lookup, in lower case where a first word
   * is looked up so).
   */
  DECODED;

  /** The lower-case name, as filter arguments and command-line options write it. */
  public String argument() {
    return name().toLowerCase(Locale.ROOT);
  }

  /**
   * The value named {@code text} ({@code tokenizer} or {@code decoded}).
   *
   * @throws IllegalArgumentException naming {@code what} and the values if there is none
   */
  public static SentenceBoundaries parse(String text, String what) {
    for (SentenceBoundaries value : values()) {
      if (value.argument().equals(text)) {
        return value;
      }
    }
    throw new IllegalArgumentException("'" + what + "' must be tokenizer or decoded, not '" + text + "'");
  }
}
