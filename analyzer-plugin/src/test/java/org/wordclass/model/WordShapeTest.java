package org.wordclass.model;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Spelling shapes, against the definitions in {@link WordShape}'s documentation and the Unicode
 * general categories of the characters (Nd digits, Lu/Lt upper and title case).
 */
class WordShapeTest {
  @ParameterizedTest(name = "{0} -> {1}")
  @CsvSource(delimiter = '|', value = {
      "walked | LOWER", "e-mail | LOWER", "iPhone | LOWER", "x² | LOWER", "über | LOWER",
      "Paris | CAPITALISED", "McDonald | CAPITALISED", "A | CAPITALISED", "Éclair | CAPITALISED",
      "ǅemal | CAPITALISED", "(Paris) | CAPITALISED",
      "NASA | ALL_CAPS", "USB-C | ALL_CAPS", "ÉCOLE | ALL_CAPS", "OK! | ALL_CAPS",
      "2026 | HAS_DIGIT", "3.5mm | HAS_DIGIT", "A4 | HAS_DIGIT", "٣ | HAS_DIGIT", "COVID19 | HAS_DIGIT",
      "... | NO_LETTER", ":-) | NO_LETTER", "§ | NO_LETTER", "€ | NO_LETTER"})
  void classifiesWords(String word, WordShape expected) {
    assertEquals(expected, WordShape.classify(word.toCharArray(), 0, word.length()));
  }

  @Test
  void emptyWordHasNoLetter() {
    assertEquals(WordShape.NO_LETTER, WordShape.classify(new char[0], 0, 0));
  }

  @Test
  void classifiesOnlyTheGivenSlice() {
    char[] buf = "NASA walked 42".toCharArray();
    assertEquals(WordShape.ALL_CAPS, WordShape.classify(buf, 0, 4));
    assertEquals(WordShape.LOWER, WordShape.classify(buf, 5, 6));
    assertEquals(WordShape.HAS_DIGIT, WordShape.classify(buf, 12, 2));
    assertEquals(WordShape.CAPITALISED, WordShape.classify(buf, 0, 1));
  }

  @Test
  void capitalisationOnlyFoldsShapesIntoTwo() {
    assertEquals(WordShape.CAPITALISED, WordShape.ALL_CAPS.capitalisationOnly());
    assertEquals(WordShape.CAPITALISED, WordShape.CAPITALISED.capitalisationOnly());
    assertEquals(WordShape.LOWER, WordShape.LOWER.capitalisationOnly());
    assertEquals(WordShape.LOWER, WordShape.HAS_DIGIT.capitalisationOnly());
    assertEquals(WordShape.LOWER, WordShape.NO_LETTER.capitalisationOnly());
  }

  @Test
  void ordinalsRoundTrip() {
    for (WordShape shape : WordShape.values()) {
      assertEquals(shape, WordShape.of(shape.ordinal()));
    }
  }
}
