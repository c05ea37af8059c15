package org.wordclass.training;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.wordclass.model.HmmModel;
import org.wordclass.model.Lexicon;
import org.wordclass.model.SuffixTrie;
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
 *   <li>emissions of known words: {@code P(w|t) = c(w,t) / c(t)};
 *   <li>unknown words: see {@link UnknownWordModel}.
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
    int[] finalId = new int[tagCount + 1]; // provisional state (0 = boundary) -> final state
    finalId[0] = tagCount;
    for (int i = 0; i < tagCount; i++) {
      finalId[i + 1] = tagSet.indexOf(counts.tagNames().get(i));
    }
    int states = tagCount + 1;
    double[] tri = new double[states * states * states];
    for (Map.Entry<Long, Long> e : counts.trigrams().entrySet()) {
      long key = e.getKey();
      int a = finalId[(int) (key >>> 32)];
      int b = finalId[(int) ((key >>> 16) & 0xFFFF)];
      int c = finalId[(int) (key & 0xFFFF)];
      tri[(a * states + b) * states + c] += e.getValue();
    }
    Transitions transitions = Transitions.ofTrigrams(tri, states, Transitions.Smoothing.DELETED_INTERPOLATION);

    long[] tagTokens = new long[tagCount];
    List<Lexicon.Entry> entries = lexiconEntries(counts, finalId, tagTokens);
    UnknownWordModel unknown = unknownWordModel(counts, finalId, tagTokens, tagSet);

    Map<String, String> all = new TreeMap<>(provenance);
    all.putAll(options.describe());
    all.put("counts.sentences", Long.toString(counts.sentences()));
    all.put("counts.tokens", Long.toString(counts.tokens()));
    all.put("smoothing.trigramWeights", transitions.describeTrigramWeights());
    all.put("smoothing.bigramWeights", transitions.describeBigramWeights());
    all.put("smoothing.suffixWeight", Double.toString(unknown.theta()));
    return new HmmModel(options.order(), tagSet, transitions.logBigram(), transitions.logTrigram(),
        new Lexicon(entries), unknown, all);
  }

  private static List<Lexicon.Entry> lexiconEntries(TagCounts counts, int[] finalId, long[] tagTokens) {
    TreeMap<String, Map<Integer, Integer>> byWord = new TreeMap<>(counts.wordTags());
    for (Map<Integer, Integer> tags : byWord.values()) {
      for (Map.Entry<Integer, Integer> e : tags.entrySet()) {
        tagTokens[finalId[e.getKey() + 1]] += e.getValue();
      }
    }
    List<Lexicon.Entry> entries = new ArrayList<>(byWord.size());
    for (Map.Entry<String, Map<Integer, Integer>> word : byWord.entrySet()) {
      TreeMap<Integer, Integer> tags = new TreeMap<>();
      word.getValue().forEach((id, n) -> tags.put(finalId[id + 1], n));
      int[] tagIds = new int[tags.size()];
      float[] emissions = new float[tags.size()];
      int k = 0;
      for (Map.Entry<Integer, Integer> e : tags.entrySet()) {
        tagIds[k] = e.getKey();
        emissions[k] = (float) Math.log((double) e.getValue() / tagTokens[e.getKey()]);
        k++;
      }
      entries.add(new Lexicon.Entry(word.getKey(), tagIds, emissions));
    }
    return entries;
  }

  private UnknownWordModel unknownWordModel(TagCounts counts, int[] finalId, long[] tagTokens, TagSet tagSet) {
    int tagCount = tagSet.size();
    long total = Arrays.stream(tagTokens).sum();
    double[] logPrior = new double[tagCount];
    for (int t = 0; t < tagCount; t++) {
      logPrior[t] = Math.log((double) tagTokens[t] / total);
    }
    int[] openTags = openTags(counts, finalId, tagCount);
    int[] trieOfShape = trieOfShape();
    int trieCount = Arrays.stream(trieOfShape).max().getAsInt() + 1;
    SuffixTrie.Builder[] builders = new SuffixTrie.Builder[trieCount];
    for (int i = 0; i < trieCount; i++) {
      builders[i] = new SuffixTrie.Builder();
    }
    long[] rareByTag = new long[tagCount];
    TreeMap<String, Map<Integer, Integer>> byWord = new TreeMap<>(counts.wordTags());
    for (Map.Entry<String, Map<Integer, Integer>> word : byWord.entrySet()) {
      int frequency = word.getValue().values().stream().mapToInt(Integer::intValue).sum();
      if (frequency > options.rareWordMaxCount()) {
        continue;
      }
      String w = word.getKey();
      char[] chars = w.toCharArray();
      SuffixTrie.Builder trie = builders[trieOfShape[WordShape.classify(chars, 0, chars.length).ordinal()]];
      for (Map.Entry<Integer, Integer> e : new TreeMap<>(word.getValue()).entrySet()) {
        int tag = finalId[e.getKey() + 1];
        trie.add(w, tag, e.getValue(), options.maxSuffixLength());
        rareByTag[tag] += e.getValue();
      }
    }
    double[] base = new double[openTags.length];
    long rareOpen = 0;
    for (int t : openTags) {
      rareOpen += rareByTag[t];
    }
    for (int k = 0; k < openTags.length; k++) {
      base[k] = (double) rareByTag[openTags[k]] / rareOpen;
    }
    SuffixTrie[] tries = new SuffixTrie[trieCount];
    for (int i = 0; i < trieCount; i++) {
      tries[i] = builders[i].build();
    }
    UnknownWordModel model = new UnknownWordModel(1.0, options.maxSuffixLength(), openTags, logPrior, base, trieOfShape, tries);
    double theta = switch (options.suffixWeightRule()) {
      case HELD_OUT -> SuffixWeightSelection.choose(model, counts, finalId, options.rareWordMaxCount());
      case TAG_SPREAD -> tagProbabilitySpread(tagTokens, total);
      case FIXED -> options.suffixWeight();
    };
    return new UnknownWordModel(theta, options.maxSuffixLength(), openTags, logPrior, base, trieOfShape, tries);
  }

  /** Tags carried by at least the configured share of the words seen exactly once. */
  private int[] openTags(TagCounts counts, int[] finalId, int tagCount) {
    long[] hapaxByTag = new long[tagCount];
    long hapaxes = 0;
    for (Map<Integer, Integer> tags : counts.wordTags().values()) {
      if (tags.size() == 1) {
        Map.Entry<Integer, Integer> only = tags.entrySet().iterator().next();
        if (only.getValue() == 1) {
          hapaxByTag[finalId[only.getKey() + 1]]++;
          hapaxes++;
        }
      }
    }
    List<Integer> open = new ArrayList<>();
    int mostFrequent = 0;
    for (int t = 0; t < tagCount; t++) {
      if (hapaxByTag[t] > 0 && hapaxByTag[t] >= options.openClassMinShare() * hapaxes) {
        open.add(t);
      }
      if (hapaxByTag[t] > hapaxByTag[mostFrequent]) {
        mostFrequent = t;
      }
    }
    if (open.isEmpty()) {
      open.add(mostFrequent);
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
