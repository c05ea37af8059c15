package org.wordclass.cli;

import java.io.IOException;
import java.nio.file.Path;
import org.wordclass.corpus.Corpus;
import java.util.function.Consumer;
import org.wordclass.corpus.Sentence;
import org.wordclass.evaluation.Evaluation;
import org.wordclass.evaluation.EvaluationReport;
import org.wordclass.model.HmmModel;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code wordclass evaluate}: tags gold corpus files with a model and scores the result. */
@Command(name = "evaluate", mixinStandardHelpOptions = true,
    description = "Tags gold-tagged corpus files with a model and reports accuracy (overall, on known and on "
        + "unknown words), per-tag scores and confusions; optionally as JSON, HTML and PNG files.")
final class EvaluateCommand extends BaseCommand {
  @Mixin
  ModelOption model;

  @Mixin
  CorpusOptions corpus;

  @Mixin
  AnalyzerOptions analysis;

  @Mixin
  BoundariesOption boundaries;

  @Option(names = "--report", paramLabel = "FILE", description = "Also write the figures as JSON.")
  Path json;

  @Option(names = "--html", paramLabel = "FILE",
      description = "Also write a self-contained HTML page with the figures and a heat map of the confusions.")
  Path html;

  @Option(names = "--png", paramLabel = "FILE", description = "Also draw the confusion heat map as a PNG image.")
  Path png;

  @Override
  public Integer call() throws Exception {
    new CommandFiles().input("--model", model.path).countedInputs("--corpus", corpus.files)
        .output("--report", json).output("--html", html).output("--png", png).check();
    HmmModel loaded = model.load();
    Corpus input = corpus.open(Provenance.scoringColumn(loaded, model.name(), corpus.tags, "--tags"));
    Progress progress = Progress.start("evaluate", input, 1, err());
    Evaluation evaluation = new Evaluation(loaded, boundaries.value());
    Evaluation onGoldTokens = new Evaluation(loaded, boundaries.value());
    try {
      Consumer<Sentence> analyzed = analysis.feeding(evaluation::add);
      progress.read(input, analysis.enabled ? s -> {
        onGoldTokens.add(s);
        analyzed.accept(s);
      } : evaluation::add);
      analysis.finish();
    } finally {
      analysis.close();
    }
    progress.finish();
    EvaluationReport report = analysis.enabled
        ? evaluation.report().throughAnalyzer(analysis.chain() + (analysis.documents ? " (whole documents)" : ""), onGoldTokens.report(), analysis.alignmentCounts())
        : evaluation.report();
    out().print(report.toText());
    out().flush();
    writeFiles(report, "Evaluation of " + model.name() + " on " + fileNames(input));
    return OK;
  }

  private void writeFiles(EvaluationReport report, String title) throws IOException {
    if (json != null) {
      Json.write(json, report);
    }
    if (html != null) {
      HtmlReport.write(html, report, title);
    }
    if (png != null) {
      HeatmapImage.write(png, ConfusionHeatmap.of(report.confusionMatrix()), title);
    }
  }

  private static String fileNames(Corpus input) {
    return String.join(", ", input.files().stream().map(p -> p.getFileName().toString()).toList());
  }
}
