package org.wordclass.model;

import java.util.Arrays;

/**
 * The lower-case words of a lexicon with the most probable tag of each, looked up by a word
 * written in any case: what "Customer" or "CUSTOMER" most often is as "customer". The most
 * probable tag of a word is that of its state {@code s} with the highest {@code P(w|s) P(s)},
 * that is the state it was seen with most often in training.
 *
 * <p>Lower-casing is {@link Spelling#lowerCase(char)} character by character, done on the fly
 * while hashing and comparing, so a lookup allocates nothing. An open-addressing hash table over
 * the lexicon's own characters, built once from the lexicon when a model is loaded (derived data:
 * a model file does not store it). Immutable and safe to share between threads.
 */
public final class LowerCaseForms {
  /** The lexicon's own characters and word starts, shared rather than copied. */
  private final char[] chars;
  private final int[] lexiconStart;
  /** Per held word: its id in the lexicon and its most probable tag. */
  private final int[] wordOf;
  private final int[] tagOf;
  private final int[] slots;
  private final int[] slotHash;

  /**
   * @param lexicon the known words
   * @param states the states the lexicon's entries list
   * @param logStatePrior {@code log P(s)} for every state
   */
  public LowerCaseForms(Lexicon lexicon, StateSpace states, double[] logStatePrior) {
    if (logStatePrior.length != states.size()) {
      throw new IllegalArgumentException("one state prior per state expected, not " + logStatePrior.length);
    }
    this.chars = lexicon.allChars();
    this.lexiconStart = lexicon.wordStarts();
    int[] words = new int[lexicon.size()];
    int[] tags = new int[lexicon.size()];
    int count = 0;
    for (int w = 0; w < lexicon.size(); w++) {
      if (lexiconStart[w + 1] == lexiconStart[w] || !Spelling.isLowerCase(chars, lexiconStart[w], lexiconStart[w + 1] - lexiconStart[w])) {
        continue;
      }
      int best = -1;
      double bestScore = Double.NEGATIVE_INFINITY;
      for (int k = 0; k < lexicon.stateCount(w); k++) {
        int state = lexicon.state(w, k);
        double score = lexicon.logEmission(w, k) + logStatePrior[state];
        if (best < 0 || score > bestScore) {
          best = state;
          bestScore = score;
        }
      }
      words[count] = w;
      tags[count] = states.tagOf(best);
      count++;
    }
    this.wordOf = Arrays.copyOf(words, count);
    this.tagOf = Arrays.copyOf(tags, count);
    int capacity = Integer.highestOneBit(Math.max(2, count) * 2) * 2;
    this.slots = new int[capacity];
    this.slotHash = new int[capacity];
    Arrays.fill(slots, -1);
    for (int i = 0; i < count; i++) {
      int start = lexiconStart[wordOf[i]];
      int h = hash(chars, start, lexiconStart[wordOf[i] + 1] - start);
      int slot = h & (capacity - 1);
      while (slots[slot] >= 0) {
        slot = (slot + 1) & (capacity - 1); // lexicon words are distinct
      }
      slots[slot] = i;
      slotHash[slot] = h;
    }
  }

  /**
   * The most probable tag of the lower-case form of {@code buf[off..off+len)}, or -1 if that
   * form is not a known word.
   */
  public int tagOfLowerCased(char[] buf, int off, int len) {
    int mask = slots.length - 1;
    int h = hash(buf, off, len);
    int slot = h & mask;
    int word;
    while ((word = slots[slot]) >= 0) {
      if (slotHash[slot] == h && equal(word, buf, off, len)) {
        return tagOf[word];
      }
      slot = (slot + 1) & mask;
    }
    return -1;
  }

  /** Number of lower-case words held. */
  public int size() {
    return tagOf.length;
  }

  /** Approximate heap size in bytes. */
  public long ramBytesUsed() {
    return 8L * (wordOf.length + slots.length);
  }

  private boolean equal(int held, char[] buf, int off, int len) {
    int start = lexiconStart[wordOf[held]];
    if (lexiconStart[wordOf[held] + 1] - start != len) {
      return false;
    }
    for (int i = 0; i < len; i++) {
      if (chars[start + i] != Spelling.lowerCase(buf[off + i])) {
        return false;
      }
    }
    return true;
  }

  /** A hash of the lower-cased characters. */
  private static int hash(char[] buf, int off, int len) {
    int h = 0x9747b28c;
    for (int i = off, end = off + len; i < end; i++) {
      h = 31 * h + Spelling.lowerCase(buf[i]);
    }
    h ^= h >>> 16;
    h *= 0x85ebca6b;
    h ^= h >>> 13;
    return h;
  }
}
