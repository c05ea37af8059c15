package org.wordclass.decoding;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.wordclass.model.HmmModel;
import org.wordclass.testing.TestModels;

/**
 * Property tests of Viterbi and forward-backward against brute-force enumeration (definition of
 * the HMM joint probability), on hundreds of small random models and token sequences of length 1
 * to 6 that include unknown words. Seeded: a failure message names the seed of the case.
 */
class DecoderBruteForceTest {
  private static final int MODELS = 400;
  private static final int SEQUENCES_PER_MODEL = 4;
  private static final double TOLERANCE = 1e-9;

  @ParameterizedTest(name = "order {0}")
  @ValueSource(ints = {1, 2})
  void decoderAgreesWithEnumeration(int order) {
    Random seeds = new Random(0x5EED0000L + order);
    int checked = 0;
    for (int m = 0; m < MODELS; m++) {
      long seed = seeds.nextLong();
      Random rnd = new Random(seed);
      HmmModel model = TestModels.random(rnd, order);
      Decoder decoder = new Decoder(model, order);
      for (int s = 0; s < SEQUENCES_PER_MODEL; s++) {
        List<String> tokens = TestModels.randomTokens(rnd, model, 1 + rnd.nextInt(6), 0.25);
        String where = "seed " + seed + ", sequence " + s + " " + tokens + ", order " + order;
        check(decoder, new BruteForce(model, order, tokens), tokens, where);
        checked++;
      }
    }
    assertEquals(MODELS * SEQUENCES_PER_MODEL, checked);
  }

  private static void check(Decoder decoder, BruteForce brute, List<String> tokens, String where) {
    fill(decoder.lattice(), tokens);
    checkViterbi(decoder, brute, where);
    checkForwardBackward(decoder, brute, where);
  }

  static void fill(Lattice lattice, List<String> tokens) {
    lattice.clear();
    tokens.forEach(lattice::add);
  }

  private static void checkViterbi(Decoder decoder, BruteForce brute, String where) {
    Lattice lattice = decoder.lattice();
    int[] best = new int[lattice.size()];
    decoder.viterbi(best);
    int[] choice = new int[best.length];
    for (int i = 0; i < best.length; i++) {
      choice[i] = indexOf(brute.tags[i], lattice.candidateTag(i, best[i]), where);
    }
    double expected = brute.best();
    assertClose(expected, brute.logJoint(choice), "joint probability of the Viterbi path, " + where);
    assertClose(expected, decoder.bestLogProbability(), "bestLogProbability, " + where);
  }

  private static void checkForwardBackward(Decoder decoder, BruteForce brute, String where) {
    double expected = brute.logSum();
    assertClose(expected, decoder.forwardBackward(), "log-likelihood, " + where);
    if (expected == Double.NEGATIVE_INFINITY) {
      return; // no path has any probability: posteriors are undefined
    }
    Lattice lattice = decoder.lattice();
    for (int i = 0; i < lattice.size(); i++) {
      assertEquals(brute.tags[i].length, lattice.candidateCount(i), "candidates at " + i + ", " + where);
      for (int k = 0; k < lattice.candidateCount(i); k++) {
        double marginal = brute.marginal(i, lattice.candidateTag(i, k));
        assertRelative(marginal, decoder.posterior(i, k), "posterior at " + i + " of candidate " + k + ", " + where);
      }
    }
  }

  private static int indexOf(int[] tags, int tag, String where) {
    for (int k = 0; k < tags.length; k++) {
      if (tags[k] == tag) {
        return k;
      }
    }
    return fail("Viterbi chose tag " + tag + ", which the lexicon does not allow, " + where);
  }

  /** Probabilities: equal within {@value #TOLERANCE} of the expected value (with a floor of 1e-15 for tiny ones). */
  static void assertRelative(double expected, double actual, String what) {
    double allowed = TOLERANCE * Math.abs(expected) + 1e-15;
    assertTrue(Math.abs(expected - actual) <= allowed, what + ": expected " + expected + " but was " + actual);
  }

  /** Log-probabilities: equal within {@value #TOLERANCE} relative (absolute below magnitude 1); infinities must match. */
  static void assertClose(double expected, double actual, String what) {
    if (Double.isInfinite(expected) || Double.isInfinite(actual)) {
      assertEquals(expected, actual, what);
      return;
    }
    double allowed = TOLERANCE * Math.max(1.0, Math.abs(expected));
    assertTrue(Math.abs(expected - actual) <= allowed, what + ": expected " + expected + " but was " + actual);
  }
}
