package org.wordclass.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Huge fields go through the filter in a JVM with a small heap: the window bound keeps memory
 * flat however long the field (the filter would need gigabytes to buffer it). Each run prints
 * the child's figures (tokens, characters, time, heap).
 */
class TestLargeField {
  private static final long TOKENS = 10_000_000;
  private static final long CHARS = 50_000_000;

  @TempDir Path dir;

  @Test
  void tenMillionTokensInASmallHeap() throws IOException, InterruptedException {
    String output = runChild("-Xmx256m", "tokens=" + TOKENS);
    assertTrue(output.contains("tokens=" + TOKENS + " "), output);
  }

  /** Fifty million characters through the standard tokenizer, in 128 MB: the field itself would need 100 MB. */
  @Test
  void fiftyMillionCharactersThroughTheStandardTokenizer() throws IOException, InterruptedException {
    String output = runChild("-Xmx128m", "chars=" + CHARS, "tokenizer=standard");
    assertTrue(output.contains(" chars=" + CHARS + " "), output);
    assertTrue(output.matches("(?s).*tokens=[1-9][0-9]{6,} .*"), output);
  }

  /** Runs {@link LargeFieldMain} in a child JVM with heap setting {@code heap}; returns its output. */
  private String runChild(String heap, String... args) throws IOException, InterruptedException {
    Path java = Paths.get(System.getProperty("java.home"), "bin", "java");
    // surefire may hand the test JVM a manifest-only jar; it keeps the real class path here
    String classPath = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
    List<String> command = new ArrayList<>(List.of(java.toString(), heap, "-cp", classPath, LargeFieldMain.class.getName()));
    command.addAll(List.of(args));
    Path out = dir.resolve("out.txt");
    // output goes to a file, so a hung child cannot block the test on a full pipe
    Process child = new ProcessBuilder(command).redirectErrorStream(true).redirectOutput(out.toFile()).start();
    boolean finished = child.waitFor(120, TimeUnit.SECONDS);
    if (!finished) {
      child.destroyForcibly();
    }
    String output = Files.readString(out, StandardCharsets.UTF_8);
    assertTrue(finished, "the child JVM did not finish in time: " + output);
    assertEquals(0, child.exitValue(), output);
    System.out.println(heap + " " + String.join(" ", args) + ": " + output.strip());
    return output;
  }
}
