package org.wordclass.training;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wordclass.decoding.Decoder;
import org.wordclass.decoding.Lattice;
import org.wordclass.decoding.Tagger;
import org.wordclass.model.HmmModel;
import org.wordclass.model.Lexicon;
import org.wordclass.model.ModelFile;

/**
 * Split-merge training on an invented language whose verb-like class V has two sub-types that no
 * tag shows: "ka" and "ko" are always followed by a word of class A, "ti" and "tu" by one of
 * class B. The word "zim" is both A and B, a little more often A. A model over tags only knows
 * that V is followed by A or B half the time, so it tags every "zim" A; a model that splits V
 * into sub-states learns which V words lead to B and gets "zim" after "ti" right.
 */
class LatentStatesTest {
  @TempDir
  Path dir;

  /** Sentences of one to three V-phrases and a full stop. */
  private static List<TagCounts.TaggedSentence> corpus(int sentences, long seed) {
    Random random = new Random(seed);
    List<TagCounts.TaggedSentence> out = new ArrayList<>();
    for (int s = 0; s < sentences; s++) {
      List<String> words = new ArrayList<>();
      List<String> tags = new ArrayList<>();
      for (int phrase = 0, n = 1 + random.nextInt(3); phrase < n; phrase++) {
        boolean leadsToA = random.nextBoolean();
        words.add(leadsToA ? (random.nextBoolean() ? "ka" : "ko") : (random.nextBoolean() ? "ti" : "tu"));
        tags.add("V");
        // "zim" is 60% of the A words and 40% of the B words
        boolean zim = random.nextDouble() < (leadsToA ? 0.6 : 0.4);
        words.add(zim ? "zim" : leadsToA ? "ap" : "bo");
        tags.add(leadsToA ? "A" : "B");
      }
      words.add(".");
      tags.add("P");
      out.add(new TagCounts.TaggedSentence(words, tags));
    }
    return out;
  }

  private static HmmModel train(TrainingOptions options, List<TagCounts.TaggedSentence> corpus) {
    TagCounts counts = TagCounts.forOptions(options);
    corpus.forEach(s -> counts.add(s.words(), s.tags()));
    return new HmmEstimator(options).estimate(counts, Map.of());
  }

  private static double accuracy(HmmModel model, List<TagCounts.TaggedSentence> sentences) {
    Tagger tagger = new Tagger(model);
    int right = 0;
    int total = 0;
    for (TagCounts.TaggedSentence s : sentences) {
      String[] tags = tagger.tagNames(s.words());
      for (int i = 0; i < tags.length; i++) {
        right += tags[i].equals(s.tags().get(i)) ? 1 : 0;
        total++;
      }
    }
    return (double) right / total;
  }

  /** Log-likelihood of the words with their gold tags, summed over the sub-states of each tag. */
  private static double taggedLogLikelihood(HmmModel model, List<TagCounts.TaggedSentence> sentences) {
    Decoder decoder = new Decoder(model);
    Lattice lattice = decoder.lattice();
    double sum = 0;
    for (TagCounts.TaggedSentence s : sentences) {
      lattice.clear();
      for (int i = 0; i < s.words().size(); i++) {
        lattice.add(s.words().get(i), model.tags().indexOf(s.tags().get(i)));
      }
      sum += decoder.forwardBackward();
    }
    return sum;
  }

  @Test
  void subStatesFindTheHiddenSubTypeAndRaiseLikelihoodAndAccuracy() {
    List<TagCounts.TaggedSentence> train = corpus(400, 1);
    List<TagCounts.TaggedSentence> test = corpus(200, 2);
    for (int order = 1; order <= 2; order++) {
      TrainingOptions plain = TrainingOptions.DEFAULTS.withOrder(order).withCues(true, false, true);
      HmmModel tagsOnly = train(plain, train);
      HmmModel latent = train(plain.withLatentRounds(1), train);

      // 4 states split into 8; half of the 4 splits merged back; the split of V is kept
      assertEquals(6, latent.states().size(), "order " + order);
      assertEquals(2, latent.states().statesOf(latent.tags().indexOf("V")).length, "order " + order);
      assertTrue(taggedLogLikelihood(latent, train) > taggedLogLikelihood(tagsOnly, train) + 50, "order " + order);
      double before = accuracy(tagsOnly, test);
      double after = accuracy(latent, test);
      assertTrue(before < 0.95, "order " + order + ": a model over tags cannot tell, but scored " + before);
      assertTrue(after > 0.995, "order " + order + ": sub-states should tell, but scored " + after);
    }
  }

  @Test
  void emNeverLowersTheTaggedLikelihood() {
    // maximum-likelihood estimates, so that each iteration is an exact EM step
    LatentStates.Settings exact =
        new LatentStates.Settings(6, 0.5, 0, Transitions.Smoothing.MAXIMUM_LIKELIHOOD, 0.05, 7);
    List<TagCounts.TaggedSentence> train = corpus(300, 3);
    for (int order = 1; order <= 2; order++) {
      HmmModel start = train(TrainingOptions.DEFAULTS.withOrder(order).withCues(true, false, true), train);
      LatentStates.Result result = new LatentStates(exact, train).train(start, 2);
      assertEquals(4, result.logLikelihoods().size(), "two phases of EM per round");
      for (double[] phase : result.logLikelihoods()) {
        for (int i = 1; i < phase.length; i++) {
          // tables are stored as floats, which moves the likelihood by a hair
          assertTrue(phase[i] >= phase[i - 1] - 1e-6 * Math.abs(phase[i - 1]),
              "order " + order + ": iteration " + i + " went from " + phase[i - 1] + " to " + phase[i]);
        }
      }
      double[] first = result.logLikelihoods().get(0);
      assertTrue(first[first.length - 1] > first[0] + 1, "EM after the first split should gain something");
    }
  }

  @Test
  void subStatesAreJustStatesToTheModelFile() throws IOException {
    List<TagCounts.TaggedSentence> train = corpus(300, 4);
    HmmModel latent = train(TrainingOptions.DEFAULTS.withOrder(1).withLatentRounds(2), train);
    Path file = dir.resolve("latent.wcm");
    ModelFile.write(latent, file);
    HmmModel read = ModelFile.read(file);
    assertEquals(latent.states(), read.states());
    assertArrayEquals(latent.logBigramTable(), read.logBigramTable());
    assertEquals(latent.lexicon().size(), read.lexicon().size());
    for (int w = 0; w < latent.lexicon().size(); w++) {
      Lexicon.Entry written = latent.lexicon().entries().get(w);
      Lexicon.Entry loaded = read.lexicon().entries().get(w);
      assertEquals(written.word(), loaded.word());
      assertArrayEquals(written.states(), loaded.states());
      assertArrayEquals(written.logEmissions(), loaded.logEmissions());
    }
    assertEquals(latent.provenance(), read.provenance());
    Tagger before = new Tagger(latent);
    Tagger after = new Tagger(read);
    for (TagCounts.TaggedSentence s : corpus(50, 5)) {
      assertArrayEquals(before.tagNames(s.words()), after.tagNames(s.words()));
    }
  }

  @Test
  void trainingIsDeterministic() throws IOException {
    List<TagCounts.TaggedSentence> train = corpus(300, 6);
    TrainingOptions options = TrainingOptions.DEFAULTS.withOrder(2).withLatentRounds(2);
    Path first = dir.resolve("first.wcm");
    Path second = dir.resolve("second.wcm");
    ModelFile.write(train(options, train), first);
    ModelFile.write(train(options, train), second);
    assertArrayEquals(Files.readAllBytes(first), Files.readAllBytes(second));
  }

  @Test
  void latentRoundsNeedTheSentences() {
    TagCounts counts = new TagCounts();
    corpus(10, 8).forEach(s -> counts.add(s.words(), s.tags()));
    HmmEstimator estimator = new HmmEstimator(TrainingOptions.DEFAULTS.withLatentRounds(1));
    assertThrows(IllegalArgumentException.class, () -> estimator.estimate(counts, Map.of()));
    assertThrows(IllegalArgumentException.class, () -> TrainingOptions.DEFAULTS.withLatentRounds(-1));
    assertThrows(IllegalArgumentException.class,
        () -> TrainingOptions.DEFAULTS.withLatentRounds(LatentStates.MAX_ROUNDS + 1));
  }

  @Test
  void aTokenRestrictedToATagItCannotTakeIsRefused() {
    HmmModel model = train(TrainingOptions.DEFAULTS, corpus(50, 9));
    Lattice lattice = new Decoder(model).lattice();
    lattice.add("zim", model.tags().indexOf("B"));
    assertEquals(1, lattice.candidateCount(0));
    assertEquals("B", model.tags().name(lattice.candidateTag(0, 0)));
    assertThrows(IllegalArgumentException.class, () -> lattice.add("ka", model.tags().indexOf("A")));
  }
}
