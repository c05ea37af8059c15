package org.wordclass.model;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The unknown-word scores the decoder reads, kept per trie node once a word has reached it,
 * against the same scores worked out word by word: successive abstraction along the word's
 * endings (the formula of Brants 2000, as {@link UnknownWordModel#tagDistribution} applies it),
 * the lower-case form's factors and the beginning's, then Bayes' rule. Both must agree to 12
 * digits for every word, whatever its shape and however deep its ending and beginning are known,
 * whether a node was reached first by this word or by another one.
 */
class UnknownWordModelTest {
  private static final String[] WORDS = {
    "", "a", "zz", "ferrylike", "Harbourmaster", "re-boarding", "ticketed", "QUAYSIDE", "3.5mm", "B2B", ":-)",
    "unsailable", "gangwayed", "Marenholm", "overbooking", "ness", "ation", "xqzv", "É", "naïvely",
    "Customer", "Ferries", "Boarding", "Timetables", "Harbour", "Overbooked"
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
    int expectedDepth = model.tagDistribution(chars, 0, chars.length, model.theta(), new double[k], expected);
    if (model.lowerCaseForms() != null) {
      model.lowerCaseForms().apply(chars, 0, chars.length, expected);
    }
    for (int i = 0; i < k && model.maxBeginningLength() > 0; i++) {
      expected[i] *= model.beginningFactor(chars, 0, chars.length, i);
    }
    boolean capitalised = !word.isEmpty() && Character.isUpperCase(word.charAt(0));
    double[] actual = new double[k];
    assertEquals(expectedDepth, model.logEmissions(chars, 0, chars.length, capitalised, new double[k], actual),
        "ending length of '" + word + "'");
    for (int i = 0; i < k; i++) {
      int tag = model.openTag(i);
      double logP = Math.log(expected[i]) - (capitalised ? model.logPriorCapitalised(tag) : model.logPrior(tag));
      // the decoder sums the cues' logarithms rather than taking the logarithm of their product
      assertEquals(logP, actual[i], 1e-12 * Math.max(1, Math.abs(logP)), "'" + word + "', open tag " + i);
    }
  }
}
