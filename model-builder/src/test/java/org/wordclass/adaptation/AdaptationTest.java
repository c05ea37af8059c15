package org.wordclass.adaptation;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.wordclass.corpus.Corpus;
import org.wordclass.corpus.CorpusFormat;
import org.wordclass.corpus.Sentence;
import org.wordclass.corpus.TagColumn;
import org.wordclass.decoding.Tagger;
import org.wordclass.model.HmmModel;
import org.wordclass.model.Lexicon;

class AdaptationTest {
  /** Tagged text where sentences mostly start with a noun phrase... */
  private static final List<Sentence> TAGGED = ToyLanguage.sentences(1, 40, 0.2);
  /** ...and untagged text where most start with a pronoun, so re-estimation has something to learn. */
  private static final List<Sentence> UNTAGGED = ToyLanguage.sentences(2, 300, 0.8);

  private static Adaptation.Result adapt(HmmModel start, AdaptationOptions options, Corpus heldOut) throws IOException {
    return new Adaptation(options.withThreads(1), new Adaptation.Listener() {}).adapt(start, ToyLanguage.text(UNTAGGED), heldOut);
  }

  /** EM never lowers the likelihood of the data it is fitted to (Dempster, Laird and Rubin 1977). */
  @ParameterizedTest
  @ValueSource(ints = {1, 2})
  void everyEmIterationRaisesTheLikelihood(int order) throws IOException {
    HmmModel start = ToyLanguage.train(TAGGED, order);
    assertEquals(vocabulary(TAGGED), vocabulary(UNTAGGED), "exact EM needs every word known and every known word in the text");
    List<Adaptation.Iteration> iterations = adapt(start, AdaptationOptions.plainBaumWelch(4), null).iterations();
    assertEquals(5, iterations.size());
    for (int i = 1; i < iterations.size(); i++) {
      double before = iterations.get(i - 1).logLikelihood();
      double after = iterations.get(i).logLikelihood();
      assertTrue(after >= before - 1e-9 * Math.abs(before), "iteration " + i + ": " + before + " -> " + after);
    }
    assertTrue(iterations.get(1).logLikelihood() > iterations.get(0).logLikelihood() + 1, "the first step should gain clearly");
  }

  /**
   * A word written with a capital both first and in mid-sentence has a state of each kind, of
   * which a token admits only those that match its position: the expected counts must still go
   * to the right lexicon states, or the likelihood falls (as it once did).
   */
  @ParameterizedTest
  @ValueSource(booleans = {true, false})
  void capitalisedWordsInBothPositionsKeepEmMonotone(boolean lexiconConstraint) throws IOException {
    List<Sentence> tagged = new java.util.ArrayList<>(ToyLanguage.tagged(3,
        "Rex/PROPN barks/VERB", "we/PRON walk/VERB Rex/PROPN", "Walks/NOUN tire/VERB Rex/PROPN",
        "we/PRON like/VERB Walks/NOUN", "the/DET dog/NOUN barks/VERB"));
    HmmModel start = ToyLanguage.train(tagged, 2);
    TextSource text = ToyLanguage.text(ToyLanguage.tagged(10, "we/PRON like/VERB Rex/PROPN", "Rex/PROPN walk/VERB",
        "Walks/NOUN tire/VERB the/DET dog/NOUN"), tagged);
    List<Adaptation.Iteration> iterations = new Adaptation(
        AdaptationOptions.plainBaumWelch(3).withLexiconConstraint(lexiconConstraint).withThreads(1),
        new Adaptation.Listener() {}).adapt(start, text, null).iterations();
    for (int i = 1; i < iterations.size(); i++) {
      double before = iterations.get(i - 1).logLikelihood();
      double after = iterations.get(i).logLikelihood();
      assertTrue(after >= before - 1e-9 * Math.abs(before), "iteration " + i + ": " + before + " -> " + after);
    }
  }

  private static Set<String> vocabulary(List<Sentence> sentences) {
    return sentences.stream().flatMap(s -> s.words().stream()).collect(Collectors.toCollection(TreeSet::new));
  }

  /**
   * Tagged text shows "walk" only as a noun and verbs after pronouns; the untagged text puts it
   * after pronouns again and again. Only with the constraint off may it become a verb too.
   */
  @Test
  void knownWordsKeepTheirTagsUnderTheLexiconConstraint() throws IOException {
    List<Sentence> tagged = new java.util.ArrayList<>(ToyLanguage.tagged(4, "we/PRON run/VERB fast/ADV", "they/PRON like/VERB the/DET dog/NOUN"));
    tagged.addAll(ToyLanguage.tagged(3, "the/DET walk/NOUN ends/VERB"));
    tagged.addAll(ToyLanguage.tagged(1, "the/DET cat/NOUN sleeps/VERB", "a/DET park/NOUN opens/VERB", "we/PRON jump/VERB"));
    HmmModel start = ToyLanguage.train(tagged, 2);
    TextSource text = ToyLanguage.text(ToyLanguage.tagged(20, "we/PRON walk/VERB", "they/PRON walk/VERB fast/ADV"), tagged);
    AdaptationOptions options = AdaptationOptions.DEFAULTS.withIterations(3, 0).withThreads(1);

    HmmModel constrained = new Adaptation(options, new Adaptation.Listener() {}).adapt(start, text, null).model();
    Lexicon before = start.lexicon();
    for (int w = 0; w < before.size(); w++) {
      assertEquals(tags(before, w), tags(constrained.lexicon(), constrained.lexicon().lookup(before.word(w))), before.word(w));
    }
    HmmModel relaxed = new Adaptation(options.withLexiconConstraint(false), new Adaptation.Listener() {}).adapt(start, text, null).model();
    int verb = start.tags().indexOf("VERB");
    assertEquals(Set.of(start.tags().indexOf("NOUN")), tags(before, before.lookup("walk")));
    assertTrue(tags(relaxed.lexicon(), relaxed.lexicon().lookup("walk")).contains(verb),
        "without the constraint 'walk' should become a verb too, or this test shows nothing");
  }

  private static Set<Integer> tags(Lexicon lexicon, int word) {
    Set<Integer> tags = new HashSet<>();
    for (int k = 0; k < lexicon.stateCount(word); k++) {
      tags.add(lexicon.state(word, k));
    }
    return tags;
  }

  @ParameterizedTest
  @ValueSource(ints = {1, 2})
  void zeroWeightForTheNewEstimateKeepsTheStartingParameters(int order) throws IOException {
    HmmModel start = ToyLanguage.train(TAGGED, order);
    HmmModel adapted = adapt(start, AdaptationOptions.DEFAULTS.withIterations(2, 0).withNewWeight(0).withAddedWords(1), null).model();
    assertArrayEquals(start.logBigramTable(), adapted.logBigramTable());
    assertArrayEquals(start.logTrigramTable(), adapted.logTrigramTable());
    assertEquals(start.lexicon().size(), adapted.lexicon().size());
    for (int w = 0; w < start.lexicon().size(); w++) {
      Lexicon.Entry expected = start.lexicon().entries().get(w);
      Lexicon.Entry actual = adapted.lexicon().entries().get(w);
      assertEquals(expected.word(), actual.word());
      assertArrayEquals(expected.states(), actual.states());
      assertArrayEquals(expected.logEmissions(), actual.logEmissions());
    }
    // and a positive weight does change them, so the comparison above can tell
    HmmModel moved = adapt(start, AdaptationOptions.DEFAULTS.withIterations(1, 0).withNewWeight(0.5), null).model();
    assertTrue(!Arrays.equals(start.logBigramTable(), moved.logBigramTable()));
  }

  /**
   * The held-out file is the starting model's own tagging, so any change in how the model tags
   * it lowers held-out accuracy; unweighted re-estimation on differently distributed text does
   * change it.
   */
  @Test
  void earlyStopKeepsTheBestModelWhenHeldOutAccuracyDrops(@TempDir Path dir) throws IOException {
    HmmModel start = ToyLanguage.train(ToyLanguage.sentences(4, 12, 0.1), 2);
    Tagger tagger = new Tagger(start);
    List<Sentence> ownTagging = ToyLanguage.sentences(5, 60, 0.5).stream().map(s -> {
      List<String> tags = List.of(tagger.tagNames(s.words()));
      return new Sentence(s.words(), tags, null, s.spaceAfter(), "held-out", s.line(), List.of());
    }).toList();
    Corpus heldOut = new Corpus(List.of(ToyLanguage.write(ownTagging, dir.resolve("held-out.txt"))), CorpusFormat.PLAIN, TagColumn.XPOS);

    Adaptation.Result result = adapt(start, AdaptationOptions.plainBaumWelch(5), heldOut);

    assertEquals(1.0, result.iterations().get(0).heldOutAccuracy());
    assertEquals(Adaptation.Stop.HELD_OUT_DROPPED, result.stop());
    assertEquals(0, result.keptIteration());
    assertTrue(result.iterations().size() < 6, "iterating should stop at the drop");
    assertArrayEquals(start.logTrigramTable(), result.model().logTrigramTable());
    assertEquals("held-out-dropped", result.model().provenance().get("adapt.stop"));
  }

  @ParameterizedTest
  @ValueSource(ints = {1, 2})
  void severalThreadsCountWhatOneThreadCounts(int order) throws IOException {
    HmmModel start = ToyLanguage.train(TAGGED, order);
    AdaptationOptions options = AdaptationOptions.DEFAULTS.withIterations(3, 0).withLexiconConstraint(false);
    ExpectedCounts one = new ExpectationPass(start, order, true, 1, 7).run(ToyLanguage.text(UNTAGGED), n -> {});
    ExpectedCounts three = new ExpectationPass(start, order, true, 3, 7).run(ToyLanguage.text(UNTAGGED), n -> {});
    assertClose(one.transitions, three.transitions);
    assertClose(one.pairs, three.pairs);
    assertEquals(one.logLikelihood, three.logLikelihood, 1e-9 * Math.abs(one.logLikelihood));
    assertEquals(one.sentences, three.sentences);

    HmmModel single = new Adaptation(options.withThreads(1), new Adaptation.Listener() {})
        .adapt(start, ToyLanguage.text(UNTAGGED), null).model();
    HmmModel parallel = new Adaptation(options.withThreads(2), new Adaptation.Listener() {})
        .adapt(start, ToyLanguage.text(UNTAGGED), null).model();
    assertClose(single.logTrigramTable(), parallel.logTrigramTable());
    assertClose(single.logBigramTable(), parallel.logBigramTable());
  }

  private static void assertClose(double[] expected, double[] actual) {
    assertEquals(expected.length, actual.length);
    for (int i = 0; i < expected.length; i++) {
      assertEquals(expected[i], actual[i], 1e-9 * Math.max(1, Math.abs(expected[i])), "entry " + i);
    }
  }
}
