package org.wordclass.decoding;

/**
 * The layout of the trellis that {@link Decoder}'s kernels (Viterbi and forward-backward, at
 * order 1 and 2) fill over a {@link Lattice}: the one place that knows where the cell of a
 * position and candidate is, and where the emission of a (previous candidate, candidate) pair
 * is. Every kernel asks it for a position's first cell and strides instead of working them out.
 *
 * <p>Cells of all positions lie one after another in flat arrays (scores, back pointers,
 * forward and backward weights). At order 1 a position has one cell per candidate; at order 2
 * one per (candidate j of the position before, candidate k of this one), row by row:
 *
 * <pre>
 *   cell(i, j, k) = start(i) + j * stride(i) + k      stride(i) = K(i) at order 2, 0 at order 1
 *   emission(i, j, k) = emissionStart(i) + j * emissionStride(i) + k
 * </pre>
 *
 * where {@code K(i)} is the number of candidates of position i, and {@code emissionStride(i)} is
 * K(i) where the token's emissions depend on the previous candidate, else 0 (one row serves
 * all). The virtual positions -1 and -2 before the sentence hold one candidate each, the
 * boundary state, so that the first tokens need no special case. Laying out costs one pass over
 * the positions; the offsets are kept and reused, so steady-state decoding allocates nothing.
 */
final class Trellis {
  private final Lattice lattice;
  private final boolean pairs;
  private final int[] boundaryState;
  private int[] start = new int[65];

  Trellis(Lattice lattice, int order, int boundary) {
    this.lattice = lattice;
    this.pairs = order == 2;
    this.boundaryState = new int[] {boundary};
  }

  /** Lays out the cells of the lattice's tokens as they are now; returns the number of cells. */
  int layOut() {
    int n = lattice.size();
    if (start.length < n + 1) {
      start = new int[Math.max(n + 1, start.length * 2)];
    }
    int total = 0;
    for (int i = 0; i < n; i++) {
      start[i] = total;
      total += pairs ? count(i - 1) * count(i) : count(i);
    }
    start[n] = total;
    return total;
  }

  /** Number of candidates of a position; 1 for the virtual positions before the sentence. */
  int count(int position) {
    return position < 0 ? 1 : lattice.candidateCount(position);
  }

  /** The first cell of {@code position}; 0 for the virtual positions, whose one cell is the start. */
  int start(int position) {
    return position < 0 ? 0 : start[position];
  }

  /** The number of cells of {@code position}: K(i-1) K(i) at order 2, K(i) at order 1. */
  int cells(int position) {
    return start[position + 1] - start[position];
  }

  /** How far apart the rows of {@code position} after consecutive previous candidates are: K at order 2, 0 at order 1. */
  int stride(int position) {
    return pairs ? count(position) : 0;
  }

  /** The cell of candidate {@code k} of {@code position} after candidate {@code j} of the position before (j ignored at order 1). */
  int cell(int position, int j, int k) {
    return start(position) + j * stride(position) + k;
  }

  /** The first index of the emissions of {@code position} in {@link Lattice#pairLogEmissions}. */
  int emissionStart(int position) {
    return lattice.pairOffset(position);
  }

  /** How far apart the emissions of {@code position} after consecutive previous candidates are. */
  int emissionStride(int position) {
    return lattice.pairStride(position);
  }

  /**
   * The array holding the candidate states of {@code position} from {@link #statesFrom}: the
   * lattice's, or the boundary alone for the virtual positions. Inner loops index it directly
   * instead of testing the position per candidate.
   */
  int[] statesAt(int position) {
    return position < 0 ? boundaryState : lattice.candidateStates();
  }

  int statesFrom(int position) {
    return position < 0 ? 0 : lattice.candidateOffset(position);
  }

  /**
   * The first candidate of {@code position} that opens a sentence ({@link Lattice#openingFrom});
   * its candidate count, none, for the virtual positions.
   */
  int openingFrom(int position) {
    return position < 0 ? 1 : lattice.openingFrom(position);
  }

  /**
   * The state a transition into candidate {@code k} of {@code position} leads to: its own, or the
   * boundary for a candidate that opens a sentence (entered through the end of the one before).
   */
  int enteredAt(int position, int k) {
    return k >= openingFrom(position) ? boundaryState[0] : stateAt(position, k);
  }

  /** The state of candidate {@code k}, or the boundary before the sentence. */
  int stateAt(int position, int k) {
    return position < 0 ? boundaryState[0] : lattice.candidateState(position, k);
  }
}
