package org.wordclass.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import org.wordclass.corpus.Corpus;
import org.wordclass.corpus.TagColumn;
import org.wordclass.model.HmmModel;
import org.wordclass.model.ModelFile;
import org.wordclass.training.HmmEstimator;
import org.wordclass.training.TagCounts;
import org.wordclass.training.TrainingOptions;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code wordclass train}: counts a tagged corpus in one streaming pass and writes a model. */
@Command(name = "train", mixinStandardHelpOptions = true,
    description = "Trains a model on tagged corpus files and writes it to a model file. "
        + "The file is written only once the whole corpus has been read without error.")
final class TrainCommand extends BaseCommand {
  @Mixin
  CorpusOptions corpus;

  @Mixin
  TrainingOptionsMixin training;

  @Mixin
  AnalyzerOptions analysis;

  @Mixin
  LexiconOption lexicon;

  @Option(names = "--out", required = true, paramLabel = "MODEL", description = "The model file to write (.wcm).")
  Path out;

  @Override
  public Integer call() throws Exception {
    TrainingOptions options = training.toOptions();
    new CommandFiles().countedInputs("--corpus", corpus.files).input("--lexicon", lexicon.path).output("--out", out).check();
    Corpus input = corpus.open(TagColumn.UPOS);
    Progress progress = Progress.start("train", input, 1, err());
    TagCounts counts = TagCounts.forOptions(options);
    try {
      progress.read(input, analysis.feeding(s -> counts.add(s.words(), s.tags())));
    } finally {
      analysis.close();
    }
    progress.finish();
    Map<String, String> provenance = Provenance.of(input, corpus);
    analysis.describeInto(provenance);
    // folded in before writing, so a bad lexicon leaves no model file behind
    HmmModel model = lexicon.applyTo(new HmmEstimator(options).estimate(counts, provenance));
    ModelFile.write(model, out);
    printSummary(counts, model, progress.seconds());
    warnIfTooBigForConfigStores(out, Files.size(out));
    return OK;
  }

  private void printSummary(TagCounts counts, HmmModel model, double seconds) throws IOException {
    if (analysis.alignmentCounts() != null) {
      out().printf(Locale.ROOT, "analyzer    %s %s%n", analysis.chain(), analysis.alignmentCounts());
    }
    out().printf(Locale.ROOT, "sentences   %d%n", counts.sentences());
    out().printf(Locale.ROOT, "tokens      %d%n", counts.tokens());
    out().printf(Locale.ROOT, "tags        %d%n", model.tags().size());
    out().printf(Locale.ROOT, "vocabulary  %d words%n", model.lexicon().size());
    if (lexicon.path != null) {
      out().printf(Locale.ROOT, "lexicon     %s entries from %s%n", model.provenance().get("lexicon.entries"), lexicon.path);
    }
    out().printf(Locale.ROOT, "time        %.1f s%n", seconds);
    out().printf(Locale.ROOT, "model       %s (%d bytes, order %d)%n", out, Files.size(out), model.order());
    out().flush();
  }
}
