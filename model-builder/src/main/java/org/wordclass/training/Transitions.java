package org.wordclass.training;

import java.util.Locale;

/**
 * Transition estimates from counts of tag n-grams. With {@link Smoothing#DELETED_INTERPOLATION}
 * (Jelinek and Mercer's smoothing with the weight setting of Brants 2000): {@code P(c|a,b) = λ1
 * P^(c) + λ2 P^(c|b) + λ3 P^(c|a,b)} and, for the first-order chain, {@code P(c|b) = μ1 P^(c) +
 * μ2 P^(c|b)}. With {@link Smoothing#MAXIMUM_LIKELIHOOD} only the highest order is used, falling
 * back to a lower one for a context never seen: the M-step of exact EM.
 *
 * <p>Input is a table of counts over states 0..S-1, where S-1 is the sentence boundary (a
 * context before the first word, an event after the last). Counts may be fractional: the
 * expected counts of Baum-Welch re-estimation go through the same path as the tagged counts of
 * supervised training (whole counts are exact in a double, so supervised models do not change).
 * With deleted interpolation every state that occurs as an event keeps {@code P^(c) > 0}, so no
 * interpolated probability of it is zero.
 */
public final class Transitions {
  /** How the orders are combined. */
  public enum Smoothing {
    /** Weights set from the counts, each n-gram voting for the order that predicts it best held out. */
    DELETED_INTERPOLATION,
    /** Relative frequencies of the highest order with a seen context. */
    MAXIMUM_LIKELIHOOD
  }

  private final int states;
  private final double[] lambda = new double[3];
  private final double[] mu = new double[2];
  private final double[] uni;
  private final double[] bi;
  private final double[] biContext;
  private final double total;
  private final double[] logBigram;
  private final double[] logTrigram;

  private Transitions(double[] tri, double[] bi, int states, Smoothing smoothing) {
    this.states = states;
    this.bi = bi;
    this.uni = new double[states];
    this.biContext = new double[states];
    double sum = 0;
    for (int b = 0; b < states; b++) {
      for (int c = 0; c < states; c++) {
        double n = bi[b * states + c];
        uni[c] += n;
        biContext[b] += n;
        sum += n;
      }
    }
    this.total = sum;
    double[] triContext = tri == null ? null : contexts(tri);
    if (smoothing == Smoothing.MAXIMUM_LIKELIHOOD) {
      lambda[2] = 1;
      mu[1] = 1;
    } else {
      setWeights(tri, triContext);
    }
    logBigram = bigramTable();
    logTrigram = tri == null ? null : trigramTable(tri, triContext);
  }

  /** Both tables from trigram counts, indexed {@code (a * S + b) * S + c}. */
  public static Transitions ofTrigrams(double[] tri, int states, Smoothing smoothing) {
    double[] bi = new double[states * states];
    for (int a = 0; a < states; a++) {
      for (int bc = 0; bc < states * states; bc++) {
        bi[bc] += tri[a * states * states + bc];
      }
    }
    return new Transitions(tri, bi, states, smoothing);
  }

  /** The bigram table alone from bigram counts, indexed {@code b * S + c}; no trigram table. */
  public static Transitions ofBigrams(double[] bi, int states, Smoothing smoothing) {
    return new Transitions(null, bi.clone(), states, smoothing);
  }

  private double[] contexts(double[] tri) {
    double[] triContext = new double[states * states];
    for (int ab = 0; ab < states * states; ab++) {
      for (int c = 0; c < states; c++) {
        triContext[ab] += tri[ab * states + c];
      }
    }
    return triContext;
  }

  private double[] bigramTable() {
    double[] table = new double[states * states];
    for (int b = 0; b < states; b++) {
      for (int c = 0; c < states; c++) {
        table[b * states + c] = Math.log(mu[0] * unigram(c) + mu[1] * bigram(b, c));
      }
    }
    return table;
  }

  private double[] trigramTable(double[] tri, double[] triContext) {
    double[] table = new double[states * states * states];
    for (int a = 0; a < states; a++) {
      for (int b = 0; b < states; b++) {
        double context = triContext[a * states + b];
        for (int c = 0; c < states; c++) {
          double p2 = bigram(b, c);
          double p3 = context > 0 ? tri[(a * states + b) * states + c] / context : p2;
          table[(a * states + b) * states + c] = Math.log(lambda[0] * unigram(c) + lambda[1] * p2 + lambda[2] * p3);
        }
      }
    }
    return table;
  }

  private double unigram(int c) {
    return uni[c] / total;
  }

  /** {@code P^(c|b)}, or the unigram estimate for a context never seen. */
  private double bigram(int b, int c) {
    return biContext[b] > 0 ? bi[b * states + c] / biContext[b] : unigram(c);
  }

  /** Each n-gram votes, with its count, for the order that predicts it best when it is held out. */
  private void setWeights(double[] tri, double[] triContext) {
    if (tri != null) {
      for (int a = 0; a < states; a++) {
        for (int b = 0; b < states; b++) {
          for (int c = 0; c < states; c++) {
            double n = tri[(a * states + b) * states + c];
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
      normalise(lambda);
    }
    for (int b = 0; b < states; b++) {
      for (int c = 0; c < states; c++) {
        double n = bi[b * states + c];
        if (n > 0) {
          mu[argMax(heldOut(uni[c], total), heldOut(n, biContext[b]), -1)] += n;
        }
      }
    }
    normalise(mu);
  }

  private static double heldOut(double count, double context) {
    return context > 1 ? (count - 1) / (context - 1) : 0;
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

  /** Log bigram probabilities, indexed {@code b * S + c}. */
  public double[] logBigram() {
    return logBigram;
  }

  /** Log trigram probabilities, or null when built from bigram counts only. */
  public double[] logTrigram() {
    return logTrigram;
  }

  public String describeTrigramWeights() {
    return String.format(Locale.ROOT, "%.6f %.6f %.6f", lambda[0], lambda[1], lambda[2]);
  }

  public String describeBigramWeights() {
    return String.format(Locale.ROOT, "%.6f %.6f", mu[0], mu[1]);
  }
}
