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
 * <p>Where each cell of the trellis lies is {@link Trellis}'s to say: the kernels ask it for a
 * position's first cell and strides ({@code start + j * stride + k}, the same form for cells and
 * emissions) rather than working the layout out themselves.
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
  private final Trellis trellis;

  private double[] score = new double[1024];
  private int[] backPointer = new int[1024];
  private double[] alpha = new double[1024];
  private double[] beta = new double[1024];
  private double[] scaledEmission = new double[256];
  private double[] posterior = new double[256];
  private double[] betaSum = new double[64];
  /**
   * Per predecessor h while a position is decoded (a candidate of the position before at order
   * 1, two before at order 2): the offset of its row or plane in the transition table.
   */
  private int[] planeOf = new int[16];
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
    this.trellis = new Trellis(lattice, order, boundary);
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

  /** Lays out the trellis ({@link Trellis}) and makes the buffers hold its cells. */
  private int layOutStates() {
    int n = lattice.size();
    int total = trellis.layOut();
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
    viterbiOverCells(best, n);
  }

  /** Log joint probability of the sequence found by the last {@link #viterbi} call. */
  public double bestLogProbability() {
    return bestLogProbability;
  }

  /**
   * Viterbi at either order as one first-order kernel over the trellis's cells: at order 1 a cell
   * is a candidate k and its predecessors are the candidates j before it; at order 2 a cell is a
   * pair (j, k) and its predecessors are the pairs (h, j) of the position before, so the same
   * loop runs with the transition read from the trigram table. The emission of a cell follows
   * the predecessor at order 1 (context rows by the previous candidate) and the row j at order 2.
   * Sums are (score + transition) + emission in both cases, as in the kernels it replaces.
   */
  private void viterbiOverCells(int[] best, int n) {
    double[] emissions = lattice.pairLogEmissions();
    int[] current = lattice.candidateStates();
    boolean pairs = order == 2;
    float[] transition = pairs ? logTrigram : logBigram;
    int plane = pairs ? states * states : states;
    for (int i = 0; i < n; i++) {
      // the predecessors of a cell: kh of them, a step of predStep apart in the cells of i - 1
      int back = pairs ? 2 : 1;
      int kh = trellis.count(i - back);
      if (planeOf.length < kh) {
        planeOf = new int[kh];
      }
      int[] first = trellis.statesAt(i - back);
      int fo = trellis.statesFrom(i - back);
      for (int h = 0; h < kh; h++) {
        planeOf[h] = first[fo + h] * plane;
      }
      int rows = pairs ? trellis.count(i - 1) : 1;
      int predStep = pairs ? trellis.stride(i - 1) : 1;
      int[] previous = trellis.statesAt(i - 1);
      int po = trellis.statesFrom(i - 1);
      double[] prevScore = i == 0 ? START_SCORE : score;
      int prev = trellis.start(i - 1);
      int here = trellis.start(i);
      int row = trellis.stride(i);
      int kc = trellis.count(i);
      int co = lattice.candidateOffset(i);
      int emit = trellis.emissionStart(i);
      int stride = trellis.emissionStride(i);
      int emitByPred = pairs ? 0 : stride;
      for (int j = 0; j < rows; j++) {
        int lead = pairs ? previous[po + j] * states : 0;
        int emitted = emit + (pairs ? j * stride : 0);
        int cell = here + j * row;
        for (int k = 0; k < kc; k++) {
          int last = lead + current[co + k];
          double top = Double.NEGATIVE_INFINITY;
          int arg = 0;
          for (int h = 0; h < kh; h++) {
            double s = prevScore[prev + h * predStep + j] + transition[planeOf[h] + last] + emissions[emitted + h * emitByPred + k];
            if (s > top) {
              top = s;
              arg = h;
            }
          }
          score[cell + k] = top;
          backPointer[cell + k] = arg;
        }
      }
    }
    int last = trellis.start(n - 1);
    int lastRows = pairs ? trellis.count(n - 2) : 1;
    int lastRow = trellis.stride(n - 1);
    double top = Double.NEGATIVE_INFINITY;
    int argJ = 0;
    int argK = 0;
    for (int j = 0; j < lastRows; j++) {
      int lead = pairs ? trellis.stateAt(n - 2, j) * states * states : 0;
      for (int k = 0; k < trellis.count(n - 1); k++) {
        double s = score[last + j * lastRow + k] + transition[lead + trellis.stateAt(n - 1, k) * states + boundary];
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
      int h = backPointer[trellis.cell(i, j, k)];
      // at order 2 the predecessor (h, j) becomes the cell (j', k') = (h, j); at order 1 h is k
      if (pairs) {
        k = j;
        j = h;
      } else {
        k = h;
      }
    }
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
      for (int k = 0; k < trellis.count(i); k++) {
        sum += posterior[base + k];
      }
      for (int k = 0; k < trellis.count(i); k++) {
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
    return alpha[trellis.start(position) + cell];
  }

  /** The backward weight of a cell (of the tokens after it, given the cell); see {@link #scaledForward}. */
  public double scaledBackward(int position, int cell) {
    return beta[trellis.start(position) + cell];
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
    return scaledEmission[trellis.emissionStart(position) + j * trellis.emissionStride(position) + k];
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
      int from = trellis.emissionStart(i);
      int to = trellis.emissionStart(i + 1);
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
      int kp = trellis.count(i - 1);
      int here = trellis.start(i);
      int prev = trellis.start(i - 1);
      int emit = trellis.emissionStart(i);
      int stride = trellis.emissionStride(i);
      int kc = trellis.count(i);
      double sum = 0;
      for (int k = 0; k < kc; k++) {
        int tk = trellis.stateAt(i, k);
        double a = 0;
        for (int j = 0; j < kp; j++) {
          a += (i == 0 ? 1 : alpha[prev + j]) * bigram[trellis.stateAt(i - 1, j) * states + tk] * scaledEmission[emit + j * stride + k];
        }
        alpha[here + k] = a;
        sum += a;
      }
      logScale += normalize(alpha, here, trellis.cells(i), sum);
    }
    int last = trellis.start(n - 1);
    double end = 0;
    double sum = 0;
    for (int k = 0; k < trellis.count(n - 1); k++) {
      double b = bigram[trellis.stateAt(n - 1, k) * states + boundary];
      beta[last + k] = b;
      end += alpha[last + k] * b;
      sum += b;
    }
    normalize(beta, last, trellis.cells(n - 1), sum);
    for (int i = n - 2; i >= 0; i--) {
      int here = trellis.start(i);
      int next = trellis.start(i + 1);
      int emit = trellis.emissionStart(i + 1);
      int stride = trellis.emissionStride(i + 1);
      int kn = trellis.count(i + 1);
      sum = 0;
      for (int j = 0; j < trellis.count(i); j++) {
        int tj = trellis.stateAt(i, j);
        double b = 0;
        for (int k = 0; k < kn; k++) {
          b += bigram[tj * states + trellis.stateAt(i + 1, k)] * scaledEmission[emit + j * stride + k] * beta[next + k];
        }
        beta[here + j] = b;
        sum += b;
      }
      betaSum[i] = sum;
      normalize(beta, here, trellis.cells(i), sum);
    }
    for (int i = 0; i < n; i++) {
      int here = trellis.start(i);
      int base = lattice.candidateOffset(i);
      for (int k = 0; k < trellis.count(i); k++) {
        posterior[base + k] = alpha[here + k] * beta[here + k];
      }
    }
    return logScale + Math.log(end);
  }

  private double forwardBackwardSecondOrder(int n) {
    double logScale = maxEmissionSum;
    for (int i = 0; i < n; i++) {
      int kpp = trellis.count(i - 2);
      int kp = trellis.count(i - 1);
      int kc = trellis.count(i);
      int here = trellis.start(i);
      int prev = trellis.start(i - 1);
      int prevRow = trellis.stride(i - 1);
      int row = trellis.stride(i);
      int emit = trellis.emissionStart(i);
      int stride = trellis.emissionStride(i);
      double sum = 0;
      for (int j = 0; j < kp; j++) {
        int tj = trellis.stateAt(i - 1, j);
        for (int k = 0; k < kc; k++) {
          int tk = trellis.stateAt(i, k);
          double a = 0;
          for (int h = 0; h < kpp; h++) {
            a += (i == 0 ? 1 : alpha[prev + h * prevRow + j]) * trigram[(trellis.stateAt(i - 2, h) * states + tj) * states + tk];
          }
          a *= scaledEmission[emit + j * stride + k];
          alpha[here + j * row + k] = a;
          sum += a;
        }
      }
      logScale += normalize(alpha, here, trellis.cells(i), sum);
    }
    int kp = trellis.count(n - 2);
    int kc = trellis.count(n - 1);
    int last = trellis.start(n - 1);
    int lastRow = trellis.stride(n - 1);
    double end = 0;
    double sum = 0;
    for (int j = 0; j < kp; j++) {
      for (int k = 0; k < kc; k++) {
        double b = trigram[(trellis.stateAt(n - 2, j) * states + trellis.stateAt(n - 1, k)) * states + boundary];
        beta[last + j * lastRow + k] = b;
        end += alpha[last + j * lastRow + k] * b;
        sum += b;
      }
    }
    normalize(beta, last, trellis.cells(n - 1), sum);
    for (int i = n - 2; i >= 0; i--) {
      // state (h at i-1, j at i) continues to (j at i, k at i+1)
      int kh = trellis.count(i - 1);
      int kj = trellis.count(i);
      int kk = trellis.count(i + 1);
      int here = trellis.start(i);
      int next = trellis.start(i + 1);
      int row = trellis.stride(i);
      int nextRow = trellis.stride(i + 1);
      int emit = trellis.emissionStart(i + 1);
      int stride = trellis.emissionStride(i + 1);
      sum = 0;
      for (int h = 0; h < kh; h++) {
        int th = trellis.stateAt(i - 1, h);
        for (int j = 0; j < kj; j++) {
          int base = (th * states + trellis.stateAt(i, j)) * states;
          double b = 0;
          for (int k = 0; k < kk; k++) {
            b += trigram[base + trellis.stateAt(i + 1, k)] * scaledEmission[emit + j * stride + k] * beta[next + j * nextRow + k];
          }
          beta[here + h * row + j] = b;
          sum += b;
        }
      }
      betaSum[i] = sum;
      normalize(beta, here, trellis.cells(i), sum);
    }
    for (int i = 0; i < n; i++) {
      int kpI = trellis.count(i - 1);
      int kcI = trellis.count(i);
      int here = trellis.start(i);
      int row = trellis.stride(i);
      int base = lattice.candidateOffset(i);
      for (int k = 0; k < kcI; k++) {
        double p = 0;
        for (int j = 0; j < kpI; j++) {
          p += alpha[here + j * row + k] * beta[here + j * row + k];
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
