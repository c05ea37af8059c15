package org.wordclass.decoding;

import java.util.Arrays;
import org.wordclass.model.HmmModel;
import org.wordclass.model.Lexicon;
import org.wordclass.model.Spelling;
import org.wordclass.model.StateSpace;
import org.wordclass.model.UnknownWordModel;

/**
 * The candidate states of each token of a sequence with their emission log-probabilities: a
 * known word's own states (the lexicon constraint), or the states of the open classes scored by
 * the unknown-word model. Where the model splits classes by capitalisation, only the states that
 * match how the token is written are candidates. Where a word's emission depends on the
 * previous state, the lattice holds one emission per (previous candidate, candidate) pair. Each
 * position also records how its candidates were chosen ({@link #source}) and, for unknown words,
 * the length of the ending the suffix model matched: two stores per token, for explanations.
 *
 * <p>With {@link SentenceBoundaries#DECODED}, a capitalised token after the first also gets the
 * candidates of its first-word reading (the states and emissions it would get first in a
 * sentence: not capitalised, looked up in lower case where a first word is), after its own:
 * candidates {@code k >= openingFrom(i)} open a sentence, and the decoder enters them through the
 * end of the sentence before. Their context emissions are those after the sentence start.
 *
 * <p>Filled token by token from char buffers and reused across sequences, so steady-state
 * decoding allocates nothing. Not thread-safe: one per decoding thread.
 */
public final class Lattice {
  private final HmmModel model;
  private final StateSpace states;
  private final boolean splitsByCapital;
  private final double[] unknownScratch;
  private final double[] unknownScores;
  /** {@link #unknownPlan} for lower-case (0) and capitalised (1) unknown words. */
  private final int[][] unknownPlan;
  private final SentenceBoundaries boundaries;
  private int size;
  /** Number of positions with a first-word reading. */
  private int openings;
  private int[] candidateStart = new int[65];
  private int[] candidateState = new int[256];
  private double[] candidateLogEmission = new double[256];
  private int[] candidateEntry = new int[256];
  private int[] wordId = new int[64];
  private byte[] source = new byte[64];
  private short[] endingLength = new short[64];
  /** Per position, the index of its first candidate that opens a sentence; its candidate count if none. */
  private int[] openingFrom = new int[64];
  /** Per position, the word and source of its first-word reading, where it has one. */
  private int[] openingWordId = new int[64];
  private byte[] openingSource = new byte[64];
  /** Whether the last {@link #lookup} found the word only in lower case. */
  private boolean foundLowerCased;
  /** The word and source of the last {@link #addReading}. */
  private int readingWord;
  private byte readingSource;
  /** The token's own lexicon id (-1: unknown), looked up once for both of its readings. */
  private int ownWord;
  /** Whether {@link #unknownScores} already hold the token's scores: they depend on its characters only, not on its reading. */
  private boolean unknownScored;
  private int[] pairStart = new int[65];
  /** Per position: its number of candidates if its emissions depend on the previous candidate, else 0. */
  private int[] pairStride = new int[64];
  private double[] pairLogEmission = new double[1024];
  private int[] contextRowOf = new int[32];
  private double[] plainOf = new double[32];

  /** A lattice of the sequence's own sentence, as training and most tools decode. */
  public Lattice(HmmModel model) {
    this(model, SentenceBoundaries.TOKENIZER);
  }

  public Lattice(HmmModel model, SentenceBoundaries boundaries) {
    this.model = model;
    this.boundaries = boundaries;
    this.states = model.states();
    this.splitsByCapital = states.uses(StateSpace.CAPITALISED);
    int open = model.unknownWords().openTagCount();
    this.unknownScratch = new double[open];
    this.unknownScores = new double[open];
    this.unknownPlan = new int[][] {unknownPlan(0), unknownPlan(StateSpace.CAPITALISED)};
  }

  public HmmModel model() {
    return model;
  }

  public SentenceBoundaries boundaries() {
    return boundaries;
  }

  /** Empties the lattice, keeping its buffers. */
  public void clear() {
    size = 0;
    openings = 0;
  }

  /** Number of tokens. */
  public int size() {
    return size;
  }

  /** Appends the token {@code buf[off..off+len)}. */
  public void add(char[] buf, int off, int len) {
    add(buf, off, len, -1);
  }

  /**
   * Appends the token {@code buf[off..off+len)} with only the states of {@code tag} as
   * candidates (all its states when {@code tag} is negative): a tagged token whose hidden state
   * within its tag is unknown, as in training with latent sub-states.
   *
   * @throws IllegalArgumentException if the model lets the token take no state of {@code tag}
   */
  public void add(char[] buf, int off, int len, int tag) {
    ensureTokenCapacity(size + 1);
    int start = candidateStart[size];
    endingLength[size] = 0;
    ownWord = model.lexicon().lookup(buf, off, len);
    unknownScored = false;
    int end = addReading(buf, off, len, tag, size == 0, start);
    if (end == start) {
      throw new IllegalArgumentException("'" + new String(buf, off, len) + "' cannot take "
          + (tag < 0 ? "any state of the model" : "tag " + model.tags().name(tag)));
    }
    wordId[size] = readingWord;
    source[size] = readingSource;
    openingFrom[size] = end - start;
    if (boundaries == SentenceBoundaries.DECODED && size > 0 && tag < 0 && Spelling.startsWithCapital(buf, off, len)) {
      end = addReading(buf, off, len, tag, true, end);
      openingWordId[size] = readingWord;
      openingSource[size] = readingSource;
      openings++;
    }
    candidateStart[size + 1] = end;
    size++;
    fillPairEmissions(size - 1);
  }

  /**
   * Appends from {@code start} the candidates of the token read as the first word of a sentence
   * or not; returns the end. Sets {@link #readingWord} and {@link #readingSource}.
   */
  private int addReading(char[] buf, int off, int len, int tag, boolean first, int start) {
    int flags = splitsByCapital && !first && Spelling.startsWithCapital(buf, off, len) ? StateSpace.CAPITALISED : 0;
    int word = lookup(buf, off, len, first);
    readingWord = word;
    readingSource = (byte) sourceOf(word).ordinal();
    return word >= 0 ? addKnown(word, flags, tag, start) : addUnknown(buf, off, len, flags, tag, start);
  }

  /** Appends a token given as a String. */
  public void add(String token) {
    add(token.toCharArray(), 0, token.length());
  }

  /** Appends a token given as a String, restricted to the states of {@code tag}. */
  public void add(String token, int tag) {
    add(token.toCharArray(), 0, token.length(), tag);
  }

  /** Whether {@code state} may be a candidate: of the wanted tag, and written as the token is unless {@code anyCase}. */
  private boolean admits(int state, int tag, int flags, boolean anyCase) {
    return (tag < 0 || states.tagOf(state) == tag) && (anyCase || !splitsByCapital || states.flags(state) == flags);
  }

  private CandidateSource sourceOf(int word) {
    if (word < 0) {
      return CandidateSource.UNKNOWN;
    }
    if (model.lexicon().isUserListed(word)) {
      return CandidateSource.USER_LEXICON;
    }
    return foundLowerCased ? CandidateSource.LOWERCASED_FIRST_WORD : CandidateSource.KNOWN;
  }

  /**
   * The word's id; a capitalised first word missing from the lexicon, or (a cue of its own) known
   * only from mid-sentence, is looked up in lower case, and keeps its own entry if that fails.
   */
  private int lookup(char[] buf, int off, int len, boolean first) {
    Lexicon lexicon = model.lexicon();
    int word = ownWord;
    foundLowerCased = false;
    if (first && Spelling.startsWithCapital(buf, off, len) && lowerCaseFirst(word)) {
      int lower = lexicon.lookupLowerCased(buf, off, len);
      foundLowerCased = lower >= 0;
      word = foundLowerCased ? lower : word;
    }
    return word;
  }

  /** Whether a capitalised first word with this id (-1: unknown) is to be looked up in lower case. */
  private boolean lowerCaseFirst(int word) {
    if (word < 0) {
      return model.cues().lowercaseFirstWord();
    }
    if (!model.cues().lowercaseMidSentenceFirstWord() || !splitsByCapital || model.lexicon().isUserListed(word)) {
      return false; // a user's entry is taken as given
    }
    // training puts every first word in a state "not capitalised": none means never seen first
    for (int k = 0; k < model.lexicon().stateCount(word); k++) {
      if (states.flags(model.lexicon().state(word, k)) == 0) {
        return false;
      }
    }
    return true;
  }

  private int addKnown(int word, int flags, int tag, int start) {
    Lexicon lexicon = model.lexicon();
    int n = lexicon.stateCount(word);
    ensureCandidateCapacity(start + n);
    int end = start;
    for (int pass = 0; pass < 2 && end == start; pass++) {
      // first pass: states that match how the token is written; if none do, all of them
      for (int k = 0; k < n; k++) {
        int state = lexicon.state(word, k);
        if (admits(state, tag, flags, pass == 1)) {
          candidateState[end] = state;
          candidateLogEmission[end] = lexicon.logEmission(word, k);
          candidateEntry[end] = k;
          end++;
        }
      }
    }
    return end;
  }

  private int addUnknown(char[] buf, int off, int len, int flags, int tag, int start) {
    UnknownWordModel unknown = model.unknownWords();
    if (!unknownScored) {
      endingLength[size] = (short) unknown.logEmissions(buf, off, len, unknownScratch, unknownScores);
      unknownScored = true;
    }
    if (tag < 0) {
      int[] plan = unknownPlan[flags == 0 ? 0 : 1];
      int count = plan.length / 2;
      ensureCandidateCapacity(start + count);
      for (int c = 0; c < count; c++) {
        candidateState[start + c] = plan[2 * c];
        candidateLogEmission[start + c] = unknownScores[plan[2 * c + 1]];
        candidateEntry[start + c] = -1;
      }
      return start + count;
    }
    return addUnknownOfTag(flags, tag, start);
  }

  /**
   * The candidate states of an unknown word written with {@code flags}, as (state, open-tag
   * index) pairs: worked out once per lattice, since they depend on nothing else.
   */
  private int[] unknownPlan(int flags) {
    int end = addUnknownOfTag(flags, -1, 0);
    int[] plan = new int[2 * end];
    UnknownWordModel unknown = model.unknownWords();
    for (int c = 0; c < end; c++) {
      plan[2 * c] = candidateState[c];
      plan[2 * c + 1] = unknown.openIndex(states.tagOf(candidateState[c]));
    }
    return plan;
  }

  /** The states of the open tags (of {@code tag} only, unless negative) as candidates from {@code start}; emissions from {@link #unknownScores}. */
  private int addUnknownOfTag(int flags, int tag, int start) {
    UnknownWordModel unknown = model.unknownWords();
    int end = start;
    for (int pass = 0; pass < 2 && end == start; pass++) {
      for (int k = 0; k < unknown.openTagCount(); k++) {
        for (int state : states.statesOf(unknown.openTag(k))) {
          if (admits(state, tag, flags, pass == 1)) {
            ensureCandidateCapacity(end + 1);
            candidateState[end] = state;
            candidateLogEmission[end] = unknownScores[k];
            candidateEntry[end] = -1;
            end++;
          }
        }
      }
    }
    return end;
  }

  /**
   * Emissions of {@code position} for every candidate of the position before it; a single row
   * (stride 0) where they do not depend on it, as for most tokens.
   */
  private void fillPairEmissions(int position) {
    int here = candidateCount(position);
    int from = openingFrom[position];
    boolean contexts = hasContexts(wordId[position]) || from < here && hasContexts(openingWordId[position]);
    int previous = contexts && position > 0 ? candidateCount(position - 1) : 1;
    int start = pairStart[position];
    int end = start + previous * here;
    if (end > pairLogEmission.length) {
      pairLogEmission = Arrays.copyOf(pairLogEmission, Math.max(end, 2 * pairLogEmission.length));
    }
    pairStart[position + 1] = end;
    pairStride[position] = contexts ? here : 0;
    if (!contexts) {
      System.arraycopy(candidateLogEmission, candidateStart[position], pairLogEmission, start, here);
      return;
    }
    prepareContexts(position, here);
    for (int j = 0; j < previous; j++) {
      int previousState = position == 0 ? model.boundary() : candidateState(position - 1, j);
      int row = start + j * here;
      for (int k = 0; k < here; k++) {
        // a first-word reading follows the start of its sentence, whatever stands before it
        int context = contextRowOf[k];
        float c = context < 0 ? Float.NaN : model.lexicon().contextLogEmissionInRow(context, k < from ? previousState : model.boundary());
        pairLogEmission[row + k] = Float.isNaN(c) ? plainOf[k] : c;
      }
    }
  }

  private boolean hasContexts(int word) {
    return word >= 0 && model.lexicon().hasContexts(word);
  }

  /**
   * Per candidate of {@code position}, once rather than per previous candidate: its row of
   * context emissions (-1 if none) and the emission used where the context was not seen, which
   * for a word with contexts carries the model's unseen-context weight.
   */
  private void prepareContexts(int position, int here) {
    if (contextRowOf.length < here) {
      contextRowOf = new int[Math.max(here, 2 * contextRowOf.length)];
      plainOf = new double[contextRowOf.length];
    }
    double unseen = model.cues().unseenContextLogWeight();
    int first = candidateStart[position];
    for (int k = 0; k < here; k++) {
      int word = k < openingFrom[position] ? wordId[position] : openingWordId[position];
      boolean contexts = hasContexts(word);
      contextRowOf[k] = contexts ? model.lexicon().contextRow(word, candidateEntry[first + k]) : -1;
      plainOf[k] = candidateLogEmission[first + k] + (contexts ? unseen : 0);
    }
  }

  /** Number of candidate states of token {@code position}. */
  public int candidateCount(int position) {
    return candidateStart[position + 1] - candidateStart[position];
  }

  /** The {@code k}-th candidate state of token {@code position}. */
  public int candidateState(int position, int k) {
    return candidateState[candidateStart[position] + k];
  }

  /** The tag of the {@code k}-th candidate of token {@code position}. */
  public int candidateTag(int position, int k) {
    return states.tagOf(candidateState(position, k));
  }

  /**
   * Emission log-probability of the {@code k}-th candidate of token {@code position}, regardless
   * of context.
   */
  public double candidateLogEmission(int position, int k) {
    return candidateLogEmission[candidateStart[position] + k];
  }

  /**
   * Emission log-probability of the {@code k}-th candidate of {@code position} after the {@code
   * j}-th candidate of the position before (j = 0 for the first token, after the boundary).
   */
  public double logEmission(int position, int j, int k) {
    return pairLogEmission[pairStart[position] + j * pairStride[position] + k];
  }

  /**
   * Which of its word's lexicon states the {@code k}-th candidate of {@code position} is (its
   * index {@code k'} for {@link org.wordclass.model.Lexicon#state(int, int)}), or -1 for an unknown
   * word. Not always {@code k}: where tags are split by capitalisation, only the states that
   * match how the token is written are candidates.
   */
  public int candidateEntry(int position, int k) {
    return candidateEntry[candidateStart[position] + k];
  }

  /** Whether the token at {@code position} is in the model's lexicon (as read in mid-sentence, where it has a first-word reading too). */
  public boolean isKnown(int position) {
    return wordId[position] >= 0;
  }

  /** Whether the {@code k}-th candidate of {@code position}'s reading is in the model's lexicon. */
  public boolean isKnown(int position, int k) {
    return wordId(position, k) >= 0;
  }

  /** How the candidates of the token at {@code position} were chosen (those of its mid-sentence reading, where it has two). */
  public CandidateSource source(int position) {
    return CandidateSource.of(source[position]);
  }

  /** How the {@code k}-th candidate of {@code position} was chosen: the source of its reading. */
  public CandidateSource source(int position, int k) {
    return CandidateSource.of(opensSentence(position, k) ? openingSource[position] : source[position]);
  }

  /**
   * The index of the first candidate of {@code position} that reads it as the first word of a
   * sentence ({@link SentenceBoundaries#DECODED}); its candidate count if it has no such reading.
   */
  public int openingFrom(int position) {
    return openingFrom[position];
  }

  /** Whether the {@code k}-th candidate of {@code position} opens a sentence. */
  public boolean opensSentence(int position, int k) {
    return k >= openingFrom[position];
  }

  /** Number of positions with a first-word reading, those that may open a sentence. */
  public int openings() {
    return openings;
  }

  /**
   * For an unknown token, the length of the longest ending of it that the suffix model had
   * counts for (0 if none: its shape alone scored it); 0 for other tokens.
   */
  public int matchedEndingLength(int position) {
    return endingLength[position];
  }

  /** Lexicon id of the token at {@code position}, or -1 if it is unknown (its mid-sentence reading, where it has two). */
  public int wordId(int position) {
    return wordId[position];
  }

  /** Lexicon id of the reading of the {@code k}-th candidate of {@code position}, or -1 if unknown. */
  public int wordId(int position, int k) {
    return opensSentence(position, k) ? openingWordId[position] : wordId[position];
  }

  /** First index of the candidates of {@code position} in the flat candidate arrays. */
  int candidateOffset(int position) {
    return candidateStart[position];
  }

  /**
   * How far apart in the flat pair array the emissions of {@code position} after consecutive
   * candidates of the position before are: its candidate count, or 0 where they do not depend on
   * the previous candidate and one row serves all. The emission after candidate j of candidate k
   * is at {@code pairOffset + j * pairStride + k}.
   */
  int pairStride(int position) {
    return pairStride[position];
  }

  /** First index of the emissions of {@code position} in the flat pair array. */
  int pairOffset(int position) {
    return pairStart[position];
  }

  /** The flat candidate states; those of a position start at {@link #candidateOffset}. */
  int[] candidateStates() {
    return candidateState;
  }

  double[] pairLogEmissions() {
    return pairLogEmission;
  }

  /** Total number of candidates over all tokens. */
  public int totalCandidates() {
    return candidateStart[size];
  }

  /** Total number of (previous candidate, candidate) pairs over all tokens. */
  int totalPairs() {
    return pairStart[size];
  }

  private void ensureTokenCapacity(int tokens) {
    if (tokens + 1 > candidateStart.length) {
      int grown = Math.max(tokens + 1, candidateStart.length * 2);
      candidateStart = Arrays.copyOf(candidateStart, grown);
      pairStart = Arrays.copyOf(pairStart, grown);
      pairStride = Arrays.copyOf(pairStride, grown);
      wordId = Arrays.copyOf(wordId, grown);
      source = Arrays.copyOf(source, grown);
      openingFrom = Arrays.copyOf(openingFrom, grown);
      openingWordId = Arrays.copyOf(openingWordId, grown);
      openingSource = Arrays.copyOf(openingSource, grown);
      endingLength = Arrays.copyOf(endingLength, grown);
    }
  }

  private void ensureCandidateCapacity(int candidates) {
    if (candidates > candidateState.length) {
      int grown = Math.max(candidates, candidateState.length * 2);
      candidateState = Arrays.copyOf(candidateState, grown);
      candidateLogEmission = Arrays.copyOf(candidateLogEmission, grown);
      candidateEntry = Arrays.copyOf(candidateEntry, grown);
    }
  }
}
