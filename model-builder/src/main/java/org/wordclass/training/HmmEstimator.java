package org.wordclass.training;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.apache.lucene.util.ArrayUtil;
import org.wordclass.model.HmmModel;
import org.wordclass.model.Lexicon;
import org.wordclass.model.LowerCaseFormCue;
import org.wordclass.model.LowerCaseForms;
import org.wordclass.model.Spelling;
import org.wordclass.model.StateSpace;
import org.wordclass.model.AffixTrie;
import org.wordclass.model.TagSet;
import org.wordclass.model.UnknownWordModel;
import org.wordclass.model.WordShape;

/**
 * Turns {@link TagCounts} into an {@link HmmModel} with the estimates of Brants (2000):
 *
 * <ul>
 *   <li>transitions: maximum-likelihood unigram, bigram and trigram estimates combined by deleted
 *       interpolation, with weights set from the counts themselves (each trigram votes, with its
 *       count, for the estimate that predicts it best when it is left out of the counts); a
 *       context never seen falls back to the next lower order, so no allowed path scores
 *       -Infinity;
 *   <li>emissions of known words: {@code P(w|s) = c(w,s) / c(s)}, and, where enabled, also
 *       conditioned on the previous state (Thede and Harper 1999), smoothed back to {@code P(w|s)};
 *   <li>states: one per tag, or, where enabled, tags split by whether the word was written with
 *       a capital in mid-sentence (Brants 2000);
 *   <li>unknown words: see {@link UnknownWordModel}; the priors their tag probabilities are
 *       divided by, the factors of lower-case forms and the counts of word beginnings are
 *       estimated here as the options say;
 *   <li>where enabled, latent sub-states of every state, fitted by split-merge training (see
 *       {@link LatentStates}).
 * </ul>
 *
 * Deterministic: the same counts and options give the same model, bit for bit.
 */
public final class HmmEstimator {
  private final TrainingOptions options;

  public HmmEstimator(TrainingOptions options) {
    this.options = options;
  }

  /** Estimates a model; {@code provenance} is stored in it, with the options and counts added. */
  public HmmModel estimate(TagCounts counts, Map<String, String> provenance) {
    if (counts.tokens() == 0) {
      throw new IllegalArgumentException("the training corpus holds no tagged word");
    }
    List<String> sorted = new ArrayList<>(counts.tagNames());
    Collections.sort(sorted);
    TagSet tagSet = new TagSet(sorted);
    int tagCount = sorted.size();
    int[] finalId = new int[tagCount + 1]; // provisional tag + 1 (0 = boundary) -> final tag
    finalId[0] = tagCount;
    for (int i = 0; i < tagCount; i++) {
      finalId[i + 1] = tagSet.indexOf(counts.tagNames().get(i));
    }
    StatePlan plan = new StatePlan(counts, finalId, tagCount, options.capitalisationStates());
    int n = plan.size() + 1;
    long cells = (long) n * n * n;
    if (tagCount > TagCounts.MAX_TAGS || cells > ArrayUtil.MAX_ARRAY_LENGTH) {
      throw new IllegalArgumentException(tagCount + " tags in " + plan.size() + " states are more than a model can hold (at most "
          + TagCounts.MAX_TAGS + " tags)");
    }
    double[] tri = new double[(int) cells];
    for (Map.Entry<Long, Long> e : counts.trigrams().entrySet()) {
      long key = e.getKey();
      int a = plan.stateOfKey((int) (key >>> 32));
      int b = plan.stateOfKey((int) ((key >>> 16) & 0xFFFF));
      int c = plan.stateOfKey((int) (key & 0xFFFF));
      tri[(a * n + b) * n + c] += e.getValue();
    }
    Transitions transitions = Transitions.ofTrigrams(tri, n, Transitions.Smoothing.DELETED_INTERPOLATION);

    Map<String, Map<Integer, Integer>> wordTags = counts.wordTags();
    long[] tagTokens = new long[tagCount];
    wordTags.values().forEach(tags -> tags.forEach((tag, count) -> tagTokens[finalId[tag + 1]] += count));
    List<Lexicon.Entry> entries = lexiconEntries(counts, plan, tri, n);
    Lexicon lexicon = new Lexicon(entries);
    UnknownWordModel unknown = unknownWordModel(counts, wordTags, finalId, tagTokens, tagSet, lexicon, plan);
    HmmModel.DecodingCues cues = new HmmModel.DecodingCues(options.lowercaseFirstWord(),
        options.contextEmissions() ? Math.log(1 - contextWeight(0)) : 0, options.lowercaseMidSentenceFirstWord());

    Map<String, String> all = new TreeMap<>(provenance);
    all.putAll(options.describe());
    all.put("counts.sentences", Long.toString(counts.sentences()));
    all.put("counts.tokens", Long.toString(counts.tokens()));
    all.put("smoothing.trigramWeights", transitions.describeTrigramWeights());
    all.put("smoothing.bigramWeights", transitions.describeBigramWeights());
    all.put("smoothing.suffixWeight", Double.toString(unknown.theta()));
    HmmModel model = new HmmModel(options.order(), tagSet, plan.space(), cues, transitions.logBigram(),
        transitions.logTrigram(), lexicon, unknown, all);
    return options.latentRounds() == 0 ? model : withLatentStates(model, counts);
  }

  /** The model refined by split-merge training on the counted sentences. */
  private HmmModel withLatentStates(HmmModel model, TagCounts counts) {
    if (counts.keptSentences() == null) {
      throw new IllegalArgumentException("latent states are trained on the sentences: count them with TagCounts.forOptions");
    }
    return new LatentStates(LatentStates.Settings.DEFAULT, counts.keptSentences()).train(model, options.latentRounds()).model();
  }

  /**
   * Weight of a word's own context-dependent estimate {@code P^(w | s', s)} against its plain
   * emission {@code P(w | s)} when the triple was seen {@code count} times; grows towards 1 with
   * the evidence, as in Thede and Harper (1999) (formula from memory).
   */
  static double contextWeight(long count) {
    double log = Math.log(count + 1);
    return (log + 1) / (log + 2);
  }

  private List<Lexicon.Entry> lexiconEntries(TagCounts counts, StatePlan plan, double[] tri, int n) {
    long[] stateTokens = new long[plan.size()];
    counts.wordStates().values().forEach(states -> states.forEach((raw, count) -> stateTokens[plan.stateOf(raw)] += count));
    double[] contextTokens = new double[n * n]; // c(previous state, state), from the trigram counts
    for (int a = 0; a < n; a++) {
      for (int bc = 0; bc < n * n; bc++) {
        contextTokens[bc] += tri[a * n * n + bc];
      }
    }
    TreeMap<String, Map<Integer, Integer>> byWord = new TreeMap<>(counts.wordStates());
    List<Lexicon.Entry> entries = new ArrayList<>(byWord.size());
    for (Map.Entry<String, Map<Integer, Integer>> word : byWord.entrySet()) {
      TreeMap<Integer, Long> states = new TreeMap<>();
      word.getValue().forEach((raw, count) -> states.merge(plan.stateOf(raw), (long) count, Long::sum));
      dropRareTags(states, plan.space());
      int[] ids = new int[states.size()];
      float[] emissions = new float[states.size()];
      int k = 0;
      for (Map.Entry<Integer, Long> e : states.entrySet()) {
        ids[k] = e.getKey();
        emissions[k] = (float) Math.log((double) e.getValue() / stateTokens[e.getKey()]);
        k++;
      }
      if (options.contextEmissions()) {
        entries.add(withContexts(word.getKey(), ids, emissions, counts.wordContexts().get(word.getKey()), plan,
            contextTokens, n, options.contextMinCount()));
      } else {
        entries.add(new Lexicon.Entry(word.getKey(), ids, emissions));
      }
    }
    return entries;
  }

  /**
   * Removes the states of tags that carry less than the minimum share of the word's occurrences;
   * the word's most frequent tag (each of them, on a tie) is always kept, whatever the share, so
   * that no word is left without a tag.
   */
  private void dropRareTags(TreeMap<Integer, Long> states, StateSpace space) {
    if (options.minTagShare() == 0) {
      return;
    }
    long total = 0;
    long[] perTag = new long[space.tagCount()];
    for (Map.Entry<Integer, Long> e : states.entrySet()) {
      perTag[space.tagOf(e.getKey())] += e.getValue();
      total += e.getValue();
    }
    double floor = Math.min(options.minTagShare() * total, Arrays.stream(perTag).max().getAsLong());
    states.keySet().removeIf(state -> perTag[space.tagOf(state)] < floor);
  }

  /**
   * The entry with {@code P(w | s', s)} for every previous state s' seen at least {@code
   * minCount} times before the word; rarer contexts use the plain emission, which keeps the model
   * small at no measured cost in accuracy.
   */
  private static Lexicon.Entry withContexts(String word, int[] ids, float[] emissions, Map<Integer, Integer> contexts,
      StatePlan plan, double[] contextTokens, int n, int minCount) {
    List<TreeMap<Integer, Long>> perState = new ArrayList<>();
    for (int k = 0; k < ids.length; k++) {
      perState.add(new TreeMap<>());
    }
    contexts.forEach((key, count) -> {
      if (count < minCount) {
        return;
      }
      int previous = plan.stateOfKey(key >>> 16);
      int k = Arrays.binarySearch(ids, plan.stateOfKey(key & 0xFFFF));
      if (k >= 0) { // not a state left out as too rare for the word
        perState.get(k).merge(previous, (long) count, Long::sum);
      }
    });
    int[][] contextStates = new int[ids.length][];
    float[][] contextEmissions = new float[ids.length][];
    for (int k = 0; k < ids.length; k++) {
      TreeMap<Integer, Long> seen = perState.get(k);
      contextStates[k] = new int[seen.size()];
      contextEmissions[k] = new float[seen.size()];
      int j = 0;
      for (Map.Entry<Integer, Long> e : seen.entrySet()) {
        double lambda = contextWeight(e.getValue());
        double own = e.getValue() / contextTokens[e.getKey() * n + ids[k]];
        contextStates[k][j] = e.getKey();
        contextEmissions[k][j] = (float) Math.log(lambda * own + (1 - lambda) * Math.exp(emissions[k]));
        j++;
      }
    }
    return new Lexicon.Entry(word, ids, emissions, contextStates, contextEmissions);
  }

  private UnknownWordModel unknownWordModel(TagCounts counts, Map<String, Map<Integer, Integer>> wordTags, int[] finalId,
      long[] tagTokens, TagSet tagSet, Lexicon lexicon, StatePlan plan) {
    int tagCount = tagSet.size();
    long total = Arrays.stream(tagTokens).sum();
    double[][] priors = unknownWordPriors(counts, finalId, tagTokens, tagCount);
    double[] logPrior = priors[0];
    double[] logPriorCapitalised = priors[1];
    int[] openTags = openTags(wordTags, finalId, tagCount);
    int[] trieOfShape = trieOfShape();
    int trieCount = Arrays.stream(trieOfShape).max().getAsInt() + 1;
    AffixTrie.Builder[] builders = new AffixTrie.Builder[trieCount];
    for (int i = 0; i < trieCount; i++) {
      builders[i] = new AffixTrie.Builder();
    }
    AffixTrie.Builder[] beginningBuilders = {new AffixTrie.Builder(), new AffixTrie.Builder()};
    long[] rareByTag = new long[tagCount];
    TreeMap<String, Map<Integer, Integer>> byWord = new TreeMap<>(wordTags);
    for (Map.Entry<String, Map<Integer, Integer>> word : byWord.entrySet()) {
      int frequency = word.getValue().values().stream().mapToInt(Integer::intValue).sum();
      if (frequency > options.rareWordMaxCount()) {
        continue;
      }
      String w = word.getKey();
      char[] chars = w.toCharArray();
      WordShape shape = WordShape.classify(chars, 0, chars.length);
      AffixTrie.Builder trie = builders[trieOfShape[shape.ordinal()]];
      boolean capitalised = shape.capitalisationOnly() == WordShape.CAPITALISED;
      String beginnings = options.maxPrefixLength() > 0 ? lowerCasedReversed(chars) : null;
      String endings = options.endingAlphabet().fold(w);
      for (Map.Entry<Integer, Integer> e : new TreeMap<>(word.getValue()).entrySet()) {
        int tag = finalId[e.getKey() + 1];
        trie.add(endings, tag, e.getValue(), options.maxSuffixLength());
        if (options.maxPrefixLength() > 0) {
          beginningBuilders[capitalised ? 1 : 0].add(beginnings, tag, e.getValue(), options.maxPrefixLength());
        }
        rareByTag[tag] += e.getValue();
      }
    }
    // the overall tag distribution counts as one extra rare word, so that no open tag has zero mass
    double[] base = new double[openTags.length];
    double mass = 0;
    for (int k = 0; k < openTags.length; k++) {
      base[k] = rareByTag[openTags[k]] + (double) tagTokens[openTags[k]] / total;
      mass += base[k];
    }
    for (int k = 0; k < openTags.length; k++) {
      base[k] /= mass;
    }
    AffixTrie[] tries = new AffixTrie[trieCount];
    for (int i = 0; i < trieCount; i++) {
      tries[i] = builders[i].build();
    }
    UnknownWordModel model = UnknownWordModel.builder().theta(1.0).openTags(openTags, base)
        .logPriors(logPrior, logPriorCapitalised).endings(options.maxSuffixLength(), trieOfShape, tries)
        .endingAlphabet(options.endingAlphabet()).build();
    double theta = switch (options.suffixWeightRule()) {
      case HELD_OUT -> SuffixWeightSelection.choose(model, wordTags, finalId, options.rareWordMaxCount());
      case TAG_SPREAD -> tagProbabilitySpread(tagTokens, total);
      case FIXED -> options.suffixWeight();
    };
    // the cue picks a lower-case form's tag by the priors of the supervised states, which latent
    // sub-states replace: a model with latent states goes without it
    LowerCaseFormCue cue = options.lowerCaseForms() && options.latentRounds() == 0
        ? lowerCaseFormCue(counts, wordTags, finalId, openTags, tagCount, lexicon, plan) : null;
    AffixTrie[] beginningTries = options.maxPrefixLength() > 0
        ? new AffixTrie[] {beginningBuilders[0].build(), beginningBuilders[1].build()} : null;
    return model.toBuilder().theta(theta).lowerCaseForms(cue).beginnings(options.maxPrefixLength(), beginningTries)
        .build();
  }

  /**
   * The word lower-cased character by character and reversed: counted as endings, its endings
   * are the word's beginnings, as {@link UnknownWordModel} reads them.
   */
  static String lowerCasedReversed(char[] chars) {
    char[] out = new char[chars.length];
    for (int i = 0; i < chars.length; i++) {
      out[chars.length - 1 - i] = Spelling.lowerCase(chars[i]);
    }
    return new String(out);
  }

  /**
   * The factors of {@link LowerCaseFormCue}, counted over the rare training words written with a
   * capital: for each tag X, {@code P(t | lower-case form mostly X) / P(t)} among them, where
   * {@code P(t | X)} is smoothed towards {@code P(t)} with the weight of half a word per open tag,
   * so that a tag X seen with few such words keeps factors near 1.
   */
  private LowerCaseFormCue lowerCaseFormCue(TagCounts counts, Map<String, Map<Integer, Integer>> wordTags, int[] finalId,
      int[] openTags, int tagCount, Lexicon lexicon, StatePlan plan) {
    int open = openTags.length;
    long[] stateTokens = new long[plan.size()];
    counts.wordStates().values().forEach(states -> states.forEach((raw, n) -> stateTokens[plan.stateOf(raw)] += n));
    long total = Arrays.stream(stateTokens).sum();
    double[] logStatePrior = new double[plan.size()];
    for (int s = 0; s < plan.size(); s++) {
      logStatePrior[s] = Math.log((double) stateTokens[s] / total);
    }
    LowerCaseForms forms = new LowerCaseForms(lexicon, plan.space(), logStatePrior);
    double[] all = new double[open];
    double[][] byForm = new double[tagCount][open];
    for (Map.Entry<String, Map<Integer, Integer>> word : new TreeMap<>(wordTags).entrySet()) {
      Map<Integer, Integer> tags = word.getValue();
      char[] chars = word.getKey().toCharArray();
      if (tags.values().stream().mapToInt(Integer::intValue).sum() > options.rareWordMaxCount()
          || WordShape.classify(chars, 0, chars.length).capitalisationOnly() != WordShape.CAPITALISED) {
        continue;
      }
      int form = forms.tagOfLowerCased(chars, 0, chars.length);
      for (Map.Entry<Integer, Integer> e : tags.entrySet()) {
        int k = Arrays.binarySearch(openTags, finalId[e.getKey() + 1]);
        if (k >= 0) {
          all[k] += e.getValue();
          if (form >= 0) {
            byForm[form][k] += e.getValue();
          }
        }
      }
    }
    double pseudo = 0.5 * open;
    double allTotal = Arrays.stream(all).sum();
    double[] factors = new double[tagCount * open];
    for (int x = 0; x < tagCount; x++) {
      double rowTotal = Arrays.stream(byForm[x]).sum();
      for (int k = 0; k < open; k++) {
        double p = (all[k] + 0.5) / (allTotal + pseudo);
        double q = (byForm[x][k] + pseudo * p) / (rowTotal + pseudo);
        factors[x * open + k] = q / p;
      }
    }
    return new LowerCaseFormCue(logStatePrior, factors, tagCount, open, lexicon, plan.space());
  }

  /**
   * The log priors an unknown word's tag probability is divided by, for words not written with a
   * capital in mid-sentence ([0]) and for those that are ([1]), as {@link
   * TrainingOptions#unknownWordPrior()} says: the tag's or the state's share of all tokens or of
   * the tokens of rare words. Without capitalisation states a state is a tag, and both are the
   * tag's. A tag never seen in the counted tokens (a closed class among rare words) gets the
   * share of half a token, so that its prior stays finite.
   */
  double[][] unknownWordPriors(TagCounts counts, int[] finalId, long[] tagTokens, int tagCount) {
    TrainingOptions.UnknownWordPrior rule = options.unknownWordPrior();
    boolean rareOnly = rule == TrainingOptions.UnknownWordPrior.RARE_TAG
        || rule == TrainingOptions.UnknownWordPrior.RARE_STATE;
    boolean byState = options.capitalisationStates() && (rule == TrainingOptions.UnknownWordPrior.STATE
        || rule == TrainingOptions.UnknownWordPrior.RARE_STATE
        || rule == TrainingOptions.UnknownWordPrior.LOWER_CASE_STATE);
    boolean capitalisedByTag = rule == TrainingOptions.UnknownWordPrior.LOWER_CASE_STATE;
    long[][] tokens = new long[2][tagCount];
    for (Map<Integer, Integer> states : counts.wordStates().values()) {
      if (rareOnly && states.values().stream().mapToInt(Integer::intValue).sum() > options.rareWordMaxCount()) {
        continue;
      }
      states.forEach((raw, count) -> tokens[byState && TagCounts.isCapitalised(raw) ? 1 : 0]
          [finalId[TagCounts.tagOfRawState(raw) + 1]] += count);
    }
    long total = Arrays.stream(tokens[0]).sum() + Arrays.stream(tokens[1]).sum();
    double[][] logPriors = new double[2][tagCount];
    for (int c = 0; c < 2; c++) {
      for (int t = 0; t < tagCount; t++) {
        long n = !byState ? tokens[0][t] : c == 1 && capitalisedByTag ? tokens[0][t] + tokens[1][t] : tokens[c][t];
        logPriors[c][t] = Math.log(Math.max(n, 0.5) / total);
      }
    }
    return logPriors;
  }

  /**
   * Tags carried by at least the configured share of the words seen exactly once. A share no tag
   * reaches leaves the tag (or tags, on a tie) with the most such words, so that a larger share
   * never gives more open classes than a smaller one.
   */
  private int[] openTags(Map<String, Map<Integer, Integer>> wordTags, int[] finalId, int tagCount) {
    long[] hapaxByTag = new long[tagCount];
    long hapaxes = 0;
    for (Map<Integer, Integer> tags : wordTags.values()) {
      if (tags.size() == 1) {
        Map.Entry<Integer, Integer> only = tags.entrySet().iterator().next();
        if (only.getValue() == 1) {
          hapaxByTag[finalId[only.getKey() + 1]]++;
          hapaxes++;
        }
      }
    }
    double floor = Math.min(options.openClassMinShare() * hapaxes, Arrays.stream(hapaxByTag).max().orElse(0));
    List<Integer> open = new ArrayList<>();
    for (int t = 0; t < tagCount; t++) {
      if (hapaxByTag[t] > 0 && hapaxByTag[t] >= floor) {
        open.add(t);
      }
    }
    if (open.isEmpty()) {
      // no word was seen once (a tiny or artificial corpus): every tag may take unknown words
      for (int t = 0; t < tagCount; t++) {
        open.add(t);
      }
    }
    return open.stream().mapToInt(Integer::intValue).toArray();
  }

  /** Which trie each word shape uses: one per shape, or capitalised versus the rest. */
  private int[] trieOfShape() {
    int[] map = new int[WordShape.values().length];
    for (WordShape shape : WordShape.values()) {
      map[shape.ordinal()] = options.shapeClasses() ? shape.ordinal() : shape.capitalisationOnly().ordinal();
    }
    return map;
  }

  /** Standard deviation of the unconditional tag probabilities, Brants' choice of θ. */
  static double tagProbabilitySpread(long[] tagTokens, long total) {
    int s = tagTokens.length;
    if (s < 2) {
      return 1.0;
    }
    double mean = 1.0 / s;
    double sum = 0;
    for (long n : tagTokens) {
      double p = (double) n / total;
      sum += (p - mean) * (p - mean);
    }
    double theta = Math.sqrt(sum / (s - 1));
    return theta > 0 ? theta : 1.0;
  }
}
