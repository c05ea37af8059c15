package org.wordclass.decoding;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.wordclass.model.DefaultModel;
import org.wordclass.model.HmmModel;
import org.wordclass.model.LexiconFormatException;
import org.wordclass.model.LexiconOverlay;
import org.wordclass.model.UserLexicon;

/**
 * Mistakes of the bundled model on invented kitchen sentences, corrected by one-line user
 * lexicons, with the words around still decoded in context; and how the lattice reports where
 * each token's candidates came from.
 */
class UserLexiconDecodingTest {
  private static final HmmModel BUNDLED = DefaultModel.get();

  private static HmmModel withLexicon(String text) throws LexiconFormatException {
    return LexiconOverlay.apply(BUNDLED, UserLexicon.parse(text.getBytes(StandardCharsets.UTF_8), "kitchen.txt", BUNDLED.tags()));
  }

  private static List<String> tags(HmmModel model, String sentence) {
    return List.of(new Tagger(model).tagNames(List.of(sentence.split(" "))));
  }

  @Test
  void aOneLineLexiconMakesTheCookANoun() throws Exception {
    assertEquals(List.of("DET", "VERB", "VERB", "DET", "NOUN"), tags(BUNDLED, "The cook tastes the broth"));
    // both classes allowed: the context, not the lexicon, picks the noun here
    assertEquals(List.of("DET", "NOUN", "VERB", "DET", "NOUN"), tags(withLexicon("cook NOUN VERB\n"), "The cook tastes the broth"));
  }

  @Test
  void theListedClassesAreStillChosenByContext() throws Exception {
    assertEquals(List.of("PROPN", "DET", "ADJ", "DET", "NOUN"), tags(BUNDLED, "Baste the roast every hour"));
    assertEquals(List.of("PRON", "ADJ", "DET", "NOUN"), tags(BUNDLED, "We roast the peppers"));
    HmmModel fixed = withLexicon("roast NOUN VERB\n");
    assertEquals(List.of("DET", "NOUN"), tags(fixed, "Baste the roast every hour").subList(1, 3));
    assertEquals(List.of("PRON", "VERB", "DET", "NOUN"), tags(fixed, "We roast the peppers"));
  }

  @Test
  void caseInsensitiveEntriesMatchAtTheStartAndInsideASentence() throws Exception {
    assertEquals("PROPN", tags(BUNDLED, "Zest the lemon").get(0));
    HmmModel fixed = withLexicon("zest VERB NOUN case=any\n");
    assertEquals(List.of("VERB", "DET", "NOUN"), tags(fixed, "Zest the lemon"));
    assertEquals(List.of("PRON", "VERB", "DET", "NOUN"), tags(fixed, "We zest the lemon"));
    assertEquals(List.of("DET", "NOUN", "AUX", "ADJ"), tags(fixed, "The ZEST is fresh"));
  }

  @Test
  void latticeSaysHowEachTokensCandidatesWereChosen() throws Exception {
    Lattice lattice = new Lattice(withLexicon("cook NOUN VERB\n"));
    for (String token : "Stir the broth the cook made".split(" ")) {
      lattice.add(token);
    }
    assertEquals(List.of(CandidateSource.LOWERCASED_FIRST_WORD, CandidateSource.KNOWN, CandidateSource.UNKNOWN,
        CandidateSource.KNOWN, CandidateSource.USER_LEXICON, CandidateSource.KNOWN), sources(lattice));
    assertEquals("oth".length(), lattice.matchedEndingLength(2), "the suffix model's longest ending of 'broth'");
    assertEquals(0, lattice.matchedEndingLength(0));
    assertEquals(0, lattice.matchedEndingLength(4));
  }

  @Test
  void aUserWordFoundInLowerCaseAtTheStartIsReportedAsTheUsers() throws Exception {
    Lattice lattice = new Lattice(withLexicon("baste VERB\n"));
    lattice.add("Baste");
    lattice.add("baste");
    assertEquals(List.of(CandidateSource.USER_LEXICON, CandidateSource.USER_LEXICON), sources(lattice));
  }

  @Test
  void reportingSourcesAllocatesNothingPerToken() throws Exception {
    Decoder decoder = new Decoder(withLexicon("cook NOUN VERB\nzest VERB case=any\n"));
    char[][] tokens = Arrays.stream("Zest the broth the cook made for Qwertyville".split(" "))
        .map(String::toCharArray).toArray(char[][]::new);
    int[] best = new int[tokens.length];
    long[] checksum = new long[1];
    Runnable sentence = () -> {
      Lattice lattice = decoder.lattice();
      lattice.clear();
      for (char[] t : tokens) {
        lattice.add(t, 0, t.length);
      }
      decoder.viterbi(best);
      for (int i = 0; i < lattice.size(); i++) {
        checksum[0] += lattice.source(i).ordinal() + lattice.matchedEndingLength(i);
      }
    };
    for (int i = 0; i < 2_000; i++) {
      sentence.run(); // warm up: buffers reach their size, code is compiled
    }
    com.sun.management.ThreadMXBean threads = (com.sun.management.ThreadMXBean) java.lang.management.ManagementFactory.getThreadMXBean();
    long before = threads.getCurrentThreadAllocatedBytes();
    for (int i = 0; i < 2_000; i++) {
      sentence.run();
    }
    long allocated = threads.getCurrentThreadAllocatedBytes() - before;
    // 16,000 tokens: a single object per token would be well over 100 KB
    assertTrue(allocated < 4_096, allocated + " bytes allocated");
    assertTrue(checksum[0] > 0);
  }

  private static List<CandidateSource> sources(Lattice lattice) {
    CandidateSource[] out = new CandidateSource[lattice.size()];
    Arrays.setAll(out, lattice::source);
    return List.of(out);
  }

  @Test
  void explanationsGiveTagPosteriorsThatSumToOne() throws Exception {
    Tagger tagger = new Tagger(withLexicon("roast NOUN VERB\n"));
    List<Tagger.Explanation> explained = tagger.explain(List.of("We", "roast", "the", "broth"));
    assertEquals(4, explained.size());
    Tagger.Explanation roast = explained.get(1);
    assertEquals(CandidateSource.USER_LEXICON, roast.source());
    assertEquals("VERB", BUNDLED.tags().name(roast.tag()));
    assertEquals(roast.confidence(), roast.tagPosteriors()[roast.tag()], 1e-12);
    for (Tagger.Explanation e : explained) {
      assertEquals(1.0, Arrays.stream(e.tagPosteriors()).sum(), 1e-9, e.token());
    }
    // only the listed classes have any probability
    double[] posteriors = roast.tagPosteriors();
    double listed = posteriors[BUNDLED.tags().indexOf("NOUN")] + posteriors[BUNDLED.tags().indexOf("VERB")];
    assertEquals(1.0, listed, 1e-9);
    assertTrue(posteriors[BUNDLED.tags().indexOf("NOUN")] > 0, "the other listed class stays a candidate");
    Tagger.Explanation broth = explained.get(3);
    assertEquals(CandidateSource.UNKNOWN, broth.source());
    assertEquals(3, broth.matchedEndingLength());
    assertArrayEquals(new int[] {0, 0, 0}, new int[] {explained.get(0).matchedEndingLength(),
        explained.get(1).matchedEndingLength(), explained.get(2).matchedEndingLength()});
  }
}
