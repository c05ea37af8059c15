package org.wordclass.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Consumer;
import java.util.function.ToDoubleFunction;
import org.wordclass.corpus.Corpus;
import org.wordclass.corpus.Sentence;
import org.wordclass.corpus.TagColumn;
import org.wordclass.evaluation.Evaluation;
import org.wordclass.evaluation.EvaluationReport;
import org.wordclass.evaluation.Figures;
import org.wordclass.training.HmmEstimator;
import org.wordclass.training.TagCounts;
import org.wordclass.training.TrainingOptions;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;

/**
 * {@code wordclass cross-validate}: K-fold cross-validation. Sentence i belongs to fold i mod K;
 * each fold is tagged by a model trained on all the others. The corpus is streamed, two passes
 * per fold, so only one fold's counts and model are in memory at a time.
 */
@Command(name = "cross-validate", mixinStandardHelpOptions = true,
    description = "Estimates how well a model trained on the corpus tags unseen text: splits it into K folds "
        + "(sentence i into fold i mod K), trains on K-1 and tags the remaining one, for each fold.")
final class CrossValidateCommand extends BaseCommand {
  @Mixin
  CorpusOptions corpus;

  @Mixin
  TrainingOptionsMixin training;

  @Mixin
  AnalyzerOptions analysis;

  @Option(names = "--folds", required = true, paramLabel = "K", description = "Number of folds, at least 2.")
  int folds;

  @Option(names = "--report", paramLabel = "FILE", description = "Also write the results as JSON.")
  Path json;

  /** One fold's scores. */
  record FoldResult(int fold, long sentences, long tokens, double accuracy, double knownAccuracy, double unknownAccuracy) {}

  /** All folds; the top-level accuracies are means over folds, with their standard deviations. */
  record CrossValidationReport(
      int folds,
      long tokens,
      double accuracy,
      double knownAccuracy,
      double unknownAccuracy,
      double accuracyStandardDeviation,
      double knownAccuracyStandardDeviation,
      double unknownAccuracyStandardDeviation,
      List<FoldResult> perFold) {}

  @Override
  public Integer call() throws Exception {
    if (folds < 2) {
      throw new ParameterException(spec.commandLine(), "--folds must be at least 2, not " + folds);
    }
    TrainingOptions options = training.toOptions();
    new CommandFiles().countedInputs("--corpus", corpus.files).output("--report", json).check();
    Corpus input = corpus.open(TagColumn.UPOS);
    Progress progress = Progress.start("cross-validate", input, 2 * folds, err());
    List<FoldResult> results = new ArrayList<>();
    try {
      for (int fold = 0; fold < folds; fold++) {
        results.add(runFold(fold, input, options, progress));
      }
    } finally {
      analysis.close();
    }
    progress.finish();
    CrossValidationReport report = summarise(results);
    print(report);
    if (json != null) {
      Json.write(json, report);
    }
    return OK;
  }

  private FoldResult runFold(int fold, Corpus input, TrainingOptions options, Progress progress) {
    TagCounts counts = TagCounts.forOptions(options);
    long[] seen = new long[1];
    progress.read(input, analysis.feeding(inFold(fold, false, counts::add, seen)));
    analysis.finish();
    if (seen[0] < folds) {
      throw new ParameterException(spec.commandLine(),
          "--folds " + folds + " is more than the " + seen[0] + " sentences of the corpus");
    }
    Evaluation evaluation = new Evaluation(new HmmEstimator(options).estimate(counts, Map.of()));
    progress.read(input, analysis.feeding(inFold(fold, true, evaluation::add, new long[1])));
    analysis.finish();
    EvaluationReport r = evaluation.report();
    FoldResult result = new FoldResult(fold + 1, r.sentences(), r.tokens(), r.accuracy(), r.knownAccuracy(), r.unknownAccuracy());
    out().printf(Locale.ROOT, "fold %d/%d  accuracy %s  known %s  unknown %s  (%d tokens)%n", result.fold(), folds,
        Figures.format("%.4f", result.accuracy()), Figures.format("%.4f", result.knownAccuracy()),
        Figures.format("%.4f", result.unknownAccuracy()), result.tokens());
    out().flush();
    return result;
  }

  /**
   * Passes on the sentences of fold {@code fold} ({@code held} true) or of all other folds,
   * counting every sentence of the pass in {@code seen[0]}.
   */
  private Consumer<Sentence> inFold(int fold, boolean held, Consumer<Sentence> action, long[] seen) {
    return sentence -> {
      boolean inFold = seen[0]++ % folds == fold;
      if (inFold == held) {
        action.accept(sentence);
      }
    };
  }

  private CrossValidationReport summarise(List<FoldResult> results) {
    long tokens = results.stream().mapToLong(FoldResult::tokens).sum();
    return new CrossValidationReport(folds, tokens,
        mean(results, FoldResult::accuracy), mean(results, FoldResult::knownAccuracy),
        mean(results, FoldResult::unknownAccuracy), deviation(results, FoldResult::accuracy),
        deviation(results, FoldResult::knownAccuracy), deviation(results, FoldResult::unknownAccuracy),
        List.copyOf(results));
  }

  private void print(CrossValidationReport r) {
    out().printf(Locale.ROOT, "mean      accuracy %s  known %s  unknown %s  (%d tokens)%n",
        meanAndDeviation(r.accuracy(), r.accuracyStandardDeviation()),
        meanAndDeviation(r.knownAccuracy(), r.knownAccuracyStandardDeviation()),
        meanAndDeviation(r.unknownAccuracy(), r.unknownAccuracyStandardDeviation()), r.tokens());
    out().flush();
  }

  /** {@code 0.9512 ± 0.0031}; the deviation left out where only one fold defines the figure, {@code none} where none does. */
  private static String meanAndDeviation(double mean, double deviation) {
    return Figures.format("%.4f", mean) + (Double.isNaN(deviation) ? "" : " ± " + Figures.format("%.4f", deviation));
  }

  /** Mean over the folds where the figure is defined (a fold may have no unknown words). */
  static double mean(List<FoldResult> results, ToDoubleFunction<FoldResult> figure) {
    return results.stream().mapToDouble(figure).filter(v -> !Double.isNaN(v)).average().orElse(Double.NaN);
  }

  /** Sample standard deviation over the folds where the figure is defined. */
  static double deviation(List<FoldResult> results, ToDoubleFunction<FoldResult> figure) {
    double[] values = results.stream().mapToDouble(figure).filter(v -> !Double.isNaN(v)).toArray();
    if (values.length < 2) {
      return Double.NaN;
    }
    double mean = Arrays.stream(values).average().getAsDouble();
    double squares = Arrays.stream(values).map(v -> (v - mean) * (v - mean)).sum();
    return Math.sqrt(squares / (values.length - 1));
  }
}
