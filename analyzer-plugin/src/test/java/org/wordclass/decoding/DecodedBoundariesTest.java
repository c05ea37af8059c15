package org.wordclass.decoding;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.wordclass.model.DefaultModel;
import org.wordclass.model.HmmModel;
import org.wordclass.model.Spelling;

/**
 * Sentence boundaries decoded with the tags ({@link SentenceBoundaries#DECODED}) against their
 * definition: the joint probability of a sequence cut into sentences is the product of the
 * sentences' joint probabilities, each decoded on its own. So the decoded Viterbi score must be
 * the best over every way of cutting the sequence before capitalised tokens, its likelihood the
 * sum over them, and each tag's posterior the mixture of the cuts' posteriors weighted by their
 * likelihoods (the definition of a mixture; common practice). Checked on the bundled model, whose
 * capitalised states, lower-case lookups of first words and context emissions all take part.
 */
class DecodedBoundariesTest {
  private static final HmmModel MODEL = DefaultModel.get();
  private static final double TOLERANCE = 1e-8;

  /** Random lexicon words and invented ones, about a third of them capitalised. */
  private static List<String> randomTokens(Random rnd) {
    List<String> tokens = new ArrayList<>();
    for (String token : BundledModelDecodingTest.randomTokens(rnd, 2 + rnd.nextInt(6), 0.2)) {
      tokens.add(rnd.nextInt(3) == 0 && !token.isEmpty() ? Character.toUpperCase(token.charAt(0)) + token.substring(1) : token);
    }
    return tokens;
  }

  @ParameterizedTest(name = "order {0}")
  @ValueSource(ints = {1, 2})
  void decodingAgreesWithEveryCutEnumerated(int order) {
    Random rnd = new Random(0xB0DA1L + order);
    Decoder joint = new Decoder(MODEL, order, SentenceBoundaries.DECODED);
    Decoder alone = new Decoder(MODEL, order, SentenceBoundaries.TOKENIZER);
    int withOpenings = 0;
    for (int s = 0; s < 300; s++) {
      List<String> tokens = randomTokens(rnd);
      String where = tokens + ", order " + order;
      int[] capitals = capitalisedAfterFirst(tokens);
      fill(joint.lattice(), tokens);
      assertEquals(capitals.length, joint.lattice().openings(), where);
      withOpenings += capitals.length > 0 ? 1 : 0;
      int[] best = new int[tokens.size()];
      joint.viterbi(best);
      double viterbi = joint.bestLogProbability();
      double likelihood = joint.forwardBackward();

      double bestCut = Double.NEGATIVE_INFINITY;
      int bestMask = -1;
      double[] cutLikelihood = new double[1 << capitals.length];
      double[][][] cutPosteriors = new double[cutLikelihood.length][][];
      for (int mask = 0; mask < cutLikelihood.length; mask++) {
        double score = 0;
        double logLikelihood = 0;
        cutPosteriors[mask] = new double[tokens.size()][];
        for (int[] piece : pieces(tokens.size(), capitals, mask)) {
          fill(alone.lattice(), tokens.subList(piece[0], piece[1]));
          alone.viterbi(new int[piece[1] - piece[0]]);
          score += alone.bestLogProbability();
          logLikelihood += alone.forwardBackward();
          for (int i = piece[0]; i < piece[1]; i++) {
            cutPosteriors[mask][i] = new double[MODEL.tags().size()];
            alone.tagPosteriors(i - piece[0], cutPosteriors[mask][i]);
          }
        }
        cutLikelihood[mask] = logLikelihood;
        if (score > bestCut) {
          bestCut = score;
          bestMask = mask;
        }
      }
      assertEquals(bestCut, viterbi, TOLERANCE, where);
      assertEquals(logSumExp(cutLikelihood), likelihood, TOLERANCE, where);
      for (int c = 0; c < capitals.length; c++) {
        int p = capitals[c];
        assertEquals((bestMask >> c & 1) == 1, joint.lattice().opensSentence(p, best[p]), where + ": boundary before " + p);
      }
      for (int i = 0; i < tokens.size(); i++) {
        double[] mixed = new double[MODEL.tags().size()];
        for (int mask = 0; mask < cutLikelihood.length; mask++) {
          double weight = Math.exp(cutLikelihood[mask] - likelihood);
          for (int t = 0; t < mixed.length; t++) {
            mixed[t] += weight * cutPosteriors[mask][i][t];
          }
        }
        double[] posteriors = new double[MODEL.tags().size()];
        joint.tagPosteriors(i, posteriors);
        assertArrayEquals(mixed, posteriors, 1e-7, where + ": posteriors of token " + i);
      }
    }
    assertTrue(withOpenings > 100, "too few sequences with a capitalised token after the first: " + withOpenings);
  }

  /** Off, a lattice has no first-word readings and decodes as a lattice always did. */
  @Test
  void tokenizerBoundariesAddNoReading() {
    Decoder decoder = new Decoder(MODEL, 2, SentenceBoundaries.TOKENIZER);
    fill(decoder.lattice(), List.of("We", "waited", "for", "the", "bus", "Run", "if", "you", "can"));
    assertEquals(0, decoder.lattice().openings());
    for (int i = 0; i < decoder.lattice().size(); i++) {
      assertFalse(decoder.lattice().opensSentence(i, decoder.lattice().candidateCount(i) - 1));
    }
  }

  /**
   * Two invented sentences written without a full stop between them, the second opening with an
   * imperative: UD tags an imperative VERB (UD guidelines, common practice). Read in mid-sentence
   * the capitalised verb comes out NOUN or PROPN; with decoded boundaries it opens a sentence.
   */
  @Test
  void imperativeAfterASentenceWithoutFullStop() {
    Tagger joint = new Tagger(MODEL, SentenceBoundaries.DECODED);
    Tagger alone = new Tagger(MODEL, SentenceBoundaries.TOKENIZER);
    for (String text : List.of("The kettle is broken again Start the coffee machine instead",
        "We waited an hour for the bus Run if you want to catch it")) {
      List<String> tokens = Arrays.asList(text.split(" "));
      int verb = tokens.indexOf(text.contains("Start") ? "Start" : "Run");
      Tagger.Tagging decoded = joint.tag(tokens, true);
      assertEquals("VERB", MODEL.tags().name(decoded.tags()[verb]), text);
      assertTrue(decoded.opensSentence()[verb], text);
      assertEquals(1, count(decoded.opensSentence()), text);
      assertFalse("VERB".equals(MODEL.tags().name(alone.tag(tokens, false).tags()[verb])), "without the feature: " + text);
    }
  }

  private static int count(boolean[] flags) {
    int n = 0;
    for (boolean f : flags) {
      n += f ? 1 : 0;
    }
    return n;
  }

  private static void fill(Lattice lattice, List<String> tokens) {
    lattice.clear();
    tokens.forEach(lattice::add);
  }

  private static int[] capitalisedAfterFirst(List<String> tokens) {
    List<Integer> at = new ArrayList<>();
    for (int i = 1; i < tokens.size(); i++) {
      String t = tokens.get(i);
      if (Spelling.startsWithCapital(t.toCharArray(), 0, t.length())) {
        at.add(i);
      }
    }
    return at.stream().mapToInt(Integer::intValue).toArray();
  }

  /** The [from, to) pieces of a sequence of {@code n} tokens cut before {@code capitals[c]} for each bit c of {@code mask}. */
  private static List<int[]> pieces(int n, int[] capitals, int mask) {
    List<int[]> out = new ArrayList<>();
    int from = 0;
    for (int c = 0; c < capitals.length; c++) {
      if ((mask >> c & 1) == 1) {
        out.add(new int[] {from, capitals[c]});
        from = capitals[c];
      }
    }
    out.add(new int[] {from, n});
    return out;
  }

  private static double logSumExp(double[] values) {
    double max = Arrays.stream(values).max().orElseThrow();
    double sum = 0;
    for (double v : values) {
      sum += Math.exp(v - max);
    }
    return max + Math.log(sum);
  }
}
