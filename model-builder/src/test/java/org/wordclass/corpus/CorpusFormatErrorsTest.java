package org.wordclass.corpus;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.wordclass.corpus.CorpusFiles.lines;
import static org.wordclass.corpus.CorpusFiles.row;
import static org.wordclass.corpus.CorpusFiles.utf8;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Each malformed input is refused with the exact file name, line number and problem, in the form
 * {@link CorpusFormatException} documents ("file:line: problem"); what counts as malformed follows
 * the CoNLL-U format description of Universal Dependencies and the UTF-8 definition (RFC 3629:
 * a lone continuation byte such as 0x80, or 0xC3 followed by a non-continuation byte, is invalid).
 */
class CorpusFormatErrorsTest {
  @TempDir Path dir;

  private static final String GOOD_1 = row("1", "Hi", "INTJ");

  /** Reads {@code file} to the end and returns the message it was refused with. */
  private static String refusal(Path file, TagColumn column) {
    CorpusFormatException e = assertThrows(CorpusFormatException.class, () -> CorpusFiles.read(file, column));
    assertEquals(file.toString(), e.file());
    return e.getMessage();
  }

  private String conllu(String name, String text) {
    return refusal(CorpusFiles.write(dir, name, text), TagColumn.UPOS);
  }

  @Test
  void wrongColumnCount() {
    String text = lines("# c", GOOD_1, "2\tthere\tthere\tADV\t_\t_\t_\t_\t_", "");
    assertEquals(dir.resolve("a.conllu") + ":3: expected 10 tab-separated columns but found 9", conllu("a.conllu", text));
  }

  @Test
  void missingTag() {
    assertEquals(dir.resolve("b.conllu") + ":2: missing tag", conllu("b.conllu", lines(GOOD_1, row("2", "there", "_"), "")));
  }

  @Test
  void unknownUposTag() {
    String expected = dir.resolve("c.conllu") + ":1: unknown UPOS tag 'NOUNS' (expected one of the 17 Universal Dependencies tags)";
    assertEquals(expected, conllu("c.conllu", lines(row("1", "cats", "NOUNS"), "")));
  }

  @Test
  void whiteSpaceInTag() {
    Path file = CorpusFiles.write(dir, "d.conllu", lines(row("1", "Hi", "INTJ", "UH", "_"), "", row("1", "x", "X", "N N", "_"), ""));
    assertEquals(file + ":3: tag 'N N' contains white space", refusal(file, TagColumn.XPOS));
    Path upos = CorpusFiles.write(dir, "d2.conllu", lines(GOOD_1, row("2", "x", "NO UN"), ""));
    assertEquals(upos + ":2: tag 'NO UN' contains white space", refusal(upos, TagColumn.UPOS));
  }

  @Test
  void nonNumericId() {
    assertEquals(dir.resolve("e.conllu") + ":2: word ID 'two' is not a number", conllu("e.conllu", lines(GOOD_1, row("two", "x", "X"))));
  }

  @Test
  void outOfOrderId() {
    String text = lines(GOOD_1, row("3", "x", "X"), "");
    assertEquals(dir.resolve("f.conllu") + ":2: word ID 3 where 2 was expected", conllu("f.conllu", text));
  }

  @Test
  void idsRestartInEachSentence() {
    String text = lines(GOOD_1, "", row("2", "x", "X"), "");
    assertEquals(dir.resolve("g.conllu") + ":3: word ID 2 where 1 was expected", conllu("g.conllu", text));
  }

  @Test
  void emptyFile() {
    assertEquals(dir.resolve("h.conllu") + ": is empty", conllu("h.conllu", ""));
  }

  @Test
  void onlyComments() {
    assertEquals(dir.resolve("i.conllu") + ": holds no tagged sentence", conllu("i.conllu", lines("# one", "# two")));
  }

  @Test
  void textCommentWithoutWords() {
    String text = lines("# text = Hello.", "", GOOD_1, "");
    assertEquals(dir.resolve("j.conllu") + ":2: sentence has comments but no words", conllu("j.conllu", text));
  }

  @Test
  void brokenUtf8OnAnEarlyLine() {
    byte[] bytes = CorpusFiles.concat(utf8(lines(GOOD_1, "") + "1\tca"), new byte[] {(byte) 0xC3, 0x28}, utf8("\tca\tNOUN\t_\t_\t_\t_\t_\t_\n"));
    Path file = CorpusFiles.write(dir, "k.conllu", bytes);
    assertEquals(file + ":3: is not valid UTF-8 (MalformedInputException)", refusal(file, TagColumn.UPOS));
  }

  /** Line 5,000 of a long file holds a lone continuation byte; plain and gzipped. */
  @Test
  void brokenUtf8OnLineFiveThousand() {
    for (String name : new String[] {"long.conllu", "long.conllu.gz"}) {
      Path file = CorpusFiles.write(dir, name, withBadByteOnLine(5_000));
      assertEquals(file + ":5000: is not valid UTF-8 (MalformedInputException)", refusal(file, TagColumn.UPOS));
    }
  }

  /** Sentences of three lines each; the word line {@code line} gets a stray 0x80 byte in its form. */
  private static byte[] withBadByteOnLine(int line) {
    List<String> lines = CorpusFiles.manySentences(line / 3 + 10);
    assertEquals(1, (line - 1) % 3, "line " + line + " must be a word line");
    List<byte[]> parts = new ArrayList<>();
    for (int i = 0; i < lines.size(); i++) {
      String text = lines.get(i) + "\n";
      parts.add(i == line - 1 ? CorpusFiles.concat(new byte[] {(byte) 0x80}, utf8(text)) : utf8(text));
    }
    return CorpusFiles.concat(parts.toArray(new byte[0][]));
  }

  @Test
  void notAGzipFile() throws java.io.IOException {
    Path file = java.nio.file.Files.write(dir.resolve("fake.conllu.gz"), utf8(GOOD_1));
    String message = refusal(file, TagColumn.UPOS);
    assertEquals(file + ": not a readable gzip file", message.substring(0, message.indexOf(" (")));
  }

  @Test
  void plainWrongColumnCount() {
    Path file = CorpusFiles.write(dir, "p.txt", "a\tDET\nb\tNOUN\textra\n");
    assertEquals(file + ":2: expected 2 tab-separated columns (token, tag) but found 3", refusal(file, TagColumn.UPOS));
  }

  @Test
  void plainMissingTagAndEmptyToken() {
    Path missing = CorpusFiles.write(dir, "q.txt", "a\tDET\n\nb\t_\n");
    assertEquals(missing + ":3: missing tag", refusal(missing, TagColumn.XPOS));
    Path empty = CorpusFiles.write(dir, "r.txt", "\tDET\n");
    assertEquals(empty + ":1: empty token", refusal(empty, TagColumn.XPOS));
  }

  @Test
  void plainUnknownUposTag() {
    Path file = CorpusFiles.write(dir, "s.txt", "a\tDET\nb\tNN\n");
    assertEquals(file + ":2: unknown UPOS tag 'NN' (expected one of the 17 Universal Dependencies tags)", refusal(file, TagColumn.UPOS));
  }
}
