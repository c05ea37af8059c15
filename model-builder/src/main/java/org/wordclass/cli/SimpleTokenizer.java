package org.wordclass.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Splits a line of raw text into tokens for tagging from the command line, with one regular
 * expression and no language data: runs of letters and digits are words, keeping the
 * apostrophes, hyphens and periods inside them ({@code don't}, {@code well-known}, {@code 3.5});
 * dotted abbreviations keep their final period ({@code e.g.}); digit groups keep their commas
 * ({@code 10,000}); every other visible character is a token of its own.
 */
final class SimpleTokenizer {
  private static final Pattern TOKEN = Pattern.compile(
      "(?:\\p{L}\\.){2,}"                                  // abbreviations such as U.S. or e.g.
          + "|\\p{N}+(?:[.,:]\\p{N}+)+"                    // numbers with separators: 10,000 3.5 10:30
          + "|[\\p{L}\\p{N}\\p{M}]+(?:['’.\\-][\\p{L}\\p{N}\\p{M}]+)*"  // words with inner ' . -
          + "|\\S");                                        // any other mark on its own

  List<String> tokens(String text) {
    List<String> tokens = new ArrayList<>();
    Matcher m = TOKEN.matcher(text);
    while (m.find()) {
      tokens.add(m.group());
    }
    return tokens;
  }
}
