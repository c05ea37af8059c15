package org.wordclass.model;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import org.apache.lucene.codecs.CodecUtil;
import org.junit.jupiter.api.Test;
import org.wordclass.decoding.Decoder;
import org.wordclass.decoding.Tagger;
import org.wordclass.testing.FuzzRun;
import org.wordclass.testing.Mutator;
import org.wordclass.testing.TestModels;

/**
 * Fuzzes the model loader for a bounded time (see {@link FuzzRun}) with mutants of valid model
 * files. Most mutants get a fresh checksum footer, so that they pass the checksum and reach the
 * parser, which must refuse them with a {@link ModelFormatException} or return a model that
 * tags text without failing. Any other outcome fails the test, naming the seed and execution.
 */
class ModelFileFuzzTest {
  private static final int HEADER = CodecUtil.headerLength(ModelFile.CODEC);
  private static final int FOOTER = CodecUtil.footerLength();
  private static final List<String> TEXT = List.of("the", "run", "walks", "Zürich", "walked", "Bern", "ab", "zzq", "42", "",
      "%%", "x".repeat(300), "\uD800", "QRS");

  @Test
  void mutantsAreRefusedOrUsable() throws IOException {
    FuzzRun run = new FuzzRun("model loader");
    Random rnd = run.random();
    Mutator mutator = new Mutator(rnd, seeds(), List.of());
    byte[] bundled = ModelFileRoundTripTest.bundledBytes();
    long accepted = 0;
    long refused = 0;
    while (run.next()) {
      byte[] original = rnd.nextInt(50) == 0 ? bundled : mutator.seed();
      byte[] mutant = mutant(original, mutator, rnd);
      if (loadAndUse(mutant, run)) {
        accepted++;
      } else {
        refused++;
      }
    }
    System.out.println(run.summary() + "; " + refused + " refused, " + accepted + " accepted and used");
    assertTrue(refused > 0 && run.executions() >= 100, run.summary());
  }

  /** Small models of both orders: the fixed one and a few random ones. */
  private static List<byte[]> seeds() {
    List<byte[]> seeds = new ArrayList<>(List.of(TestModels.bytes(TestModels.small())));
    for (long seed = 1; seed <= 4; seed++) {
      seeds.add(TestModels.bytes(TestModels.random(new Random(seed), 1 + (int) (seed % 2))));
    }
    return seeds;
  }

  /**
   * Half the time only the body between header and footer is mutated; nine times in ten the
   * result gets a valid checksum footer, as a file written by a buggy or hostile writer would.
   */
  static byte[] mutant(byte[] valid, Mutator mutator, Random rnd) {
    byte[] mutated;
    if (rnd.nextBoolean()) {
      byte[] body = mutator.mutate(Arrays.copyOfRange(valid, HEADER, valid.length - FOOTER));
      mutated = concat(Arrays.copyOf(valid, HEADER), body);
    } else {
      mutated = mutator.mutate(valid);
      mutated = Arrays.copyOf(mutated, Math.max(0, mutated.length - FOOTER));
    }
    return rnd.nextInt(10) == 0 ? mutated : sealed(mutated);
  }

  private static byte[] concat(byte[] a, byte[] b) {
    byte[] out = Arrays.copyOf(a, a.length + b.length);
    System.arraycopy(b, 0, out, a.length, b.length);
    return out;
  }

  /** {@code content} followed by a footer with its correct checksum. */
  static byte[] sealed(byte[] content) {
    return TestModels.write(out -> {
      out.writeBytes(content, content.length);
      CodecUtil.writeFooter(out);
    });
  }

  /** True if the model loaded and tagged text; false if it was refused as it should be. */
  private static boolean loadAndUse(byte[] bytes, FuzzRun run) {
    HmmModel model;
    try {
      model = ModelFile.read(bytes, "fuzz.wcm");
    } catch (ModelFormatException e) {
      return false;
    } catch (Throwable t) {
      throw new AssertionError(run.where() + ": loading threw " + t, t);
    }
    try {
      for (int order = 1; order <= 2; order++) {
        new Tagger(new Decoder(model, order)).tag(TEXT, true);
      }
    } catch (Throwable t) {
      throw new AssertionError(run.where() + ": an accepted model failed to tag: " + t, t);
    }
    return true;
  }
}
