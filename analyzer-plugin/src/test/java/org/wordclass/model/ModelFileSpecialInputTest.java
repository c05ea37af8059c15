package org.wordclass.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.io.RandomAccessFile;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.time.Duration;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A model path that names something other than a model file is refused before it is read
 * whole: devices that never end ({@code /dev/zero} ran out of memory, {@code /dev/urandom} hung),
 * pipes, folders, and a large foreign file, whose first bytes already show it is not a model.
 */
class ModelFileSpecialInputTest {
  /** Bound of a refusal; reading the inputs below to the end would take minutes or forever. */
  private static final Duration FAST = Duration.ofSeconds(5);

  @TempDir Path dir;

  private static String refusal(Path path) {
    return assertTimeoutPreemptively(FAST, () -> assertThrows(ModelFormatException.class, () -> ModelFile.read(path))).getMessage();
  }

  @Test
  void endlessDevicesAreRefusedAsNotOrdinaryFiles() {
    for (String device : new String[] {"/dev/zero", "/dev/urandom"}) {
      Path path = Paths.get(device);
      assumeTrue(Files.exists(path), "skipped: no " + device + " on this system");
      assertEquals(device + ": not an ordinary file (a device, pipe or socket); a model is read from a file written by train or adapt",
          refusal(path));
    }
  }

  /** Nothing ever writes into this pipe: reading it would wait forever. */
  @Test
  void namedPipeIsRefusedWithoutWaitingForIt() throws Exception {
    Path fifo = dir.resolve("model.wcm");
    assumeTrue(new ProcessBuilder("mkfifo", fifo.toString()).start().waitFor() == 0, "skipped: mkfifo unavailable");
    assertEquals(fifo + ": not an ordinary file (a device, pipe or socket); a model is read from a file written by train or adapt",
        refusal(fifo));
  }

  @Test
  void folderIsRefused() {
    assertEquals(dir + ": not an ordinary file (a folder); a model is read from a file written by train or adapt", refusal(dir));
  }

  /** A file of the largest accepted size, all zeros (sparse, so it costs no disk): refused on its header. */
  @Test
  void largeForeignFileIsRefusedOnItsHeader() throws IOException {
    Path big = dir.resolve("zeros.wcm");
    try (RandomAccessFile f = new RandomAccessFile(big.toFile(), "rw")) {
      f.setLength(ModelFile.MAX_FILE_BYTES);
    }
    assertEquals(big + ": not a word-class model file (its header does not name the WordClassHmm format)", refusal(big));
  }
}
