package org.wordclass.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Bad input ends a command with a non-zero exit code and one line on standard error that names
 * the file, the line and the problem, and leaves no model or temporary file behind.
 */
class MalformedInputTest {
  private static final String GOOD_CONLLU = "# text = the otter slept .\n"
      + "1\tthe\tthe\tDET\tDT\t_\t_\t_\t_\t_\n"
      + "2\totter\totter\tNOUN\tNN\t_\t_\t_\t_\t_\n"
      + "3\tslept\tsleep\tVERB\tVBD\t_\t_\t_\t_\t_\n"
      + "4\t.\t.\tPUNCT\t.\t_\t_\t_\t_\t_\n\n";
  private static final String GOOD_PLAIN = "the\tDET\notter\tNOUN\nslept\tVERB\n.\tPUNCT\n\n";

  @TempDir
  Path dir;

  /** File name, content, line of the problem (0: the whole file), words of the expected message. */
  static Stream<Arguments> malformedFiles() {
    byte[] brokenUtf8 = (GOOD_PLAIN + "caf").getBytes(StandardCharsets.UTF_8);
    byte[] withBrokenByte = new byte[brokenUtf8.length + 3];
    System.arraycopy(brokenUtf8, 0, withBrokenByte, 0, brokenUtf8.length);
    withBrokenByte[brokenUtf8.length] = (byte) 0xC3; // a lead byte without its continuation
    withBrokenByte[brokenUtf8.length + 1] = '\t';
    withBrokenByte[brokenUtf8.length + 2] = 'N';
    byte[] brokenConllu = (GOOD_CONLLU + "1\tcaf\u00e9\tcafe\tNOUN\tNN\t_\t_\t_\t_\t_\n").getBytes(StandardCharsets.UTF_8);
    brokenConllu[brokenConllu.length - 24] = (byte) 0xFF; // the second byte of é becomes invalid
    return Stream.of(
        Arguments.of("columns.conllu", text(GOOD_CONLLU + "1\tthe\tthe\tDET\tDT\t_\t_\t_\t_\n"), 7, "expected 10 tab-separated columns"),
        Arguments.of("columns.tsv", text(GOOD_PLAIN + "the\tDET\textra\n"), 6, "expected 2 tab-separated columns"),
        Arguments.of("missing-tag.conllu", text(GOOD_CONLLU.replace("\tNOUN\t", "\t_\t")), 3, "missing tag"),
        Arguments.of("missing-tag.tsv", text(GOOD_PLAIN.replace("\tNOUN", "\t_")), 2, "missing tag"),
        Arguments.of("unknown-tag.conllu", text(GOOD_CONLLU.replace("\tNOUN\t", "\tNOUNISH\t")), 3, "unknown UPOS tag 'NOUNISH'"),
        Arguments.of("unknown-tag.tsv", text(GOOD_PLAIN.replace("\tVERB", "\tVB")), 3, "unknown UPOS tag 'VB'"),
        Arguments.of("broken.tsv", withBrokenByte, 6, "not valid UTF-8"),
        Arguments.of("broken.conllu", brokenConllu, 7, "not valid UTF-8"),
        Arguments.of("empty.conllu", new byte[0], 0, "is empty"),
        Arguments.of("empty.tsv", new byte[0], 0, "is empty"),
        Arguments.of("comments.conllu", text("# sent_id = 1\n# a remark\n"), 0, "holds no tagged sentence"),
        Arguments.of("comments-only-sentence.conllu", text("# sent_id = 1\n# text = nothing here\n\n"), 3, "comments but no words"),
        Arguments.of("word-id.conllu", text(GOOD_CONLLU.replace("\n3\t", "\nthree\t")), 4, "word ID 'three' is not a number"),
        Arguments.of("not-gzip.conllu.gz", text("this is not compressed"), 0, "not a readable gzip file"));
  }

  private static byte[] text(String s) {
    return s.getBytes(StandardCharsets.UTF_8);
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("malformedFiles")
  void trainReportsFileLineAndProblemAndWritesNothing(String name, byte[] content, int line, String problem) throws Exception {
    Path input = dir.resolve(name);
    Files.write(input, content);
    Path model = dir.resolve("out.wcm");
    Cli.Result r = Cli.run("train", "--corpus", input.toString(), "--out", model.toString());
    assertInputError(r, name, line, problem);
    assertOnlyInputsLeft(input);
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("malformedFiles")
  void evaluateReportsTheSameAndWritesNoReport(String name, byte[] content, int line, String problem) throws Exception {
    Path input = dir.resolve(name);
    Files.write(input, content);
    Cli.Result r = Cli.run("evaluate", "--corpus", input.toString(), "--report", dir.resolve("r.json").toString(),
        "--html", dir.resolve("r.html").toString());
    assertInputError(r, name, line, problem);
    assertOnlyInputsLeft(input);
  }

  @Test
  void aMissingFileIsNamed() throws Exception {
    Path good = Files.writeString(dir.resolve("good.tsv"), GOOD_PLAIN);
    Path missing = dir.resolve("missing.conllu");
    for (List<String> args : List.of(
        List.of("train", "--corpus", good.toString(), "--corpus", missing.toString(), "--out", dir.resolve("m.wcm").toString()),
        List.of("evaluate", "--corpus", missing.toString()),
        List.of("cross-validate", "--corpus", missing.toString(), "--folds", "2"),
        List.of("inspect", "--model", dir.resolve("missing.wcm").toString()))) {
      Cli.Result r = Cli.run(args.toArray(String[]::new));
      assertInputError(r, "missing.", 0, "no such file");
    }
    assertOnlyInputsLeft(good);
  }

  @Test
  void aCorruptModelIsNamed() throws Exception {
    Path model = Files.writeString(dir.resolve("corrupt.wcm"), "not a model at all, just some text");
    Path corpus = Files.writeString(dir.resolve("good.tsv"), GOOD_PLAIN);
    for (List<String> args : List.of(
        List.of("inspect", "--model", model.toString()),
        List.of("tag", "--model", model.toString(), "some words"),
        List.of("evaluate", "--model", model.toString(), "--corpus", corpus.toString()))) {
      Cli.Result r = Cli.run(args.toArray(String[]::new));
      assertInputError(r, "corrupt.wcm", 0, "not a word-class model file");
    }
  }

  @Test
  void verboseAddsTheStackTrace() throws Exception {
    Path input = Files.writeString(dir.resolve("bad.tsv"), "one\ttwo\tthree\n");
    Cli.Result r = Cli.run("train", "--verbose", "--corpus", input.toString(), "--out", dir.resolve("m.wcm").toString());
    assertEquals(Failures.INPUT_ERROR, r.exitCode(), r::toString);
    assertTrue(r.err().contains("at org.wordclass."), r::toString);
  }

  static Stream<Arguments> badOptions() {
    return Stream.of(
        Arguments.of(List.of("--order", "3"), "order must be 1 or 2"),
        Arguments.of(List.of("--order", "two"), "--order"),
        Arguments.of(List.of("--suffix-weight", "heavy"), "neither a number nor held-out or tag-spread"),
        Arguments.of(List.of("--suffix-weight", "-1"), "suffix weight must be positive"),
        Arguments.of(List.of("--open-class-min-share", "1.5"), "open-class share"),
        Arguments.of(List.of("--max-suffix-length", "-2"), "suffix length"),
        Arguments.of(List.of("--rare-word-max-count", "0"), "rare-word count"),
        Arguments.of(List.of("--format", "xml"), "--format"),
        Arguments.of(List.of("--tags", "lemma"), "--tags"));
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("badOptions")
  void badOptionValuesAreUsageErrors(List<String> options, String problem) throws Exception {
    Path input = Files.writeString(dir.resolve("good.tsv"), GOOD_PLAIN);
    Path model = dir.resolve("m.wcm");
    List<String> args = new java.util.ArrayList<>(List.of("train", "--corpus", input.toString(), "--out", model.toString()));
    args.addAll(options);
    Cli.Result r = Cli.run(args.toArray(String[]::new));
    assertEquals(picocli.CommandLine.ExitCode.USAGE, r.exitCode(), r::toString);
    assertTrue(r.err().contains(problem), r::toString);
    assertEquals(1, r.err().lines().count(), r::toString);
    assertOnlyInputsLeft(input);
  }

  @Test
  void tooManyFoldsIsAUsageError() throws Exception {
    Path input = Files.writeString(dir.resolve("good.tsv"), GOOD_PLAIN + GOOD_PLAIN);
    Cli.Result r = Cli.run("cross-validate", "--corpus", input.toString(), "--folds", "5");
    assertEquals(picocli.CommandLine.ExitCode.USAGE, r.exitCode(), r::toString);
    assertTrue(r.err().contains("more than the 2 sentences"), r::toString);
  }

  private static void assertInputError(Cli.Result r, String file, int line, String problem) {
    assertEquals(Failures.INPUT_ERROR, r.exitCode(), r::toString);
    String message = r.err().lines().filter(l -> l.startsWith("wordclass ")).findFirst().orElse("");
    assertTrue(message.contains(file), () -> "file name missing: " + r);
    if (line > 0) {
      assertTrue(message.contains(":" + line + ":"), () -> "line " + line + " missing: " + r);
    }
    assertTrue(message.contains(problem), () -> "problem missing: " + r);
    assertFalse(r.err().contains("\tat "), () -> "no stack trace without --verbose: " + r);
  }

  private void assertOnlyInputsLeft(Path... inputs) throws Exception {
    try (Stream<Path> files = Files.list(dir)) {
      assertEquals(List.of(inputs).stream().map(Path::getFileName).sorted().toList(),
          files.map(Path::getFileName).sorted().toList());
    }
  }
}
