package org.wordclass.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.wordclass.testing.Corpora;

/**
 * A training run killed outright (SIGKILL, as by an out-of-memory killer or a power cut) leaves
 * the previous model byte for byte as it was, and no temporary file: {@code train} writes
 * nothing until the corpus is counted and the model estimated, then writes through a temporary
 * file that is moved into place. The run is a child JVM training on the English Web Treebank
 * (about five seconds of reading, two of estimating), killed while it reads or while it
 * estimates, as its progress lines on standard error tell.
 */
class InterruptedTrainTest {
  private static final long WAIT_SECONDS = 60;

  @org.junit.jupiter.api.io.TempDir Path dir;
  private Path model;
  private byte[] previous;

  @BeforeEach
  void trainPreviousModel() throws IOException {
    Path corpus = InventedCorpus.write(dir.resolve("small.tsv"), InventedCorpus.plain(InventedCorpus.sentences(50, 1L, false)));
    model = dir.resolve("model.wcm");
    Cli.Result r = Cli.run("train", "--corpus", corpus.toString(), "--out", model.toString());
    assertEquals(0, r.exitCode(), r::toString);
    previous = Files.readAllBytes(model);
  }

  /** Killed once the child prints {@code marker}: "reading" starts the count, "done" ends it. */
  @ParameterizedTest(name = "killed after ''{0}''")
  @ValueSource(strings = {"train: reading", "train: done"})
  void killedTrainingLeavesThePreviousModel(String marker) throws Exception {
    Path ewt = Corpora.ewtTrain();
    Path log = dir.resolve("child.log");
    Process child = childTrain(ewt, log);
    try {
      waitFor(log, marker, child);
      assertTrue(child.isAlive(), "the run ended before it could be killed: " + read(log));
      child.destroyForcibly().waitFor(WAIT_SECONDS, TimeUnit.SECONDS);
    } finally {
      child.destroyForcibly();
    }
    assertFalse(read(log).contains("model "), "the run got as far as writing: " + read(log));
    assertArrayEquals(previous, Files.readAllBytes(model), "the previous model changed");
    try (Stream<Path> files = Files.list(dir)) {
      assertEquals(List.of("child.log", "model.wcm", "small.tsv"), files.map(p -> p.getFileName().toString()).sorted().toList());
    }
  }

  private Process childTrain(Path corpus, Path log) throws IOException {
    Path java = Paths.get(System.getProperty("java.home"), "bin", "java");
    String classPath = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
    List<String> command = List.of(java.toString(), "-Xmx512m", "-cp", classPath, WordclassCommand.class.getName(),
        "train", "--corpus", corpus.toString(), "--out", model.toString());
    return new ProcessBuilder(command).redirectErrorStream(true).redirectOutput(log.toFile()).start();
  }

  private static void waitFor(Path log, String marker, Process child) throws IOException, InterruptedException {
    long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(WAIT_SECONDS);
    while (!read(log).contains(marker) && child.isAlive() && System.nanoTime() < deadline) {
      Thread.sleep(10);
    }
    assertTrue(read(log).contains(marker), "the child never printed '" + marker + "': " + read(log));
  }

  private static String read(Path log) throws IOException {
    return Files.readString(log, StandardCharsets.UTF_8);
  }
}
