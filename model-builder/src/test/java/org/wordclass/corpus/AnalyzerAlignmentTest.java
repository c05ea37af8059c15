package org.wordclass.corpus;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import org.apache.lucene.analysis.Analyzer;
import org.junit.jupiter.api.Test;

/** Alignment of analyzer tokens with gold words, on invented sentences of a bakery's order log. */
class AnalyzerAlignmentTest {

  private static Sentence sentence(String text, String[] words, String[] tags, List<Sentence.MultiwordToken> mwt) {
    boolean[] spaces = new boolean[words.length];
    Arrays.fill(spaces, true);
    return new Sentence(List.of(words), List.of(tags), text, spaces, "orders.conllu", 7, mwt);
  }

  /** The aligned tokens of {@code s}, which must come out as one sentence. */
  private static Sentence one(AnalyzerAlignment alignment, Sentence s) {
    List<Sentence> aligned = alignment.align(List.of(s));
    assertEquals(1, aligned.size(), aligned::toString);
    return aligned.get(0);
  }

  /** "We don't bake rye, sorry." with "don't" as the multiword token do + n't. */
  private static Sentence contraction() {
    return sentence("We don't bake rye, sorry.",
        new String[] {"We", "do", "n't", "bake", "rye", ",", "sorry", "."},
        new String[] {"PRON", "AUX", "PART", "VERB", "NOUN", "PUNCT", "INTJ", "PUNCT"},
        List.of(new Sentence.MultiwordToken(1, 2, "don't")));
  }

  @Test
  void offsetsFollowFormsAndSplitMultiwordTokens() {
    int[] offsets = WordOffsets.locate(contraction());
    assertArrayEquals(new int[] {0, 2, 3, 5, 5, 8, 9, 13, 14, 17, 17, 18, 19, 24, 24, 25}, offsets);
  }

  @Test
  void standardTokenizerKeepsContractionWholeAndDropsPunctuation() {
    try (Analyzer analyzer = AnalysisChain.DEFAULT.build()) {
      AnalyzerAlignment alignment = new AnalyzerAlignment(analyzer, false);
      Sentence aligned = one(alignment, contraction());
      assertEquals(List.of("We", "don't", "bake", "rye", "sorry"), aligned.words());
      // a token over several words takes the tag of the first one: "don't" -> AUX (from "do")
      assertEquals(List.of("PRON", "AUX", "VERB", "NOUN", "INTJ"), aligned.tags());
      assertEquals(4, alignment.count(AnalyzerAlignment.Case.ONE_WORD));
      assertEquals(1, alignment.count(AnalyzerAlignment.Case.SEVERAL_WORDS));
      assertEquals(2, alignment.wordsWithoutToken(), "the comma and the full stop are dropped");
    }
  }

  @Test
  void lowercasingBeforeTheFilterIsReproduced() {
    try (Analyzer analyzer = AnalysisChain.of("whitespace", List.of("lowercase")).build()) {
      Sentence aligned = one(new AnalyzerAlignment(analyzer, false), contraction());
      assertEquals(List.of("we", "don't", "bake", "rye,", "sorry."), aligned.words());
      assertEquals(List.of("PRON", "AUX", "VERB", "NOUN", "INTJ"), aligned.tags());
    }
  }

  @Test
  void tokenPartOfAWordTakesThatWordsTag() {
    Sentence s = sentence("Ship 3.5kg today", new String[] {"Ship", "3.5kg", "today"},
        new String[] {"VERB", "NUM", "NOUN"}, List.of());
    try (Analyzer analyzer = AnalysisChain.of("letter", List.of()).build()) {
      AnalyzerAlignment alignment = new AnalyzerAlignment(analyzer, false);
      Sentence aligned = one(alignment, s);
      assertEquals(List.of("Ship", "kg", "today"), aligned.words());
      assertEquals(List.of("VERB", "NUM", "NOUN"), aligned.tags());
      assertEquals(1, alignment.count(AnalyzerAlignment.Case.PART_OF_A_WORD));
    }
  }

  @Test
  void runWrittenTogetherIsOneObservationForTrainingAndEveryTokenIsScored() {
    // invented; EWT has an e-mail address as one word (PROPN) and "b/c" as one word (SCONJ)
    Sentence s = sentence("Mail orders@rye.example b/c we bake",
        new String[] {"Mail", "orders@rye.example", "b/c", "we", "bake"},
        new String[] {"VERB", "PROPN", "SCONJ", "PRON", "VERB"}, List.of());
    try (Analyzer analyzer = AnalysisChain.DEFAULT.build()) {
      AnalyzerAlignment alignment = new AnalyzerAlignment(analyzer, false);
      Sentence aligned = one(alignment, s);
      assertEquals(List.of("Mail", "orders", "rye.example", "b", "c", "we", "bake"), aligned.words());
      assertEquals(Arrays.asList(null, null, "@", null, "/", null, null), aligned.gapList());
      assertEquals(List.of("VERB", "PROPN", "PROPN", "SCONJ", "SCONJ", "PRON", "VERB"), aligned.tags());
      Sentence units = aligned.runsJoined();
      assertEquals(List.of("Mail", "orders@rye.example", "b/c", "we", "bake"), units.words());
      assertEquals(List.of("VERB", "PROPN", "SCONJ", "PRON", "VERB"), units.tags());
    }
  }

  @Test
  void missingTextIsRefusedWithFileAndLineOrSkippedAndCounted() {
    Sentence noText = sentence(null, new String[] {"Rye"}, new String[] {"NOUN"}, List.of());
    try (Analyzer analyzer = AnalysisChain.DEFAULT.build()) {
      CorpusFormatException e = assertThrows(CorpusFormatException.class,
          () -> new AnalyzerAlignment(analyzer, false).align(List.of(noText)));
      assertEquals("orders.conllu:7: sentence has no '# text =' line", e.getMessage());
      AnalyzerAlignment skipping = new AnalyzerAlignment(analyzer, true);
      assertTrue(skipping.align(List.of(noText)).isEmpty());
      assertEquals(1L, skipping.summary().get("sentencesSkipped"));
    }
  }

  @Test
  void textThatDoesNotMatchItsFormsIsRefused() {
    Sentence wrong = sentence("Two loaves", new String[] {"Three", "loaves"}, new String[] {"NUM", "NOUN"}, List.of());
    CorpusFormatException e = assertThrows(CorpusFormatException.class, () -> WordOffsets.locate(wrong));
    assertTrue(e.getMessage().startsWith("orders.conllu:7: text does not match its forms: expected 'Three'"), e.getMessage());
  }

  @Test
  void chainSpecsParseNamesAndArguments() {
    AnalysisChain chain = AnalysisChain.of("standard:maxTokenLength=40", List.of("lowercase", "stop:ignoreCase=true"));
    assertEquals("standard:maxTokenLength=40 | lowercase | stop:ignoreCase=true", chain.toString());
    assertThrows(IllegalArgumentException.class, () -> AnalysisChain.parse("stop:ignoreCase"));
    assertThrows(IllegalArgumentException.class, () -> AnalysisChain.of("no-such-tokenizer", List.of()).build());
  }
}
