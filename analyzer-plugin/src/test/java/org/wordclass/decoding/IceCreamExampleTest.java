package org.wordclass.decoding;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.wordclass.model.HmmModel;
import org.wordclass.model.Lexicon;
import org.wordclass.model.TagSet;
import org.wordclass.testing.TestModels;

/**
 * A published worked example: Jason Eisner's ice-cream HMM (2002), in the form given in
 * Jurafsky &amp; Martin, "Speech and Language Processing" (3rd ed. draft), appendix on hidden
 * Markov models. The numbers are from memory, not checked against a copy:
 *
 * <pre>
 *   start:  P(HOT) = 0.8   P(COLD) = 0.2
 *   trans:  P(HOT|HOT) = 0.6  P(COLD|HOT) = 0.4  P(HOT|COLD) = 0.5  P(COLD|COLD) = 0.5
 *   emit:   P(1|HOT) = 0.2  P(2|HOT) = 0.4  P(3|HOT) = 0.4
 *           P(1|COLD) = 0.5 P(2|COLD) = 0.4 P(3|COLD) = 0.1
 * </pre>
 *
 * Observations 3 1 3. Forward trellis as recalled: alpha1 = (HOT .32, COLD .02),
 * alpha2(HOT) = .32*.12 + .02*.10 = .0404, alpha2(COLD) = .32*.20 + .02*.25 = .069,
 * alpha3(HOT) = (.0404*.6 + .069*.5)*.4 = .023496, alpha3(COLD) = (.0404*.4 + .069*.5)*.1 = .005066,
 * so P(3 1 3) = .028562.
 *
 * <p>Independent hand calculation, all eight paths (start * emit * (trans * emit)^2):
 * HHH .32*.12*.24 = .009216, HHC .32*.12*.04 = .001536, HCH .32*.20*.20 = .0128,
 * HCC .32*.20*.05 = .0032, CHH .02*.10*.24 = .00048, CHC .02*.10*.04 = .00008,
 * CCH .02*.25*.20 = .001, CCC .02*.25*.05 = .00025; the sum is .028562, and the largest term,
 * HOT COLD HOT = .0128, is the Viterbi path.
 *
 * <p>Mapped onto our model: tags HOT, COLD; words "1", "2", "3" with these emissions; start
 * probabilities as P(tag | boundary). End transitions P(boundary | tag) are set to 1 (log 0), so
 * that they do not change the result; the rows then sum to more than one, which the decoder does
 * not require. The trigram table repeats the bigram one (P(c | a, b) = P(c | b)), so decoding at
 * order 2 must give the same numbers. Emissions are stored as floats in the lexicon, hence a
 * tolerance of 1e-6 relative.
 */
class IceCreamExampleTest {
  private static final int HOT = 0;
  private static final int COLD = 1;
  private static final double P_313 = 0.028562;
  private static final double P_VITERBI = 0.0128;

  @ParameterizedTest(name = "order {0}")
  @ValueSource(ints = {1, 2})
  void forwardProbabilityOfThreeOneThree(int order) {
    Decoder decoder = decoder(order);
    double logLikelihood = decoder.forwardBackward();
    assertEquals(P_313, Math.exp(logLikelihood), P_313 * 1e-6);
  }

  @ParameterizedTest(name = "order {0}")
  @ValueSource(ints = {1, 2})
  void viterbiPathOfThreeOneThree(int order) {
    Decoder decoder = decoder(order);
    int[] best = new int[3];
    decoder.viterbi(best);
    assertArrayEquals(new int[] {HOT, COLD, HOT}, decoder.tagsOf(best));
    assertEquals(P_VITERBI, Math.exp(decoder.bestLogProbability()), P_VITERBI * 1e-6);
  }

  @ParameterizedTest(name = "order {0}")
  @ValueSource(ints = {1, 2})
  void posteriorOfHotOnTheFirstDay(int order) {
    Decoder decoder = decoder(order);
    decoder.forwardBackward();
    // hand calculation: (HHH + HHC + HCH + HCC) / P(3 1 3) = .026752 / .028562
    double expected = 0.026752 / P_313;
    assertEquals(expected, decoder.posterior(0, HOT), expected * 1e-6);
  }

  private static Decoder decoder(int order) {
    Decoder decoder = new Decoder(iceCreamModel(), order);
    DecoderBruteForceTest.fill(decoder.lattice(), List.of("3", "1", "3"));
    return decoder;
  }

  static HmmModel iceCreamModel() {
    int b = 2;
    double[] bigram = new double[9];
    bigram[b * 3 + HOT] = Math.log(0.8);
    bigram[b * 3 + COLD] = Math.log(0.2);
    bigram[b * 3 + b] = Double.NEGATIVE_INFINITY;
    bigram[HOT * 3 + HOT] = Math.log(0.6);
    bigram[HOT * 3 + COLD] = Math.log(0.4);
    bigram[COLD * 3 + HOT] = Math.log(0.5);
    bigram[COLD * 3 + COLD] = Math.log(0.5);
    bigram[HOT * 3 + b] = 0; // log 1: the end transition leaves the result unchanged
    bigram[COLD * 3 + b] = 0;
    double[] trigram = new double[27];
    for (int i = 0; i < 27; i++) {
      trigram[i] = bigram[i % 9];
    }
    Lexicon lexicon = new Lexicon(List.of(
        emissions("1", 0.2, 0.5), emissions("2", 0.4, 0.4), emissions("3", 0.4, 0.1)));
    return new HmmModel(1, new TagSet(List.of("HOT", "COLD")), bigram, trigram, lexicon,
        TestModels.randomUnknownWords(new java.util.Random(1), 2), Map.of());
  }

  private static Lexicon.Entry emissions(String word, double hot, double cold) {
    return new Lexicon.Entry(word, new int[] {HOT, COLD}, new float[] {(float) Math.log(hot), (float) Math.log(cold)});
  }
}
