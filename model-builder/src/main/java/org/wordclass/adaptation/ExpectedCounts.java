package org.wordclass.adaptation;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.wordclass.decoding.Decoder;
import org.wordclass.decoding.Lattice;
import org.wordclass.model.HmmModel;
import org.wordclass.model.Lexicon;

/**
 * The expectation step of Baum-Welch for one model over some of the text: expected transition
 * counts, expected counts of each word/tag pair of the lexicon, expected tag counts of unknown
 * tokens, and the log-likelihood of the text. Each worker thread fills its own, and they are
 * merged; memory is one double per transition and per lexicon pair, plus, when unknown words
 * are collected, one small array per distinct unknown word.
 */
final class ExpectedCounts {
  private final HmmModel model;
  final double[] transitions;
  final double[] pairs;
  /** Expected tag counts of all unknown tokens, by tag. */
  final double[] unknownTags;
  /** Per unknown word: expected count of each open tag, then its number of occurrences; null when not collected. */
  final Map<String, double[]> unknownWords;
  double logLikelihood;
  long sentences;
  long tokens;
  /** Sentences the model gives probability zero (left out of every count). */
  long impossible;

  ExpectedCounts(HmmModel model, int order, boolean collectUnknownWords) {
    this.model = model;
    int states = model.states().size() + 1;
    this.transitions = new double[order == 2 ? states * states * states : states * states];
    this.pairs = new double[model.lexicon().pairCount()];
    this.unknownTags = new double[model.states().size()];
    this.unknownWords = collectUnknownWords ? new HashMap<>() : null;
  }

  /** The model whose lexicon {@link #pairs} refers to. */
  HmmModel model() {
    return model;
  }

  /** Runs forward-backward on one sentence with {@code decoder} and adds its expectations. */
  void add(Decoder decoder, List<String> tokens) {
    Lattice lattice = decoder.lattice();
    lattice.clear();
    for (String token : tokens) {
      lattice.add(token);
    }
    if (lattice.size() == 0) {
      return;
    }
    double logLikelihood = decoder.forwardBackward();
    if (logLikelihood == Double.NEGATIVE_INFINITY || Double.isNaN(logLikelihood)) {
      impossible++;
      return;
    }
    this.logLikelihood += logLikelihood;
    sentences++;
    this.tokens += lattice.size();
    ExpectedTransitions.add(decoder, transitions);
    addEmissions(decoder, lattice, tokens);
  }

  private void addEmissions(Decoder decoder, Lattice lattice, List<String> words) {
    Lexicon lexicon = model.lexicon();
    for (int i = 0; i < lattice.size(); i++) {
      int word = lattice.wordId(i);
      int candidates = lattice.candidateCount(i);
      if (word >= 0) {
        for (int k = 0; k < candidates; k++) {
          pairs[lexicon.pairIndex(word, lattice.candidateEntry(i, k))] += decoder.posterior(i, k);
        }
        continue;
      }
      double[] perWord = unknownWords == null ? null
          : unknownWords.computeIfAbsent(words.get(i), w -> new double[unknownTags.length + 1]);
      for (int k = 0; k < candidates; k++) {
        double p = decoder.posterior(i, k);
        int state = lattice.candidateState(i, k);
        unknownTags[state] += p;
        if (perWord != null) {
          perWord[state] += p;
        }
      }
      if (perWord != null) {
        perWord[unknownTags.length]++;
      }
    }
  }

  /** Adds {@code other}'s counts (of the same model) to these. */
  void merge(ExpectedCounts other) {
    addInto(transitions, other.transitions);
    addInto(pairs, other.pairs);
    addInto(unknownTags, other.unknownTags);
    if (unknownWords != null) {
      other.unknownWords.forEach((word, counts) -> unknownWords.merge(word, counts, (a, b) -> {
        addInto(a, b);
        return a;
      }));
    }
    logLikelihood += other.logLikelihood;
    sentences += other.sentences;
    tokens += other.tokens;
    impossible += other.impossible;
  }

  private static void addInto(double[] target, double[] source) {
    for (int i = 0; i < target.length; i++) {
      target[i] += source[i];
    }
  }
}
