package org.wordclass.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.function.Consumer;
import org.wordclass.corpus.Sentence;
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

  @Option(names = "--with-treebank-tokens",
      description = "With --through-analyzer: learn from the corpus's own tokens too (punctuation included), each "
          + "sentence once as the chain emits it and once as the treebank splits it, so that the model also tags "
          + "the punctuation and split contractions of chains that keep them.")
  boolean withTreebankTokens;

  @Option(names = "--note", paramLabel = "KEY=VALUE",
      description = "Record KEY=VALUE in the model's provenance as note.KEY (for example --note licence=CC-BY-4.0, "
          + "--note model=fr-news); repeat for more. The note model names the model in inspect and in the "
          + "analysis screen.")
  Map<String, String> notes = new TreeMap<>();

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
      // a run of tokens written together is one observation, as the filter decodes it
      Consumer<Sentence> learn = counts::add;
      Consumer<Sentence> throughChain = analysis.feeding(learn);
      progress.read(input, withTreebankTokens && analysis.enabled ? throughChain.andThen(learn) : throughChain);
      analysis.finish();
    } finally {
      analysis.close();
    }
    progress.finish();
    Map<String, String> provenance = Provenance.of(input, corpus);
    analysis.describeInto(provenance);
    if (withTreebankTokens && analysis.enabled) {
      provenance.put("analysis.withTreebankTokens", "true");
    }

    notes.forEach((key, value) -> provenance.put(HmmModel.NOTE_PREFIX + key, value));
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
