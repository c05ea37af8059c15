package org.wordclass.model;

/**
 * How the unknown-word model spells the endings it counts and looks up: as written, or with the
 * letters that a language's suffixes alternate by sound folded into one, so that the variants of
 * one suffix share their counts. Training folds the rare words before counting their endings and
 * decoding folds each character of an unknown word as it walks the ending trie, so both sides
 * must use the same alphabet: the model file records it ({@code docs/model-format.md}).
 *
 * <p>Folding works on single UTF-16 chars and keeps every other char as it is: one table step per
 * char of an ending, nothing allocated.
 */
public enum EndingAlphabet {
  /** Endings as written. */
  AS_WRITTEN {
    @Override
    public char fold(char c) {
      return c;
    }
  },

  /**
   * Turkish vowel harmony: a suffix takes {@code a} or {@code e} after the last vowel of the
   * word, {@code ı}, {@code i}, {@code u} or {@code ü} in its four-way suffixes ({@code -da/-de},
   * {@code -ın/-in/-un/-ün}, {@code -lar/-ler}; a fact of Turkish grammar). Folded: {@code e} to
   * {@code a}; {@code i}, {@code u}, {@code ü} to {@code ı}; {@code ö} to {@code o}; the capitals
   * likewise ({@code E} to {@code A}; {@code İ}, {@code U}, {@code Ü} to {@code I}; {@code Ö} to
   * {@code O}). Consonants are kept: folding {@code d/t} as well gained less on Turkish dev.
   */
  TURKISH_VOWEL_HARMONY {
    @Override
    public char fold(char c) {
      return switch (c) {
        case 'e' -> 'a';
        case 'i', 'u', 'ü' -> 'ı';
        case 'ö' -> 'o';
        case 'E' -> 'A';
        case 'İ', 'U', 'Ü' -> 'I';
        case 'Ö' -> 'O';
        default -> c;
      };
    }
  },

  /**
   * Finnish vowel harmony: a suffix takes the back vowels {@code a}, {@code o}, {@code u} after a
   * word with back vowels and the front {@code ä}, {@code ö}, {@code y} otherwise ({@code
   * -ssa/-ssä}, {@code -lla/-llä}, {@code -ko/-kö}; {@code e} and {@code i} are neutral; a fact of
   * Finnish grammar). Folded: {@code ä} to {@code a}, {@code ö} to {@code o}, {@code y} to
   * {@code u}, the capitals likewise.
   */
  FINNISH_VOWEL_HARMONY {
    @Override
    public char fold(char c) {
      return switch (c) {
        case 'ä' -> 'a';
        case 'ö' -> 'o';
        case 'y' -> 'u';
        case 'Ä' -> 'A';
        case 'Ö' -> 'O';
        case 'Y' -> 'U';
        default -> c;
      };
    }
  };

  /** The char that stands for {@code c} in endings. */
  public abstract char fold(char c);

  /** {@code word} folded char by char; as long as {@code word}. */
  public String fold(CharSequence word) {
    char[] out = new char[word.length()];
    for (int i = 0; i < out.length; i++) {
      out[i] = fold(word.charAt(i));
    }
    return new String(out);
  }

  /** The name {@code train --ending-alphabet} takes: {@code as-written}, {@code turkish-vowel-harmony}, ... */
  public String optionName() {
    return name().toLowerCase(java.util.Locale.ROOT).replace('_', '-');
  }
}
