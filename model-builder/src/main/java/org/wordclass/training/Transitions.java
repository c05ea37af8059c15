package org.wordclass.training;

import java.util.Locale;

/**
 * Transition estimates by deleted interpolation (Jelinek and Mercer's smoothing with the weight
 * setting of Brants 2000): {@code P(c|a,b) = λ1 P^(c) + λ2 P^(c|b) + λ3 P^(c|a,b)} and, for the
 * first-order chain, {@code P(c|b) = μ1 P^(c) + μ2 P^(c|b)}.
 *
 * <p>Input is the table of trigram counts over states 0..S-1, where S-1 is the sentence
 * boundary (a context before the first word, an event after the last). Every real tag and the
 * boundary occur as events, so {@code P^(c) > 0} and no interpolated probability is zero.
 */
final class Transitions {
  private final int states;
  private final double[] lambda = new double[3];
  private final double[] mu = new double[2];
  private final double[] logBigram;
  private final double[] logTrigram;

  Transitions(long[] tri, int states) {
    this.states = states;
    long[] uni = new long[states];
    long[] bi = new long[states * states];
    long[] biContext = new long[states];
    long[] triContext = new long[states * states];
    long total = 0;
    for (int a = 0; a < states; a++) {
      for (int b = 0; b < states; b++) {
        for (int c = 0; c < states; c++) {
          long n = tri[(a * states + b) * states + c];
          uni[c] += n;
          bi[b * states + c] += n;
          biContext[b] += n;
          triContext[a * states + b] += n;
          total += n;
        }
      }
    }
    setWeights(tri, uni, bi, biContext, triContext, total);
    logBigram = new double[states * states];
    logTrigram = new double[states * states * states];
    for (int b = 0; b < states; b++) {
      for (int c = 0; c < states; c++) {
        double p1 = (double) uni[c] / total;
        double p2 = biContext[b] > 0 ? (double) bi[b * states + c] / biContext[b] : p1;
        logBigram[b * states + c] = Math.log(mu[0] * p1 + mu[1] * p2);
        for (int a = 0; a < states; a++) {
          long context = triContext[a * states + b];
          double p3 = context > 0 ? (double) tri[(a * states + b) * states + c] / context : p2;
          logTrigram[(a * states + b) * states + c] = Math.log(lambda[0] * p1 + lambda[1] * p2 + lambda[2] * p3);
        }
      }
    }
  }

  /** Each n-gram votes, with its count, for the order that predicts it best when it is held out. */
  private void setWeights(long[] tri, long[] uni, long[] bi, long[] biContext, long[] triContext, long total) {
    for (int a = 0; a < states; a++) {
      for (int b = 0; b < states; b++) {
        for (int c = 0; c < states; c++) {
          long n = tri[(a * states + b) * states + c];
          if (n == 0) {
            continue;
          }
          double x1 = heldOut(uni[c], total);
          double x2 = heldOut(bi[b * states + c], biContext[b]);
          double x3 = heldOut(n, triContext[a * states + b]);
          lambda[argMax(x1, x2, x3)] += n;
        }
      }
    }
    for (int b = 0; b < states; b++) {
      for (int c = 0; c < states; c++) {
        long n = bi[b * states + c];
        if (n > 0) {
          mu[argMax(heldOut(uni[c], total), heldOut(n, biContext[b]), -1)] += n;
        }
      }
    }
    normalise(lambda);
    normalise(mu);
  }

  private static double heldOut(long count, long context) {
    return context > 1 ? (double) (count - 1) / (context - 1) : 0;
  }

  /** Index of the largest; ties go to the lower order, the more robust estimate. */
  private static int argMax(double x1, double x2, double x3) {
    if (x3 > x2 && x3 > x1) {
      return 2;
    }
    return x2 > x1 ? 1 : 0;
  }

  private static void normalise(double[] weights) {
    double sum = 0;
    for (double w : weights) {
      sum += w;
    }
    if (sum == 0) {
      // a corpus too small to vote: trust the lowest order only
      weights[0] = 1;
      return;
    }
    for (int i = 0; i < weights.length; i++) {
      weights[i] /= sum;
    }
    if (weights[0] == 0) {
      // keep every allowed path possible: the unigram estimate is never switched off entirely
      weights[0] = 1e-6;
      normaliseAgain(weights);
    }
  }

  private static void normaliseAgain(double[] weights) {
    double sum = 0;
    for (double w : weights) {
      sum += w;
    }
    for (int i = 0; i < weights.length; i++) {
      weights[i] /= sum;
    }
  }

  double[] logBigram() {
    return logBigram;
  }

  double[] logTrigram() {
    return logTrigram;
  }

  String describeTrigramWeights() {
    return String.format(Locale.ROOT, "%.6f %.6f %.6f", lambda[0], lambda[1], lambda[2]);
  }

  String describeBigramWeights() {
    return String.format(Locale.ROOT, "%.6f %.6f", mu[0], mu[1]);
  }
}
