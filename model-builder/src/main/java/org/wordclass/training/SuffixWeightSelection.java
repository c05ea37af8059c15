package org.wordclass.training;

import java.util.Map;
import org.wordclass.model.UnknownWordModel;

/**
 * Chooses θ, the weight of shorter endings in the suffix model's successive abstraction, from
 * the training data alone: every rare training word is scored as if it were unknown, with its
 * own counts taken out of the ending statistics (leave-one-out), and the θ that gives its tags
 * the highest total log-probability wins. This stands in for the held-out text that unknown
 * words really come from, and needs no development set, so it carries over to languages and
 * corpora nobody tuned on.
 */
final class SuffixWeightSelection {
  /** Candidate weights, spaced evenly on a log scale. */
  static final double[] CANDIDATES = {0.03, 0.05, 0.1, 0.2, 0.3, 0.5, 0.75, 1, 1.5, 2, 3, 5};

  private SuffixWeightSelection() {}

  static double choose(UnknownWordModel model, Map<String, Map<Integer, Integer>> wordTags, int[] finalId, int rareWordMaxCount) {
    int open = model.openTagCount();
    double[] logLikelihood = new double[CANDIDATES.length];
    long[] heldOut = new long[open];
    LeaveOneOutEndings endings = new LeaveOneOutEndings(model);
    double[] dist = new double[open];
    for (Map.Entry<String, Map<Integer, Integer>> word : wordTags.entrySet()) {
      Map<Integer, Integer> tags = word.getValue();
      int frequency = tags.values().stream().mapToInt(Integer::intValue).sum();
      if (frequency > rareWordMaxCount) {
        continue;
      }
      java.util.Arrays.fill(heldOut, 0);
      for (Map.Entry<Integer, Integer> e : tags.entrySet()) {
        int k = model.openIndex(finalId[e.getKey() + 1]);
        if (k >= 0) {
          heldOut[k] += e.getValue();
        }
      }
      char[] chars = word.getKey().toCharArray();
      for (int c = 0; c < CANDIDATES.length; c++) {
        endings.tagDistribution(chars, CANDIDATES[c], heldOut, dist);
        for (int k = 0; k < open; k++) {
          if (heldOut[k] > 0) {
            logLikelihood[c] += heldOut[k] * Math.log(dist[k]);
          }
        }
      }
    }
    int best = 0;
    for (int c = 1; c < CANDIDATES.length; c++) {
      if (logLikelihood[c] > logLikelihood[best]) {
        best = c;
      }
    }
    return CANDIDATES[best];
  }
}
