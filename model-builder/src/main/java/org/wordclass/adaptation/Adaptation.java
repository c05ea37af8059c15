package org.wordclass.adaptation;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import org.wordclass.corpus.Corpus;
import org.wordclass.evaluation.Evaluation;
import org.wordclass.model.HmmModel;

/**
 * Adapts a model to untagged text by Baum-Welch re-estimation (EM with forward-backward): each
 * iteration counts the expected transitions and word/tag pairs of the text under the current
 * model ({@link ExpectationPass}) and re-estimates transitions and known-word emissions from them
 * ({@link Reestimation}). The tag set and the unknown-word model stay as they are.
 *
 * <p>Re-estimation maximises the likelihood of the text, not tagging accuracy, and can lower
 * accuracy when the starting model was trained on plenty of tagged text (Merialdo 1994). Hence
 * the safeguards of {@link AdaptationOptions}: the lexicon constraint, interpolation with the
 * starting model, a bound on iterations and on the gain worth another pass, and, with a tagged
 * held-out corpus, an early stop that keeps the best model once held-out accuracy drops.
 *
 * <p>Iteration 0 is the starting model; iteration {@code i} is the model after {@code i}
 * re-estimations. Each model's log-likelihood is measured by the pass that also counts for the
 * next one, so {@code i} iterations cost {@code i + 1} passes over the text. The log-likelihood
 * leaves out a constant per unknown token (see {@link org.wordclass.decoding.Decoder}), so it
 * is comparable between iterations only while the set of known words stays the same: the gain of
 * the iteration that adds words to the lexicon is not defined.
 *
 * <p>The command-line {@code adapt} command is a thin shell around {@link #adapt}.
 */
public final class Adaptation {
  /** Hears about progress; all calls come from the thread that called {@link #adapt}. */
  public interface Listener {
    /** A pass over the text starts for the model of {@code iteration}. */
    default void passStarted(int iteration) {}

    /** {@code sentences} read so far in the current pass (every {@value ExpectationPass#PROGRESS_EVERY}). */
    default void progress(int iteration, long sentences) {}

    /** One model measured; {@code model} is that iteration's model, before provenance is added. */
    default void iterationFinished(Iteration iteration, HmmModel model) {}
  }

  /**
   * The figures of one model: iteration 0 is the starting model.
   *
   * @param relativeGain {@code (LL_i - LL_{i-1}) / |LL_{i-1}|}; NaN for iteration 0 and when the
   *     lexicon grew
   * @param heldOutAccuracy token accuracy on the held-out corpus, NaN without one
   * @param impossibleSentences sentences the model gives probability zero (none, normally)
   */
  public record Iteration(int number, double logLikelihood, double relativeGain, long sentences, long tokens,
      long impossibleSentences, int lexiconWords, double heldOutAccuracy, double seconds) {
    @Override
    public String toString() {
      // a gain or accuracy that is not defined is left out rather than printed as NaN
      return String.format(Locale.ROOT, "iteration %d: log-likelihood %.6e%s, %d sentences, %d tokens, %d lexicon words%s, %.1f s",
          number, logLikelihood, Double.isNaN(relativeGain) ? "" : String.format(Locale.ROOT, " (gain %.3e)", relativeGain),
          sentences, tokens, lexiconWords,
          Double.isNaN(heldOutAccuracy) ? "" : String.format(Locale.ROOT, ", held-out accuracy %.4f", heldOutAccuracy), seconds);
    }
  }

  /** Why iterating stopped. */
  public enum Stop {
    /** The maximum number of iterations ran. */
    ITERATIONS,
    /** The log-likelihood gain fell below the threshold. */
    CONVERGED,
    /** Held-out accuracy dropped; the best model before the drop is kept. */
    HELD_OUT_DROPPED
  }

  /** The adapted model (with its provenance), every iteration's figures, and which model was kept. */
  public record Result(HmmModel model, List<Iteration> iterations, int keptIteration, Stop stop) {}

  private final AdaptationOptions options;
  private final Listener listener;

  public Adaptation(AdaptationOptions options, Listener listener) {
    this.options = options;
    this.listener = listener;
  }

  /**
   * Adapts {@code start} to {@code text}; decodes at the model's own order.
   *
   * @param heldOut tagged sentences for the early stop, or null for none
   */
  public Result adapt(HmmModel start, TextSource text, Corpus heldOut) throws IOException {
    Reestimation reestimation = new Reestimation(start, options);
    List<Iteration> history = new ArrayList<>();
    HmmModel current = start;
    long began = System.nanoTime();
    ExpectedCounts counts = expect(current, text, 0, options.addWordsMinCount() > 0);
    history.add(measure(0, counts, current, heldOut, Double.NaN, began));
    HmmModel best = start;
    int bestIteration = 0;
    Stop stop = Stop.ITERATIONS;
    for (int i = 1; i <= options.maxIterations(); i++) {
      began = System.nanoTime();
      Map<String, double[]> added = i == 1 ? frequentUnknownWords(counts) : Map.of();
      current = reestimation.next(counts, start.order(), added);
      double previous = counts.logLikelihood;
      counts = expect(current, text, i, false);
      double gain = added.isEmpty() ? (counts.logLikelihood - previous) / Math.abs(previous) : Double.NaN;
      Iteration measured = measure(i, counts, current, heldOut, gain, began);
      history.add(measured);
      if (heldOut != null && measured.heldOutAccuracy() < history.get(bestIteration).heldOutAccuracy()) {
        stop = Stop.HELD_OUT_DROPPED;
        break;
      }
      best = current;
      bestIteration = i;
      if (gain < options.minRelativeGain()) {
        stop = Stop.CONVERGED;
        break;
      }
    }
    return new Result(withProvenance(best, start, text, heldOut, history.get(bestIteration), stop), history,
        bestIteration, stop);
  }

  private ExpectedCounts expect(HmmModel model, TextSource text, int iteration, boolean collectUnknownWords)
      throws IOException {
    listener.passStarted(iteration);
    HmmModel working = options.lexiconConstraint() ? model : RelaxedLexicon.relax(model, options.relaxedFloor());
    ExpectationPass pass = new ExpectationPass(working, model.order(), collectUnknownWords, options.threads(),
        options.batchSentences());
    return pass.run(text, sentences -> listener.progress(iteration, sentences));
  }

  private Iteration measure(int number, ExpectedCounts counts, HmmModel model, Corpus heldOut, double gain, long began) {
    double accuracy = heldOut == null ? Double.NaN : accuracy(model, heldOut);
    Iteration iteration = new Iteration(number, counts.logLikelihood, gain, counts.sentences, counts.tokens,
        counts.impossible, model.lexicon().size(), accuracy, (System.nanoTime() - began) / 1e9);
    listener.iterationFinished(iteration, model);
    return iteration;
  }

  /** Token accuracy of {@code model} on tagged sentences. */
  public static double accuracy(HmmModel model, Corpus corpus) {
    Evaluation evaluation = new Evaluation(model);
    corpus.forEachSentence(evaluation::add);
    return evaluation.accuracy();
  }

  /** Unknown words seen at least the configured number of times, with their expected open-tag counts. */
  private Map<String, double[]> frequentUnknownWords(ExpectedCounts counts) {
    Map<String, double[]> frequent = new TreeMap<>();
    if (counts.unknownWords == null) {
      return frequent;
    }
    counts.unknownWords.forEach((word, expected) -> {
      int occurrences = (int) expected[expected.length - 1];
      if (occurrences >= options.addWordsMinCount()) {
        frequent.put(word, Arrays.copyOf(expected, expected.length - 1));
      }
    });
    return frequent;
  }

  private HmmModel withProvenance(HmmModel model, HmmModel start, TextSource text, Corpus heldOut, Iteration kept,
      Stop stop) {
    Map<String, String> provenance = new TreeMap<>(start.provenance());
    provenance.putAll(text.describe());
    provenance.putAll(options.describe());
    provenance.put("adapt.iterations", Integer.toString(kept.number()));
    provenance.put("adapt.stop", stop.name().toLowerCase(Locale.ROOT).replace('_', '-'));
    provenance.put("adapt.logLikelihood", Double.toString(kept.logLikelihood()));
    provenance.put("adapt.sentences", Long.toString(kept.sentences()));
    provenance.put("adapt.tokens", Long.toString(kept.tokens()));
    if (heldOut != null) {
      heldOut.sha256ByFile().forEach((file, sha) -> provenance.put("adapt.heldOut." + file, "sha256:" + sha));
      provenance.put("adapt.heldOutAccuracy", Double.toString(kept.heldOutAccuracy()));
    }
    return model.withParameters(model.logBigramTable(), model.logTrigramTable(), model.lexicon(), provenance);
  }
}
