package org.wordclass.corpus;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

/**
 * Reads CoNLL-U (https://universaldependencies.org/format.html): FORM (column 2) with UPOS
 * (column 4) or XPOS (column 5).
 *
 * <ul>
 *   <li>Comment lines ({@code #}) are skipped, except {@code # text =}, kept as the raw text, and
 *       {@code # newdoc}, which makes the sentence the first of a document.
 *   <li>Multiword-token lines ({@code 3-4 don't}) are not words: the syntactic words that follow
 *       them ({@code do}, {@code n't}) are, because they carry the tags. The range line's
 *       {@code SpaceAfter=No} applies to its last word.
 *   <li>Empty nodes ({@code 5.1}) are skipped: they have no surface form.
 * </ul>
 */
public final class ConlluReader extends SentenceReader {
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
        } else if (line.startsWith("# newdoc")) {
          startDocument();
        }
        continue;
      }
      String[] fields = line.split("\t", -1);
      if (fields.length != 10) {
        throw error("expected 10 tab-separated columns but found " + fields.length);
      }
      String id = fields[0];
      if (id.indexOf('.') >= 0) {
        continue;
      }
      int dash = id.indexOf('-');
      if (dash >= 0) {
        int rangeStart = parseId(id.substring(0, dash));
        rangeEnd = parseId(id.substring(dash + 1));
        if (rangeStart != expectedId || rangeEnd < rangeStart) {
          throw error("multiword token range " + id + " does not start at word " + expectedId);
        }
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
    return words.isEmpty() ? null : sentence(words, tags, text, spaces, first, multiwordTokens);
  }

  private int parseId(String id) {
    try {
      int value = Integer.parseInt(id);
      if (value < 1) {
        throw error("word ID " + id + " is not positive");
      }
      return value;
    } catch (NumberFormatException e) {
      throw error("word ID '" + id + "' is not a number");
    }
  }
}
