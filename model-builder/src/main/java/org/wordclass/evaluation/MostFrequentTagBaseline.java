package org.wordclass.evaluation;

import java.util.List;
import org.wordclass.corpus.Sentence;
import org.wordclass.model.HmmModel;
import org.wordclass.model.Lexicon;
import org.wordclass.model.UnknownWordModel;

/**
 * The usual floor for a tagger: every known word gets the tag it carried most often in training
 * ({@code argmax_t c(w,t)}, recovered from the model as {@code P(w|t) P(t)}), every unknown
 * word the tag its ending suggests most ({@code argmax_t P(t | ending)}), with no context at all.
 * What an HMM adds is measured against this.
 */
public final class MostFrequentTagBaseline {
  private final HmmModel model;
  private final double[] scratch;
  private final double[] scores;

  public MostFrequentTagBaseline(HmmModel model) {
    this.model = model;
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
      char[] chars = words.get(i).toCharArray();
      int word = model.lexicon().lookup(chars, 0, chars.length);
      known[i] = word >= 0;
      tags[i] = known[i] ? mostFrequent(word) : mostLikelyUnknown(chars);
    }
    evaluation.add(sentence.tags(), tags, known);
  }

  private int mostFrequent(int word) {
    Lexicon lexicon = model.lexicon();
    UnknownWordModel unknown = model.unknownWords();
    int best = 0;
    double bestScore = Double.NEGATIVE_INFINITY;
    for (int k = 0; k < lexicon.tagCount(word); k++) {
      double score = lexicon.logEmission(word, k) + unknown.logPrior(lexicon.tag(word, k));
      if (score > bestScore) {
        bestScore = score;
        best = k;
      }
    }
    return lexicon.tag(word, best);
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
