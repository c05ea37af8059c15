package org.wordclass.demo;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/** Short pieces of a notice around a word, for tables and notes that must fit a terminal line. */
final class Snippets {
  private static final String ELLIPSIS = "...";

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
    int start = wordStart(marked, Math.max(0, m.start() - width / 3));
    return (start > 0 ? ELLIPSIS : "") + cut(marked, start, width);
  }

  /** {@code word} with the words just before and after it, as a note quotes it: "Book early". */
  static String phrase(String text, String word) {
    Matcher m = find(text, word);
    if (m == null) {
      return word;
    }
    String before = text.substring(0, m.start()).replaceAll(".*?([\\p{L}\\p{N}'-]+)\\W*$", "$1 ");
    String after = text.substring(m.end()).replaceAll("^\\W*([\\p{L}\\p{N}'-]+).*", " $1");
    return (m.start() == 0 ? "" : before) + m.group() + (m.end() == text.length() ? "" : after);
  }

  private static int wordStart(String text, int from) {
    int i = from;
    while (i > 0 && !Character.isWhitespace(text.charAt(i - 1))) {
      i++;
      if (i >= text.length()) {
        return from;
      }
    }
    return i;
  }

  private static String cut(String text, int start, int width) {
    String rest = text.substring(start);
    return rest.length() <= width ? rest : rest.substring(0, width - ELLIPSIS.length()).stripTrailing() + ELLIPSIS;
  }
}
