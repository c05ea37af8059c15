package org.wordclass.evaluation;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.wordclass.corpus.Sentence;
import org.wordclass.model.HmmModel;
import org.wordclass.model.UnknownWordModel;

/**
 * The usual floor for a tagger: every word seen in training gets the tag it carried most often
 * there, every other word the tag its ending suggests most ({@code argmax_t P(t | ending)} from
 * the model's unknown-word model), with no context at all. What an HMM adds is measured against
 * this.
 */
public final class MostFrequentTagBaseline {
  private final HmmModel model;
  private final Map<String, Integer> mostFrequent = new HashMap<>();
  private final double[] scratch;
  private final double[] scores;

  /** Counts {@code training} for the known words; {@code model} guesses the others. */
  public MostFrequentTagBaseline(HmmModel model, Iterable<Sentence> training) {
    this.model = model;
    Map<String, Map<Integer, Integer>> counts = new HashMap<>();
    for (Sentence s : training) {
      for (int i = 0; i < s.size(); i++) {
        int tag = model.tags().indexOf(s.tags().get(i));
        counts.computeIfAbsent(s.words().get(i), w -> new HashMap<>()).merge(tag, 1, Integer::sum);
      }
    }
    // ties go to the lower tag index, so the baseline does not depend on hash order
    counts.forEach((word, tags) -> mostFrequent.put(word, tags.entrySet().stream()
        .max(Map.Entry.<Integer, Integer>comparingByValue().thenComparing(Map.Entry.comparingByKey((a, b) -> b - a)))
        .orElseThrow().getKey()));
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
      tags[i] = known[i] ? tag : mostLikelyUnknown(words.get(i).toCharArray());
    }
    evaluation.add(sentence.tags(), tags, known);
  }

  private int mostLikelyUnknown(char[] chars) {
    UnknownWordModel unknown = model.unknownWords();
    unknown.tagDistribution(chars, 0, chars.length, unknown.theta(), null, scratch, scores);
    int best = 0;
    for (int k = 1; k < scores.length; k++) {
      if (scores[k] > scores[best]) {
        best = k;
      }
    }
    return unknown.openTag(best);
  }
}
