package org.wordclass.training;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;
import java.util.TreeMap;
import java.util.stream.IntStream;
import org.wordclass.decoding.Decoder;
import org.wordclass.decoding.Lattice;
import org.wordclass.model.HmmModel;
import org.wordclass.model.Lexicon;

/**
 * Split-merge training of latent sub-states, after Huang, Harper and Petrov (2009) for bigram HMM
 * taggers. A word class often hides sub-types that behave differently (verbs that take an object
 * and verbs that do not); no tag says which, but the tagged corpus does through what follows.
 *
 * <p>Starting from the supervised model's states (a tag, or a tag with the capitalisation bit),
 * each round
 *
 * <ol>
 *   <li>splits every state in two, sharing its counts out with a small seeded random change so
 *       the halves can drift apart, and re-estimates;
 *   <li>runs EM on the tagged corpus, each token restricted to the sub-states of its gold tag
 *       (forward-backward over the restricted lattice, {@link Lattice#add(String, int)});
 *   <li>merges back the share of the splits whose undoing loses least likelihood, estimated per
 *       token from forward and backward weights without decoding again (first-order chain, as
 *       published), then runs EM again.
 * </ol>
 *
 * <p>Estimates: transitions from expected counts through {@link Transitions}; emissions {@code
 * P(w|s) = (1-α) E[c(w,s)]/E[c(s)] + α E[c(w,F)]/E[c(F)]}, smoothed towards the family F of
 * sub-states of the same supervised state, which also keeps every sub-state of a family able to
 * emit the family's words. Context-dependent emissions are not kept: they would be needed per
 * pair of sub-states, and sub-states already carry what the previous word says. Unknown words
 * keep the supervised model: each sub-state of a tag gets the tag's suffix score.
 *
 * <p>Single-threaded and seeded, so the same corpus and settings give the same model, bit for bit.
 */
public final class LatentStates {
  /** Beyond this, state counts and tables grow past what a tagger can use. */
  public static final int MAX_ROUNDS = 4;

  /**
   * @param iterations EM iterations after each split and after each merge
   * @param mergeShare share of the splits of a round that are merged back
   * @param emissionSmoothing α, weight of the family's emission in each sub-state's
   * @param smoothing how transitions are estimated from expected counts
   * @param noise relative change of counts when a state is split
   * @param seed of the random changes
   */
  public record Settings(int iterations, double mergeShare, double emissionSmoothing, Transitions.Smoothing smoothing,
      double noise, long seed) {
    public static final Settings DEFAULT =
        new Settings(8, 0.5, 0.01, Transitions.Smoothing.DELETED_INTERPOLATION, 0.01, 20090806L);
  }

  /** The trained model and the corpus log-likelihood before each M-step, per phase of EM. */
  public record Result(HmmModel model, List<double[]> logLikelihoods) {}

  private final Settings settings;
  private final List<TagCounts.TaggedSentence> corpus;
  private final List<int[]> tagIds = new ArrayList<>();
  private HmmModel supervised;

  public LatentStates(Settings settings, List<TagCounts.TaggedSentence> corpus) {
    this.settings = settings;
    this.corpus = corpus;
  }

  /** Runs {@code rounds} rounds of split-merge training from the supervised model. */
  public Result train(HmmModel start, int rounds) {
    this.supervised = start;
    tagIds.clear();
    for (TagCounts.TaggedSentence s : corpus) {
      tagIds.add(s.tags().stream().mapToInt(start.tags()::indexOf).toArray());
    }
    List<double[]> trace = new ArrayList<>();
    Map<String, String> notes = new TreeMap<>();
    LatentCounts counts = expectations(start, initialCounts(start));
    HmmModel model = estimate(counts, notes);
    Random random = new Random(settings.seed());
    for (int round = 1; round <= rounds; round++) {
      counts = counts.split(random, settings.noise());
      counts = em(estimate(counts, notes), counts, trace);
      counts = counts.merge(chooseMerges(estimate(counts, notes), counts));
      counts = em(estimate(counts, notes), counts, trace);
      notes.put(String.format(Locale.ROOT, "latent.round%d", round), String.format(Locale.ROOT,
          "states %d, word/state pairs %d, log-likelihood %.1f", counts.space.size(), counts.pairCount(),
          counts.logLikelihood));
      model = estimate(counts, notes);
    }
    return new Result(model, trace);
  }

  /** The supervised model's states, one family each, and each word's states in its lexicon. */
  private static LatentCounts initialCounts(HmmModel start) {
    Lexicon lexicon = start.lexicon();
    int[][] wordStates = new int[lexicon.size()][];
    for (int w = 0; w < lexicon.size(); w++) {
      int word = w;
      wordStates[w] = IntStream.range(0, lexicon.stateCount(w)).map(k -> lexicon.state(word, k)).toArray();
    }
    int[] family = IntStream.range(0, start.states().size()).toArray();
    return new LatentCounts(start.states(), family, start.order() + 1, wordStates);
  }

  /** EM iterations; returns the counts under the last model, whose estimate is the next model. */
  private LatentCounts em(HmmModel model, LatentCounts counts, List<double[]> trace) {
    double[] logLikelihoods = new double[settings.iterations()];
    for (int i = 0; i < settings.iterations(); i++) {
      counts = expectations(model, counts.emptyLike());
      logLikelihoods[i] = counts.logLikelihood;
      model = estimate(counts, Map.of());
    }
    trace.add(logLikelihoods);
    return counts;
  }

  /** The E-step over the whole corpus. */
  private LatentCounts expectations(HmmModel model, LatentCounts empty) {
    Decoder decoder = new Decoder(model, empty.arity - 1);
    for (int s = 0; s < corpus.size(); s++) {
      empty.add(decoder, corpus.get(s).words(), tagIds.get(s));
    }
    return empty;
  }

  /** The M-step: a model over the counts' states. */
  HmmModel estimate(LatentCounts counts, Map<String, String> notes) {
    int n = counts.space.size() + 1;
    double[][] tables = transitions(counts, n);
    Map<String, String> provenance = new TreeMap<>(supervised.provenance());
    provenance.putAll(notes);
    provenance.put("latent.states", Integer.toString(counts.space.size()));
    return new HmmModel(supervised.order(), supervised.tags(), counts.space,
        new HmmModel.DecodingCues(supervised.cues().lowercaseFirstWord(), 0,
            supervised.cues().lowercaseMidSentenceFirstWord()), tables[0], tables[1],
        lexicon(counts), supervised.unknownWords(), provenance);
  }

  /** {bigram, trigram} log tables; a first-order model's trigram table repeats the bigram one. */
  private double[][] transitions(LatentCounts counts, int n) {
    if (counts.arity == 3) {
      Transitions t = Transitions.ofTrigrams(counts.transitions, n, settings.smoothing());
      return new double[][] {t.logBigram(), t.logTrigram()};
    }
    double[] bigram = Transitions.ofBigrams(counts.transitions, n, settings.smoothing()).logBigram();
    double[] trigram = new double[LatentCounts.tableCells(n, 3)];
    for (int a = 0; a < n; a++) {
      System.arraycopy(bigram, 0, trigram, a * n * n, n * n);
    }
    return new double[][] {bigram, trigram};
  }

  private Lexicon lexicon(LatentCounts counts) {
    double[] stateTotals = counts.stateTotals();
    double[] familyTotals = new double[supervised.states().size()];
    for (int s = 0; s < stateTotals.length; s++) {
      familyTotals[counts.family[s]] += stateTotals[s];
    }
    double alpha = settings.emissionSmoothing();
    Lexicon words = supervised.lexicon();
    List<Lexicon.Entry> entries = new ArrayList<>(words.size());
    double[] familyCounts = new double[familyTotals.length];
    for (int w = 0; w < counts.wordStates.length; w++) {
      int[] states = counts.wordStates[w];
      double[] expected = counts.emissions[w];
      for (int k = 0; k < states.length; k++) {
        familyCounts[counts.family[states[k]]] += expected[k];
      }
      int[] kept = new int[states.length];
      float[] logs = new float[states.length];
      int m = 0;
      for (int k = 0; k < states.length; k++) {
        int f = counts.family[states[k]];
        double own = stateTotals[states[k]] > 0 ? expected[k] / stateTotals[states[k]] : 0;
        double p = (1 - alpha) * own + alpha * familyCounts[f] / familyTotals[f];
        if (p > 0) {
          kept[m] = states[k];
          logs[m++] = (float) Math.log(p);
        }
      }
      for (int k = 0; k < states.length; k++) {
        familyCounts[counts.family[states[k]]] = 0;
      }
      entries.add(new Lexicon.Entry(words.word(w), Arrays.copyOf(kept, m), Arrays.copyOf(logs, m)));
    }
    return new Lexicon(entries);
  }

  /**
   * Which of the last round's splits (states 2p and 2p + 1) to undo: those whose merging loses
   * least likelihood, {@link Settings#mergeShare} of them.
   */
  private boolean[] chooseMerges(HmmModel model, LatentCounts counts) {
    double[] loss = mergeLosses(model, counts);
    Integer[] order = new Integer[loss.length];
    Arrays.setAll(order, p -> p);
    Arrays.sort(order, Comparator.comparingDouble((Integer p) -> loss[p]).thenComparingInt(p -> p));
    boolean[] merge = new boolean[loss.length];
    for (int i = 0; i < (int) Math.floor(settings.mergeShare() * loss.length); i++) {
      merge[order[i]] = true;
    }
    return merge;
  }

  /**
   * Approximate log-likelihood lost by merging each pair of sibling states, summed over tokens.
   * At one token, merging siblings 1 and 2 (of relative frequencies p1, p2) replaces their share
   * {@code f1 b1 + f2 b2} of the likelihood by {@code (f1 + f2)(p1 b1 + p2 b2)}, where f is the
   * weight of reaching the state (forward weight without the emission) and b the weight of
   * emitting the word and going on (backward weight with it); all other tokens are left as they
   * are. Computed on the first-order chain, where forward and backward weights are per state.
   */
  private double[] mergeLosses(HmmModel model, LatentCounts counts) {
    double[] totals = counts.stateTotals();
    double[] loss = new double[counts.space.size() / 2];
    Decoder decoder = new Decoder(model, 1);
    Lattice lattice = decoder.lattice();
    for (int s = 0; s < corpus.size(); s++) {
      lattice.clear();
      int[] tags = tagIds.get(s);
      for (int i = 0; i < tags.length; i++) {
        lattice.add(corpus.get(s).words().get(i), tags[i]);
      }
      decoder.forwardBackward();
      for (int i = 0; i < lattice.size(); i++) {
        addMergeLosses(decoder, lattice, i, totals, loss);
      }
    }
    return loss;
  }

  private static void addMergeLosses(Decoder decoder, Lattice lattice, int i, double[] totals, double[] loss) {
    int candidates = lattice.candidateCount(i);
    double total = 0;
    double maxLog = Double.NEGATIVE_INFINITY;
    for (int k = 0; k < candidates; k++) {
      total += decoder.scaledForward(i, k) * decoder.scaledBackward(i, k);
      maxLog = Math.max(maxLog, lattice.candidateLogEmission(i, k));
    }
    for (int k = 0; k + 1 < candidates; k++) {
      int state = lattice.candidateState(i, k);
      if (state % 2 != 0 || lattice.candidateState(i, k + 1) != state + 1) {
        continue;
      }
      double e1 = Math.exp(lattice.candidateLogEmission(i, k) - maxLog);
      double e2 = Math.exp(lattice.candidateLogEmission(i, k + 1) - maxLog);
      double both = totals[state] + totals[state + 1];
      if (e1 == 0 || e2 == 0 || both == 0) {
        continue; // a sibling too unlikely here to change anything by merging
      }
      double a1 = decoder.scaledForward(i, k);
      double a2 = decoder.scaledForward(i, k + 1);
      double b1 = decoder.scaledBackward(i, k);
      double b2 = decoder.scaledBackward(i, k + 1);
      double p1 = totals[state] / both;
      double merged = total - a1 * b1 - a2 * b2 + (a1 / e1 + a2 / e2) * (p1 * e1 * b1 + (1 - p1) * e2 * b2);
      loss[state / 2] += Math.log(total) - Math.log(merged);
    }
  }
}
