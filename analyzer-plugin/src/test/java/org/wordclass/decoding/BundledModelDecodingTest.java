package org.wordclass.decoding;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.stream.Collectors;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.wordclass.model.DefaultModel;
import org.wordclass.model.HmmModel;
import org.wordclass.model.Lexicon;
import org.wordclass.model.StateSpace;
import org.wordclass.model.UnknownWordModel;

/** Decoding the bundled model on random word sequences: numeric range and the lexicon constraint. */
class BundledModelDecodingTest {
  private static final int LONG = 10_000;
  private static final HmmModel MODEL = DefaultModel.get();

  /** Random tokens: lexicon words, and with probability {@code unknownRate} invented words it lacks. */
  static List<String> randomTokens(Random rnd, int length, double unknownRate) {
    Lexicon lexicon = MODEL.lexicon();
    List<String> tokens = new ArrayList<>(length);
    while (tokens.size() < length) {
      String token = rnd.nextDouble() < unknownRate ? inventedWord(rnd) : lexicon.word(rnd.nextInt(lexicon.size()));
      tokens.add(token);
    }
    return tokens;
  }

  /** An invented word of some spelling shape and common ending, not in the lexicon. */
  private static String inventedWord(Random rnd) {
    String[] stems = {"qzvx", "Qzvx", "QZVX", "zq7", "§§"};
    String[] endings = {"", "ing", "ed", "s", "ly", "tion", "9"};
    String word;
    do {
      word = stems[rnd.nextInt(stems.length)] + endings[rnd.nextInt(endings.length)];
    } while (MODEL.lexicon().lookup(word) >= 0);
    return word;
  }

  @ParameterizedTest(name = "order {0}")
  @ValueSource(ints = {1, 2})
  void longSequenceHasFiniteLikelihoodAndNormalisedPosteriors(int order) {
    Decoder decoder = new Decoder(MODEL, order);
    DecoderBruteForceTest.fill(decoder.lattice(), randomTokens(new Random(17L + order), LONG, 0.1));
    double logLikelihood = decoder.forwardBackward();
    assertTrue(Double.isFinite(logLikelihood) && logLikelihood < -LONG, "log-likelihood " + logLikelihood);
    for (int i = 0; i < LONG; i++) {
      double sum = 0;
      for (int k = 0; k < decoder.lattice().candidateCount(i); k++) {
        double p = decoder.posterior(i, k);
        assertTrue(p >= 0 && p <= 1 + 1e-12, "posterior " + p + " at " + i);
        sum += p;
      }
      assertEquals(1.0, sum, 1e-9, "posteriors at position " + i);
    }
    int[] best = new int[LONG];
    decoder.viterbi(best);
    assertTrue(Double.isFinite(decoder.bestLogProbability()), "Viterbi score " + decoder.bestLogProbability());
  }

  /**
   * Forward algorithm in log space (common practice: each step a log-sum-exp, which cannot
   * underflow), computed here independently of the decoder's scaled recursion.
   */
  @Test
  void longSequenceLikelihoodMatchesLogSpaceForward() {
    Decoder decoder = new Decoder(MODEL, 1);
    Lattice lattice = decoder.lattice();
    DecoderBruteForceTest.fill(lattice, randomTokens(new Random(99L), LONG, 0.1));
    double expected = logSpaceForward(lattice);
    DecoderBruteForceTest.assertClose(expected, decoder.forwardBackward(), "log-likelihood of " + LONG + " tokens");
  }

  private static double logSpaceForward(Lattice lattice) {
    int b = MODEL.boundary();
    double[] previous = {0};
    int[] previousTags = {b};
    for (int i = 0; i < lattice.size(); i++) {
      int[] tags = tagsAt(lattice, i);
      double[] here = new double[tags.length];
      for (int k = 0; k < tags.length; k++) {
        double[] terms = new double[previous.length];
        for (int j = 0; j < previous.length; j++) {
          // a word's emission may depend on the previous state: one per (previous, current) pair
          terms[j] = previous[j] + MODEL.logBigram(previousTags[j], tags[k]) + lattice.logEmission(i, j, k);
        }
        here[k] = logSumExp(terms);
      }
      previous = here;
      previousTags = tags;
    }
    double[] terms = new double[previous.length];
    for (int j = 0; j < previous.length; j++) {
      terms[j] = previous[j] + MODEL.logBigram(previousTags[j], b);
    }
    return logSumExp(terms);
  }

  private static double logSumExp(double[] values) {
    double top = Arrays.stream(values).max().orElseThrow();
    if (top == Double.NEGATIVE_INFINITY) {
      return top;
    }
    return top + Math.log(Arrays.stream(values).map(v -> Math.exp(v - top)).sum());
  }

  /** The lexicon constraint: a known word gets one of its own tags, an unknown one an open tag. */
  @Test
  void chosenTagsRespectLexiconAndOpenTags() {
    Random rnd = new Random(4242L);
    Tagger tagger = new Tagger(MODEL);
    Set<Integer> open = openTags(MODEL.unknownWords());
    for (int s = 0; s < 300; s++) {
      List<String> tokens = randomTokens(rnd, 1 + rnd.nextInt(30), 0.3);
      int[] tags = tagger.tag(tokens, false).tags();
      for (int i = 0; i < tags.length; i++) {
        int word = lookupAsTheLatticeDoes(tokens.get(i), i);
        Set<Integer> allowed = word >= 0 ? lexiconTags(word) : open;
        assertTrue(allowed.contains(tags[i]), "tag " + tags[i] + " for '" + tokens.get(i) + "' in " + tokens);
      }
    }
  }

  @Test
  void unknownWordCandidatesAreExactlyTheOpenTags() {
    Random rnd = new Random(77L);
    Lattice lattice = new Lattice(MODEL);
    Set<Integer> open = openTags(MODEL.unknownWords());
    assertTrue(open.size() < MODEL.tags().size(), "some tags should be closed: " + open);
    for (int s = 0; s < 200; s++) {
      lattice.clear();
      lattice.add(inventedWord(rnd));
      Set<Integer> candidates = IntStream.range(0, lattice.candidateCount(0))
          .mapToObj(k -> lattice.candidateTag(0, k)).collect(Collectors.toSet());
      assertEquals(open, candidates);
      assertEquals(open.size(), lattice.candidateCount(0), "no duplicate candidates");
    }
  }

  /**
   * No path the lexicon allows scores -Infinity: every emission of every candidate and every
   * transition between candidates of neighbouring tokens (with the boundary at both ends) is
   * finite, at both orders, for random word sequences.
   */
  @Test
  void noAllowedPathScoresMinusInfinity() {
    Random rnd = new Random(31337L);
    Lattice lattice = new Lattice(MODEL);
    for (int s = 0; s < 300; s++) {
      DecoderBruteForceTest.fill(lattice, randomTokens(rnd, 1 + rnd.nextInt(8), 0.2));
      String where = "sequence " + s;
      for (int i = 0; i < lattice.size(); i++) {
        for (int k = 0; k < lattice.candidateCount(i); k++) {
          assertTrue(Double.isFinite(lattice.candidateLogEmission(i, k)), "emission at " + i + ", " + where);
        }
      }
      for (int i = 0; i <= lattice.size(); i++) {
        checkTransitionsInto(lattice, i, where);
      }
    }
  }

  private static void checkTransitionsInto(Lattice lattice, int i, String where) {
    for (int a : tagsAt(lattice, i - 2)) {
      for (int b : tagsAt(lattice, i - 1)) {
        for (int c : tagsAt(lattice, i)) {
          String what = "transition " + a + " " + b + " -> " + c + " at " + i + ", " + where;
          assertTrue(Double.isFinite(MODEL.logBigram(b, c)), "bigram " + what);
          assertTrue(Double.isFinite(MODEL.logTrigram(a, b, c)), "trigram " + what);
        }
      }
    }
  }

  /** Candidate states of position i; the boundary state outside the sequence. */
  /** Candidate tags at a position, the boundary before the first and after the last token. */
  private static int[] tagsAt(Lattice lattice, int i) {
    if (i < 0 || i >= lattice.size()) {
      return new int[] {MODEL.boundary()};
    }
    return IntStream.range(0, lattice.candidateCount(i)).map(k -> lattice.candidateState(i, k)).toArray();
  }

  private static Set<Integer> openTags(UnknownWordModel unknown) {
    return IntStream.range(0, unknown.openTagCount()).mapToObj(unknown::openTag).collect(Collectors.toSet());
  }

  /** The lexicon holds states; each stands for one tag. */
  private static Set<Integer> lexiconTags(int word) {
    Lexicon lexicon = MODEL.lexicon();
    return IntStream.range(0, lexicon.stateCount(word))
        .mapToObj(k -> MODEL.states().tagOf(lexicon.state(word, k))).collect(Collectors.toSet());
  }

  /**
   * A capitalised first word is looked up in lower case if it is unknown, or (docs/model-format.md,
   * field 8c, bit 1) known only in states of words capitalised in mid-sentence; it keeps its own
   * entry if the lower-case form is unknown.
   */
  private static int lookupAsTheLatticeDoes(String token, int position) {
    int word = MODEL.lexicon().lookup(token);
    boolean lowerCase = word < 0 ? MODEL.cues().lowercaseFirstWord()
        : MODEL.cues().lowercaseMidSentenceFirstWord() && IntStream.range(0, MODEL.lexicon().stateCount(word))
            .allMatch(k -> MODEL.states().flags(MODEL.lexicon().state(word, k)) == StateSpace.CAPITALISED);
    if (lowerCase && position == 0 && Character.isUpperCase(token.charAt(0))) {
      int lower = MODEL.lexicon().lookup(token.toLowerCase(java.util.Locale.ROOT));
      return lower >= 0 ? lower : word;
    }
    return word;
  }
}
