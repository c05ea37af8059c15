package org.wordclass.model;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The lower-case forms of capitalised unknown words: which tag a form stands for, which words
 * are looked up, and what the factors do to the suffix model's distribution and the emissions.
 */
class LowerCaseFormCueTest {
  // tags ADJ 0, NOUN 1, VERB 2; one state per tag
  private static final StateSpace STATES = StateSpace.oneStatePerTag(3);
  private static final double[] STATE_PRIOR = {Math.log(0.2), Math.log(0.5), Math.log(0.3)};
  private static final Lexicon LEXICON = new Lexicon(List.of(
      // P(w|NOUN) 0.02 * 0.5 = 0.01 against P(w|VERB) 0.03 * 0.3 = 0.009: mostly a noun
      new Lexicon.Entry("customer", new int[] {1, 2}, new float[] {(float) Math.log(0.02), (float) Math.log(0.03)}),
      new Lexicon.Entry("green", new int[] {0}, new float[] {(float) Math.log(0.1)}),
      new Lexicon.Entry("Paris", new int[] {1}, new float[] {(float) Math.log(0.1)}),
      new Lexicon.Entry("émigré", new int[] {1}, new float[] {(float) Math.log(0.1)})));
  /** Open tags NOUN and VERB; rows ADJ, NOUN, VERB. */
  private static final double[] FACTORS = {0.5, 2, 3, 0.25, 1, 1};

  private static LowerCaseFormCue cue() {
    return new LowerCaseFormCue(STATE_PRIOR, FACTORS, 3, 2, LEXICON, STATES);
  }

  private static int tagOf(LowerCaseForms forms, String word) {
    return forms.tagOfLowerCased(word.toCharArray(), 0, word.length());
  }

  @Test
  void theFormsTagIsItsMostProbableState() {
    LowerCaseForms forms = cue().forms();
    assertEquals(1, tagOf(forms, "Customer"), "P(w|s) P(s): 0.01 for NOUN against 0.009 for VERB");
    assertEquals(0, tagOf(forms, "GREEN"));
    assertEquals(1, tagOf(forms, "ÉMIGRÉ"));
    assertEquals(3, forms.size(), "only lower-case words: not Paris");
    assertEquals(-1, tagOf(forms, "Paris".toLowerCase()), "Paris is no lower-case word");
    assertEquals(-1, tagOf(forms, "Customers"));
    // with other state priors the same emissions make the form a verb
    LowerCaseForms verbs = new LowerCaseForms(LEXICON, STATES, new double[] {Math.log(0.2), Math.log(0.3), Math.log(0.5)});
    assertEquals(2, tagOf(verbs, "Customer"));
  }

  @Test
  void onlyWordsWrittenWithACapitalAreWeighed() {
    LowerCaseFormCue cue = cue();
    double[] dist = {0.4, 0.6};
    assertEquals(1, cue.apply("Customer".toCharArray(), 0, 8, dist));
    assertArrayEquals(new double[] {0.4 * 3, 0.6 * 0.25}, dist, 1e-12);
    double[] caps = {0.4, 0.6};
    assertEquals(0, cue.apply("GREEN".toCharArray(), 0, 5, caps));
    assertArrayEquals(new double[] {0.2, 1.2}, caps, 1e-12);
    for (String word : new String[] {"customer", "Customers", "c", "", "42"}) {
      double[] same = {0.4, 0.6};
      assertEquals(-1, cue.apply(word.toCharArray(), 0, word.length(), same), word);
      assertArrayEquals(new double[] {0.4, 0.6}, same, 0, word);
    }
  }

  @Test
  void theFactorsReachTheEmissions() {
    AffixTrie.Builder trie = new AffixTrie.Builder();
    trie.add("Walker", 1, 3, 4);
    trie.add("Baker", 2, 1, 4);
    double[] logPrior = {Math.log(0.2), Math.log(0.5), Math.log(0.3)};
    int[] open = {1, 2};
    int[] shapes = new int[WordShape.values().length];
    AffixTrie[] tries = {trie.build()};
    UnknownWordModel plain = UnknownWordModel.builder().theta(1.0).openTags(open, new double[] {0.5, 0.5})
        .logPrior(logPrior).endings(4, shapes, tries).build();
    UnknownWordModel weighed = plain.toBuilder().lowerCaseForms(cue()).build();
    for (String word : new String[] {"Customer", "GREEN", "Paris", "Bakery"}) {
      double[] a = emissions(plain, word);
      double[] b = emissions(weighed, word);
      int form = tagOf(cue().forms(), word);
      for (int k = 0; k < 2; k++) {
        double factor = form < 0 ? 1 : FACTORS[form * 2 + k];
        assertEquals(a[k] + Math.log(factor), b[k], 1e-12, word);
      }
    }
  }

  private static double[] emissions(UnknownWordModel m, String word) {
    double[] out = new double[m.openTagCount()];
    m.logEmissions(word.toCharArray(), 0, word.length(), new double[m.openTagCount()], out);
    return out;
  }

  @Test
  void factorsMustBePositiveAndFinitePerTagAndOpenTag() {
    assertThrows(IllegalArgumentException.class, () -> new LowerCaseFormCue(STATE_PRIOR, new double[5], 3, 2, LEXICON, STATES));
    assertThrows(IllegalArgumentException.class,
        () -> new LowerCaseFormCue(STATE_PRIOR, new double[] {1, 1, 0, 1, 1, 1}, 3, 2, LEXICON, STATES));
    assertThrows(IllegalArgumentException.class,
        () -> new LowerCaseFormCue(STATE_PRIOR, new double[] {1, 1, Double.POSITIVE_INFINITY, 1, 1, 1}, 3, 2, LEXICON, STATES));
    assertThrows(IllegalArgumentException.class, () -> new LowerCaseFormCue(new double[2], FACTORS, 3, 2, LEXICON, STATES));
  }
}
