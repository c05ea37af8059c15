package org.wordclass.decoding;

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
}
