package org.wordclass.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/**
 * The factor an unknown word's tags get from its beginning, computed by hand: successive
 * abstraction over the lower-cased first letters, from the distribution over all rare words
 * through the root of the word's trie to its longest counted beginning, divided by the root's
 * distribution with add-one smoothing.
 */
class WordBeginningsTest {
  private static final double THETA = 1.0;
  private static final double[] BASE = {0.5, 0.5};

  /** Open tags 1 (NOUN) and 2 (VERB). Lower-case beginnings: "un" 1 noun, 3 verbs; "ta" 4 nouns. */
  private static UnknownWordModel model() {
    AffixTrie.Builder lower = new AffixTrie.Builder();
    lower.add("nu", 1, 1, 2);
    lower.add("nu", 2, 3, 2);
    lower.add("at", 1, 4, 2);
    AffixTrie.Builder upper = new AffixTrie.Builder();
    upper.add("ab", 1, 2, 2);
    double[] logPrior = {Math.log(0.2), Math.log(0.5), Math.log(0.3)};
    AffixTrie[] endings = {new AffixTrie.Builder().build()};
    return UnknownWordModel.builder().theta(THETA).openTags(new int[] {1, 2}, BASE).logPrior(logPrior)
        .endings(4, new int[WordShape.values().length], endings).beginnings(2, new AffixTrie[] {lower.build(), upper.build()})
        .build();
  }

  private static double abstracted(double own, double dist) {
    return (own + THETA * dist) / (1 + THETA);
  }

  @Test
  void aBeginningWeighsTheTagsAgainstTheRootOfItsTrie() {
    UnknownWordModel m = model();
    // root of the lower-case trie: 5 nouns, 3 verbs; "u": 1 noun, 3 verbs; "un": the same
    double rootNoun = abstracted(5.0 / 8, 0.5);
    double noun = abstracted(1.0 / 4, abstracted(1.0 / 4, rootNoun));
    double rootVerb = abstracted(3.0 / 8, 0.5);
    double verb = abstracted(3.0 / 4, abstracted(3.0 / 4, rootVerb));
    char[] word = "unzipped".toCharArray();
    assertEquals(noun / ((5 + 1.0) / (8 + 2)), m.beginningFactor(word, 0, word.length, 0), 1e-12);
    assertEquals(verb / ((3 + 1.0) / (8 + 2)), m.beginningFactor(word, 0, word.length, 1), 1e-12);
  }

  @Test
  void onlyTheConfiguredLengthIsReadAndCaseIsIgnoredWithinAGroup() {
    UnknownWordModel m = model();
    char[] shortWord = "u".toCharArray();
    double noun = abstracted(1.0 / 4, abstracted(5.0 / 8, 0.5));
    assertEquals(noun / 0.6, m.beginningFactor(shortWord, 0, 1, 0), 1e-12, "a beginning as long as the word");
    char[] unknownStart = "xylophone".toCharArray();
    assertEquals(abstracted(5.0 / 8, 0.5) / 0.6, m.beginningFactor(unknownStart, 0, unknownStart.length, 0), 1e-12,
        "no child: the root alone");
  }

  @Test
  void capitalisedWordsReadTheirOwnTrie() {
    UnknownWordModel m = model();
    char[] word = "BAKER".toCharArray();
    // root: 2 nouns, no verb; "b", "ba": the same
    double noun = abstracted(1, abstracted(1, abstracted(1, 0.5)));
    double verb = abstracted(0, abstracted(0, abstracted(0, 0.5)));
    assertEquals(noun / (3.0 / 4), m.beginningFactor(word, 0, word.length, 0), 1e-12);
    assertEquals(verb / (1.0 / 4), m.beginningFactor(word, 0, word.length, 1), 1e-12);
  }

  @Test
  void theFactorsReachTheEmissions() {
    UnknownWordModel m = model();
    UnknownWordModel endingsOnly = m.toBuilder().beginnings(0, null)
        .endings(4, new int[WordShape.values().length], new AffixTrie[] {new AffixTrie.Builder().build()}).build();
    char[] word = "unzipped".toCharArray();
    double[] a = new double[2];
    double[] b = new double[2];
    endingsOnly.logEmissions(word, 0, word.length, new double[2], a);
    m.logEmissions(word, 0, word.length, new double[2], b);
    for (int k = 0; k < 2; k++) {
      assertEquals(a[k] + Math.log(m.beginningFactor(word, 0, word.length, k)), b[k], 1e-12);
    }
  }

  @Test
  void beginningsNeedTwoTries() {
    AffixTrie[] endings = {new AffixTrie.Builder().build()};
    UnknownWordModel.Builder b = UnknownWordModel.builder().theta(THETA).openTags(new int[] {1, 2}, BASE)
        .logPrior(new double[3]).endings(4, new int[WordShape.values().length], endings);
    assertThrows(IllegalArgumentException.class, () -> b.beginnings(2, endings).build());
    assertThrows(IllegalArgumentException.class, () -> b.beginnings(-1, null).build());
  }
}
