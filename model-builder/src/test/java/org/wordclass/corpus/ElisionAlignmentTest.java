package org.wordclass.corpus;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;
import java.util.List;
import org.apache.lucene.analysis.Analyzer;
import org.junit.jupiter.api.Test;

/**
 * The class a standard-tokenizer token gets when it covers several treebank words in the Romance
 * languages: the first word's, unless that word is elided (written with a final apostrophe), then
 * the word's it leans on. Invented sentences, split into words as the UD French GSD, Spanish GSD
 * and Italian treebanks split them (in ../shared/corpora: {@code l'} a word of its own with
 * SpaceAfter=No; {@code du}, {@code del}, {@code della}, {@code dell'} multiword tokens over a
 * preposition and an article). That the standard tokenizer keeps {@code l'homme} whole and the
 * contractions as they are written is UAX #29 word breaking (common practice: the apostrophe
 * between letters does not break a word).
 */
class ElisionAlignmentTest {

  /** A sentence whose words are written with a space after each but those listed in {@code glued}. */
  private static Sentence sentence(String text, List<String> words, List<String> tags, List<Integer> glued,
      List<Sentence.MultiwordToken> multiwordTokens) {
    boolean[] spaces = new boolean[words.size()];
    Arrays.fill(spaces, true);
    glued.forEach(w -> spaces[w] = false);
    return new Sentence(words, tags, text, spaces, "invented.conllu", 1, multiwordTokens);
  }

  /** The standard tokenizer's tokens of {@code s} and the classes they are aligned with, as "token/CLASS". */
  private static List<String> aligned(Sentence s) {
    try (Analyzer analyzer = AnalysisChain.of("standard", List.of()).build()) {
      List<Sentence> out = new AnalyzerAlignment(analyzer, false).align(List.of(s));
      assertEquals(1, out.size(), out::toString);
      Sentence tokens = out.get(0);
      return java.util.stream.IntStream.range(0, tokens.size())
          .mapToObj(i -> tokens.words().get(i) + "/" + tokens.tags().get(i)).toList();
    }
  }

  @Test
  void frenchElidedArticleGivesWayToItsNoun() {
    // l' + homme, d' + eau: written together, the elided word passes the token to its host
    Sentence s = sentence("l'homme boit du thé et d'eau",
        List.of("l'", "homme", "boit", "de", "le", "thé", "et", "d'", "eau"),
        List.of("DET", "NOUN", "VERB", "ADP", "DET", "NOUN", "CCONJ", "ADP", "NOUN"),
        List.of(0, 7), List.of(new Sentence.MultiwordToken(3, 4, "du")));
    assertEquals(List.of("l'homme/NOUN", "boit/VERB", "du/ADP", "thé/NOUN", "et/CCONJ", "d'eau/NOUN"), aligned(s));
  }

  @Test
  void frenchElidedPronounAndConjunctionGiveWayToo() {
    // qu' + il: the conjunction is elided, the pronoun is the host; j' + aime: the verb
    Sentence s = sentence("je sais qu'il dort et j'aime ça",
        List.of("je", "sais", "qu'", "il", "dort", "et", "j'", "aime", "ça"),
        List.of("PRON", "VERB", "SCONJ", "PRON", "VERB", "CCONJ", "PRON", "VERB", "PRON"),
        List.of(2, 6), List.of());
    assertEquals(List.of("je/PRON", "sais/VERB", "qu'il/PRON", "dort/VERB", "et/CCONJ", "j'aime/VERB", "ça/PRON"),
        aligned(s));
  }

  @Test
  void italianContractionTakesThePrepositionUnlessItIsElided() {
    // della = di + la: the preposition; dell' = di + l', written against anno: both lean on the noun
    Sentence s = sentence("la fine della guerra e l'inizio dell'anno",
        List.of("la", "fine", "di", "la", "guerra", "e", "l'", "inizio", "di", "l'", "anno"),
        List.of("DET", "NOUN", "ADP", "DET", "NOUN", "CCONJ", "DET", "NOUN", "ADP", "DET", "NOUN"),
        List.of(6, 9), List.of(new Sentence.MultiwordToken(2, 3, "della"), new Sentence.MultiwordToken(8, 9, "dell'")));
    assertEquals(List.of("la/DET", "fine/NOUN", "della/ADP", "guerra/NOUN", "e/CCONJ", "l'inizio/NOUN",
        "dell'anno/NOUN"), aligned(s));
  }

  @Test
  void italianElisionWrittenWithASpaceIsATokenOfItsOwn() {
    // "l' evoluzione", as some Italian texts write it: two tokens, each with its own word's class
    Sentence s = sentence("capire l' evoluzione",
        List.of("capire", "l'", "evoluzione"), List.of("VERB", "DET", "NOUN"), List.of(), List.of());
    assertEquals(List.of("capire/VERB", "l/DET", "evoluzione/NOUN"), aligned(s));
  }

  @Test
  void spanishContractionsTakeTheirFirstWord() {
    // del = de + el: the preposition; dámelo = da + me + lo: the verb, the clitics go with it
    Sentence s = sentence("dámelo antes del lunes",
        List.of("da", "me", "lo", "antes", "de", "el", "lunes"),
        List.of("VERB", "PRON", "PRON", "ADV", "ADP", "DET", "NOUN"),
        List.of(), List.of(new Sentence.MultiwordToken(0, 2, "dámelo"), new Sentence.MultiwordToken(4, 5, "del")));
    assertEquals(List.of("dámelo/VERB", "antes/ADV", "del/ADP", "lunes/NOUN"), aligned(s));
  }

  @Test
  void typographicApostropheElidesLikeTheTypewriterOne() {
    Sentence s = sentence("l\u2019école", List.of("l\u2019", "école"), List.of("DET", "NOUN"), List.of(0), List.of());
    assertEquals(List.of("l\u2019école/NOUN"), aligned(s));
  }
}
