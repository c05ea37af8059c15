package org.wordclass.evaluation;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.wordclass.corpus.Sentence;
import org.wordclass.model.HmmModel;
import org.wordclass.model.UnknownWordModel;

/**
 * The usual floor for a tagger: every word seen in training gets the tag it carried most often
 * there, with no context at all. Two variants differ in what an unseen word gets: the tag its
 * ending suggests most ({@code argmax_t P(t | ending)} from the model's unknown-word model; the
 * stronger floor, which isolates what the HMM's context adds), or, with {@link
 * #withoutEndings}, the tag most frequent in the whole training data (the textbook baseline,
 * common practice). What an HMM adds is measured against these.
 */
public final class MostFrequentTagBaseline {
  private final HmmModel model;
  private final Map<String, Integer> mostFrequent = new HashMap<>();
  private final double[] scratch;
  private final double[] scores;
  /** Tag of every unseen word, or -1 to guess it from its ending. */
  private final int unseenTag;

  /** Counts {@code training} for the known words; {@code model} guesses the others. */
  public MostFrequentTagBaseline(HmmModel model, Iterable<Sentence> training) {
    this(model, training, false);
  }

  /** The textbook variant: every word not seen in {@code training} gets the tag most frequent there. */
  public static MostFrequentTagBaseline withoutEndings(HmmModel model, Iterable<Sentence> training) {
    return new MostFrequentTagBaseline(model, training, true);
  }

  private MostFrequentTagBaseline(HmmModel model, Iterable<Sentence> training, boolean withoutEndings) {
    this.model = model;
    long[] tagCounts = new long[model.tags().size()];
    Map<String, Map<Integer, Integer>> counts = new HashMap<>();
    for (Sentence s : training) {
      for (int i = 0; i < s.size(); i++) {
        int tag = model.tags().indexOf(s.tags().get(i));
        tagCounts[tag]++;
        counts.computeIfAbsent(s.words().get(i), w -> new HashMap<>()).merge(tag, 1, Integer::sum);
      }
    }
    // ties go to the lower tag index, so the baseline does not depend on hash order
    counts.forEach((word, tags) -> mostFrequent.put(word, tags.entrySet().stream()
        .max(Map.Entry.<Integer, Integer>comparingByValue().thenComparing(Map.Entry.comparingByKey((a, b) -> b - a)))
        .orElseThrow().getKey()));
    int commonest = 0;
    for (int t = 1; t < tagCounts.length; t++) {
      if (tagCounts[t] > tagCounts[commonest]) {
        commonest = t;
      }
    }
    this.unseenTag = withoutEndings ? commonest : -1;
    int open = model.unknownWords().openTagCount();
    this.scratch = new double[open];
    this.scores = new double[open];
  }

  /** Tags {@code sentence} and counts it into {@code evaluation}. */
  public void addTo(Evaluation evaluation, Sentence sentence) {
    List<String> words = sentence.words();
    int[] tags = new int[words.size()];
    boolean[] known = new boolean[words.size()];
    for (int i = 0; i < tags.length; i++) {
      Integer tag = mostFrequent.get(words.get(i));
      known[i] = tag != null;
      tags[i] = known[i] ? tag : unseenTag >= 0 ? unseenTag : mostLikelyUnknown(words.get(i).toCharArray());
    }
    evaluation.add(sentence.tags(), tags, known);
  }

  private int mostLikelyUnknown(char[] chars) {
    UnknownWordModel unknown = model.unknownWords();
    unknown.tagDistribution(chars, 0, chars.length, unknown.theta(), scratch, scores);
    int best = 0;
    for (int k = 1; k < scores.length; k++) {
      if (scores[k] > scores[best]) {
        best = k;
      }
    }
    return unknown.openTag(best);
  }
}
