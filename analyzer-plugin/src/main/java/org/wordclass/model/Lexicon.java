package org.wordclass.model;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The words a model has seen, each with the tags it may take and their emission
 * log-probabilities {@code log P(word | tag)}. Restricting a known word to its own tags (the
 * lexicon constraint) keeps decoding exact and fast.
 *
 * <p>Words live in one {@code char[]} and are found through an open-addressing hash table that
 * is probed straight from a token's char buffer, so a lookup builds no String and allocates
 * nothing. Memory: about 2 bytes per character, 12 bytes per word and 6 bytes per word/tag
 * pair. Immutable and safe to share between threads.
 */
public final class Lexicon {
  /** One word with its tags, sorted by tag index. */
  public record Entry(String word, int[] tags, float[] logEmissions) {
    public Entry {
      if (tags.length == 0 || tags.length != logEmissions.length) {
        throw new IllegalArgumentException("word '" + word + "' needs one or more tags with one emission each");
      }
    }
  }

  private final char[] chars;
  private final int[] wordStart;
  private final int[] slots;
  private final int[] tagStart;
  private final short[] tagIds;
  private final float[] logEmissions;

  /** Builds a lexicon; entries must have distinct words. */
  public Lexicon(List<Entry> entries) {
    int words = entries.size();
    wordStart = new int[words + 1];
    tagStart = new int[words + 1];
    int totalChars = 0;
    int totalTags = 0;
    for (Entry e : entries) {
      totalChars += e.word().length();
      totalTags += e.tags().length;
    }
    chars = new char[totalChars];
    tagIds = new short[totalTags];
    logEmissions = new float[totalTags];
    slots = new int[tableSize(words)];
    Arrays.fill(slots, -1);
    int c = 0;
    int t = 0;
    for (int w = 0; w < words; w++) {
      Entry e = entries.get(w);
      wordStart[w] = c;
      e.word().getChars(0, e.word().length(), chars, c);
      c += e.word().length();
      tagStart[w] = t;
      for (int k = 0; k < e.tags().length; k++) {
        tagIds[t] = (short) e.tags()[k];
        logEmissions[t] = e.logEmissions()[k];
        t++;
      }
      wordStart[w + 1] = c;
      tagStart[w + 1] = t;
      insert(w);
    }
  }

  private static int tableSize(int words) {
    int size = 16;
    while (size < words * 2L) {
      size <<= 1;
    }
    return size;
  }

  private void insert(int word) {
    int start = wordStart[word];
    int len = wordStart[word + 1] - start;
    int mask = slots.length - 1;
    int slot = hash(chars, start, len) & mask;
    while (slots[slot] >= 0) {
      if (equalsWord(slots[slot], chars, start, len)) {
        throw new IllegalArgumentException("duplicate word in lexicon: " + word(word));
      }
      slot = (slot + 1) & mask;
    }
    slots[slot] = word;
  }

  private static int hash(char[] buf, int off, int len) {
    int h = 0;
    for (int i = off, end = off + len; i < end; i++) {
      h = 31 * h + buf[i];
    }
    // finalisation step of MurmurHash3, so that similar words spread over the table
    h ^= h >>> 16;
    h *= 0x85ebca6b;
    h ^= h >>> 13;
    h *= 0xc2b2ae35;
    h ^= h >>> 16;
    return h;
  }

  private boolean equalsWord(int word, char[] buf, int off, int len) {
    int start = wordStart[word];
    if (wordStart[word + 1] - start != len) {
      return false;
    }
    return Arrays.equals(chars, start, start + len, buf, off, off + len);
  }

  /** Id of the word {@code buf[off..off+len)}, or -1 if it is not in the lexicon. */
  public int lookup(char[] buf, int off, int len) {
    int mask = slots.length - 1;
    int slot = hash(buf, off, len) & mask;
    int word;
    while ((word = slots[slot]) >= 0) {
      if (equalsWord(word, buf, off, len)) {
        return word;
      }
      slot = (slot + 1) & mask;
    }
    return -1;
  }

  /** Id of {@code word}, or -1. */
  public int lookup(String word) {
    return lookup(word.toCharArray(), 0, word.length());
  }

  public int size() {
    return wordStart.length - 1;
  }

  public String word(int word) {
    return new String(chars, wordStart[word], wordStart[word + 1] - wordStart[word]);
  }

  /** Number of tags the word may take. */
  public int tagCount(int word) {
    return tagStart[word + 1] - tagStart[word];
  }

  /** The {@code k}-th tag of the word. */
  public int tag(int word, int k) {
    return tagIds[tagStart[word] + k];
  }

  /** Emission log-probability of the word under its {@code k}-th tag. */
  public float logEmission(int word, int k) {
    return logEmissions[tagStart[word] + k];
  }

  /**
   * Position of the word's {@code k}-th tag among all {@link #pairCount()} word/tag pairs, for
   * tools that keep one number per pair in a flat array (such as expected counts).
   */
  public int pairIndex(int word, int k) {
    return tagStart[word] + k;
  }

  /** Total number of word/tag pairs. */
  public int pairCount() {
    return tagIds.length;
  }

  /** The entries in id order, for writing and inspecting. */
  public List<Entry> entries() {
    List<Entry> out = new ArrayList<>(size());
    for (int w = 0; w < size(); w++) {
      int n = tagCount(w);
      int[] tags = new int[n];
      float[] emissions = new float[n];
      for (int k = 0; k < n; k++) {
        tags[k] = tag(w, k);
        emissions[k] = logEmission(w, k);
      }
      out.add(new Entry(word(w), tags, emissions));
    }
    return out;
  }

  /** Approximate heap size in bytes. */
  public long ramBytesUsed() {
    return 2L * chars.length + 4L * (wordStart.length + slots.length + tagStart.length) + 6L * tagIds.length;
  }
}
