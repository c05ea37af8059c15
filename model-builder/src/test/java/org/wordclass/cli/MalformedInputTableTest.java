package org.wordclass.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.Arrays;
import java.util.List;
import java.util.stream.Stream;
import java.util.zip.GZIPOutputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The table of malformed corpus inputs in {@code docs/reliability.md}, held here row by row: each
 * input, given to {@code wordclass train}, must end it with the input-error exit code and
 * exactly the row's message (FILE standing for the path), and must leave no model and no
 * temporary file. A second test checks that the document repeats every row, so the table stays
 * true.
 */
class MalformedInputTableTest {
  static final Path DOC = Paths.get("..", "docs", "reliability.md");

  private static final String CONLLU = "# text = the otter slept .\n"
      + "1\tthe\tthe\tDET\tDT\t_\t_\t_\t_\t_\n"
      + "2\totter\totter\tNOUN\tNN\t_\t_\t_\t_\t_\n"
      + "3\tslept\tsleep\tVERB\tVBD\t_\t_\t_\t_\t_\n"
      + "4\t.\t.\tPUNCT\t.\t_\t_\t_\t_\t_\n\n";
  /** What the strict UTF-8 decoding says of a NUL; {@code tag} says the same of its input. */
  static final String NUL = "holds a NUL character (byte 0), which text never does (is it UTF-16, or not text at all?)";
  private static final String PLAIN = "the\tDET\notter\tNOUN\nslept\tVERB\n.\tPUNCT\n\n";

  /** One kind of malformed input: what it is, the file it comes in, and what the user is told. */
  record Row(String kind, String file, byte[] content, String message) {
    String format() {
      return file.contains(".conllu") ? "CoNLL-U" : "plain";
    }

    String markdown() {
      return "| " + kind + " | " + format() + " | `" + message + "` |";
    }

    @Override
    public String toString() {
      return format() + ": " + kind;
    }
  }

  static List<Row> rows() {
    return List.of(
        conllu("a word line with 9 columns", CONLLU + "1\tthe\tthe\tDET\tDT\t_\t_\t_\t_\n",
            "FILE:7: expected 10 tab-separated columns but found 9"),
        conllu("columns separated by spaces", "1 the the DET DT _ _ _ _ _\n", "FILE:1: expected 10 tab-separated columns but found 1"),
        conllu("UPOS left empty (_)", CONLLU.replace("\tNOUN\t", "\t_\t"), "FILE:3: missing tag"),
        conllu("a tag that is not UPOS", CONLLU.replace("\tNOUN\t", "\tNN\t"),
            "FILE:3: unknown UPOS tag 'NN' (expected one of the 17 Universal Dependencies tags)"),
        conllu("a tag with a space", CONLLU.replace("\tNOUN\t", "\tNO UN\t"), "FILE:3: tag 'NO UN' contains white space"),
        conllu("a word ID that is not a number", CONLLU.replace("\n3\t", "\nthree\t"), "FILE:4: word ID 'three' is not a number"),
        conllu("word IDs out of order", CONLLU.replace("\n3\t", "\n4\t"), "FILE:4: word ID 4 where 3 was expected"),
        conllu("word ID 0", CONLLU.replace("\n1\t", "\n0\t"), "FILE:2: word ID 0 is not positive"),
        conllu("a multiword range out of place", CONLLU.replace("\n2\t", "\n3-4\tgone\t_\t_\t_\t_\t_\t_\t_\t_\n2\t"),
            "FILE:3: multiword token range 3-4 does not start at word 2"),
        conllu("a word ID with a leading zero", CONLLU.replace("\n2\t", "\n02\t"),
            "FILE:3: word ID '02' is not written as CoNLL-U writes IDs (ASCII digits, no sign or leading zero)"),
        conllu("a word ID with a plus sign", CONLLU.replace("\n2\t", "\n+2\t"),
            "FILE:3: word ID '+2' is not written as CoNLL-U writes IDs (ASCII digits, no sign or leading zero)"),
        conllu("a word ID in Arabic-Indic digits", CONLLU.replace("\n2\t", "\n\u0662\t"),
            "FILE:3: word ID '\u0662' is not written as CoNLL-U writes IDs (ASCII digits, no sign or leading zero)"),
        conllu("a multiword range 2-5 in a two-word sentence", "1\tthe\tthe\tDET\tDT\t_\t_\t_\t_\t_\n"
                + "2-5\totters\t_\t_\t_\t_\t_\t_\t_\t_\n2\totter\totter\tNOUN\tNN\t_\t_\t_\t_\t_\n\n",
            "FILE:2: multiword token range 2-5 ends after the last word of its sentence (word 2)"),
        conllu("a multiword range with no words after it", CONLLU.replace(".\t_\t_\t_\t_\t_\n\n",
                ".\t_\t_\t_\t_\t_\n5-6\tgone\t_\t_\t_\t_\t_\t_\t_\t_\n\n"),
            "FILE:6: multiword token range 5-6 ends after the last word of its sentence (word 4)"),
        conllu("a multiword range of one word", CONLLU.replace("\n2\t", "\n2-2\tgone\t_\t_\t_\t_\t_\t_\t_\t_\n2\t"),
            "FILE:3: multiword token range 2-2 must end after it starts (N-M with N < M)"),
        conllu("overlapping multiword ranges", CONLLU.replace("\n1\t", "\n1-3\tgone\t_\t_\t_\t_\t_\t_\t_\t_\n1\t")
                .replace("\n2\t", "\n2-3\tgone\t_\t_\t_\t_\t_\t_\t_\t_\n2\t"),
            "FILE:4: multiword token range 2-3 overlaps range 1-3"),
        conllu("an empty node out of place", CONLLU.replace("\n2\t", "\n3.1\tgone\t_\t_\t_\t_\t_\t_\t_\t_\n2\t"),
            "FILE:3: empty node 3.1 does not follow word 3 (the last word was 1)"),
        conllu("an empty node ID that is not N.M", CONLLU.replace("\n2\t", "\n1.0\tgone\t_\t_\t_\t_\t_\t_\t_\t_\n2\t"),
            "FILE:3: empty node ID '1.0' is not of the form N.M (ASCII digits, M from 1, no sign or leading zero)"),
        conllu("CR-only line ends (old Mac OS)", CONLLU.replace("\n", "\r"),
            "FILE:1: carriage return (CR) without a line feed; lines must end in LF or CR LF (convert CR-only line ends first)"),
        conllu("an empty FORM", CONLLU.replace("\totter\t", "\t\t"), "FILE:3: empty FORM"),
        conllu("a sentence of comments only", "# text = nothing here\n\n" + CONLLU, "FILE:2: sentence has comments but no words"),
        conllu("a file of comments only", "# sent_id = 1\n# newdoc\n", "FILE: holds no tagged sentence"),
        row("an empty file", "empty.conllu", new byte[0], "FILE: is empty"),
        row("a byte that is not UTF-8", "latin1.conllu", latin1(CONLLU.replace("otter", "café")), "FILE:1: is not valid UTF-8 (MalformedInputException)"),
        row("a UTF-16 file with its byte order mark", "utf16.conllu", utf16(CONLLU), "FILE:1: is not valid UTF-8 (MalformedInputException)"),
        conllu("a NUL character", CONLLU.replace("2\totter", "2\tot\0ter"), "FILE:3: " + NUL),
        row("an image instead of text", "image.conllu", new byte[] {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1A, '\n', 0, 0, 0, 13},
            "FILE:1: is not valid UTF-8 (MalformedInputException)"),
        row("a .gz name on an uncompressed file", "plain.conllu.gz", utf8(CONLLU), "FILE: not a readable gzip file (Not in GZIP format)"),
        row("a gzip file cut short", "cut.conllu.gz", cutGzip(CONLLU.repeat(50)), "FILE:16: cannot be read: Unexpected end of ZLIB input stream"),
        plain("three columns", PLAIN + "the\tDET\textra\n", "FILE:6: expected 2 tab-separated columns (token, tag) but found 3"),
        plain("no tag column", "the\tDET\notter\n", "FILE:2: expected 2 tab-separated columns (token, tag) but found 1"),
        plain("tag left empty (_)", PLAIN.replace("\tNOUN", "\t_"), "FILE:2: missing tag"),
        plain("an empty token", PLAIN.replace("otter\t", "\t"), "FILE:2: empty token"),
        plain("a tag that is not UPOS", PLAIN.replace("\tVERB", "\tVBD"),
            "FILE:3: unknown UPOS tag 'VBD' (expected one of the 17 Universal Dependencies tags)"),
        plain("a tag with a space", PLAIN.replace("\tVERB", "\tVE RB"), "FILE:3: tag 'VE RB' contains white space"),
        row("an empty file", "empty.txt", new byte[0], "FILE: is empty"),
        plain("blank lines only", "\n\n \n\t\n", "FILE: holds no tagged sentence"),
        row("a byte that is not UTF-8", "latin1.txt", latin1(PLAIN.replace("otter", "café")), "FILE:2: is not valid UTF-8 (MalformedInputException)"),
        plain("CR-only line ends (old Mac OS)", PLAIN.replace("\n", "\r"),
            "FILE:1: carriage return (CR) without a line feed; lines must end in LF or CR LF (convert CR-only line ends first)"),
        row("a UTF-16 file without a byte order mark", "utf16.txt", PLAIN.getBytes(StandardCharsets.UTF_16LE), "FILE:1: " + NUL),
        plain("CoNLL-U in a plain file", CONLLU, "FILE:1: expected 2 tab-separated columns (token, tag) but found 1"));
  }

  private static Row conllu(String kind, String text, String message) {
    return row(kind, "input.conllu", utf8(text), message);
  }

  private static Row plain(String kind, String text, String message) {
    return row(kind, "input.txt", utf8(text), message);
  }

  private static Row row(String kind, String file, byte[] content, String message) {
    return new Row(kind, file, content, message);
  }

  private static byte[] utf8(String text) {
    return text.getBytes(StandardCharsets.UTF_8);
  }

  /** UTF-16 as editors on some systems save it: little-endian, after the byte order mark FF FE. */
  private static byte[] utf16(String text) {
    return ("\uFEFF" + text).getBytes(StandardCharsets.UTF_16LE);
  }

  private static byte[] latin1(String text) {
    return text.getBytes(StandardCharsets.ISO_8859_1);
  }

  /** {@code text} gzipped, without its last 40 bytes. */
  private static byte[] cutGzip(String text) {
    ByteArrayOutputStream bytes = new ByteArrayOutputStream();
    try (GZIPOutputStream gz = new GZIPOutputStream(bytes)) {
      gz.write(utf8(text));
    } catch (IOException e) {
      throw new AssertionError(e);
    }
    byte[] all = bytes.toByteArray();
    return Arrays.copyOf(all, all.length - 40);
  }

  @TempDir Path dir;

  @ParameterizedTest(name = "{0}")
  @MethodSource("rows")
  void trainPrintsTheDocumentedMessageAndWritesNothing(Row row) throws IOException {
    Path input = Files.write(dir.resolve(row.file()), row.content());
    Cli.Result r = Cli.run("train", "--corpus", input.toString(), "--out", dir.resolve("model.wcm").toString());
    assertEquals(Failures.INPUT_ERROR, r.exitCode(), r::toString);
    String expected = "wordclass train: " + row.message().replace("FILE", input.toString());
    assertEquals(expected, r.err().lines().filter(l -> l.startsWith("wordclass ")).findFirst().orElse(""), r::toString);
    try (Stream<Path> left = Files.list(dir)) {
      assertEquals(List.of(input), left.toList(), "no model and no temporary file may remain");
    }
  }

  @Test
  void theDocumentRepeatsEveryRow() throws IOException {
    String doc = Files.readString(DOC, StandardCharsets.UTF_8);
    List<String> missing = rows().stream().map(Row::markdown).filter(line -> !doc.contains(line)).toList();
    assertTrue(missing.isEmpty(), "rows missing from " + DOC + ":\n" + String.join("\n", missing));
  }

  @Test
  void theTableHasTwentyKindsOrMoreInBothFormats() {
    assertTrue(rows().size() >= 20);
    assertTrue(rows().stream().filter(r -> r.format().equals("plain")).count() >= 8);
    assertTrue(rows().stream().filter(r -> r.format().equals("CoNLL-U")).count() >= 8);
  }
}
