package org.wordclass.training;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.wordclass.model.HmmModel;
import org.wordclass.model.UnknownWordModel;
import org.wordclass.training.TrainingOptions.UnknownWordPrior;

/**
 * The priors the estimator stores for unknown words, counted by hand on a corpus of four
 * sentences: 13 tokens, NOUN 5 (3 of them capitalised in mid-sentence), PROPN 3 (2), DET 3,
 * VERB 2 (1 as the capitalised first word, which counts as not capitalised).
 */
class UnknownWordPriorTest {
  private static final int TOKENS = 13;

  private static TagCounts counts() {
    TagCounts counts = new TagCounts();
    counts.add(List.of("the", "Dog", "barks"), List.of("DET", "NOUN", "VERB"));
    counts.add(List.of("Sees", "the", "Cat"), List.of("VERB", "DET", "NOUN"));
    counts.add(List.of("Ann", "likes", "Bob"), List.of("PROPN", "NOUN", "PROPN"));
    counts.add(List.of("the", "Moon", "Eve", "cats"), List.of("DET", "NOUN", "PROPN", "NOUN"));
    return counts;
  }

  private static UnknownWordModel unknown(TrainingOptions options) {
    HmmModel model = new HmmEstimator(options.withOpenClassMinShare(0)).estimate(counts(), Map.of());
    return model.unknownWords();
  }

  private static int tag(String name) {
    return new HmmEstimator(TrainingOptions.DEFAULTS).estimate(counts(), Map.of()).tags().indexOf(name);
  }

  private static double log(double n) {
    return Math.log(n / TOKENS);
  }

  @Test
  void tagPriorIsTheTagsShareForEveryWord() {
    UnknownWordModel u = unknown(TrainingOptions.DEFAULTS.withUnknownWordPrior(UnknownWordPrior.TAG));
    assertFalse(u.hasCapitalisedPriors());
    assertEquals(log(5), u.logPrior(tag("NOUN")), 1e-12);
    assertEquals(log(3), u.logPrior(tag("PROPN")), 1e-12);
    assertEquals(log(2), u.logPrior(tag("VERB")), 1e-12);
  }

  @Test
  void statePriorSplitsByCapitalInMidSentence() {
    UnknownWordModel u = unknown(TrainingOptions.DEFAULTS.withUnknownWordPrior(UnknownWordPrior.STATE));
    assertTrue(u.hasCapitalisedPriors());
    assertEquals(log(2), u.logPrior(tag("NOUN")), 1e-12);
    assertEquals(log(3), u.logPriorCapitalised(tag("NOUN")), 1e-12);
    assertEquals(log(1), u.logPrior(tag("PROPN")), 1e-12);
    assertEquals(log(2), u.logPriorCapitalised(tag("PROPN")), 1e-12);
    // "Sees" opens its sentence: a state of words without a capital
    assertEquals(log(2), u.logPrior(tag("VERB")), 1e-12);
    assertEquals(log(0.5), u.logPriorCapitalised(tag("VERB")), 1e-12, "half a token where none was seen");
  }

  @Test
  void lowerCaseStatePriorKeepsTheTagsShareForCapitalisedWords() {
    UnknownWordModel u = unknown(TrainingOptions.DEFAULTS);
    assertEquals(UnknownWordPrior.LOWER_CASE_STATE, TrainingOptions.DEFAULTS.unknownWordPrior());
    assertEquals(log(2), u.logPrior(tag("NOUN")), 1e-12);
    assertEquals(log(5), u.logPriorCapitalised(tag("NOUN")), 1e-12);
    assertEquals(log(1), u.logPrior(tag("PROPN")), 1e-12);
    assertEquals(log(3), u.logPriorCapitalised(tag("PROPN")), 1e-12);
  }

  @Test
  void rarePriorsCountOnlyRareWords() {
    // with rare meaning "seen once", "the" (3 times) drops out: 10 tokens, DET none
    TrainingOptions rare = TrainingOptions.DEFAULTS.withSuffix(10, 1);
    UnknownWordModel u = unknown(rare.withUnknownWordPrior(UnknownWordPrior.RARE_TAG));
    assertEquals(Math.log(5.0 / 10), u.logPrior(tag("NOUN")), 1e-12);
    assertEquals(Math.log(0.5 / 10), u.logPrior(tag("DET")), 1e-12);
    UnknownWordModel s = unknown(rare.withUnknownWordPrior(UnknownWordPrior.RARE_STATE));
    assertEquals(Math.log(3.0 / 10), s.logPriorCapitalised(tag("NOUN")), 1e-12);
  }

  @Test
  void withoutCapitalisationStatesEveryPriorIsTheTags() {
    TrainingOptions noStates = TrainingOptions.DEFAULTS.withCues(false, true, true);
    for (UnknownWordPrior prior : new UnknownWordPrior[] {UnknownWordPrior.STATE, UnknownWordPrior.LOWER_CASE_STATE}) {
      UnknownWordModel u = unknown(noStates.withUnknownWordPrior(prior));
      assertFalse(u.hasCapitalisedPriors(), prior.name());
      assertEquals(log(5), u.logPrior(tag("NOUN")), 1e-12, prior.name());
    }
  }

  @Test
  void thePriorChangesTheScoresOfUnknownWords() {
    double[] tag = scores(unknown(TrainingOptions.DEFAULTS.withUnknownWordPrior(UnknownWordPrior.TAG)), "dogs");
    double[] state = scores(unknown(TrainingOptions.DEFAULTS), "dogs");
    assertNotEquals(tag[0] - tag[1], state[0] - state[1]);
    // a capitalised word keeps the tag prior under the default
    assertArrayEquals(scores(unknown(TrainingOptions.DEFAULTS.withUnknownWordPrior(UnknownWordPrior.TAG)), "Dogs"),
        scores(unknown(TrainingOptions.DEFAULTS), "Dogs"), 1e-12);
  }

  private static double[] scores(UnknownWordModel u, String word) {
    double[] out = new double[u.openTagCount()];
    u.logEmissions(word.toCharArray(), 0, word.length(), new double[u.openTagCount()], out);
    return out;
  }
}
