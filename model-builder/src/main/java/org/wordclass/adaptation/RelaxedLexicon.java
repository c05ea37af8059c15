package org.wordclass.adaptation;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.wordclass.model.HmmModel;
import org.wordclass.model.Lexicon;
import org.wordclass.model.StateSpace;
import org.wordclass.model.UnknownWordModel;

/**
 * With the lexicon constraint off, a known word may take any open tag during re-estimation, not
 * only those it was seen with. A tag it lacks starts from a floor: {@code floor} times the
 * smallest emission of that tag in the lexicon, about what a word seen once with the tag gets,
 * so that a pair the text gives no support stays negligible. Words keep their own emissions.
 */
final class RelaxedLexicon {
  private RelaxedLexicon() {}

  /** {@code model} with every known word opened to every open tag. */
  static HmmModel relax(HmmModel model, double floor) {
    Lexicon lexicon = model.lexicon();
    UnknownWordModel unknown = model.unknownWords();
    double[] floorLog = floorLogEmissions(lexicon, model.states().size(), Math.log(floor));
    List<Lexicon.Entry> entries = new ArrayList<>(lexicon.size());
    for (int w = 0; w < lexicon.size(); w++) {
      entries.add(relaxed(Reestimation.entryOf(lexicon, w), model.states(), unknown, floorLog));
    }
    return model.withParameters(model.logBigramTable(), model.logTrigramTable(), new Lexicon(entries), model.provenance());
  }

  /** Per tag: log(floor) + the smallest log emission of the tag (the overall smallest if it has none). */
  private static double[] floorLogEmissions(Lexicon lexicon, int tagCount, double logFloor) {
    double[] smallest = new double[tagCount];
    Arrays.fill(smallest, Double.POSITIVE_INFINITY);
    double overall = Double.POSITIVE_INFINITY;
    for (int w = 0; w < lexicon.size(); w++) {
      for (int k = 0; k < lexicon.stateCount(w); k++) {
        int t = lexicon.state(w, k);
        smallest[t] = Math.min(smallest[t], lexicon.logEmission(w, k));
        overall = Math.min(overall, smallest[t]);
      }
    }
    for (int t = 0; t < tagCount; t++) {
      smallest[t] = (smallest[t] == Double.POSITIVE_INFINITY ? overall : smallest[t]) + logFloor;
    }
    return smallest;
  }

  /** The entry opened to every state of every open tag (entries list states). */
  private static Lexicon.Entry relaxed(Lexicon.Entry entry, StateSpace states, UnknownWordModel unknown, double[] floorLog) {
    int[] tags = Arrays.copyOf(entry.states(), entry.states().length + states.size());
    float[] emissions = Arrays.copyOf(entry.logEmissions(), tags.length);
    int n = entry.states().length;
    for (int k = 0; k < unknown.openTagCount(); k++) {
      for (int state : states.statesOf(unknown.openTag(k))) {
        if (Arrays.binarySearch(entry.states(), state) < 0) {
          tags[n] = state;
          emissions[n] = (float) floorLog[state];
          n++;
        }
      }
    }
    return sortedByTag(entry.word(), Arrays.copyOf(tags, n), Arrays.copyOf(emissions, n));
  }

  /** The lexicon keeps each word's tags in ascending order. */
  private static Lexicon.Entry sortedByTag(String word, int[] tags, float[] emissions) {
    Integer[] order = new Integer[tags.length];
    for (int i = 0; i < order.length; i++) {
      order[i] = i;
    }
    Arrays.sort(order, (a, b) -> Integer.compare(tags[a], tags[b]));
    int[] sortedTags = new int[tags.length];
    float[] sortedEmissions = new float[tags.length];
    for (int i = 0; i < order.length; i++) {
      sortedTags[i] = tags[order[i]];
      sortedEmissions[i] = emissions[order[i]];
    }
    return new Lexicon.Entry(word, sortedTags, sortedEmissions);
  }
}
