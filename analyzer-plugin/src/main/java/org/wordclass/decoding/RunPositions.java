package org.wordclass.decoding;

import java.util.Arrays;

/**
 * Fills a {@link Lattice} from tokens, one position per token, except that a run of tokens
 * written together (a URL, an e-mail address, a path or a date that the tokenizer cut at its
 * slashes and at signs) becomes one position: observed as the run's text as written, the tokens
 * with the gaps between them, and looked up like any word (lexicon, else the unknown-word model
 * on its ending, where {@code .com}, {@code .pdf} or a year are telling). Every token of a run
 * then takes that position's class. Tokens given without a gap are each a position of their own,
 * exactly as if added to the lattice directly.
 *
 * <p>Cost: a token on its own is handed to the lattice from the caller's buffer, which must stay
 * unchanged until {@link #finish}; only the tokens and gaps of runs are copied, into a buffer
 * kept for the runs' text (the explanation of an unknown run names its ending). No allocation in
 * steady state. Not thread-safe: one per lattice.
 */
public final class RunPositions {
  private final Lattice lattice;
  /** The text of the runs, one after the other. */
  private char[] text = new char[256];
  private int textLength;
  /** Per position, where its run's text starts in {@link #text}, or -1 for a token on its own. */
  private int[] runStart = new int[64];
  /** Per position, where its run's text ends. */
  private int[] runEnd = new int[64];
  private int[] positionOf = new int[64];
  private int tokens;
  private int positions;
  /** The last position's first token, until it is added to the lattice or copied into a run. */
  private char[] pending;
  private int pendingOffset;
  private int pendingLength;

  public RunPositions(Lattice lattice) {
    this.lattice = lattice;
  }

  public Lattice lattice() {
    return lattice;
  }

  /** Empties the lattice and forgets the tokens. */
  public void clear() {
    lattice.clear();
    tokens = 0;
    positions = 0;
    textLength = 0;
    pending = null;
  }

  /** Adds a token that starts a position of its own. */
  public void add(char[] term, int offset, int length) {
    add(term, offset, length, term, 0, 0);
  }

  /**
   * Adds a token; if its {@code gap} (the characters between it and the previous token) is not
   * empty, it continues the previous token's run, unless it is the first token.
   */
  public void add(char[] term, int offset, int length, char[] gap, int gapOffset, int gapLength) {
    if (gapLength == 0 || tokens == 0) {
      flush();
      if (positions == runStart.length) {
        runStart = Arrays.copyOf(runStart, 2 * positions);
        runEnd = Arrays.copyOf(runEnd, 2 * positions);
      }
      runStart[positions++] = -1;
      pending = term;
      pendingOffset = offset;
      pendingLength = length;
    } else {
      int p = positions - 1;
      if (runStart[p] < 0) {
        runStart[p] = textLength;
        append(pending, pendingOffset, pendingLength);
        pending = null;
      }
      append(gap, gapOffset, gapLength);
      append(term, offset, length);
      runEnd[p] = textLength;
    }
    if (tokens == positionOf.length) {
      positionOf = Arrays.copyOf(positionOf, 2 * tokens);
    }
    positionOf[tokens++] = positions - 1;
  }

  /** Adds the last position to the lattice: call after the last token, before decoding. */
  public void finish() {
    flush();
  }

  /** Number of tokens added. */
  public int tokens() {
    return tokens;
  }

  /** The lattice position of token {@code token}. */
  public int positionOf(int token) {
    return positionOf[token];
  }

  /** Whether {@code position} is a run of several tokens rather than a token on its own. */
  public boolean isRun(int position) {
    return runStart[position] >= 0;
  }

  /** The observed text of a run is {@code text()[runStart(position)..runEnd(position))}. */
  public char[] text() {
    return text;
  }

  public int runStart(int position) {
    return runStart[position];
  }

  public int runEnd(int position) {
    return runEnd[position];
  }

  /** Adds the last position, if not yet added, to the lattice. */
  private void flush() {
    int p = positions - 1;
    if (p < 0 || lattice.size() > p) {
      return;
    }
    if (runStart[p] >= 0) {
      lattice.add(text, runStart[p], runEnd[p] - runStart[p]);
    } else {
      lattice.add(pending, pendingOffset, pendingLength);
      pending = null;
    }
  }

  private void append(char[] chars, int offset, int length) {
    if (textLength + length > text.length) {
      text = Arrays.copyOf(text, Math.max(textLength + length, 2 * text.length));
    }
    System.arraycopy(chars, offset, text, textLength, length);
    textLength += length;
  }
}
