package org.wordclass.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The divisor of an unknown word's ending-based tag probability: the prior kept for words
 * written with a capital applies to them, the other one to the rest, and with one prior for
 * both the scores are those of a plain {@code P(t | ending) / P(t)}.
 */
class UnknownWordModelPriorTest {
  private static final double[] LOWER = {Math.log(0.5), Math.log(0.3), Math.log(0.2)};
  private static final double[] CAPITALISED = {Math.log(0.1), Math.log(0.6), Math.log(0.3)};

  private static UnknownWordModel model(double[] capitalised) {
    AffixTrie.Builder trie = new AffixTrie.Builder();
    trie.add("walked", 2, 3, 4);
    trie.add("table", 1, 4, 4);
    trie.add("Bern", 1, 5, 4);
    return UnknownWordModel.builder().theta(1.0).openTags(new int[] {1, 2}, new double[] {0.5, 0.5})
        .logPriors(LOWER, capitalised).endings(4, new int[WordShape.values().length], new AffixTrie[] {trie.build()}).build();
  }

  private static double[] scores(UnknownWordModel m, String word) {
    double[] out = new double[m.openTagCount()];
    m.logEmissions(word.toCharArray(), 0, word.length(), new double[m.openTagCount()], out);
    return out;
  }

  private static double[] scores(UnknownWordModel m, String word, boolean capitalisedState) {
    double[] out = new double[m.openTagCount()];
    m.logEmissions(word.toCharArray(), 0, word.length(), capitalisedState, new double[m.openTagCount()], out);
    return out;
  }

  private static double[] distribution(UnknownWordModel m, String word) {
    double[] out = new double[m.openTagCount()];
    m.tagDistribution(word.toCharArray(), 0, word.length(), m.theta(), new double[m.openTagCount()], out);
    return out;
  }

  @Test
  void aWordWrittenWithACapitalIsDividedByTheCapitalisedPrior() {
    UnknownWordModel m = model(CAPITALISED);
    assertTrue(m.hasCapitalisedPriors());
    for (String word : new String[] {"Zalked", "Xable", "Q"}) {
      double[] p = distribution(m, word);
      double[] s = scores(m, word);
      for (int k = 0; k < m.openTagCount(); k++) {
        assertEquals(Math.log(p[k]) - CAPITALISED[m.openTag(k)], s[k], 1e-12, word);
      }
    }
  }

  @Test
  void aWordWithoutACapitalIsDividedByTheOtherPrior() {
    UnknownWordModel m = model(CAPITALISED);
    for (String word : new String[] {"zalked", "xable", "q", "42", "..."}) {
      double[] p = distribution(m, word);
      double[] s = scores(m, word);
      for (int k = 0; k < m.openTagCount(); k++) {
        assertEquals(Math.log(p[k]) - LOWER[m.openTag(k)], s[k], 1e-12, word);
      }
    }
  }

  @Test
  void theStateCanBeGivenWhereThePlaceDecidesIt() {
    // a capitalised first word of a sentence is in a state of words without a capital
    UnknownWordModel m = model(CAPITALISED);
    double[] p = distribution(m, "Zalked");
    double[] s = scores(m, "Zalked", false);
    for (int k = 0; k < m.openTagCount(); k++) {
      assertEquals(Math.log(p[k]) - LOWER[m.openTag(k)], s[k], 1e-12);
    }
    assertEquals(scores(m, "Zalked")[0], scores(m, "Zalked", true)[0], 0);
  }

  @Test
  void thePriorShiftsTheScoresBetweenTags() {
    // P(tag 1) is 0.3 for lower-case words and 0.6 for capitalised ones: tag 1 loses log 2 against tag 2
    double[] lower = scores(model(LOWER), "Zalked");
    double[] capitalised = scores(model(CAPITALISED), "Zalked");
    assertEquals((lower[0] - lower[1]) - Math.log(2) - Math.log(0.2 / 0.3), capitalised[0] - capitalised[1], 1e-12);
  }

  @Test
  void onePriorForBothIsThePlainDivision() {
    UnknownWordModel plain = UnknownWordModel.builder().theta(1.0).openTags(new int[] {1, 2}, new double[] {0.5, 0.5})
        .logPrior(LOWER).endings(4, new int[WordShape.values().length], new AffixTrie[] {new AffixTrie.Builder().build()})
        .build();
    assertFalse(plain.hasCapitalisedPriors());
    assertEquals(plain.logPrior(1), plain.logPriorCapitalised(1));
  }

  @Test
  void aCapitalisedPriorMustBeFiniteForTheOpenTags() {
    double[] broken = CAPITALISED.clone();
    broken[2] = Double.NEGATIVE_INFINITY;
    assertThrows(IllegalArgumentException.class, () -> model(broken));
    assertThrows(IllegalArgumentException.class, () -> model(new double[] {0, 0}));
  }
}
