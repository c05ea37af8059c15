package org.wordclass.testing;

import java.io.ByteArrayOutputStream;
import java.util.Arrays;
import java.util.List;
import java.util.Random;

/**
 * A seeded mutator for fuzz tests: turns a valid input into a nearby invalid one by one to four
 * edits among bit flips, byte sets to boundary values, inserts, deletes, duplicated ranges,
 * splices with another seed, variable-length integers of boundary values written over the
 * bytes, dictionary words (such as tabs and tags for text formats) and truncation. The same
 * seed gives the same sequence of inputs.
 */
public final class Mutator {
  /** Single bytes that sit on the edges of signed, unsigned, ASCII and UTF-8 ranges. */
  private static final int[] BOUNDARY_BYTES = {0x00, 0x01, 0x7F, 0x80, 0xBF, 0xC0, 0xC3, 0xE0, 0xED, 0xF0, 0xF4, 0xFE, 0xFF};
  /** Values whose variable-length encodings reach the edges of 1 to 5 bytes and of int. */
  private static final int[] BOUNDARY_INTS = {0, 1, 2, 127, 128, 16_383, 16_384, 2_097_151, 2_097_152, 268_435_455,
      268_435_456, Integer.MAX_VALUE, Integer.MIN_VALUE, -1, -2, 1 << 20, 65_535, 65_536};

  private final Random rnd;
  private final List<byte[]> seeds;
  private final List<byte[]> dictionary;

  /**
   * @param seeds valid inputs, also the material of splices
   * @param dictionary byte strings that mean something to the format (may be empty)
   */
  public Mutator(Random rnd, List<byte[]> seeds, List<byte[]> dictionary) {
    this.rnd = rnd;
    this.seeds = List.copyOf(seeds);
    this.dictionary = List.copyOf(dictionary);
  }

  /** A random seed. */
  public byte[] seed() {
    return seeds.get(rnd.nextInt(seeds.size())).clone();
  }

  /** A mutant of a random seed. */
  public byte[] next() {
    return mutate(seed());
  }

  /** {@code input} with one to four random edits. */
  public byte[] mutate(byte[] input) {
    byte[] out = input;
    for (int edits = 1 + rnd.nextInt(4); edits > 0; edits--) {
      out = edit(out);
    }
    return out;
  }

  private byte[] edit(byte[] in) {
    if (in.length == 0) {
      return insert(in, 0, randomBytes(1 + rnd.nextInt(8)));
    }
    int at = rnd.nextInt(in.length);
    return switch (rnd.nextInt(dictionary.isEmpty() ? 9 : 10)) {
      case 0 -> flipBit(in, at);
      case 1 -> set(in, at, BOUNDARY_BYTES[rnd.nextInt(BOUNDARY_BYTES.length)]);
      case 2 -> set(in, at, rnd.nextInt(256));
      case 3 -> insert(in, at, randomBytes(1 + rnd.nextInt(8)));
      case 4 -> delete(in, at, 1 + rnd.nextInt(Math.min(64, in.length - at)));
      case 5 -> duplicate(in, at);
      case 6 -> splice(in, at);
      case 7 -> overwrite(in, at, vInt(BOUNDARY_INTS[rnd.nextInt(BOUNDARY_INTS.length)]));
      case 8 -> Arrays.copyOf(in, at);
      default -> insert(in, at, dictionary.get(rnd.nextInt(dictionary.size())));
    };
  }

  private static byte[] flipBit(byte[] in, int at) {
    byte[] out = in.clone();
    out[at] ^= (byte) (1 << (at % 8));
    return out;
  }

  private static byte[] set(byte[] in, int at, int value) {
    byte[] out = in.clone();
    out[at] = (byte) value;
    return out;
  }

  private byte[] randomBytes(int n) {
    byte[] bytes = new byte[n];
    rnd.nextBytes(bytes);
    return bytes;
  }

  private static byte[] insert(byte[] in, int at, byte[] what) {
    byte[] out = new byte[in.length + what.length];
    System.arraycopy(in, 0, out, 0, at);
    System.arraycopy(what, 0, out, at, what.length);
    System.arraycopy(in, at, out, at + what.length, in.length - at);
    return out;
  }

  private static byte[] delete(byte[] in, int at, int n) {
    byte[] out = new byte[in.length - n];
    System.arraycopy(in, 0, out, 0, at);
    System.arraycopy(in, at + n, out, at, in.length - at - n);
    return out;
  }

  /** Repeats a range of up to 64 bytes starting at {@code at}. */
  private byte[] duplicate(byte[] in, int at) {
    int n = 1 + rnd.nextInt(Math.min(64, in.length - at));
    return insert(in, at, Arrays.copyOfRange(in, at, at + n));
  }

  /** The head of {@code in} up to {@code at}, then the tail of another seed from a random point. */
  private byte[] splice(byte[] in, int at) {
    byte[] other = seeds.get(rnd.nextInt(seeds.size()));
    int from = rnd.nextInt(other.length + 1);
    byte[] out = Arrays.copyOf(in, at + other.length - from);
    System.arraycopy(other, from, out, at, other.length - from);
    return out;
  }

  private static byte[] overwrite(byte[] in, int at, byte[] what) {
    byte[] out = Arrays.copyOf(in, Math.max(in.length, at + what.length));
    System.arraycopy(what, 0, out, at, what.length);
    return out;
  }

  /** {@code value} as Lucene's DataOutput.writeVInt encodes it (negative values take 5 bytes). */
  static byte[] vInt(int value) {
    ByteArrayOutputStream out = new ByteArrayOutputStream(5);
    int v = value;
    while ((v & ~0x7F) != 0) {
      out.write((v & 0x7F) | 0x80);
      v >>>= 7;
    }
    out.write(v);
    return out.toByteArray();
  }
}
