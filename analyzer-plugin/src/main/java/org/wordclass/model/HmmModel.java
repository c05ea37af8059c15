package org.wordclass.model;

import java.util.Collections;
import java.util.Map;
import java.util.SortedMap;
import java.util.TreeMap;

/**
 * A hidden Markov model of word classes: the tag set, the lexicon of known words with their
 * emission log-probabilities, an unknown-word model, and transition log-probabilities of both a
 * first-order (bigram) and a second-order (trigram) chain. {@link #order()} is the order the
 * model was trained to be decoded with; both tables are always present, so a decoder may choose.
 *
 * <p>The sentence boundary is the extra state {@link #boundary()} ({@code = tags().size()}): it
 * stands for "before the sentence" in a context and for "end of sentence" as the next state.
 * Tables are flat arrays indexed by {@link #bigramIndex} and {@link #trigramIndex}.
 *
 * <p>Immutable and safe to share between threads; one loaded copy serves every analyzer.
 * Memory: {@code 16 (T+1)^3} bytes for the trigram tables plus the lexicon and the suffix tries.
 */
public final class HmmModel {
  private final int order;
  private final TagSet tags;
  private final double[] logBigram;
  private final double[] logTrigram;
  private final double[] bigram;
  private final double[] trigram;
  private final Lexicon lexicon;
  private final UnknownWordModel unknownWords;
  private final SortedMap<String, String> provenance;

  public HmmModel(
      int order,
      TagSet tags,
      double[] logBigram,
      double[] logTrigram,
      Lexicon lexicon,
      UnknownWordModel unknownWords,
      Map<String, String> provenance) {
    if (order != 1 && order != 2) {
      throw new IllegalArgumentException("order must be 1 or 2, not " + order);
    }
    int states = tags.size() + 1;
    if (logBigram.length != states * states || logTrigram.length != states * states * states) {
      throw new IllegalArgumentException("transition tables do not match a tag set of " + tags.size());
    }
    this.order = order;
    this.tags = tags;
    this.logBigram = logBigram.clone();
    this.logTrigram = logTrigram.clone();
    this.bigram = exp(logBigram);
    this.trigram = exp(logTrigram);
    this.lexicon = lexicon;
    this.unknownWords = unknownWords;
    this.provenance = Collections.unmodifiableSortedMap(new TreeMap<>(provenance));
  }

  private static double[] exp(double[] logs) {
    double[] out = new double[logs.length];
    for (int i = 0; i < logs.length; i++) {
      out[i] = Math.exp(logs[i]);
    }
    return out;
  }

  public int order() {
    return order;
  }

  public TagSet tags() {
    return tags;
  }

  /** The boundary state: before the first and after the last word of a sentence. */
  public int boundary() {
    return tags.size();
  }

  public int bigramIndex(int previous, int next) {
    return previous * (tags.size() + 1) + next;
  }

  public int trigramIndex(int first, int previous, int next) {
    int states = tags.size() + 1;
    return (first * states + previous) * states + next;
  }

  /** {@code log P(next | previous)}. */
  public double logBigram(int previous, int next) {
    return logBigram[bigramIndex(previous, next)];
  }

  /** {@code log P(next | first, previous)}. */
  public double logTrigram(int first, int previous, int next) {
    return logTrigram[trigramIndex(first, previous, next)];
  }

  /** The whole bigram log table; callers must not modify it. */
  public double[] logBigramTable() {
    return logBigram;
  }

  /** The whole trigram log table; callers must not modify it. */
  public double[] logTrigramTable() {
    return logTrigram;
  }

  /** Bigram probabilities (not logs), for forward-backward; callers must not modify it. */
  public double[] bigramTable() {
    return bigram;
  }

  /** Trigram probabilities (not logs), for forward-backward; callers must not modify it. */
  public double[] trigramTable() {
    return trigram;
  }

  public Lexicon lexicon() {
    return lexicon;
  }

  public UnknownWordModel unknownWords() {
    return unknownWords;
  }

  /** Where the model came from: input files and checksums, counts, options, builder version. */
  public SortedMap<String, String> provenance() {
    return provenance;
  }

  /** Approximate heap size in bytes of the loaded model. */
  public long ramBytesUsed() {
    return 16L * (logBigram.length + logTrigram.length)
        + lexicon.ramBytesUsed()
        + unknownWords.ramBytesUsed();
  }
}
