package org.wordclass.adaptation;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.wordclass.model.HmmModel;
import org.wordclass.model.Lexicon;
import org.wordclass.model.AffixTrie;
import org.wordclass.model.TagSet;
import org.wordclass.model.UnknownWordModel;
import org.wordclass.model.WordShape;

/** Small models with random parameters, for checking the decoder against brute force. */
final class RandomModels {
  private RandomModels() {}

  /** Tags T0.., known words w0.., every distribution random; unknown words score by their ending. */
  static HmmModel model(Random random, int tagCount, int words, int order) {
    List<String> names = new ArrayList<>();
    for (int t = 0; t < tagCount; t++) {
      names.add("T" + t);
    }
    int states = tagCount + 1;
    return new HmmModel(order, new TagSet(names), conditionalLogs(random, states, states),
        conditionalLogs(random, states * states, states), lexicon(random, tagCount, words),
        unknownWords(random, tagCount), Map.of());
  }

  /** {@code contexts} rows of a random distribution over {@code events}, as logs. */
  private static double[] conditionalLogs(Random random, int contexts, int events) {
    double[] table = new double[contexts * events];
    for (int c = 0; c < contexts; c++) {
      double[] p = distribution(random, events);
      for (int e = 0; e < events; e++) {
        table[c * events + e] = Math.log(p[e]);
      }
    }
    return table;
  }

  private static double[] distribution(Random random, int size) {
    double[] p = new double[size];
    double sum = 0;
    for (int i = 0; i < size; i++) {
      p[i] = 0.05 + random.nextDouble();
      sum += p[i];
    }
    for (int i = 0; i < size; i++) {
      p[i] /= sum;
    }
    return p;
  }

  private static Lexicon lexicon(Random random, int tagCount, int words) {
    List<Lexicon.Entry> entries = new ArrayList<>();
    for (int w = 0; w < words; w++) {
      int[] tags = random.ints(0, tagCount).distinct().limit(1 + random.nextInt(Math.min(3, tagCount))).sorted().toArray();
      float[] emissions = new float[tags.length];
      for (int k = 0; k < tags.length; k++) {
        emissions[k] = (float) Math.log(0.01 + random.nextDouble());
      }
      entries.add(new Lexicon.Entry("w" + w, tags, emissions));
    }
    return new Lexicon(entries);
  }

  private static UnknownWordModel unknownWords(Random random, int tagCount) {
    int[] open = new int[tagCount];
    for (int t = 0; t < tagCount; t++) {
      open[t] = t;
    }
    double[] logPrior = Arrays.stream(distribution(random, tagCount)).map(Math::log).toArray();
    AffixTrie.Builder trie = new AffixTrie.Builder();
    for (String ending : new String[] {"ab", "ba", "bb", "aa"}) {
      trie.add("x" + ending, random.nextInt(tagCount), 1 + random.nextInt(4), 3);
    }
    return UnknownWordModel.builder().theta(0.5).openTags(open, distribution(random, tagCount)).logPrior(logPrior)
        .endings(3, new int[WordShape.values().length], new AffixTrie[] {trie.build()}).build();
  }

  /** A sentence of known words w.. and unknown words x..; unknown ones only if {@code withUnknown}. */
  static List<String> sentence(Random random, int length, int words, boolean withUnknown) {
    List<String> tokens = new ArrayList<>();
    String[] unknown = {"xab", "xba", "xbb", "yaa"};
    for (int i = 0; i < length; i++) {
      tokens.add(withUnknown && random.nextInt(4) == 0 ? unknown[random.nextInt(unknown.length)] : "w" + random.nextInt(words));
    }
    return tokens;
  }
}
