package org.wordclass.model;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The unknown-word scores the decoder reads, kept per suffix-trie node once a word has ended
 * there, against successive abstraction done word by word along the word's endings (the formula
 * of Brants 2000, as {@link UnknownWordModel#tagDistribution} applies it): both must give the same
 * bits for every word, whatever its shape and however deep its ending is known, whether the node
 * was reached first by this word or by another one with the same known ending.
 */
class UnknownWordModelTest {
  private static final String[] WORDS = {
    "", "a", "zz", "ferrylike", "Harbourmaster", "re-boarding", "ticketed", "QUAYSIDE", "3.5mm", "B2B", ":-)",
    "unsailable", "gangwayed", "Marenholm", "overbooking", "ness", "ation", "xqzv", "É", "naïvely"
  };

  @Test
  void precomputedScoresEqualAbstractionWordByWord() {
    UnknownWordModel model = DefaultModel.get().unknownWords();
    for (int round = 0; round < 2; round++) {
      for (String word : WORDS) {
        assertSameScores(model, word);
      }
    }
    Random random = new Random(20261202);
    String letters = "aeiourstlnmcdgkbpyhAERST-0'";
    for (int i = 0; i < 2_000; i++) {
      StringBuilder word = new StringBuilder();
      for (int n = random.nextInt(14); n > 0; n--) {
        word.append(letters.charAt(random.nextInt(letters.length())));
      }
      assertSameScores(model, word.toString());
    }
  }

  private static void assertSameScores(UnknownWordModel model, String word) {
    int k = model.openTagCount();
    char[] chars = word.toCharArray();
    double[] expected = new double[k];
    int expectedDepth = model.tagDistribution(chars, 0, chars.length, model.theta(), null, new double[k], expected);
    double[] actual = new double[k];
    assertEquals(expectedDepth, model.logEmissions(chars, 0, chars.length, new double[k], actual), "ending length of '" + word + "'");
    for (int i = 0; i < k; i++) {
      double logP = Math.log(expected[i]) - model.logPrior(model.openTag(i));
      assertEquals(Double.doubleToLongBits(logP), Double.doubleToLongBits(actual[i]),
          "'" + word + "', open tag " + i + ": " + logP + " vs " + actual[i]);
    }
  }
}
