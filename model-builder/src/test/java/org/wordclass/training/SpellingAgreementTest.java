package org.wordclass.training;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.wordclass.decoding.CandidateSource;
import org.wordclass.decoding.Lattice;
import org.wordclass.model.HmmModel;
import org.wordclass.model.Spelling;
import org.wordclass.model.StateSpace;
import org.wordclass.model.UserLexicon;
import org.wordclass.model.WordShape;

/**
 * Training and decoding classify the same words alike: the capitalisation bit training counts a
 * word under is the one the decoder admits for it, and the lower-case form training files a word
 * under is the one the decoder, the cue of lower-case forms and a user lexicon look it up by.
 * The words cover the cases where char-by-char and locale-free string lower-casing differ.
 * Expected forms follow the simple case mappings of the Unicode Character Database
 * (UnicodeData.txt: U+0130 → U+0069, U+03A3 → U+03C3; the final-sigma rule is a contextual one of
 * SpecialCasing.txt, which char-by-char lower-casing does not apply), from memory.
 */
class SpellingAgreementTest {
  /** Each written with a capital (or not) as its first char shows; "İ" dotted capital I, "ǅ" title case. */
  private static final List<String> CAPITALISED = List.of("İzmir", "ΟΔΟΣ", "Σοφος", "ǅemal", "Élan", "Apple", "USB");
  private static final List<String> NOT_CAPITALISED = List.of("2026", "apple", "élan", "ǆungla", "σοφος", "'Tis", "3M");

  @Test
  void expectedLowerCaseForms() {
    assertEquals("izmir", Spelling.lowerCase("İzmir"), "dotted capital I: one char, no combining dot");
    assertEquals("οδοσ", Spelling.lowerCase("ΟΔΟΣ"), "capital sigma: σ wherever it stands");
    assertEquals("ǆemal", Spelling.lowerCase("ǅemal"));
    assertEquals("2026", Spelling.lowerCase("2026"));
    assertEquals("ǅungla", Spelling.capitalised("ǆungla"), "title case of the digraph, not Ǆ");
  }

  @Test
  void trainingAndDecodingAgreeOnCapitals() {
    HmmModel model = train();
    for (String word : concat(CAPITALISED, NOT_CAPITALISED)) {
      boolean expected = CAPITALISED.contains(word);
      assertEquals(expected, countedCapitalised(word), "training counts '" + word + "'");
      assertEquals(expected, decodedCapitalised(model, word), "decoding admits '" + word + "'");
      if (Character.isLetter(word.charAt(0))) {
        // the shape looks at the first letter, which is the first char here
        assertEquals(expected, WordShape.classify(word.toCharArray(), 0, word.length()).capitalisationOnly()
            == WordShape.CAPITALISED, "shape of '" + word + "'");
      }
    }
  }

  @Test
  void trainingAndDecodingAgreeOnLowerCaseForms() throws Exception {
    HmmModel model = train();
    for (String word : CAPITALISED) {
      String lower = Spelling.lowerCase(word);
      assertEquals(lower.length(), word.length(), word);
      // training: the lower-cased beginnings are the word's lower-case form reversed
      assertEquals(lower, new StringBuilder(HmmEstimator.lowerCasedReversed(word.toCharArray())).reverse().toString());
      // decoding: an unknown first word is found by that form, which training holds as a known word
      Lattice lattice = new Lattice(model);
      lattice.add(word);
      assertEquals(CandidateSource.LOWERCASED_FIRST_WORD, lattice.source(0), "first word '" + word + "'");
      // the cue of lower-case forms finds the same form in mid-sentence
      assertTrue(model.unknownWords().lowerCaseForms().forms().tagOfLowerCased(word.toCharArray(), 0, word.length()) >= 0,
          "lower-case form of '" + word + "'");
      // a user lexicon's case=any entry covers the same form
      UserLexicon user = UserLexicon.parse((word + " NOUN case=any\n").getBytes(StandardCharsets.UTF_8), "test.txt",
          model.tags());
      assertTrue(user.entries().get(0).forms().contains(lower), user.entries().get(0).forms() + " holds " + lower);
    }
  }

  /**
   * Counts the lower-case form of every test word, and, in mid-sentence, a capitalised noun and
   * proper noun so that the model has open states of both spellings; the test words themselves
   * stay unknown.
   */
  private static TagCounts counts() {
    TagCounts counts = new TagCounts();
    for (int i = 0; i < 3; i++) {
      counts.add(List.of("we", "saw", "it"), List.of("PRON", "VERB", "PRON"));
    }
    for (String word : concat(CAPITALISED, NOT_CAPITALISED)) {
      counts.add(List.of("we", "saw", Spelling.lowerCase(word)), List.of("PRON", "VERB", "NOUN"));
    }
    counts.add(List.of("we", "saw", "Table", "Anna"), List.of("PRON", "VERB", "NOUN", "PROPN"));
    return counts;
  }

  private static HmmModel train() {
    return new HmmEstimator(TrainingOptions.DEFAULTS.withOpenClassMinShare(0).withMinTagShare(0)).estimate(counts(), Map.of());
  }

  /** Whether training counts {@code word} in mid-sentence in the state of words written with a capital. */
  private static boolean countedCapitalised(String word) {
    TagCounts counts = new TagCounts();
    counts.add(List.of("we", word), List.of("PRON", "NOUN"));
    return counts.wordStates().get(word).keySet().stream().allMatch(TagCounts::isCapitalised);
  }

  /** Whether the decoder admits {@code word}, unknown, in mid-sentence only in capitalised states. */
  private static boolean decodedCapitalised(HmmModel model, String word) {
    Lattice lattice = new Lattice(model);
    lattice.add("we");
    lattice.add(word + "zzq");
    assertTrue(!lattice.isKnown(1));
    boolean all = true;
    boolean none = true;
    for (int k = 0; k < lattice.candidateCount(1); k++) {
      boolean capital = (model.states().flags(lattice.candidateState(1, k)) & StateSpace.CAPITALISED) != 0;
      all &= capital;
      none &= !capital;
    }
    assertTrue(all || none, "candidates of one spelling only");
    return all;
  }

  private static List<String> concat(List<String> a, List<String> b) {
    List<String> out = new ArrayList<>(a);
    out.addAll(b);
    return out;
  }
}
