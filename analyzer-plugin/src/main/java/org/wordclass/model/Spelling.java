package org.wordclass.model;

/**
 * The spelling rules that training and decoding must apply alike: whether a word starts with a
 * capital, and how a word is lower-cased. A model's capitalisation states, its lexicon of
 * lower-case forms, its tries of lower-cased word beginnings and a user lexicon's {@code
 * case=any} forms are all built with these rules when a model is trained or a lexicon is read,
 * and looked up with the same rules while decoding; a rule applied one way on each side would
 * silently make words unknown or put them in states they were never counted in.
 *
 * <p>Both rules work on single UTF-16 chars, without locale, so that the decoder applies them to
 * a token's char buffer on the fly and allocates nothing:
 *
 * <ul>
 *   <li>a capital is a char that is upper case or title case ({@code ǅ} in {@code ǅemal});
 *   <li>lower-casing is {@link Character#toLowerCase(char)} char by char: the dotted capital
 *       {@code İ} becomes {@code i} (not {@code i} plus a combining dot, as {@link
 *       String#toLowerCase(java.util.Locale)} writes it), and a capital sigma becomes {@code σ}
 *       wherever it stands (no final {@code ς}); the length of a word never changes.
 * </ul>
 *
 * Each method costs one pass over the chars it is given, or less.
 */
public final class Spelling {
  private Spelling() {}

  /** Whether {@code c} is a capital: upper case or title case. */
  public static boolean isCapital(char c) {
    return Character.isUpperCase(c) || Character.isTitleCase(c);
  }

  /** Whether {@code buf[off..off+len)} starts with a capital; false when empty. */
  public static boolean startsWithCapital(char[] buf, int off, int len) {
    return len > 0 && isCapital(buf[off]);
  }

  /** Whether {@code word} starts with a capital; false when empty. */
  public static boolean startsWithCapital(CharSequence word) {
    return word.length() > 0 && isCapital(word.charAt(0));
  }

  /** The lower-case form of one char. */
  public static char lowerCase(char c) {
    return Character.toLowerCase(c);
  }

  /** The lower-case form of {@code word}, char by char; as long as {@code word}. */
  public static String lowerCase(CharSequence word) {
    char[] out = new char[word.length()];
    for (int i = 0; i < out.length; i++) {
      out[i] = lowerCase(word.charAt(i));
    }
    return new String(out);
  }

  /** Whether lower-casing leaves {@code buf[off..off+len)} as it is. */
  public static boolean isLowerCase(char[] buf, int off, int len) {
    for (int i = off, end = off + len; i < end; i++) {
      if (lowerCase(buf[i]) != buf[i]) {
        return false;
      }
    }
    return true;
  }

  /**
   * {@code word} lower-cased by {@link #lowerCase(CharSequence)} with its first code point in
   * title case: the form a word takes at the start of a sentence or as a name. Title case, so
   * that a digraph such as {@code ǆ} becomes {@code ǅ}; {@link #startsWithCapital(CharSequence)}
   * holds for the result whenever its first char has a capital at all.
   */
  public static String capitalised(CharSequence word) {
    String lower = lowerCase(word);
    if (lower.isEmpty()) {
      return lower;
    }
    int first = lower.codePointAt(0);
    return new StringBuilder().appendCodePoint(Character.toTitleCase(first))
        .append(lower, Character.charCount(first), lower.length()).toString();
  }

  /**
   * The upper-case form of {@code word} as a text written in capitals spells it ({@code ß}
   * becomes {@code SS}): {@link String#toUpperCase(java.util.Locale)} without locale. No
   * decoding rule upper-cases a token, so this one need not keep the length.
   */
  public static String upperCase(CharSequence word) {
    return word.toString().toUpperCase(java.util.Locale.ROOT);
  }
}
