package org.wordclass.adaptation;

import org.wordclass.decoding.Decoder;
import org.wordclass.decoding.Lattice;
import org.wordclass.model.HmmModel;

/**
 * The expected number of times each transition is taken in a sequence, given the whole
 * sequence: the expectation step of Baum-Welch (forward-backward) re-estimation, and of the
 * fitting of latent sub-states. Computed from what a {@link Decoder}'s last {@link
 * Decoder#forwardBackward} left, read through its read-only view (the scaled forward and
 * backward weights of each trellis cell, the backward normaliser of each position, the scaled
 * emissions), so that the search engine's decoder carries no training code.
 *
 * <p>At order 1 the counts are the pair posteriors ξ(j, k) summed over positions, indexed like
 * {@link HmmModel#bigramIndex}; at order 2 the expected trigram counts over (h, j, k), indexed
 * like {@link HmmModel#trigramIndex}. The transitions from and to the sentence boundary are
 * included, so a sequence of n tokens adds n + 1 in total. The expected emission counts are the
 * candidate posteriors, {@link Decoder#posterior}.
 *
 * <p>Cost: one pass like the forward pass, O(n K^2) at order 1 and O(n K^3) at order 2; it
 * allocates nothing.
 */
public final class ExpectedTransitions {
  private ExpectedTransitions() {}

  /**
   * Adds the expected transition counts of the sequence of {@code decoder}'s last {@link
   * Decoder#forwardBackward} call to {@code counts}. An empty sequence, or one the model gives
   * probability zero, adds nothing. The lattice must not change in between.
   *
   * @param counts {@code (T+1)^2} entries at order 1, {@code (T+1)^3} at order 2
   */
  public static void add(Decoder decoder, double[] counts) {
    int states = decoder.model().states().size() + 1;
    int expected = decoder.order() == 2 ? states * states * states : states * states;
    if (counts.length != expected) {
      throw new IllegalArgumentException("expected " + expected + " transition counts, got " + counts.length);
    }
    int n = decoder.lattice().size();
    if (n == 0 || decoder.lastLogLikelihood() == Double.NEGATIVE_INFINITY) {
      return;
    }
    if (decoder.order() == 2) {
      addTrigrams(decoder, counts, n, states);
    } else {
      addBigrams(decoder, counts, n, states);
    }
  }

  private static void addBigrams(Decoder d, double[] counts, int n, int states) {
    Lattice lattice = d.lattice();
    int boundary = d.model().boundary();
    double[] bigram = d.model().bigramTable();
    for (int k = 0; k < lattice.candidateCount(0); k++) {
      counts[boundary * states + lattice.candidateState(0, k)] += d.posterior(0, k);
    }
    for (int i = 0; i + 1 < n; i++) {
      int kj = lattice.candidateCount(i);
      int kk = lattice.candidateCount(i + 1);
      // the unnormalised backward value at i is backwardSum(i) * beta, so this makes the ξ of i sum to 1
      double norm = 1.0 / (d.backwardSum(i) * overlap(d, i, kj));
      for (int j = 0; j < kj; j++) {
        double a = d.scaledForward(i, j) * norm;
        int row = lattice.candidateState(i, j) * states;
        for (int k = 0; k < kk; k++) {
          int index = row + lattice.candidateState(i + 1, k);
          counts[index] += a * bigram[index] * d.scaledEmission(i + 1, j, k) * d.scaledBackward(i + 1, k);
        }
      }
    }
    for (int k = 0; k < lattice.candidateCount(n - 1); k++) {
      counts[lattice.candidateState(n - 1, k) * states + boundary] += d.posterior(n - 1, k);
    }
  }

  private static void addTrigrams(Decoder d, double[] counts, int n, int states) {
    Lattice lattice = d.lattice();
    int boundary = d.model().boundary();
    double[] trigram = d.model().trigramTable();
    for (int k = 0; k < lattice.candidateCount(0); k++) {
      counts[(boundary * states + boundary) * states + lattice.candidateState(0, k)] += d.posterior(0, k);
    }
    for (int i = 0; i + 1 < n; i++) {
      int kh = i == 0 ? 1 : lattice.candidateCount(i - 1);
      int kj = lattice.candidateCount(i);
      int kk = lattice.candidateCount(i + 1);
      double norm = 1.0 / (d.backwardSum(i) * overlap(d, i, kh * kj));
      for (int h = 0; h < kh; h++) {
        int th = i == 0 ? boundary : lattice.candidateState(i - 1, h);
        for (int j = 0; j < kj; j++) {
          double a = d.scaledForward(i, h * kj + j) * norm;
          int base = (th * states + lattice.candidateState(i, j)) * states;
          for (int k = 0; k < kk; k++) {
            int index = base + lattice.candidateState(i + 1, k);
            counts[index] += a * trigram[index] * d.scaledEmission(i + 1, j, k) * d.scaledBackward(i + 1, j * kk + k);
          }
        }
      }
    }
    int kj = n == 1 ? 1 : lattice.candidateCount(n - 2);
    int kk = lattice.candidateCount(n - 1);
    double norm = 1.0 / overlap(d, n - 1, kj * kk);
    for (int j = 0; j < kj; j++) {
      int base = ((n == 1 ? boundary : lattice.candidateState(n - 2, j)) * states) * states;
      for (int k = 0; k < kk; k++) {
        int cell = j * kk + k;
        counts[base + lattice.candidateState(n - 1, k) * states + boundary]
            += d.scaledForward(n - 1, cell) * d.scaledBackward(n - 1, cell) * norm;
      }
    }
  }

  /** Sum of forward times backward over the first {@code cells} cells of {@code position}: the normaliser of their scaled posteriors. */
  private static double overlap(Decoder d, int position, int cells) {
    double sum = 0;
    for (int c = 0; c < cells; c++) {
      sum += d.scaledForward(position, c) * d.scaledBackward(position, c);
    }
    return sum;
  }
}
