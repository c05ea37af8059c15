package org.wordclass.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wordclass.model.ModelFile;

/**
 * No command writes over what the user has: an output that is one of the inputs (by file
 * identity: the same path, another spelling of it, a hard or symbolic link), a special file, a
 * folder, or a file in a folder that does not exist is refused before any work, with exit code 2
 * and a message naming the user's path; the inputs are byte for byte as they were. Links given
 * as outputs are written through, and a replaced file keeps its permissions.
 */
class OutputSafetyTest {
  @TempDir
  Path dir;

  private Path corpus;
  private byte[] corpusBytes;
  private Path model;
  private byte[] modelBytes;

  @BeforeEach
  void writeCorpusAndModel() throws IOException {
    corpus = InventedCorpus.write(dir.resolve("c.conllu"), InventedCorpus.conllu(InventedCorpus.sentences(60, 1L, false)));
    corpusBytes = Files.readAllBytes(corpus);
    model = dir.resolve("m.wcm");
    Cli.Result r = Cli.run("train", "--corpus", corpus.toString(), "--out", model.toString());
    assertEquals(0, r.exitCode(), r::toString);
    modelBytes = Files.readAllBytes(model);
  }

  private void assertRefused(Cli.Result r, String message) {
    assertEquals(2, r.exitCode(), r::toString);
    assertEquals(message, r.err().strip(), r::toString);
    assertEquals("", r.out(), r::toString);
  }

  private void assertInputsUnchanged() throws IOException {
    assertArrayEquals(corpusBytes, Files.readAllBytes(corpus), "the corpus was changed");
    assertArrayEquals(modelBytes, Files.readAllBytes(model), "the model was changed");
    assertEquals(List.of(), temporaryFiles(), "a temporary file was left");
  }

  private List<Path> temporaryFiles() throws IOException {
    try (Stream<Path> files = Files.walk(dir)) {
      return files.filter(f -> f.getFileName().toString().endsWith(".tmp")).toList();
    }
  }

  @Test
  void trainRefusesToWriteTheModelOverItsCorpus() throws IOException {
    assertRefused(Cli.run("train", "--corpus", corpus.toString(), "--out", corpus.toString()),
        "wordclass train: " + corpus + ": --out is the same file as --corpus " + corpus
            + ", an input; refusing to write over it (choose another output file)");
    assertInputsUnchanged();
  }

  /** Another spelling of the path, a hard link and a symbolic link are all the same file. */
  @Test
  void sameFileIsRecognisedWhateverThePathSays() throws IOException {
    Path sub = Files.createDirectory(dir.resolve("sub"));
    Path spelled = sub.resolve("..").resolve(".").resolve("c.conllu");
    Path hard = Files.createLink(dir.resolve("hard.conllu"), corpus);
    Path soft = Files.createSymbolicLink(dir.resolve("soft.conllu"), corpus.getFileName());
    for (Path out : List.of(spelled, hard, soft)) {
      Cli.Result r = Cli.run("train", "--corpus", corpus.toString(), "--out", out.toString());
      assertEquals(2, r.exitCode(), r::toString);
      assertTrue(r.err().contains("--out is the same file as --corpus"), r::toString);
    }
    assertInputsUnchanged();
  }

  @Test
  void adaptRefusesToWriteOverItsTextButMayReplaceItsModel() throws IOException {
    Path text = Files.writeString(dir.resolve("t.txt"), "The otter slept on the bank.\n");
    assertRefused(Cli.run("adapt", "--model", model.toString(), "--text", text.toString(), "--out", text.toString(),
            "--iterations", "1", "--threads", "1"),
        "wordclass adapt: " + text + ": --out is the same file as --text " + text
            + ", an input; refusing to write over it (choose another output file)");
    assertEquals("The otter slept on the bank.\n", Files.readString(text));
    Cli.Result replaced = Cli.run("adapt", "--model", model.toString(), "--text", text.toString(), "--out", model.toString(),
        "--iterations", "1", "--threads", "1");
    assertEquals(0, replaced.exitCode(), replaced::toString);
    assertTrue(ModelFile.read(model).provenance().containsKey("adapt.iterations"));
  }

  @Test
  void evaluateRefusesReportsOverTheGoldCorpusOrTheModel() throws IOException {
    for (String option : List.of("--report", "--html", "--png")) {
      for (Path input : List.of(corpus, model)) {
        Cli.Result r = Cli.run("evaluate", "--model", model.toString(), "--corpus", corpus.toString(), option, input.toString());
        assertEquals(2, r.exitCode(), r::toString);
        assertTrue(r.err().contains(option + " is the same file as --" + (input == model ? "model" : "corpus")), r::toString);
      }
    }
    assertInputsUnchanged();
  }

  @Test
  void twoOutputsThatAreOneFileAreRefused() throws IOException {
    Path report = dir.resolve("r.out");
    assertRefused(Cli.run("evaluate", "--model", model.toString(), "--corpus", corpus.toString(), "--report", report.toString(),
            "--html", report.toString()),
        "wordclass evaluate: " + report + ": --report " + report + " and --html " + report + " are the same file");
    assertFalse(Files.exists(report));
  }

  @Test
  void theSameCorpusTwiceIsRefusedRatherThanCountedTwice() throws IOException {
    Path out = dir.resolve("twice.wcm");
    Path other = dir.resolve(".").resolve("c.conllu");
    assertRefused(Cli.run("train", "--corpus", corpus.toString(), "--corpus", other.toString(), "--out", out.toString()),
        "wordclass train: " + other + ": given twice (--corpus " + corpus + " and --corpus " + other
            + " are the same file); each is counted once per mention, so give it once");
    assertFalse(Files.exists(out));
  }

  /** A pipe stands for every special file (/dev/null, which root replaced by an ordinary file). */
  @Test
  void specialFileIsRefusedAsOutput() throws Exception {
    Path fifo = dir.resolve("out.fifo");
    assumeTrue(new ProcessBuilder("mkfifo", fifo.toString()).start().waitFor() == 0, "skipped: mkfifo unavailable");
    assertRefused(Cli.run("train", "--corpus", corpus.toString(), "--out", fifo.toString()),
        "wordclass train: " + fifo + ": is not an ordinary file (a device, pipe or socket); refusing to replace it");
    assertTrue(Files.exists(fifo) && !Files.isRegularFile(fifo));
    assertInputsUnchanged();
  }

  @Test
  void symbolicLinkOutputIsWrittenThroughAndPermissionsKept() throws IOException {
    Path kept = dir.resolve("private.wcm");
    Files.write(kept, new byte[] {1});
    Files.setPosixFilePermissions(kept, PosixFilePermissions.fromString("rw-------"));
    Path link = Files.createSymbolicLink(dir.resolve("current.wcm"), Paths.get("private.wcm"));
    Cli.Result r = Cli.run("train", "--corpus", corpus.toString(), "--out", link.toString());
    assertEquals(0, r.exitCode(), r::toString);
    assertTrue(Files.isSymbolicLink(link), "the link became an ordinary file");
    assertArrayEquals(modelBytes, Files.readAllBytes(kept), "the link's target was not replaced");
    assertEquals("rw-------", PosixFilePermissions.toString(Files.getPosixFilePermissions(kept)));
  }

  @Test
  void missingFolderIsRefusedBeforeReadingAndNotCreated() throws IOException {
    Path typo = dir.resolve("modles").resolve("new.wcm");
    Path broken = Files.writeString(dir.resolve("broken.conllu"), "not a corpus\n");
    // the corpus is broken too: the output is checked first, before any reading
    assertRefused(Cli.run("train", "--corpus", broken.toString(), "--out", typo.toString()),
        "wordclass train: " + typo + ": folder " + typo.getParent() + " does not exist (folders are not created; create it first)");
    assertFalse(Files.exists(typo.getParent()));
  }

  /** Today's message named a random temporary file in the system's temporary folder. */
  @Test
  void folderAsOutputIsNamedAsTheUserGaveIt() throws IOException {
    Path folder = Files.createDirectory(dir.resolve("adir"));
    assertRefused(Cli.run("train", "--corpus", corpus.toString(), "--out", folder.toString()),
        "wordclass train: " + folder + ": is a folder; give a file name");
    assertInputsUnchanged();
  }

  @Test
  void outputInsideTheIndexFolderOfAdaptIsRefused() throws IOException {
    Path index = Files.createDirectory(dir.resolve("index"));
    Path inside = index.resolve("adapted.wcm");
    Cli.Result r = Cli.run("adapt", "--model", model.toString(), "--index", index.toString(), "--field", "body",
        "--out", inside.toString());
    assertEquals(2, r.exitCode(), r::toString);
    assertTrue(r.err().contains("--out lies inside the folder of --index " + index), r::toString);
  }

  /** Needs a user whom permissions bind (root writes anywhere); CI runs as root and skips it. */
  @Test
  void readOnlyFolderIsRefusedBeforeReading() throws IOException {
    assumeTrue(!"root".equals(System.getProperty("user.name")), "skipped: permissions do not bind root");
    Path locked = Files.createDirectory(dir.resolve("locked"));
    Files.setPosixFilePermissions(locked, PosixFilePermissions.fromString("r-xr-xr-x"));
    try {
      Path out = locked.resolve("m.wcm");
      assertRefused(Cli.run("train", "--corpus", corpus.toString(), "--out", out.toString()),
          "wordclass train: " + out + ": folder " + locked + " cannot be written (permission denied)");
    } finally {
      Files.setPosixFilePermissions(locked, PosixFilePermissions.fromString("rwxr-xr-x"));
    }
  }
}
