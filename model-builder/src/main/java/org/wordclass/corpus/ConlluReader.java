package org.wordclass.corpus;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Pattern;

/**
 * Reads CoNLL-U (https://universaldependencies.org/format.html): FORM (column 2) with UPOS
 * (column 4) or XPOS (column 5).
 *
 * <ul>
 *   <li>Comment lines ({@code #}) are skipped, except {@code # text =}, kept as the raw text.
 *   <li>Multiword-token lines ({@code 3-4 don't}) are not words: the syntactic words that follow
 *       them ({@code do}, {@code n't}) are, because they carry the tags. The range line's
 *       {@code SpaceAfter=No} applies to its last word.
 *   <li>Empty nodes ({@code 5.1}) are skipped: they have no surface form.
 * </ul>
 *
 * IDs are checked as the specification defines them: word IDs are integers from 1 in ASCII
 * digits, in order; a range N-M has N &lt; M, starts at the next word, overlaps no other range
 * and ends within its sentence; an empty node N.M follows word N.
 */
public final class ConlluReader extends SentenceReader {
  private static final Pattern ASCII_DIGITS = Pattern.compile("[0-9]+");
  private static final Pattern DECIMAL_ID = Pattern.compile("(0|[1-9][0-9]*)\\.[1-9][0-9]*");

  public ConlluReader(Path path, TagColumn column) throws IOException {
    super(path, column);
  }

  @Override
  protected Sentence readSentence() {
    List<String> words = newList();
    List<String> tags = newList();
    List<Boolean> spaces = newList();
    List<Sentence.MultiwordToken> multiwordTokens = newList();
    String text = null;
    long first = 0;
    int rangeEnd = -1;
    String rangeId = null;
    long rangeLine = 0;
    boolean rangeSpaceAfter = true;
    int expectedId = 1;
    String line;
    while ((line = lines.readLine()) != null) {
      if (line.isBlank()) {
        if (!words.isEmpty()) {
          break;
        }
        if (text != null) {
          throw error("sentence has comments but no words");
        }
        continue;
      }
      if (first == 0) {
        first = lines.lineNumber();
      }
      if (line.startsWith("#")) {
        if (line.startsWith("# text =")) {
          text = line.substring("# text =".length()).strip();
        }
        continue;
      }
      String[] fields = line.split("\t", -1);
      if (fields.length != 10) {
        throw error("expected 10 tab-separated columns but found " + fields.length);
      }
      String id = fields[0];
      int dot = id.indexOf('.');
      if (dot >= 0) {
        checkEmptyNode(id, dot, expectedId - 1);
        continue;
      }
      int dash = id.indexOf('-');
      if (dash >= 0) {
        int rangeStart = parseId(id.substring(0, dash));
        int end = parseId(id.substring(dash + 1));
        if (rangeStart != expectedId) {
          throw error("multiword token range " + id + " does not start at word " + expectedId);
        }
        if (end <= rangeStart) {
          throw error("multiword token range " + id + " must end after it starts (N-M with N < M)");
        }
        if (rangeStart <= rangeEnd) {
          throw error("multiword token range " + id + " overlaps range " + rangeId);
        }
        rangeEnd = end;
        rangeId = id;
        rangeLine = lines.lineNumber();
        rangeSpaceAfter = !fields[9].contains("SpaceAfter=No");
        multiwordTokens.add(new Sentence.MultiwordToken(rangeStart - 1, rangeEnd - 1, fields[1]));
        continue;
      }
      int wordId = parseId(id);
      if (wordId != expectedId) {
        throw error("word ID " + wordId + " where " + expectedId + " was expected");
      }
      expectedId++;
      if (fields[1].isEmpty()) {
        throw error("empty FORM");
      }
      String tag = column == TagColumn.UPOS ? fields[3] : fields[4];
      words.add(fields[1]);
      tags.add(checkedTag(tag));
      if (wordId < rangeEnd) {
        spaces.add(false);
      } else if (wordId == rangeEnd) {
        spaces.add(rangeSpaceAfter);
      } else {
        spaces.add(!fields[9].contains("SpaceAfter=No"));
      }
    }
    if (rangeEnd > words.size()) {
      throw new CorpusFormatException(fileName, rangeLine, "multiword token range " + rangeId + " ends after the last word of "
          + "its sentence (" + (words.isEmpty() ? "none" : "word " + words.size()) + ")");
    }
    return words.isEmpty() ? null : sentence(words, tags, text, spaces, first, multiwordTokens);
  }

  /** An empty node's ID is N.M (M from 1) and follows word N, or opens the sentence as 0.M. */
  private void checkEmptyNode(String id, int dot, int lastWord) {
    if (!DECIMAL_ID.matcher(id).matches()) {
      throw error("empty node ID '" + id + "' is not of the form N.M (ASCII digits, M from 1, no sign or leading zero)");
    }
    if (!id.substring(0, dot).equals(Integer.toString(lastWord))) {
      throw error("empty node " + id + " does not follow word " + id.substring(0, dot) + " (the last word was " + lastWord + ")");
    }
  }

  /**
   * A word ID as the specification writes it: an integer from 1 in ASCII digits, without sign or
   * leading zero ({@code Integer.parseInt} alone takes {@code 01}, {@code +2} and other scripts'
   * digits).
   */
  private int parseId(String id) {
    if (!ASCII_DIGITS.matcher(id).matches()) {
      boolean number = id.codePoints().allMatch(c -> Character.isDigit(c) || c == '+' || c == '-') && !id.isEmpty();
      throw error(number ? "word ID '" + id + "' is not written as CoNLL-U writes IDs (ASCII digits, no sign or leading zero)"
          : "word ID '" + id + "' is not a number");
    }
    if (id.equals("0")) {
      throw error("word ID 0 is not positive");
    }
    if (id.startsWith("0")) {
      throw error("word ID '" + id + "' is not written as CoNLL-U writes IDs (ASCII digits, no sign or leading zero)");
    }
    if (id.length() > 9) {
      throw error("word ID " + id + " is larger than any sentence");
    }
    return Integer.parseInt(id);
  }
}
