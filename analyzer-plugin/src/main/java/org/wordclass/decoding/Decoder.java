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
 * <p>With {@link SentenceBoundaries#DECODED} the lattice gives capitalised tokens a first-word
 * reading as well, and the kernels decode sentence boundaries with the tags: a transition into a
 * candidate that opens a sentence is the end of the sentence before ({@code </s>} after the
 * history) times the start of a new one ({@code <s>}, or {@code <s> <s>} at order 2, before the
 * candidate), and the history of the token after it begins at the boundary. Viterbi so finds the
 * most probable segmentation and tagging together; a tag's posterior sums both readings. The
 * cost is that of the extra candidates, plus one pass over the candidates per sequence that has
 * them; a lattice without them is decoded exactly as before, bit for bit.
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
  /** {@link #planeOf} for a row whose candidate at the position before opens a sentence: the boundary's plane for every h. */
  private int[] boundaryPlanes = new int[0];
  /** Per candidate, the state a transition into it leads to ({@link Trellis#enteredAt}); filled when the lattice has openings. */
  private int[] entered = new int[256];
  /** Per candidate that opens a sentence, the start of the new sentence before it, as a log-probability and as a probability. */
  private double[] openingLog = new double[256];
  private double[] openingWeight = new double[256];
  private double bestLogProbability;
  private double lastLogLikelihood = Double.NEGATIVE_INFINITY;
  private double maxEmissionSum;

  /** A decoder of the order the model was trained for. */
  public Decoder(HmmModel model) {
    this(model, model.order());
  }

  public Decoder(HmmModel model, int order) {
    this(model, order, SentenceBoundaries.TOKENIZER);
  }

  /** A decoder that finds sentence boundaries inside a sequence as well, if {@code boundaries} says so. */
  public Decoder(HmmModel model, int order, SentenceBoundaries boundaries) {
    if (order != 1 && order != 2) {
      throw new IllegalArgumentException("order must be 1 or 2, not " + order);
    }
    this.model = model;
    this.order = order;
    this.lattice = new Lattice(model, boundaries);
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
    if (lattice.openings() > 0) {
      prepareOpenings(n, candidates);
    }
    return total;
  }

  /** Fills {@link #entered}, {@link #openingLog} and {@link #openingWeight} for the lattice's candidates. */
  private void prepareOpenings(int n, int candidates) {
    if (entered.length < candidates) {
      int grown = Math.max(candidates, entered.length * 2);
      entered = new int[grown];
      openingLog = new double[grown];
      openingWeight = new double[grown];
    }
    System.arraycopy(lattice.candidateStates(), 0, entered, 0, candidates);
    int start = order == 2 ? (boundary * states + boundary) * states : boundary * states;
    for (int i = 1; i < n; i++) {
      int offset = lattice.candidateOffset(i);
      for (int k = lattice.openingFrom(i); k < lattice.candidateCount(i); k++) {
        int state = entered[offset + k];
        entered[offset + k] = boundary;
        openingLog[offset + k] = order == 2 ? logTrigram[start + state] : logBigram[start + state];
        openingWeight[offset + k] = order == 2 ? trigram[start + state] : bigram[start + state];
      }
    }
  }

  /** The boundary's plane in the trigram table, {@code kh} times, for rows after a candidate that opens a sentence. */
  private int[] boundaryPlanes(int kh) {
    if (boundaryPlanes.length < kh) {
      boundaryPlanes = new int[Math.max(kh, 2 * boundaryPlanes.length)];
      Arrays.fill(boundaryPlanes, boundary * states * states);
    }
    return boundaryPlanes;
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
   *
   * <p>A candidate that opens a sentence is entered at the boundary state (the end of the
   * sentence before, {@link #entered}), and the start of its own sentence is added once the best
   * predecessor is found; the rows after such a candidate read the boundary's plane instead of
   * their predecessors' (its history starts at the boundary).
   */
  private void viterbiOverCells(int[] best, int n) {
    double[] emissions = lattice.pairLogEmissions();
    int[] current = lattice.openings() == 0 ? lattice.candidateStates() : entered;
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
      int opensFrom = trellis.openingFrom(i);
      int rowsOpenFrom = pairs ? trellis.openingFrom(i - 1) : rows;
      for (int j = 0; j < rows; j++) {
        int[] planes = j < rowsOpenFrom ? planeOf : boundaryPlanes(kh);
        int lead = pairs ? previous[po + j] * states : 0;
        int emitted = emit + (pairs ? j * stride : 0);
        int cell = here + j * row;
        for (int k = 0; k < kc; k++) {
          int last = lead + current[co + k];
          double top = Double.NEGATIVE_INFINITY;
          int arg = 0;
          for (int h = 0; h < kh; h++) {
            double s = prevScore[prev + h * predStep + j] + transition[planes[h] + last] + emissions[emitted + h * emitByPred + k];
            if (s > top) {
              top = s;
              arg = h;
            }
          }
          score[cell + k] = k < opensFrom ? top : top + openingLog[co + k];
          backPointer[cell + k] = arg;
        }
      }
    }
    int last = trellis.start(n - 1);
    int lastRows = pairs ? trellis.count(n - 2) : 1;
    int lastRow = trellis.stride(n - 1);
    int lastOpensFrom = trellis.openingFrom(n - 1);
    double top = Double.NEGATIVE_INFINITY;
    int argJ = 0;
    int argK = 0;
    for (int j = 0; j < lastRows; j++) {
      for (int k = 0; k < trellis.count(n - 1); k++) {
        // a last candidate that opens a sentence ends a sentence of one token
        int lead = pairs ? (k < lastOpensFrom ? trellis.stateAt(n - 2, j) : boundary) * states * states : 0;
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
      int opensFrom = trellis.openingFrom(i);
      int co = lattice.candidateOffset(i);
      double sum = 0;
      for (int k = 0; k < kc; k++) {
        int tk = trellis.enteredAt(i, k);
        double a = 0;
        for (int j = 0; j < kp; j++) {
          a += (i == 0 ? 1 : alpha[prev + j]) * bigram[trellis.stateAt(i - 1, j) * states + tk] * scaledEmission[emit + j * stride + k];
        }
        if (k >= opensFrom) {
          a *= openingWeight[co + k];
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
      int nextOpensFrom = trellis.openingFrom(i + 1);
      int nextOffset = lattice.candidateOffset(i + 1);
      sum = 0;
      for (int j = 0; j < trellis.count(i); j++) {
        int tj = trellis.stateAt(i, j);
        double b = 0;
        for (int k = 0; k < kn; k++) {
          double t = bigram[tj * states + trellis.enteredAt(i + 1, k)];
          if (k >= nextOpensFrom) {
            t *= openingWeight[nextOffset + k];
          }
          b += t * scaledEmission[emit + j * stride + k] * beta[next + k];
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
      int opensFrom = trellis.openingFrom(i);
      int rowsOpenFrom = trellis.openingFrom(i - 1);
      int co = lattice.candidateOffset(i);
      double sum = 0;
      for (int j = 0; j < kp; j++) {
        int tj = trellis.stateAt(i - 1, j);
        boolean afterOpening = j >= rowsOpenFrom;
        for (int k = 0; k < kc; k++) {
          int tk = trellis.enteredAt(i, k);
          double a = 0;
          for (int h = 0; h < kpp; h++) {
            int th = afterOpening ? boundary : trellis.stateAt(i - 2, h);
            a += (i == 0 ? 1 : alpha[prev + h * prevRow + j]) * trigram[(th * states + tj) * states + tk];
          }
          a *= scaledEmission[emit + j * stride + k];
          if (k >= opensFrom) {
            a *= openingWeight[co + k];
          }
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
    int lastOpensFrom = trellis.openingFrom(n - 1);
    double end = 0;
    double sum = 0;
    for (int j = 0; j < kp; j++) {
      for (int k = 0; k < kc; k++) {
        int tj = k < lastOpensFrom ? trellis.stateAt(n - 2, j) : boundary;
        double b = trigram[(tj * states + trellis.stateAt(n - 1, k)) * states + boundary];
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
      int opensFrom = trellis.openingFrom(i);
      int nextOpensFrom = trellis.openingFrom(i + 1);
      int nextOffset = lattice.candidateOffset(i + 1);
      sum = 0;
      for (int h = 0; h < kh; h++) {
        int th = trellis.stateAt(i - 1, h);
        for (int j = 0; j < kj; j++) {
          int base = ((j < opensFrom ? th : boundary) * states + trellis.stateAt(i, j)) * states;
          double b = 0;
          for (int k = 0; k < kk; k++) {
            double t = trigram[base + trellis.enteredAt(i + 1, k)];
            if (k >= nextOpensFrom) {
              t *= openingWeight[nextOffset + k];
            }
            b += t * scaledEmission[emit + j * stride + k] * beta[next + j * nextRow + k];
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
