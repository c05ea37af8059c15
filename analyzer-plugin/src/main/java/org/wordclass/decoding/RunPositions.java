package org.wordclass.decoding;

import java.util.Arrays;

/**
 * Fills a {@link Lattice} from tokens, one position per token, except that a run of tokens
 * written together (a URL, an e-mail address, a path or a date that the tokenizer cut at its
 * slashes, dots and at signs) becomes one position: observed as the run's text as written, the
 * tokens with the gaps between them, and looked up like any word (lexicon, else the unknown-word
 * model on its ending, where {@code .com}, {@code .pdf} or a year are telling). Every token of a
 * run then takes that position's class. Tokens given without a gap are each a position of their
 * own, exactly as if added to the lattice directly.
 *
 * <p>Cost: each token's characters, and its gap, are copied once into a buffer kept for the
 * positions' text (the explanation of an unknown word names its ending); no allocation in steady
 * state. Not thread-safe: one per lattice.
 */
public final class RunPositions {
  private final Lattice lattice;
  private char[] text = new char[256];
  private int textLength;
  /** Per position, where its text starts in {@link #text}; the entry after the last is the end. */
  private int[] textStart = new int[65];
  private int[] positionOf = new int[64];
  private int tokens;
  private int positions;

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
      ensureCapacity(positions + 1);
      textStart[positions++] = textLength;
    } else {
      append(gap, gapOffset, gapLength);
    }
    append(term, offset, length);
    if (tokens == positionOf.length) {
      positionOf = Arrays.copyOf(positionOf, 2 * tokens);
    }
    positionOf[tokens++] = positions - 1;
  }

  /** Adds the last run to the lattice: call after the last token, before decoding. */
  public void finish() {
    flush();
    textStart[positions] = textLength;
  }

  /** Number of tokens added. */
  public int tokens() {
    return tokens;
  }

  /** The lattice position of token {@code token}. */
  public int positionOf(int token) {
    return positionOf[token];
  }

  /** The observed text of {@code position} is {@code text()[textStart(position)..textEnd(position))}. */
  public char[] text() {
    return text;
  }

  public int textStart(int position) {
    return textStart[position];
  }

  public int textEnd(int position) {
    return textStart[position + 1];
  }

  /** Adds the pending run, the positions' last, to the lattice. */
  private void flush() {
    if (lattice.size() < positions) {
      int start = textStart[positions - 1];
      lattice.add(text, start, textLength - start);
    }
  }

  private void append(char[] chars, int offset, int length) {
    if (textLength + length > text.length) {
      text = Arrays.copyOf(text, Math.max(textLength + length, 2 * text.length));
    }
    System.arraycopy(chars, offset, text, textLength, length);
    textLength += length;
  }

  private void ensureCapacity(int positionCount) {
    if (positionCount + 1 > textStart.length) {
      textStart = Arrays.copyOf(textStart, Math.max(positionCount + 1, 2 * textStart.length));
    }
  }
}
