package org.wordclass.demo;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/** Short pieces of a notice around a word, for tables and notes that must fit a terminal line. */
final class Snippets {
  private static final String ELLIPSIS = "...";
  /** The last word of a text, and the first; punctuation around them is left out. */
  private static final Pattern WORD_BEFORE = Pattern.compile("([\\p{L}\\p{N}'-]+)[^\\p{L}\\p{N}]*$");
  private static final Pattern WORD_AFTER = Pattern.compile("^[^\\p{L}\\p{N}]*([\\p{L}\\p{N}'-]+)");

  private Snippets() {}

  /** The first whole-word match of {@code word} in {@code text}, case ignored. */
  private static Matcher find(String text, String word) {
    // letters and digits around the match would make it part of another word
    Pattern pattern = Pattern.compile("(?<![\\p{L}\\p{N}])" + Pattern.quote(word) + "(?![\\p{L}\\p{N}])",
        Pattern.CASE_INSENSITIVE | Pattern.UNICODE_CASE);
    Matcher matcher = pattern.matcher(text);
    return matcher.find() ? matcher : null;
  }

  /** About {@code width} characters of {@code text} around {@code word}, which is set in brackets. */
  static String around(String text, String word, int width) {
    Matcher m = find(text, word);
    if (m == null) {
      return cut(text, 0, width);
    }
    String marked = text.substring(0, m.start()) + "[" + m.group() + "]" + text.substring(m.end());
    // a little more context before the word than after reads best in a column
    int start = wordStart(marked, Math.max(0, m.start() - width / 3), m.start());
    return (start > 0 ? ELLIPSIS : "") + cut(marked, start, width);
  }

  /** {@code word} with the words just before and after it, as a note quotes it: "Book early". */
  static String phrase(String text, String word) {
    Matcher m = find(text, word);
    if (m == null) {
      return word;
    }
    Matcher before = WORD_BEFORE.matcher(text.substring(0, m.start()));
    Matcher after = WORD_AFTER.matcher(text.substring(m.end()));
    return (before.find() ? before.group(1) + " " : "") + m.group() + (after.find() ? " " + after.group(1) : "");
  }

  /** The first word start at or after {@code from}, but never past the marked word at {@code mark}. */
  private static int wordStart(String text, int from, int mark) {
    int i = from;
    while (i > 0 && i < mark && !Character.isWhitespace(text.charAt(i - 1))) {
      i++;
    }
    return i;
  }

  /** {@code text} from {@code start}, cut at a space to fit {@code width} with the ellipsis. */
  private static String cut(String text, int start, int width) {
    String rest = text.substring(start);
    if (rest.length() <= width) {
      return rest;
    }
    int end = width - ELLIPSIS.length();
    int space = rest.lastIndexOf(' ', end);
    // a half word reads worse than a shorter line, unless the cut would leave almost nothing
    return rest.substring(0, space > end / 2 ? space : end).stripTrailing() + ELLIPSIS;
  }
}
