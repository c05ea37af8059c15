package org.wordclass.model;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;
import org.wordclass.testing.TestModels;

/**
 * A user lexicon applied to a model: listed words take exactly their listed classes with the
 * documented emissions, everything else stays as the model has it, and the model is not touched.
 */
class LexiconOverlayTest {
  /** DET NOUN VERB; the (DET -0.5), run (NOUN -3.25, VERB -4.0), Zürich (NOUN -6.5), walks (NOUN -5.0, VERB -4.75). */
  private static final HmmModel SMALL = TestModels.small();
  private static final int DET = 0;
  private static final int NOUN = 1;
  private static final int VERB = 2;

  private static HmmModel overlay(HmmModel model, String text) throws LexiconFormatException {
    return LexiconOverlay.apply(model, UserLexicon.parse(text.getBytes(StandardCharsets.UTF_8), "test.txt", model.tags()));
  }

  private static int[] states(HmmModel model, String word) {
    int w = model.lexicon().lookup(word);
    return IntStream.range(0, model.lexicon().stateCount(w)).map(k -> model.lexicon().state(w, k)).toArray();
  }

  private static float emission(HmmModel model, String word, int state) {
    int w = model.lexicon().lookup(word);
    for (int k = 0; k < model.lexicon().stateCount(w); k++) {
      if (model.lexicon().state(w, k) == state) {
        return model.lexicon().logEmission(w, k);
      }
    }
    throw new AssertionError(word + " has no state " + state);
  }

  @Test
  void aListedWordTakesOnlyItsListedClassesWithTheModelsEmission() throws Exception {
    HmmModel fixed = overlay(SMALL, "run VERB\n");
    assertArrayEquals(new int[] {VERB}, states(fixed, "run"));
    assertEquals(-4.0f, emission(fixed, "run", VERB));
    assertTrue(fixed.lexicon().isUserListed(fixed.lexicon().lookup("run")));
  }

  @Test
  void aClassNeverSeenWithTheWordGetsTheSmallestEmissionOfItsState() throws Exception {
    HmmModel fixed = overlay(SMALL, "the DET NOUN\nkettle NOUN VERB\n");
    assertArrayEquals(new int[] {DET, NOUN}, states(fixed, "the"));
    assertEquals(-0.5f, emission(fixed, "the", DET));
    assertEquals(-6.5f, emission(fixed, "the", NOUN), "Zürich's, the rarest noun");
    assertEquals(-6.5f, emission(fixed, "kettle", NOUN));
    assertEquals(-4.75f, emission(fixed, "kettle", VERB), "walks', the rarest verb");
    assertEquals(SMALL.lexicon().size() + 1, fixed.lexicon().size());
  }

  @Test
  void onlyRelativeWeightsMatter() throws Exception {
    HmmModel two = overlay(SMALL, "walks NOUN:2 VERB\n");
    HmmModel four = overlay(SMALL, "walks NOUN:4 VERB:2\n");
    assertEquals(-5.0f, emission(two, "walks", NOUN));
    assertEquals((float) (-4.75 + Math.log(0.5)), emission(two, "walks", VERB));
    assertEquals(emission(two, "walks", NOUN), emission(four, "walks", NOUN));
    assertEquals(emission(two, "walks", VERB), emission(four, "walks", VERB));
  }

  @Test
  void unlistedWordsAndTheRestOfTheModelAreUntouched() throws Exception {
    HmmModel fixed = overlay(SMALL, "run VERB\n");
    assertArrayEquals(states(SMALL, "walks"), states(fixed, "walks"));
    assertEquals(emission(SMALL, "walks", VERB), emission(fixed, "walks", VERB));
    assertFalse(fixed.lexicon().isUserListed(fixed.lexicon().lookup("walks")));
    assertEquals(1, fixed.lexicon().userListedCount());
    assertSame(SMALL.tags(), fixed.tags());
    assertSame(SMALL.unknownWords(), fixed.unknownWords());
    assertArrayEquals(SMALL.logTrigramTable(), fixed.logTrigramTable());
    assertArrayEquals(SMALL.logBigramTable(), fixed.logBigramTable());
    // the model itself keeps both classes of "run"
    assertArrayEquals(new int[] {NOUN, VERB}, states(SMALL, "run"));
    assertEquals(0, SMALL.lexicon().userListedCount());
  }

  @Test
  void provenanceKeepsTheModelsAndAddsTheLexicons() throws Exception {
    HmmModel fixed = overlay(SMALL, "run VERB\nkettle NOUN\n");
    assertEquals("invented.conllu", fixed.provenance().get("corpus"));
    assertEquals("test.txt", fixed.provenance().get("lexicon.file"));
    assertEquals("2", fixed.provenance().get("lexicon.entries"));
    assertFalse(SMALL.provenance().containsKey("lexicon.file"));
  }

  @Test
  void caseInsensitiveEntriesApplyToEveryCaseFormAndExactEntriesWin() throws Exception {
    HmmModel fixed = overlay(SMALL, "Run VERB case=any\nRUN NOUN\n");
    for (String form : new String[] {"run", "Run"}) {
      assertArrayEquals(new int[] {VERB}, states(fixed, form), form);
      assertTrue(fixed.lexicon().isUserListed(fixed.lexicon().lookup(form)), form);
    }
    // each form keeps what the model knows of that very spelling: "run" its own, "Run" nothing
    assertEquals(-4.0f, emission(fixed, "run", VERB));
    assertEquals(-4.75f, emission(fixed, "Run", VERB));
    assertArrayEquals(new int[] {NOUN}, states(fixed, "RUN"));
    assertEquals(-1, fixed.lexicon().lookup("rUN"), "mixed case forms are not expanded");
    assertEquals(3, fixed.lexicon().userListedCount());
  }

  @Test
  void aClassMapsToAllItsStatesAndKeepsContextEmissions() throws Exception {
    HmmModel bundled = DefaultModel.get();
    StateSpace space = bundled.states();
    int noun = bundled.tags().indexOf("NOUN");
    int verb = bundled.tags().indexOf("VERB");
    HmmModel fixed = overlay(bundled, "cook NOUN VERB\n");
    int[] expected = IntStream.concat(Arrays.stream(space.statesOf(noun)), Arrays.stream(space.statesOf(verb))).sorted().toArray();
    assertArrayEquals(expected, states(fixed, "cook"));
    assertTrue(space.statesOf(noun).length > 1, "the bundled model splits classes by capitalisation");
    int before = bundled.lexicon().lookup("cook");
    int after = fixed.lexicon().lookup("cook");
    for (int k = 0; k < bundled.lexicon().stateCount(before); k++) {
      int state = bundled.lexicon().state(before, k);
      assertEquals(bundled.lexicon().logEmission(before, k), emission(fixed, "cook", state));
      int kAfter = Arrays.binarySearch(states(fixed, "cook"), state);
      for (int previous = 0; previous <= bundled.boundary(); previous++) {
        assertEquals(bundled.lexicon().contextLogEmission(before, k, previous),
            fixed.lexicon().contextLogEmission(after, kAfter, previous), "context " + previous);
      }
    }
    float[] floor = LexiconOverlay.smallestEmissions(bundled);
    for (int state : space.statesOf(noun)) {
      if (Arrays.binarySearch(states(bundled, "cook"), state) < 0) {
        assertEquals(floor[state], emission(fixed, "cook", state));
      }
    }
  }
}
