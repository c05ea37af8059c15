package org.wordclass.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The Turkish and Finnish alphabets fold the variants of one suffix that vowel harmony makes
 * into one spelling, and nothing else. The suffixes are those of each language's grammar (common
 * practice): Turkish locative -da/-de, plural -lar/-ler, genitive -ın/-in/-un/-ün; the words are
 * invented or everyday ones (from memory).
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

  /** Finnish: the inessive -ssa/-ssä, the adessive -lla/-llä, the question particle -ko/-kö (common practice). */
  @Test
  void finnishVariantsShareTheirFoldedEnding() {
    EndingAlphabet fi = EndingAlphabet.FINNISH_VOWEL_HARMONY;
    assertEquals(ending(fi.fold("talossa"), 3), ending(fi.fold("kylässä"), 3));
    assertEquals(ending(fi.fold("autolla"), 3), ending(fi.fold("pöydällä"), 3));
    assertEquals(ending(fi.fold("onko"), 2), ending(fi.fold("näkö"), 2));
    assertEquals("kuluu", fi.fold("kylyy"));
    // e and i are neutral in Finnish and stay
    assertEquals("talossa", fi.fold("talossa"));
    assertEquals("kivellä".length(), fi.fold("kivellä").length());
    assertEquals("kivella", fi.fold("kivellä"));
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
    assertEquals("finnish-vowel-harmony", EndingAlphabet.FINNISH_VOWEL_HARMONY.optionName());
  }

  private static String ending(String word, int length) {
    return word.substring(word.length() - length);
  }
}
