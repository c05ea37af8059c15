package org.wordclass.model;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.apache.lucene.store.DataInput;
import org.apache.lucene.store.DataOutput;

/**
 * The words a model has seen, each with the states it may take and their emission
 * log-probabilities {@code log P(word | state)}; a state is a tag, or a tag split further (by
 * capitalisation or latent sub-states, see {@link StateSpace}). Restricting a known word to its
 * own states (the lexicon constraint) keeps decoding exact and fast.
 *
 * <p>Words live in one {@code char[]} and are found through an open-addressing hash table that
 * is probed straight from a token's char buffer, so a lookup builds no String and allocates
 * nothing. Memory: about 2 bytes per character, 20 to 30 bytes per word (the hash table is kept
 * between three-eighths and three-quarters full), 10 bytes per word/state pair, and 4 bytes per
 * state for each pair with context emissions (one row of {@link #contextLogEmissionInRow}).
 * Words put in by a {@link UserLexicon} are marked ({@link #isUserListed}), so that decoding
 * can say a token's classes were fixed by the user. Immutable and safe to share between threads.
 */
public final class Lexicon {
  /**
   * One word with its states (tags, in a model with one state per tag), sorted ascending, and
   * for each state optionally its emission log-probabilities after particular previous states
   * ({@code contextStates[k]} ascending, {@code contextLogEmissions[k]} beside them).
   */
  public record Entry(String word, int[] states, float[] logEmissions, int[][] contextStates, float[][] contextLogEmissions) {
    private static final int[][] NO_STATES = new int[0][];
    private static final float[][] NO_EMISSIONS = new float[0][];

    public Entry {
      if (states.length == 0 || states.length != logEmissions.length) {
        throw new IllegalArgumentException("word '" + word + "' needs one or more states with one emission each");
      }
      if (contextStates.length != contextLogEmissions.length || (contextStates.length != 0 && contextStates.length != states.length)) {
        throw new IllegalArgumentException("word '" + word + "' has context emissions for some of its states only");
      }
    }

    /** An entry without context-dependent emissions. */
    public Entry(String word, int[] states, float[] logEmissions) {
      this(word, states, logEmissions, NO_STATES, NO_EMISSIONS);
    }

    /** Whether the entry has context-dependent emissions. */
    public boolean hasContexts() {
      return contextStates.length > 0;
    }
  }

  private final char[] chars;
  private final int[] wordStart;
  /**
   * Open addressing, one long per slot: the word's full hash in the high half, so that a probe
   * compares characters only on a likely match, and word id + 1 in the low half (0: empty). One
   * array rather than two, so a probe touches one cache line.
   */
  private final long[] slots;
  private final int[] stateStart;
  private final short[] stateIds;
  private final float[] logEmissions;
  /** Per word/state pair {@code p}: its contexts are {@code contextStart[p] .. contextStart[p+1]}. */
  private final int[] contextStart;
  private final short[] contextState;
  private final float[] contextLogEmission;
  private final boolean[] hasContexts;
  /** Per word: listed by a user lexicon; null when no word is. */
  private final boolean[] userListed;
  /**
   * The context emissions again, as one dense row per word/state pair that has any, indexed by
   * the previous state (NaN where unseen): decoding reads one per (previous, current) candidate
   * pair, and a direct read there costs far less than a binary search. Built at load time.
   */
  private final int[] contextRow;
  private final int contextWidth;
  private final float[] denseContext;

  /** Builds a lexicon; entries must have distinct words. */
  public Lexicon(List<Entry> entries) {
    this(entries, null);
  }

  /**
   * Builds a lexicon whose entry {@code i} came from a user lexicon where {@code userListed[i]};
   * {@code userListed} may be null for none.
   */
  public Lexicon(List<Entry> entries, boolean[] userListed) {
    this(builderOf(entries), userListed);
  }

  private static Builder builderOf(List<Entry> entries) {
    Builder builder = new Builder(entries.size());
    for (Entry e : entries) {
      builder.startWord(e.word(), e.hasContexts());
      for (int k = 0; k < e.states().length; k++) {
        builder.addState(e.states()[k], e.logEmissions()[k]);
        for (int j = 0; e.hasContexts() && j < e.contextStates()[k].length; j++) {
          builder.addContext(e.contextStates()[k][j], e.contextLogEmissions()[k][j]);
        }
      }
    }
    return builder;
  }

  /**
   * Collects a lexicon word by word straight into the flat arrays it is made of, without an
   * object per word: what reading a model file uses, since a cold load would otherwise spend a
   * good part of its time allocating and copying entries. Words must be distinct; each needs
   * one or more states.
   */
  public static final class Builder {
    private char[] chars;
    private int charCount;
    private int[] wordStart;
    private boolean[] hasContexts;
    private int words;
    private int[] stateStart;
    private short[] stateIds;
    private float[] logEmissions;
    private int[] contextStart;
    private int tags;
    private short[] contextState;
    private float[] contextLogEmission;
    private int contexts;
    private String lastWord;

    public Builder(int expectedWords) {
      int n = Math.max(16, expectedWords);
      chars = new char[8 * n];
      wordStart = new int[n + 1];
      stateStart = new int[n + 1];
      hasContexts = new boolean[n];
      stateIds = new short[2 * n];
      logEmissions = new float[2 * n];
      contextStart = new int[2 * n + 1];
      contextState = new short[n];
      contextLogEmission = new float[n];
    }

    /** Begins the next word; its states follow. */
    public void startWord(String word, boolean withContexts) {
      finishWord();
      if (words + 1 >= wordStart.length) {
        int grown = 2 * wordStart.length;
        wordStart = Arrays.copyOf(wordStart, grown);
        stateStart = Arrays.copyOf(stateStart, grown);
        hasContexts = Arrays.copyOf(hasContexts, grown);
      }
      if (charCount + word.length() > chars.length) {
        chars = Arrays.copyOf(chars, Math.max(charCount + word.length(), 2 * chars.length));
      }
      word.getChars(0, word.length(), chars, charCount);
      wordStart[words] = charCount;
      charCount += word.length();
      stateStart[words] = tags;
      hasContexts[words] = withContexts;
      words++;
      lastWord = word;
    }

    /** Adds a state of the current word with its emission log-probability. */
    public void addState(int state, float logEmission) {
      if (words == 0) {
        throw new IllegalStateException("a state before any word");
      }
      if (tags + 1 >= contextStart.length) {
        int grown = 2 * contextStart.length;
        stateIds = Arrays.copyOf(stateIds, grown);
        logEmissions = Arrays.copyOf(logEmissions, grown);
        contextStart = Arrays.copyOf(contextStart, grown);
      }
      stateIds[tags] = (short) state;
      logEmissions[tags] = logEmission;
      contextStart[tags] = contexts;
      tags++;
    }

    /** Adds an emission of the current word's last state after the previous state {@code previous}. */
    public void addContext(int previous, float logEmission) {
      if (tags == 0 || !hasContexts[words - 1] || stateStart[words - 1] == tags) {
        throw new IllegalArgumentException("word '" + lastWord + "' has context emissions for some of its states only");
      }
      if (contexts == contextState.length) {
        contextState = Arrays.copyOf(contextState, 2 * contextState.length);
        contextLogEmission = Arrays.copyOf(contextLogEmission, 2 * contextLogEmission.length);
      }
      contextState[contexts] = (short) previous;
      contextLogEmission[contexts] = logEmission;
      contexts++;
    }

    /** The lexicon of the words added. */
    public Lexicon build() {
      return new Lexicon(this, null);
    }

    private void finishWord() {
      if (words > 0 && stateStart[words - 1] == tags) {
        throw new IllegalArgumentException("word '" + lastWord + "' needs one or more states with one emission each");
      }
    }
  }

  private Lexicon(Builder b, boolean[] userListed) {
    b.finishWord();
    int words = b.words;
    if (userListed != null && userListed.length != words) {
      throw new IllegalArgumentException("one user-listed flag per entry expected");
    }
    this.userListed = userListed == null ? null : userListed.clone();
    chars = Arrays.copyOf(b.chars, b.charCount);
    wordStart = Arrays.copyOf(b.wordStart, words + 1);
    wordStart[words] = b.charCount;
    stateStart = Arrays.copyOf(b.stateStart, words + 1);
    stateStart[words] = b.tags;
    hasContexts = Arrays.copyOf(b.hasContexts, words);
    stateIds = Arrays.copyOf(b.stateIds, b.tags);
    logEmissions = Arrays.copyOf(b.logEmissions, b.tags);
    contextStart = Arrays.copyOf(b.contextStart, b.tags + 1);
    contextState = Arrays.copyOf(b.contextState, b.contexts);
    contextLogEmission = Arrays.copyOf(b.contextLogEmission, b.contexts);
    slots = new long[tableSize(words)];
    for (int w = 0; w < words; w++) {
      insert(w);
    }
    contextStart[b.tags] = b.contexts;
    contextWidth = maxContextState() + 1;
    contextRow = new int[b.tags];
    denseContext = new float[denseRows() * contextWidth];
    fillDenseContexts();
  }

  private int maxContextState() {
    int max = -1;
    for (short s : contextState) {
      max = Math.max(max, s);
    }
    return max;
  }

  /** Numbers the pairs that have contexts, -1 for the others; returns how many have. */
  private int denseRows() {
    int rows = 0;
    for (int p = 0; p < contextRow.length; p++) {
      contextRow[p] = contextStart[p + 1] > contextStart[p] ? contextWidth * rows++ : -1;
    }
    return rows;
  }

  private void fillDenseContexts() {
    Arrays.fill(denseContext, Float.NaN);
    for (int p = 0; p < contextRow.length; p++) {
      for (int x = contextStart[p]; x < contextStart[p + 1]; x++) {
        denseContext[contextRow[p] + contextState[x]] = contextLogEmission[x];
      }
    }
  }

  private static int tableSize(int words) {
    int size = 16;
    while (size < words * 4L / 3) {
      size <<= 1;
    }
    return size;
  }

  private void insert(int word) {
    int start = wordStart[word];
    int len = wordStart[word + 1] - start;
    int mask = slots.length - 1;
    int h = hash(chars, start, len);
    int slot = h & mask;
    long entry;
    while ((entry = slots[slot]) != 0) {
      if ((int) (entry >>> 32) == h && equalsWord((int) entry - 1, chars, start, len)) {
        throw new IllegalArgumentException("duplicate word in lexicon: " + word(word));
      }
      slot = (slot + 1) & mask;
    }
    slots[slot] = ((long) h << 32) | (word + 1);
  }

  private static int hash(char[] buf, int off, int len) {
    int h = 0;
    for (int i = off, end = off + len; i < end; i++) {
      h = 31 * h + buf[i];
    }
    return spread(h);
  }

  /** {@link #hash} of the lower-case form of {@code buf[off..off+len)}, lower-cased on the fly. */
  private static int hashLowerCased(char[] buf, int off, int len) {
    int h = 0;
    for (int i = off, end = off + len; i < end; i++) {
      h = 31 * h + Spelling.lowerCase(buf[i]);
    }
    return spread(h);
  }

  /** The finalisation step of MurmurHash3, so that similar words spread over the table. */
  private static int spread(int h) {
    h ^= h >>> 16;
    h *= 0x85ebca6b;
    h ^= h >>> 13;
    h *= 0xc2b2ae35;
    h ^= h >>> 16;
    return h;
  }

  /**
   * A plain loop: words are short, and profiles showed the setup of the vectorised comparison
   * in Arrays.equals costing more than the comparison itself.
   */
  private boolean equalsWord(int word, char[] buf, int off, int len) {
    int start = wordStart[word];
    if (wordStart[word + 1] - start != len) {
      return false;
    }
    for (int i = 0; i < len; i++) {
      if (chars[start + i] != buf[off + i]) {
        return false;
      }
    }
    return true;
  }

  /** Id of the word {@code buf[off..off+len)}, or -1 if it is not in the lexicon. */
  public int lookup(char[] buf, int off, int len) {
    int mask = slots.length - 1;
    int h = hash(buf, off, len);
    int slot = h & mask;
    long entry;
    while ((entry = slots[slot]) != 0) {
      if ((int) (entry >>> 32) == h && equalsWord((int) entry - 1, buf, off, len)) {
        return (int) entry - 1;
      }
      slot = (slot + 1) & mask;
    }
    return -1;
  }

  /** Id of {@code word}, or -1. */
  public int lookup(String word) {
    return lookup(word.toCharArray(), 0, word.length());
  }

  /**
   * Id of the lower-case form ({@link Spelling#lowerCase(char)}) of {@code buf[off..off+len)},
   * or -1 if that form is not in the lexicon: the same table as {@link #lookup}, hashed and
   * compared lower-casing the token on the fly, so that it allocates and copies nothing. What a
   * capitalised first word and the cue of lower-case forms look words up by.
   */
  public int lookupLowerCased(char[] buf, int off, int len) {
    int mask = slots.length - 1;
    int h = hashLowerCased(buf, off, len);
    int slot = h & mask;
    long entry;
    while ((entry = slots[slot]) != 0) {
      if ((int) (entry >>> 32) == h && equalsLowerCased((int) entry - 1, buf, off, len)) {
        return (int) entry - 1;
      }
      slot = (slot + 1) & mask;
    }
    return -1;
  }

  private boolean equalsLowerCased(int word, char[] buf, int off, int len) {
    int start = wordStart[word];
    if (wordStart[word + 1] - start != len) {
      return false;
    }
    for (int i = 0; i < len; i++) {
      if (chars[start + i] != Spelling.lowerCase(buf[off + i])) {
        return false;
      }
    }
    return true;
  }

  /** Whether word {@code word} is written in lower case (and not empty). */
  public boolean isLowerCase(int word) {
    int start = wordStart[word];
    int len = wordStart[word + 1] - start;
    return len > 0 && Spelling.isLowerCase(chars, start, len);
  }

  public int size() {
    return wordStart.length - 1;
  }

  public String word(int word) {
    return new String(chars, wordStart[word], wordStart[word + 1] - wordStart[word]);
  }

  /** Number of states the word may take (its tags, in a model with one state per tag). */
  public int stateCount(int word) {
    return stateStart[word + 1] - stateStart[word];
  }

  /** The {@code k}-th state of the word, ascending in {@code k}. */
  public int state(int word, int k) {
    return stateIds[stateStart[word] + k];
  }

  /** Emission log-probability of the word in its {@code k}-th state. */
  public float logEmission(int word, int k) {
    return logEmissions[stateStart[word] + k];
  }

  /** Whether the word's classes were set by a user lexicon rather than learnt by the model. */
  public boolean isUserListed(int word) {
    return userListed != null && userListed[word];
  }

  /** Number of words set by a user lexicon. */
  public int userListedCount() {
    int count = 0;
    for (int w = 0; userListed != null && w < userListed.length; w++) {
      count += userListed[w] ? 1 : 0;
    }
    return count;
  }

  /** Whether the word's emissions depend on the previous state. */
  public boolean hasContexts(int word) {
    return hasContexts[word];
  }

  /**
   * Emission log-probability of the word under its {@code k}-th state right after state {@code
   * previous}, or NaN if that context was not seen with the word.
   */
  public float contextLogEmission(int word, int k, int previous) {
    int row = contextRow(word, k);
    return row < 0 ? Float.NaN : contextLogEmissionInRow(row, previous);
  }

  /**
   * The row of context emissions of the word's {@code k}-th state, for {@link
   * #contextLogEmissionInRow}, or -1 if no context was kept for it: a decoder looks it up once
   * per candidate and then reads one value per previous state.
   */
  public int contextRow(int word, int k) {
    return contextRow[stateStart[word] + k];
  }

  /** The emission in {@code row} right after state {@code previous}, or NaN if that context was not seen. */
  public float contextLogEmissionInRow(int row, int previous) {
    return previous < contextWidth ? denseContext[row + previous] : Float.NaN;
  }

  /** Total number of word/context/state triples with their own emission. */
  public int contextCount() {
    return contextState.length;
  }

  /**
   * Position of the word's {@code k}-th state among all {@link #pairCount()} word/state pairs, for
   * tools that keep one number per pair in a flat array (such as expected counts).
   */
  public int pairIndex(int word, int k) {
    return stateStart[word] + k;
  }

  /** Total number of word/state pairs. */
  public int pairCount() {
    return stateIds.length;
  }

  /** The entries in id order, for writing and inspecting. */
  public List<Entry> entries() {
    List<Entry> out = new ArrayList<>(size());
    for (int w = 0; w < size(); w++) {
      int n = stateCount(w);
      int[] states = new int[n];
      float[] emissions = new float[n];
      int[][] contexts = new int[hasContexts[w] ? n : 0][];
      float[][] contextEmissions = new float[hasContexts[w] ? n : 0][];
      for (int k = 0; k < n; k++) {
        states[k] = state(w, k);
        emissions[k] = logEmission(w, k);
        if (hasContexts[w]) {
          int pair = stateStart[w] + k;
          int from = contextStart[pair];
          int to = contextStart[pair + 1];
          contexts[k] = new int[to - from];
          contextEmissions[k] = Arrays.copyOfRange(contextLogEmission, from, to);
          for (int j = from; j < to; j++) {
            contexts[k][j - from] = contextState[j];
          }
        }
      }
      out.add(new Entry(word(w), states, emissions, contexts, contextEmissions));
    }
    return out;
  }

  /**
   * Writes the lexicon in the model file's layout ({@code docs/model-format.md}): per word its
   * string, its states with their emissions and, for a word with context emissions, the
   * previous states and emissions of each.
   */
  void writeTo(DataOutput out) throws IOException {
    out.writeVInt(size());
    for (Entry e : entries()) {
      out.writeString(e.word());
      out.writeVInt(e.states().length);
      out.writeByte((byte) (e.hasContexts() ? 1 : 0));
      for (int k = 0; k < e.states().length; k++) {
        out.writeVInt(e.states()[k]);
        out.writeInt(Float.floatToIntBits(e.logEmissions()[k]));
        if (e.hasContexts()) {
          out.writeVInt(e.contextStates()[k].length);
          for (int j = 0; j < e.contextStates()[k].length; j++) {
            out.writeVInt(e.contextStates()[k][j]);
            out.writeInt(Float.floatToIntBits(e.contextLogEmissions()[k][j]));
          }
        }
      }
    }
  }

  /**
   * Reads a lexicon {@link #writeTo} wrote, straight into the flat arrays ({@link Builder}),
   * checking every declared size against the bytes left before allocating and every state
   * against {@code stateCount} (the boundary allowed as a previous state).
   */
  static Lexicon readFrom(DataInput in, ModelFile.Limits limits, int stateCount) throws IOException {
    int words = limits.count(ModelFile.vInt(in), 4, "lexicon words");
    Builder lexicon = new Builder(words);
    for (int w = 0; w < words; w++) {
      String word = limits.string();
      int n = limits.count(ModelFile.vInt(in), 5, "states of a word");
      boolean contexts = in.readByte() != 0;
      lexicon.startWord(word, contexts);
      for (int k = 0; k < n; k++) {
        lexicon.addState(ModelFile.tagIndex(ModelFile.vInt(in), stateCount), Float.intBitsToFloat(in.readInt()));
        if (contexts) {
          int m = limits.count(ModelFile.vInt(in), 5, "contexts of a word");
          for (int j = 0; j < m; j++) {
            lexicon.addContext(ModelFile.tagIndex(ModelFile.vInt(in), stateCount + 1), Float.intBitsToFloat(in.readInt()));
          }
        }
      }
    }
    return lexicon.build();
  }

  /** Approximate heap size in bytes. */
  public long ramBytesUsed() {
    return 2L * chars.length + 4L * (wordStart.length + 2 * slots.length + stateStart.length) + 10L * stateIds.length
        + 6L * contextState.length + (userListed == null ? 1 : 2) * words() + 4L * (contextRow.length + denseContext.length);
  }

  private int words() {
    return hasContexts.length;
  }
}
