package org.wordclass.adaptation;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.wordclass.model.HmmModel;
import org.wordclass.model.Lexicon;
import org.wordclass.model.UnknownWordModel;
import org.wordclass.training.Transitions;

/**
 * The maximisation step: new transitions and known-word emissions from expected counts, each
 * interpolated with the starting model, {@code p = λ p_new + (1 - λ) p_start}.
 *
 * <ul>
 *   <li>Transitions go through the supervised estimator's own {@link Transitions}, with the
 *       expected counts in place of tagged ones. At order 2 both tables come from the expected
 *       trigram counts; at order 1 only the bigram table is re-estimated and the trigram table
 *       stays the starting one (the first-order chain never reads it).
 *   <li>Emissions: {@code P_new(w|t) = E[c(w,t)] / E[c(t)]}, with {@code E[c(t)]} over all tokens,
 *       known or not, as the supervised estimator divides by all tokens of the tag. A known word
 *       absent from the text has no new estimate and keeps its starting emissions. A pair the
 *       starting lexicon lacks has {@code p_start = 0} and is kept only with at least {@link
 *       AdaptationOptions#newPairMinShare} of its word's expected count.
 *   <li>The unknown-word model and the tag set are never changed.
 * </ul>
 */
final class Reestimation {
  private final HmmModel start;
  private final AdaptationOptions options;
  private final double lambda;

  Reestimation(HmmModel start, AdaptationOptions options) {
    this.start = start;
    this.options = options;
    this.lambda = options.newWeight();
  }

  /**
   * The next model from the expectations of the previous one.
   *
   * @param addedWords unknown words to add, with expected counts per open tag, or an empty map
   */
  HmmModel next(ExpectedCounts counts, int order, Map<String, double[]> addedWords) {
    HmmModel counted = counts.model();
    double[] tagTotals = tagTotals(counts, addedWords);
    List<Lexicon.Entry> entries = knownWordEntries(counts, tagTotals);
    entries.addAll(addedWordEntries(addedWords, tagTotals));
    entries.sort((a, b) -> a.word().compareTo(b.word()));
    double[][] tables = transitions(counts.transitions, order);
    return counted.withParameters(tables[0], tables[1], new Lexicon(entries), counted.provenance());
  }

  private double[] tagTotals(ExpectedCounts counts, Map<String, double[]> addedWords) {
    double[] totals = counts.unknownTags.clone();
    Lexicon lexicon = counts.model().lexicon();
    for (int w = 0; w < lexicon.size(); w++) {
      for (int k = 0; k < lexicon.stateCount(w); k++) {
        totals[lexicon.state(w, k)] += counts.pairs[lexicon.pairIndex(w, k)];
      }
    }
    return totals;
  }

  private List<Lexicon.Entry> knownWordEntries(ExpectedCounts counts, double[] tagTotals) {
    Lexicon lexicon = counts.model().lexicon();
    List<Lexicon.Entry> entries = new ArrayList<>(lexicon.size());
    for (int w = 0; w < lexicon.size(); w++) {
      String word = lexicon.word(w);
      int startWord = start.lexicon().lookup(word);
      int n = lexicon.stateCount(w);
      double[] expected = new double[n];
      int[] tags = new int[n];
      for (int k = 0; k < n; k++) {
        tags[k] = lexicon.state(w, k);
        expected[k] = counts.pairs[lexicon.pairIndex(w, k)];
      }
      Lexicon.Entry entry = sum(expected) > 0 ? entry(word, tags, expected, tagTotals, startWord) : startEntry(word, startWord);
      if (entry != null) {
        entries.add(entry);
      }
    }
    return entries;
  }

  /** The starting entry of a word the text does not hold (null if it was not in the starting lexicon). */
  private Lexicon.Entry startEntry(String word, int startWord) {
    return startWord < 0 ? null : entryOf(start.lexicon(), startWord);
  }

  /** One lexicon entry as it is stored. */
  static Lexicon.Entry entryOf(Lexicon lexicon, int word) {
    int n = lexicon.stateCount(word);
    int[] tags = new int[n];
    float[] emissions = new float[n];
    for (int k = 0; k < n; k++) {
      tags[k] = lexicon.state(word, k);
      emissions[k] = lexicon.logEmission(word, k);
    }
    return new Lexicon.Entry(lexicon.word(word), tags, emissions);
  }

  private List<Lexicon.Entry> addedWordEntries(Map<String, double[]> addedWords, double[] tagTotals) {
    // expected counts are kept per state; states no unknown word reached have none and are left out
    int[] states = new int[start.states().size()];
    Arrays.setAll(states, s -> s);
    List<Lexicon.Entry> entries = new ArrayList<>();
    for (Map.Entry<String, double[]> e : new TreeMap<>(addedWords).entrySet()) {
      Lexicon.Entry entry = entry(e.getKey(), states, e.getValue(), tagTotals, -1);
      if (entry != null) {
        entries.add(entry);
      }
    }
    return entries;
  }

  /**
   * Interpolated emissions of one word from its expected tag counts; pairs that end up with no
   * probability, or new pairs below the minimum share, are left out. Null if none is left.
   */
  private Lexicon.Entry entry(String word, int[] tags, double[] expected, double[] tagTotals, int startWord) {
    double total = sum(expected);
    int[] keptTags = new int[tags.length];
    float[] keptEmissions = new float[tags.length];
    int kept = 0;
    for (int k = 0; k < tags.length; k++) {
      double startLog = startLogEmission(startWord, tags[k]);
      boolean newPair = startLog == Double.NEGATIVE_INFINITY;
      if (newPair && expected[k] < options.newPairMinShare() * total) {
        continue;
      }
      double tagTotal = tagTotals[tags[k]];
      double log = mix(tagTotal > 0 ? expected[k] / tagTotal : 0, startLog);
      if (log > Double.NEGATIVE_INFINITY) {
        keptTags[kept] = tags[k];
        keptEmissions[kept] = (float) log;
        kept++;
      }
    }
    if (kept == 0) {
      return null;
    }
    return new Lexicon.Entry(word, Arrays.copyOf(keptTags, kept), Arrays.copyOf(keptEmissions, kept));
  }

  private double startLogEmission(int startWord, int tag) {
    if (startWord < 0) {
      return Double.NEGATIVE_INFINITY;
    }
    Lexicon lexicon = start.lexicon();
    for (int k = 0; k < lexicon.stateCount(startWord); k++) {
      if (lexicon.state(startWord, k) == tag) {
        return lexicon.logEmission(startWord, k);
      }
    }
    return Double.NEGATIVE_INFINITY;
  }

  /** Log of {@code λ p_new + (1 - λ) exp(startLog)}; the ends λ = 0 and 1 are exact. */
  private double mix(double newProbability, double startLog) {
    if (lambda == 0) {
      return startLog;
    }
    if (lambda == 1) {
      return Math.log(newProbability);
    }
    return Math.log(lambda * newProbability + (1 - lambda) * Math.exp(startLog));
  }

  /** {bigram, trigram} log tables, re-estimated and interpolated with the starting ones. */
  private double[][] transitions(double[] expected, int order) {
    int states = start.states().size() + 1;
    Transitions estimate = order == 2
        ? Transitions.ofTrigrams(expected, states, options.smoothing())
        : Transitions.ofBigrams(expected, states, options.smoothing());
    double[] bigram = mixTable(estimate.logBigram(), start.logBigramTable());
    double[] trigram = order == 2 ? mixTable(estimate.logTrigram(), start.logTrigramTable()) : start.logTrigramTable();
    return new double[][] {bigram, trigram};
  }

  private double[] mixTable(double[] newLogs, double[] startLogs) {
    double[] out = new double[newLogs.length];
    for (int i = 0; i < out.length; i++) {
      out[i] = mix(Math.exp(newLogs[i]), startLogs[i]);
    }
    return out;
  }

  private static double sum(double[] values) {
    double s = 0;
    for (double v : values) {
      s += v;
    }
    return s;
  }
}
