package org.wordclass.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A field of ten million tokens goes through the filter in a JVM with a 256 MB heap: the window
 * bound keeps memory flat however long the field (the filter would need gigabytes to buffer it).
 */
class TestLargeField {
  private static final long TOKENS = 10_000_000;

  @Test
  void tenMillionTokensInASmallHeap(@TempDir Path dir) throws IOException, InterruptedException {
    Path java = Paths.get(System.getProperty("java.home"), "bin", "java");
    // surefire may hand the test JVM a manifest-only jar; it keeps the real class path here
    String classPath = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
    Process child = new ProcessBuilder(
            List.of(java.toString(), "-Xmx256m", "-cp", classPath, LargeFieldMain.class.getName(), Long.toString(TOKENS)))
        .redirectErrorStream(true)
        .redirectOutput(dir.resolve("out.txt").toFile())
        .start();
    // output goes to a file, so a hung child cannot block the test on a full pipe
    boolean finished = child.waitFor(120, TimeUnit.SECONDS);
    if (!finished) {
      child.destroyForcibly();
    }
    String output = Files.readString(dir.resolve("out.txt"), StandardCharsets.UTF_8);
    assertTrue(finished, "the child JVM did not finish in time: " + output);
    assertEquals(0, child.exitValue(), output);
    assertTrue(output.contains("tokens=" + TOKENS + " "), output);
  }
}
