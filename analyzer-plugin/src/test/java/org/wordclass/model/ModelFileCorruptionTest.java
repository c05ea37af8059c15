package org.wordclass.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.util.Arrays;
import java.util.Random;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.wordclass.testing.TestModels;

/**
 * A changed or missing byte anywhere in a model file is caught on load. CRC-32 detects every
 * error burst of up to 32 bits (common practice: a property of cyclic redundancy checks), so
 * every single-byte change must be found, not just most.
 */
class ModelFileCorruptionTest {
  /** Byte offsets of the bundled model that are changed, one at a time. */
  private static final int BUNDLED_OFFSETS = 2_000;
  /** Lengths the bundled model is cut to, besides a few chosen ones. */
  private static final int BUNDLED_TRUNCATIONS = 300;
  /** Every this many lengths the bundled model is also cut to. */
  private static final int TRUNCATION_STRIDE = 97;
  /** Bytes at each end of the bundled model within which every length is tried. */
  private static final int TRUNCATION_EDGE = 2048;

  private static byte[] small;
  private static byte[] bundled;

  @BeforeAll
  static void load() throws IOException {
    small = TestModels.bytes(TestModels.small());
    bundled = ModelFileRoundTripTest.bundledBytes();
  }

  @Test
  void smallModelIsValidAsWritten() throws IOException {
    ModelFile.read(small, "small");
  }

  /** Every offset of the small model, each with all 255 non-zero XOR masks. */
  @Test
  void everySingleByteChangeOfTheSmallModelIsDetected() {
    int checked = 0;
    for (int offset = 0; offset < small.length; offset++) {
      for (int mask = 1; mask < 256; mask++) {
        assertRefused(flip(small, offset, mask), "offset " + offset + " xor " + mask);
        checked++;
      }
    }
    assertEquals(small.length * 255, checked);
    System.out.println("small model (" + small.length + " bytes): " + checked + " single-byte changes refused");
  }

  @Test
  void sampledSingleByteChangesOfTheBundledModelAreDetected() {
    Random rnd = new Random(0xC0FFEEL);
    for (int i = 0; i < BUNDLED_OFFSETS; i++) {
      int offset = rnd.nextInt(bundled.length);
      int mask = 1 + rnd.nextInt(255);
      assertRefused(flip(bundled, offset, mask), "bundled offset " + offset + " xor " + mask);
    }
    System.out.println("bundled model: " + BUNDLED_OFFSETS + " sampled single-byte changes refused");
  }

  @Test
  void everyTruncationOfTheSmallModelIsDetected() {
    for (int length = 0; length < small.length; length++) {
      assertRefused(Arrays.copyOf(small, length), "cut to " + length + " bytes");
    }
  }

  @Test
  void sampledTruncationsOfTheBundledModelAreDetected() {
    int n = bundled.length;
    for (int length : new int[] {0, 1, 20, 21, n / 2, n - 17, n - 16, n - 8, n - 1}) {
      assertRefused(Arrays.copyOf(bundled, length), "bundled cut to " + length + " bytes");
    }
    Random rnd = new Random(0xBEEFL);
    for (int i = 0; i < BUNDLED_TRUNCATIONS; i++) {
      int length = rnd.nextInt(n);
      assertRefused(Arrays.copyOf(bundled, length), "bundled cut to " + length + " bytes");
    }
  }

  /**
   * A dense sample of the bundled model's lengths: every {@value #TRUNCATION_STRIDE}th, and every
   * length within {@value #TRUNCATION_EDGE} bytes of either end, where header and footer lie.
   * Each attempt costs one checksum pass over what is left, so every length (over 600,000) would
   * take about five minutes; this sample takes about five seconds.
   */
  @Test
  void denseTruncationsOfTheBundledModelAreDetected() {
    int n = bundled.length;
    long start = System.nanoTime();
    int count = 0;
    for (int length = 0; length < n; length++) {
      if (length % TRUNCATION_STRIDE == 0 || length < TRUNCATION_EDGE || length >= n - TRUNCATION_EDGE) {
        assertRefused(Arrays.copyOf(bundled, length), "bundled cut to " + length + " bytes");
        count++;
      }
    }
    System.out.printf(java.util.Locale.ROOT, "bundled model (%d bytes): %d truncated lengths refused in %.1f s%n",
        n, count, (System.nanoTime() - start) / 1e9);
    assertEquals(truncationCount(n), count);
  }

  /** How many lengths {@link #denseTruncationsOfTheBundledModelAreDetected} tries, counted independently. */
  private static int truncationCount(int n) {
    int strided = (n - 1) / TRUNCATION_STRIDE + 1;
    int inEdges = 2 * TRUNCATION_EDGE;
    int stridedInEdges = (TRUNCATION_EDGE - 1) / TRUNCATION_STRIDE + 1
        + (int) java.util.stream.IntStream.range(n - TRUNCATION_EDGE, n).filter(l -> l % TRUNCATION_STRIDE == 0).count();
    return strided + inEdges - stridedInEdges;
  }

  @Test
  void appendedBytesAreDetected() {
    for (int extra = 1; extra <= 32; extra++) {
      assertRefused(Arrays.copyOf(small, small.length + extra), extra + " zero bytes appended");
    }
  }

  private static byte[] flip(byte[] bytes, int offset, int mask) {
    byte[] copy = bytes.clone();
    copy[offset] ^= (byte) mask;
    return copy;
  }

  /** Loading must fail with a ModelFormatException, not with another error or not at all. */
  static ModelFormatException assertRefused(byte[] bytes, String what) {
    try {
      ModelFile.read(bytes, "corrupt.wcm");
    } catch (ModelFormatException e) {
      return e;
    } catch (Throwable t) {
      throw new AssertionError(what + ": expected a ModelFormatException but got " + t, t);
    }
    return fail(what + ": the file was accepted");
  }

  @Test
  void refusalNamesTheFile() {
    ModelFormatException e = assertThrows(ModelFormatException.class, () -> ModelFile.read(flip(small, 300, 1), "some/path.wcm"));
    assertTrue(e.getMessage().startsWith("some/path.wcm: "), e.getMessage());
    assertTrue(e.getMessage().contains("corrupt or truncated"), e.getMessage());
  }
}
