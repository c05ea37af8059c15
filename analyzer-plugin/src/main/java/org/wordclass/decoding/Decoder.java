package org.wordclass.decoding;

import java.util.Arrays;
import org.wordclass.model.HmmModel;

/**
 * Exact decoding of a {@link Lattice} under a first- or second-order HMM: Viterbi for the most
 * probable tag sequence, forward-backward for the posterior probability of each candidate tag
 * (the confidence of a tagging). Both respect the lexicon constraint and are exact under it.
 *
 * <p>Cost per token with K candidates per token: Viterbi O(K^2) at order 1 and O(K^3) at order
 * 2; forward-backward about twice that. Memory is O(n K^2) for n tokens, in buffers that are
 * kept and reused, so steady-state decoding allocates nothing. Forward-backward runs in linear
 * space with one scale factor per token, so long sequences do not underflow. What it leaves is
 * readable ({@link #scaledForward} and the methods beside it), so that training code computes
 * its expectations outside the search engine's jar.
 *
 * <p>Not thread-safe: one per thread; the model it reads is shared.
 */
public final class Decoder {
  /** Score of the single virtual state before the first token. */
  private static final double[] START_SCORE = {0};

  private final HmmModel model;
  private final int order;
  private final Lattice lattice;
  private final int states;
  private final int boundary;
  private final float[] logBigram;
  private final float[] logTrigram;
  private final double[] bigram;
  private final double[] trigram;
  private final int[] boundaryState;

  private int[] stateStart = new int[65];
  private double[] score = new double[1024];
  private int[] backPointer = new int[1024];
  private double[] alpha = new double[1024];
  private double[] beta = new double[1024];
  private double[] scaledEmission = new double[256];
  private double[] posterior = new double[256];
  private double[] betaSum = new double[64];
  /**
   * Per candidate h two positions back, while a position is decoded: the offset of its plane in
   * the trigram table, and the score of (h, j) for the j at hand.
   */
  private int[] planeOf = new int[16];
  private double[] column = new double[16];
  private double bestLogProbability;
  private double lastLogLikelihood = Double.NEGATIVE_INFINITY;
  private double maxEmissionSum;

  /** A decoder of the order the model was trained for. */
  public Decoder(HmmModel model) {
    this(model, model.order());
  }

  public Decoder(HmmModel model, int order) {
    if (order != 1 && order != 2) {
      throw new IllegalArgumentException("order must be 1 or 2, not " + order);
    }
    this.model = model;
    this.order = order;
    this.lattice = new Lattice(model);
    this.states = model.states().size() + 1;
    this.boundary = model.boundary();
    this.logBigram = model.logBigramFloats();
    this.logTrigram = model.logTrigramFloats();
    this.bigram = model.bigramTable();
    this.trigram = model.trigramTable();
    this.boundaryState = new int[] {boundary};
  }

  public HmmModel model() {
    return model;
  }

  public int order() {
    return order;
  }

  /** The tokens to decode; fill it, then call {@link #viterbi} or {@link #forwardBackward}. */
  public Lattice lattice() {
    return lattice;
  }

  /** Candidates of a position, with the virtual boundary positions -1 and -2 holding one. */
  private int count(int position) {
    return position < 0 ? 1 : lattice.candidateCount(position);
  }

  /**
   * The array holding the candidate states of {@code position} from {@link #statesFrom}: the
   * lattice's, or the boundary alone for the virtual positions before the sequence. Inner loops
   * index it directly instead of testing the position per candidate.
   */
  private int[] statesAt(int position) {
    return position < 0 ? boundaryState : lattice.candidateStates();
  }

  private int statesFrom(int position) {
    return position < 0 ? 0 : lattice.candidateOffset(position);
  }

  /** The state of candidate {@code k}, or the boundary before the sequence. */
  private int stateAt(int position, int k) {
    return position < 0 ? boundary : lattice.candidateState(position, k);
  }

  /** Lays out one state per (previous candidate, candidate) pair (order 2) or per candidate (order 1). */
  private int layOutStates() {
    int n = lattice.size();
    if (stateStart.length < n + 1) {
      stateStart = new int[Math.max(n + 1, stateStart.length * 2)];
    }
    int total = 0;
    for (int i = 0; i < n; i++) {
      stateStart[i] = total;
      total += order == 2 ? count(i - 1) * count(i) : count(i);
    }
    stateStart[n] = total;
    if (betaSum.length < n) {
      betaSum = new double[Math.max(n, betaSum.length * 2)];
    }
    if (score.length < total) {
      int grown = Math.max(total, score.length * 2);
      score = new double[grown];
      backPointer = new int[grown];
      alpha = new double[grown];
      beta = new double[grown];
    }
    int candidates = lattice.totalCandidates();
    if (posterior.length < candidates) {
      posterior = new double[Math.max(candidates, posterior.length * 2)];
    }
    int pairs = lattice.totalPairs();
    if (scaledEmission.length < pairs) {
      scaledEmission = new double[Math.max(pairs, scaledEmission.length * 2)];
    }
    return total;
  }

  /**
   * Finds the most probable tag sequence.
   *
   * @param best receives, per position, the index of the chosen candidate (see {@link
   *     Lattice#candidateTag}); at least {@code lattice().size()} long
   */
  public void viterbi(int[] best) {
    int n = lattice.size();
    if (n == 0) {
      bestLogProbability = Math.log(bigram[boundary * states + boundary]);
      return;
    }
    layOutStates();
    if (order == 2) {
      viterbiSecondOrder(best, n);
    } else {
      viterbiFirstOrder(best, n);
    }
  }

  /** Log joint probability of the sequence found by the last {@link #viterbi} call. */
  public double bestLogProbability() {
    return bestLogProbability;
  }

  private void viterbiFirstOrder(int[] best, int n) {
    double[] emissions = lattice.pairLogEmissions();
    int[] current = lattice.candidateStates();
    for (int i = 0; i < n; i++) {
      int kp = count(i - 1);
      int kc = count(i);
      int here = stateStart[i];
      double[] prevScore = i == 0 ? START_SCORE : score;
      int prev = i == 0 ? 0 : stateStart[i - 1];
      int[] previous = statesAt(i - 1);
      int po = statesFrom(i - 1);
      int co = lattice.candidateOffset(i);
      int emit = lattice.pairOffset(i);
      int stride = lattice.pairStride(i);
      for (int k = 0; k < kc; k++) {
        int tk = current[co + k];
        double top = Double.NEGATIVE_INFINITY;
        int arg = 0;
        for (int j = 0; j < kp; j++) {
          double s = prevScore[prev + j] + logBigram[previous[po + j] * states + tk] + emissions[emit + j * stride + k];
          if (s > top) {
            top = s;
            arg = j;
          }
        }
        score[here + k] = top;
        backPointer[here + k] = arg;
      }
    }
    int last = stateStart[n - 1];
    double top = Double.NEGATIVE_INFINITY;
    int arg = 0;
    for (int k = 0; k < count(n - 1); k++) {
      double s = score[last + k] + logBigram[stateAt(n - 1, k) * states + boundary];
      if (s > top) {
        top = s;
        arg = k;
      }
    }
    bestLogProbability = top;
    for (int i = n - 1; i >= 0; i--) {
      best[i] = arg;
      arg = backPointer[stateStart[i] + arg];
    }
  }

  private void viterbiSecondOrder(int[] best, int n) {
    double[] emissions = lattice.pairLogEmissions();
    int[] current = lattice.candidateStates();
    int plane = states * states;
    for (int i = 0; i < n; i++) {
      int kpp = count(i - 2);
      if (planeOf.length < kpp) {
        planeOf = new int[kpp];
        column = new double[kpp];
      }
      int kp = count(i - 1);
      int kc = count(i);
      int here = stateStart[i];
      double[] prevScore = i == 0 ? START_SCORE : score;
      int prev = i == 0 ? 0 : stateStart[i - 1];
      int[] first = statesAt(i - 2);
      int fo = statesFrom(i - 2);
      int[] previous = statesAt(i - 1);
      int po = statesFrom(i - 1);
      int co = lattice.candidateOffset(i);
      int emit = lattice.pairOffset(i);
      int stride = lattice.pairStride(i);
      for (int h = 0; h < kpp; h++) {
        planeOf[h] = first[fo + h] * plane;
      }
      for (int j = 0; j < kp; j++) {
        int tj = previous[po + j];
        // the scores of (h, j) for every h, gathered once for all k
        for (int h = 0; h < kpp; h++) {
          column[h] = prevScore[prev + h * kp + j];
        }
        int cell = here + j * kc;
        int emitted = emit + j * stride;
        for (int k = 0; k < kc; k++) {
          // (th * states + tj) * states + tk, with the part that does not depend on h taken out
          int last = tj * states + current[co + k];
          // only the best score here; which h gave it is found again when tracing back, so
          // nothing is stored per comparison
          double top = Double.NEGATIVE_INFINITY;
          for (int h = 0; h < kpp; h++) {
            double s = column[h] + logTrigram[planeOf[h] + last];
            top = s > top ? s : top;
          }
          score[cell + k] = top + emissions[emitted + k];
        }
      }
    }
    int kp = count(n - 2);
    int kc = count(n - 1);
    int last = stateStart[n - 1];
    double top = Double.NEGATIVE_INFINITY;
    int argJ = 0;
    int argK = 0;
    for (int j = 0; j < kp; j++) {
      for (int k = 0; k < kc; k++) {
        double s = score[last + j * kc + k] + logTrigram[(stateAt(n - 2, j) * states + stateAt(n - 1, k)) * states + boundary];
        if (s > top) {
          top = s;
          argJ = j;
          argK = k;
        }
      }
    }
    bestLogProbability = top;
    int j = argJ;
    int k = argK;
    for (int i = n - 1; i >= 0; i--) {
      best[i] = k;
      int h = bestBefore(i, j, k);
      k = j;
      j = h;
    }
  }

  /**
   * The candidate h of position {@code i - 2} on the best path to (j at i - 1, k at i): the first
   * h whose score plus transition equals the best, computed exactly as the forward pass did.
   */
  private int bestBefore(int i, int j, int k) {
    int kpp = count(i - 2);
    if (kpp == 1) {
      return 0;
    }
    int kp = count(i - 1);
    int prev = stateStart[i - 1];
    int last = stateAt(i - 1, j) * states + stateAt(i, k);
    double top = Double.NEGATIVE_INFINITY;
    int arg = 0;
    for (int h = 0; h < kpp; h++) {
      double s = score[prev + h * kp + j] + logTrigram[stateAt(i - 2, h) * states * states + last];
      if (s > top) {
        top = s;
        arg = h;
      }
    }
    return arg;
  }

  /**
   * Computes the posterior probability of every candidate of every token given the whole
   * sequence; read them with {@link #posterior}.
   *
   * @return the log-probability of the token sequence under the model, summed over all taggings
   *     (up to the constant that the unknown-word model leaves out)
   */
  public double forwardBackward() {
    int n = lattice.size();
    if (n == 0) {
      return Math.log(bigram[boundary * states + boundary]);
    }
    layOutStates();
    scaleEmissions(n);
    double logLikelihood = order == 2 ? forwardBackwardSecondOrder(n) : forwardBackwardFirstOrder(n);
    lastLogLikelihood = logLikelihood;
    for (int i = 0; i < n; i++) {
      int base = lattice.candidateOffset(i);
      double sum = 0;
      for (int k = 0; k < count(i); k++) {
        sum += posterior[base + k];
      }
      for (int k = 0; k < count(i); k++) {
        posterior[base + k] /= sum;
      }
    }
    return logLikelihood;
  }

  /** Posterior probability of the {@code k}-th candidate of token {@code position}. */
  public double posterior(int position, int k) {
    return posterior[lattice.candidateOffset(position) + k];
  }

  /**
   * After {@link #forwardBackward}, the read-only view of what it computed that training code
   * (Baum-Welch and latent sub-states, in the model builder) takes its expectations from: the
   * forward weight of cell {@code cell} of {@code position} (the probability of the tokens up to
   * and including it, ending in that cell). A position's cells are its candidates at order 1,
   * and its (previous candidate j, candidate k) pairs at order 2, cell {@code j * K + k} for K
   * candidates. Each weight is scaled by a factor shared by all cells of the position, so forward
   * times backward is proportional to the posterior.
   */
  public double scaledForward(int position, int cell) {
    return alpha[stateStart[position] + cell];
  }

  /** The backward weight of a cell (of the tokens after it, given the cell); see {@link #scaledForward}. */
  public double scaledBackward(int position, int cell) {
    return beta[stateStart[position] + cell];
  }

  /**
   * The sum of the backward weights of {@code position} before they were scaled to sum to 1,
   * for every position but the last: the unscaled backward weight of a cell is this times
   * {@link #scaledBackward}.
   */
  public double backwardSum(int position) {
    return betaSum[position];
  }

  /**
   * {@code exp} of the emission of candidate {@code k} of {@code position} after candidate
   * {@code j} of the position before, minus the largest emission of the position, as
   * forward-backward multiplies it.
   */
  public double scaledEmission(int position, int j, int k) {
    return scaledEmission[lattice.pairOffset(position) + j * lattice.pairStride(position) + k];
  }

  /** The log-likelihood the last {@link #forwardBackward} returned (negative infinity before any). */
  public double lastLogLikelihood() {
    return lastLogLikelihood;
  }

  /**
   * Posterior probability that token {@code position} has the tag of its {@code k}-th
   * candidate: the sum over all its candidate states of that tag.
   */
  public double tagPosterior(int position, int k) {
    int tag = lattice.candidateTag(position, k);
    double p = 0;
    for (int c = 0; c < lattice.candidateCount(position); c++) {
      if (lattice.candidateTag(position, c) == tag) {
        p += posterior(position, c);
      }
    }
    return p;
  }

  /**
   * Writes into {@code out[t]} the posterior probability that token {@code position} has tag t
   * (summed over the states of t; 0 for tags that are not candidates). Allocates nothing.
   *
   * @param out at least as long as the model's tag set
   */
  public void tagPosteriors(int position, double[] out) {
    Arrays.fill(out, 0, model.tags().size(), 0.0);
    for (int c = 0; c < lattice.candidateCount(position); c++) {
      out[lattice.candidateTag(position, c)] += posterior(position, c);
    }
  }

  /** Stores exp(emission - max emission of the token), and the sum of the maxima for the likelihood. */
  private void scaleEmissions(int n) {
    maxEmissionSum = 0;
    double[] pairs = lattice.pairLogEmissions();
    for (int i = 0; i < n; i++) {
      int from = lattice.pairOffset(i);
      int to = lattice.pairOffset(i + 1);
      double max = Double.NEGATIVE_INFINITY;
      for (int p = from; p < to; p++) {
        max = Math.max(max, pairs[p]);
      }
      for (int p = from; p < to; p++) {
        scaledEmission[p] = Math.exp(pairs[p] - max);
      }
      maxEmissionSum += max;
    }
  }

  private double forwardBackwardFirstOrder(int n) {
    double logScale = maxEmissionSum;
    for (int i = 0; i < n; i++) {
      int kp = count(i - 1);
      int here = stateStart[i];
      int prev = i == 0 ? 0 : stateStart[i - 1];
      int emit = lattice.pairOffset(i);
      int stride = lattice.pairStride(i);
      int kc = count(i);
      double sum = 0;
      for (int k = 0; k < kc; k++) {
        int tk = stateAt(i, k);
        double a = 0;
        for (int j = 0; j < kp; j++) {
          a += (i == 0 ? 1 : alpha[prev + j]) * bigram[stateAt(i - 1, j) * states + tk] * scaledEmission[emit + j * stride + k];
        }
        alpha[here + k] = a;
        sum += a;
      }
      logScale += normalize(alpha, here, count(i), sum);
    }
    int last = stateStart[n - 1];
    double end = 0;
    double sum = 0;
    for (int k = 0; k < count(n - 1); k++) {
      double b = bigram[stateAt(n - 1, k) * states + boundary];
      beta[last + k] = b;
      end += alpha[last + k] * b;
      sum += b;
    }
    normalize(beta, last, count(n - 1), sum);
    for (int i = n - 2; i >= 0; i--) {
      int here = stateStart[i];
      int next = stateStart[i + 1];
      int emit = lattice.pairOffset(i + 1);
      int stride = lattice.pairStride(i + 1);
      int kn = count(i + 1);
      sum = 0;
      for (int j = 0; j < count(i); j++) {
        int tj = stateAt(i, j);
        double b = 0;
        for (int k = 0; k < kn; k++) {
          b += bigram[tj * states + stateAt(i + 1, k)] * scaledEmission[emit + j * stride + k] * beta[next + k];
        }
        beta[here + j] = b;
        sum += b;
      }
      betaSum[i] = sum;
      normalize(beta, here, count(i), sum);
    }
    for (int i = 0; i < n; i++) {
      int here = stateStart[i];
      int base = lattice.candidateOffset(i);
      for (int k = 0; k < count(i); k++) {
        posterior[base + k] = alpha[here + k] * beta[here + k];
      }
    }
    return logScale + Math.log(end);
  }

  private double forwardBackwardSecondOrder(int n) {
    double logScale = maxEmissionSum;
    for (int i = 0; i < n; i++) {
      int kpp = count(i - 2);
      int kp = count(i - 1);
      int kc = count(i);
      int here = stateStart[i];
      int prev = i == 0 ? 0 : stateStart[i - 1];
      int emit = lattice.pairOffset(i);
      int stride = lattice.pairStride(i);
      double sum = 0;
      for (int j = 0; j < kp; j++) {
        int tj = stateAt(i - 1, j);
        for (int k = 0; k < kc; k++) {
          int tk = stateAt(i, k);
          double a = 0;
          for (int h = 0; h < kpp; h++) {
            a += (i == 0 ? 1 : alpha[prev + h * kp + j]) * trigram[(stateAt(i - 2, h) * states + tj) * states + tk];
          }
          a *= scaledEmission[emit + j * stride + k];
          alpha[here + j * kc + k] = a;
          sum += a;
        }
      }
      logScale += normalize(alpha, here, kp * kc, sum);
    }
    int kp = count(n - 2);
    int kc = count(n - 1);
    int last = stateStart[n - 1];
    double end = 0;
    double sum = 0;
    for (int j = 0; j < kp; j++) {
      for (int k = 0; k < kc; k++) {
        double b = trigram[(stateAt(n - 2, j) * states + stateAt(n - 1, k)) * states + boundary];
        beta[last + j * kc + k] = b;
        end += alpha[last + j * kc + k] * b;
        sum += b;
      }
    }
    normalize(beta, last, kp * kc, sum);
    for (int i = n - 2; i >= 0; i--) {
      // state (h at i-1, j at i) continues to (j at i, k at i+1)
      int kh = count(i - 1);
      int kj = count(i);
      int kk = count(i + 1);
      int here = stateStart[i];
      int next = stateStart[i + 1];
      int emit = lattice.pairOffset(i + 1);
      int stride = lattice.pairStride(i + 1);
      sum = 0;
      for (int h = 0; h < kh; h++) {
        int th = stateAt(i - 1, h);
        for (int j = 0; j < kj; j++) {
          int base = (th * states + stateAt(i, j)) * states;
          double b = 0;
          for (int k = 0; k < kk; k++) {
            b += trigram[base + stateAt(i + 1, k)] * scaledEmission[emit + j * stride + k] * beta[next + j * kk + k];
          }
          beta[here + h * kj + j] = b;
          sum += b;
        }
      }
      betaSum[i] = sum;
      normalize(beta, here, kh * kj, sum);
    }
    for (int i = 0; i < n; i++) {
      int kpI = count(i - 1);
      int kcI = count(i);
      int here = stateStart[i];
      int base = lattice.candidateOffset(i);
      for (int k = 0; k < kcI; k++) {
        double p = 0;
        for (int j = 0; j < kpI; j++) {
          p += alpha[here + j * kcI + k] * beta[here + j * kcI + k];
        }
        posterior[base + k] = p;
      }
    }
    return logScale + Math.log(end);
  }

  /** Divides {@code values[from..from+count)} by {@code sum}; returns log(sum). */
  private static double normalize(double[] values, int from, int count, double sum) {
    if (sum > 0) {
      double inv = 1.0 / sum;
      for (int i = from; i < from + count; i++) {
        values[i] *= inv;
      }
      return Math.log(sum);
    }
    return Double.NEGATIVE_INFINITY;
  }

  /** Tag indexes of the candidates in {@code best}, for convenience outside hot paths. */
  public int[] tagsOf(int[] best) {
    int[] tags = new int[lattice.size()];
    for (int i = 0; i < tags.length; i++) {
      tags[i] = lattice.candidateTag(i, best[i]);
    }
    return tags;
  }

  /** Grows {@code array} to hold {@code size} entries. */
  public static int[] ensureCapacity(int[] array, int size) {
    return array.length >= size ? array : Arrays.copyOf(array, Math.max(size, array.length * 2));
  }
}
