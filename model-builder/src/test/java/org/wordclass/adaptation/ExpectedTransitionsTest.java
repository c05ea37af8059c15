package org.wordclass.adaptation;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.wordclass.decoding.Decoder;
import org.wordclass.decoding.Lattice;
import org.wordclass.model.HmmModel;

/**
 * Property: on small random models, the decoder's expected transition counts (and candidate
 * posteriors and log-likelihood) equal the expectations computed by enumerating every tagging
 * the lattice allows.
 */
class ExpectedTransitionsTest {

  @ParameterizedTest
  @ValueSource(ints = {1, 2})
  void expectedTransitionCountsEqualBruteForce(int order) {
    Random random = new Random(20240611L + order);
    for (int trial = 0; trial < 150; trial++) {
      int tags = 2 + random.nextInt(3);
      HmmModel model = RandomModels.model(random, tags, 6, order);
      List<String> tokens = RandomModels.sentence(random, 1 + random.nextInt(5), 6, true);
      Decoder decoder = new Decoder(model, order);
      Lattice lattice = decoder.lattice();
      lattice.clear();
      tokens.forEach(lattice::add);
      double logLikelihood = decoder.forwardBackward();
      double[] counts = new double[order == 2 ? cube(tags + 1) : square(tags + 1)];
      ExpectedTransitions.add(decoder, counts);

      BruteForce expected = new BruteForce(model, lattice, order);
      String where = "trial " + trial + ", tokens " + tokens;
      assertEquals(expected.logLikelihood, logLikelihood, 1e-9, where);
      for (int i = 0; i < counts.length; i++) {
        assertEquals(expected.transitions[i], counts[i], 1e-9, where + ", transition " + i);
      }
      for (int i = 0; i < lattice.size(); i++) {
        for (int k = 0; k < lattice.candidateCount(i); k++) {
          assertEquals(expected.posteriors[i][k], decoder.posterior(i, k), 1e-9, where + ", posterior " + i + "/" + k);
        }
      }
    }
  }

  private static int square(int x) {
    return x * x;
  }

  private static int cube(int x) {
    return x * x * x;
  }

  /** Sums over every candidate assignment of the lattice, weighted by its joint probability. */
  private static final class BruteForce {
    final double[] transitions;
    final double[][] posteriors;
    final double logLikelihood;
    private final HmmModel model;
    private final Lattice lattice;
    private final int order;
    private final int[] choice;
    private double total;

    BruteForce(HmmModel model, Lattice lattice, int order) {
      this.model = model;
      this.lattice = lattice;
      this.order = order;
      int states = model.tags().size() + 1;
      this.transitions = new double[order == 2 ? cube(states) : square(states)];
      this.posteriors = new double[lattice.size()][];
      for (int i = 0; i < lattice.size(); i++) {
        posteriors[i] = new double[lattice.candidateCount(i)];
      }
      this.choice = new int[lattice.size()];
      enumerate(0);
      for (int i = 0; i < transitions.length; i++) {
        transitions[i] /= total;
      }
      for (double[] p : posteriors) {
        for (int k = 0; k < p.length; k++) {
          p[k] /= total;
        }
      }
      this.logLikelihood = Math.log(total);
    }

    private void enumerate(int position) {
      if (position == choice.length) {
        addPath();
        return;
      }
      for (int k = 0; k < lattice.candidateCount(position); k++) {
        choice[position] = k;
        enumerate(position + 1);
      }
    }

    /** Tag sequence with the boundary on both sides: b (b) t0 .. tn-1 b. */
    private void addPath() {
      int n = choice.length;
      int pad = order;
      int[] seq = new int[n + pad + 1];
      java.util.Arrays.fill(seq, model.boundary());
      double log = 0;
      for (int i = 0; i < n; i++) {
        seq[pad + i] = lattice.candidateTag(i, choice[i]);
        log += lattice.candidateLogEmission(i, choice[i]);
      }
      int[] used = new int[n + 1];
      for (int i = pad; i < seq.length; i++) {
        used[i - pad] = order == 2 ? model.trigramIndex(seq[i - 2], seq[i - 1], seq[i]) : model.bigramIndex(seq[i - 1], seq[i]);
        log += order == 2 ? model.logTrigramTable()[used[i - pad]] : model.logBigramTable()[used[i - pad]];
      }
      double p = Math.exp(log);
      total += p;
      for (int index : used) {
        transitions[index] += p;
      }
      for (int i = 0; i < n; i++) {
        posteriors[i][choice[i]] += p;
      }
    }
  }
}
