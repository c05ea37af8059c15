package org.wordclass.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The Turkish alphabet folds the variants of one suffix that vowel harmony makes into one
 * spelling, and nothing else. The suffixes are those of Turkish grammar (common practice): the
 * locative -da/-de, the plural -lar/-ler, the genitive -ın/-in/-un/-ün; the words are invented
 * or everyday ones (from memory).
 */
class EndingAlphabetTest {
  private static final EndingAlphabet TR = EndingAlphabet.TURKISH_VOWEL_HARMONY;

  @Test
  void variantsOfOneSuffixShareTheirFoldedEnding() {
    assertEquals(ending(TR.fold("okulda"), 2), ending(TR.fold("evde"), 2));
    assertEquals(ending(TR.fold("kapılarda"), 5), ending(TR.fold("evlerde"), 5));
    List<String> genitives = List.of("kızın", "evin", "okulun", "gözün");
    for (String w : genitives) {
      assertEquals("ın", ending(TR.fold(w), 2), w);
    }
    assertEquals(ending(TR.fold("GÖZÜN"), 2), ending(TR.fold("KIZIN"), 2));
  }

  @Test
  void consonantsAndLengthAreKept() {
    // -da and -ta (after a voiceless consonant) stay apart: only vowels are folded
    assertNotEquals(ending(TR.fold("kitapta"), 2), ending(TR.fold("evde"), 2));
    for (String w : List.of("İstanbul'un", "Ankara'da", "çiçekçiler", "")) {
      assertEquals(w.length(), TR.fold(w).length(), w);
    }
    assertEquals("kapı", TR.fold("kapı"));
  }

  @Test
  void asWrittenChangesNothing() {
    for (String w : List.of("evlerde", "İstanbul'un", "Straße", "ÉTÉ")) {
      assertEquals(w, EndingAlphabet.AS_WRITTEN.fold(w));
    }
  }

  @Test
  void optionNamesAreThoseOfTrain() {
    assertEquals("as-written", EndingAlphabet.AS_WRITTEN.optionName());
    assertEquals("turkish-vowel-harmony", TR.optionName());
  }

  private static String ending(String word, int length) {
    return word.substring(word.length() - length);
  }
}
