package org.wordclass.decoding;

import java.util.Arrays;
import org.wordclass.model.HmmModel;
import org.wordclass.model.Lexicon;
import org.wordclass.model.UnknownWordModel;

/**
 * The candidate tags of each token of a sequence with their emission log-probabilities: a known
 * word's own tags (the lexicon constraint), or the open-class tags scored by the unknown-word
 * model. Filled token by token from char buffers and reused across sequences, so steady-state
 * decoding allocates nothing.
 *
 * <p>Not thread-safe: one per decoding thread.
 */
public final class Lattice {
  private final HmmModel model;
  private final double[] unknownScratch;
  private final double[] unknownScores;
  private int size;
  private int[] candidateStart = new int[65];
  private int[] candidateTag = new int[256];
  private double[] candidateLogEmission = new double[256];
  private int[] wordId = new int[64];

  public Lattice(HmmModel model) {
    this.model = model;
    int open = model.unknownWords().openTagCount();
    this.unknownScratch = new double[open];
    this.unknownScores = new double[open];
  }

  public HmmModel model() {
    return model;
  }

  /** Empties the lattice, keeping its buffers. */
  public void clear() {
    size = 0;
  }

  /** Number of tokens. */
  public int size() {
    return size;
  }

  /** Appends the token {@code buf[off..off+len)}. */
  public void add(char[] buf, int off, int len) {
    ensureTokenCapacity(size + 1);
    Lexicon lexicon = model.lexicon();
    int word = lexicon.lookup(buf, off, len);
    wordId[size] = word;
    int start = candidateStart[size];
    if (word >= 0) {
      int n = lexicon.tagCount(word);
      ensureCandidateCapacity(start + n);
      for (int k = 0; k < n; k++) {
        candidateTag[start + k] = lexicon.tag(word, k);
        candidateLogEmission[start + k] = lexicon.logEmission(word, k);
      }
      candidateStart[size + 1] = start + n;
    } else {
      UnknownWordModel unknown = model.unknownWords();
      int n = unknown.openTagCount();
      ensureCandidateCapacity(start + n);
      unknown.logEmissions(buf, off, len, unknownScratch, unknownScores);
      for (int k = 0; k < n; k++) {
        candidateTag[start + k] = unknown.openTag(k);
        candidateLogEmission[start + k] = unknownScores[k];
      }
      candidateStart[size + 1] = start + n;
    }
    size++;
  }

  /** Appends a token given as a String. */
  public void add(String token) {
    add(token.toCharArray(), 0, token.length());
  }

  /** Number of candidate tags of token {@code position}. */
  public int candidateCount(int position) {
    return candidateStart[position + 1] - candidateStart[position];
  }

  /** The {@code k}-th candidate tag of token {@code position}. */
  public int candidateTag(int position, int k) {
    return candidateTag[candidateStart[position] + k];
  }

  /** Emission log-probability of the {@code k}-th candidate of token {@code position}. */
  public double candidateLogEmission(int position, int k) {
    return candidateLogEmission[candidateStart[position] + k];
  }

  /** Whether the token at {@code position} is in the model's lexicon. */
  public boolean isKnown(int position) {
    return wordId[position] >= 0;
  }

  /** Lexicon id of the token at {@code position}, or -1 if it is unknown. */
  public int wordId(int position) {
    return wordId[position];
  }

  /** First index of the candidates of {@code position} in the flat candidate arrays. */
  int candidateOffset(int position) {
    return candidateStart[position];
  }

  int[] candidateTags() {
    return candidateTag;
  }

  double[] candidateLogEmissions() {
    return candidateLogEmission;
  }

  /** Total number of candidates over all tokens. */
  public int totalCandidates() {
    return candidateStart[size];
  }

  private void ensureTokenCapacity(int tokens) {
    if (tokens + 1 > candidateStart.length) {
      int grown = Math.max(tokens + 1, candidateStart.length * 2);
      candidateStart = Arrays.copyOf(candidateStart, grown);
      wordId = Arrays.copyOf(wordId, grown);
    }
  }

  private void ensureCandidateCapacity(int candidates) {
    if (candidates > candidateTag.length) {
      int grown = Math.max(candidates, candidateTag.length * 2);
      candidateTag = Arrays.copyOf(candidateTag, grown);
      candidateLogEmission = Arrays.copyOf(candidateLogEmission, grown);
    }
  }
}
