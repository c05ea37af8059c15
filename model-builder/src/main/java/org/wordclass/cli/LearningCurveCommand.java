package org.wordclass.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.wordclass.corpus.Corpus;
import org.wordclass.corpus.CorpusFormat;
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
 * {@code wordclass learning-curve}: trains on growing first parts of a corpus and scores each
 * model on another corpus, to show how accuracy grows with tagged data (and where more data stops
 * paying). Prints a table; optionally writes it as JSON and draws it as a PNG.
 */
@Command(name = "learning-curve", mixinStandardHelpOptions = true,
    description = "Trains on the first N sentences of the training corpus for each N and scores every model "
        + "on the evaluation corpus: accuracy against training-set size.")
final class LearningCurveCommand extends BaseCommand {
  @Mixin
  CorpusOptions corpus;

  @Mixin
  TrainingOptionsMixin training;

  @Option(names = "--eval", required = true, paramLabel = "FILE", description = "The tagged corpus each model is scored on.")
  Path eval;

  @Option(names = "--sizes", split = ",", paramLabel = "N,N,...", defaultValue = "250,500,1000,2000,4000,8000,100000000",
      description = "Training-set sizes in sentences; a size beyond the corpus means all of it. Default: ${DEFAULT-VALUE}.")
  List<Integer> sizes;

  @Option(names = "--report", paramLabel = "FILE", description = "Also write the points as JSON.")
  Path json;

  @Option(names = "--png", paramLabel = "FILE", description = "Also draw the curve as a PNG image.")
  Path png;

  /** One point of the curve. */
  record Point(long sentences, long tokens, double accuracy, double knownAccuracy, double unknownAccuracy) {}

  @Override
  public Integer call() throws Exception {
    TrainingOptions options = training.toOptions();
    for (int size : sizes) {
      if (size < 1) {
        throw new ParameterException(spec.commandLine(), "--sizes are numbers of sentences, each at least 1, not " + size);
      }
    }
    new CommandFiles().countedInputs("--corpus", corpus.files).input("--eval", eval)
        .output("--report", json).output("--png", png).check();
    Corpus train = corpus.open(TagColumn.UPOS);
    Corpus test = new Corpus(List.of(eval), corpus.format != null ? corpus.format : CorpusFormat.guess(eval), train.column());
    List<Point> points = new ArrayList<>();
    for (int size : sizes.stream().sorted().distinct().toList()) {
      Point point = point(train, test, size, options);
      points.add(point);
      out().printf(Locale.ROOT, "%8d sentences %9d tokens  accuracy %s  known %s  unknown %s%n",
          point.sentences(), point.tokens(), Figures.format("%.4f", point.accuracy()),
          Figures.format("%.4f", point.knownAccuracy()), Figures.format("%.4f", point.unknownAccuracy()));
      out().flush();
      if (point.sentences() < size) {
        break; // the whole corpus is used: larger sizes would repeat this point
      }
    }
    if (json != null) {
      Map<String, Object> report = new LinkedHashMap<>();
      report.put("evaluatedOn", eval.getFileName().toString());
      report.put("options", options.describe());
      report.put("points", points);
      Json.write(json, report);
    }
    if (png != null) {
      new LineChart("Learning curve: accuracy on " + eval.getFileName(), "training sentences", "accuracy", true)
          .write(List.of(series("all words", points, Point::accuracy), series("known words", points, Point::knownAccuracy),
              series("unknown words", points, Point::unknownAccuracy)), png);
    }
    return OK;
  }

  private static Point point(Corpus train, Corpus test, int size, TrainingOptions options) {
    TagCounts counts = new TagCounts();
    // a whole pass, so the corpus's files are read to the end and closed
    train.forEach(s -> {
      if (counts.sentences() < size) {
        counts.add(s.words(), s.tags());
      }
    });
    Evaluation evaluation = new Evaluation(new HmmEstimator(options).estimate(counts, Map.of()));
    test.forEach(evaluation::add);
    EvaluationReport r = evaluation.report();
    return new Point(counts.sentences(), counts.tokens(), r.accuracy(), r.knownAccuracy(), r.unknownAccuracy());
  }

  private static LineChart.Series series(String name, List<Point> points, java.util.function.ToDoubleFunction<Point> y) {
    return new LineChart.Series(name, points.stream().map(p -> new double[] {p.sentences(), y.applyAsDouble(p)}).toList());
  }
}
