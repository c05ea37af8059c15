package org.wordclass.adaptation;

import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.SortedSet;
import java.util.TreeMap;
import java.util.TreeSet;
import org.wordclass.corpus.Sentence;
import org.wordclass.model.HmmModel;
import org.wordclass.training.HmmEstimator;
import org.wordclass.training.TagCounts;
import org.wordclass.training.TrainingOptions;

/**
 * For each word, the set of tags it may take, without counts: the only supervision of the
 * classic unsupervised setting, where a model is trained from untagged text and such a
 * dictionary alone. {@link #initialModel} is the starting point of Baum-Welch there: uniform
 * transitions and, per tag, uniform emissions over the words the dictionary allows it.
 */
public final class TagDictionary {
  private final TreeMap<String, SortedSet<String>> tags = new TreeMap<>();
  private long pairs;

  /** The word/tag pairs of tagged sentences; how often each occurs is ignored. */
  public static TagDictionary of(Iterable<Sentence> sentences) {
    TagDictionary dictionary = new TagDictionary();
    for (Sentence s : sentences) {
      for (int i = 0; i < s.size(); i++) {
        dictionary.add(s.words().get(i), s.tags().get(i));
      }
    }
    return dictionary;
  }

  public void add(String word, String tag) {
    if (tags.computeIfAbsent(word, w -> new TreeSet<>()).add(tag)) {
      pairs++;
    }
  }

  public int words() {
    return tags.size();
  }

  public long pairs() {
    return pairs;
  }

  /**
   * The starting model. Each word/tag pair is counted once, as a one-word sentence, by the
   * supervised estimator: that gives every tag uniform emissions over its words, and an
   * unknown-word model learnt from the endings of the dictionary's words (types, not tokens).
   * Its transitions, which such sentences would distort, are replaced by uniform ones.
   */
  public HmmModel initialModel(TrainingOptions options, Map<String, String> provenance) {
    TagCounts counts = new TagCounts();
    tags.forEach((word, wordTags) -> wordTags.forEach(tag -> counts.add(List.of(word), List.of(tag))));
    // one-word sentences carry no capitalisation or context cues: the classic model
    HmmModel counted = new HmmEstimator(options.withCues(false, false, options.lowercaseFirstWord()))
        .estimate(counts, provenance);
    int states = counted.states().size() + 1;
    double[] bigram = new double[states * states];
    double[] trigram = new double[states * states * states];
    Arrays.fill(bigram, -Math.log(states));
    Arrays.fill(trigram, -Math.log(states));
    Map<String, String> described = new TreeMap<>(counted.provenance());
    described.keySet().removeIf(key -> key.startsWith("counts.") || key.startsWith("smoothing.") && !key.equals("smoothing.suffixWeight"));
    described.put("dictionary.words", Integer.toString(words()));
    described.put("dictionary.pairs", Long.toString(pairs));
    described.put("initial", "uniform transitions, uniform emissions within the tag dictionary");
    return counted.withParameters(bigram, trigram, counted.lexicon(), described);
  }
}
