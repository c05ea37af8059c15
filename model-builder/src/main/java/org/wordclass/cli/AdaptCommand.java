package org.wordclass.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.wordclass.adaptation.Adaptation;
import org.wordclass.adaptation.AdaptationOptions;
import org.wordclass.adaptation.AdaptationOptions.Defaults;
import org.wordclass.adaptation.IndexFieldSource;
import org.wordclass.adaptation.TextFileSource;
import org.wordclass.adaptation.TextSource;
import org.wordclass.corpus.Corpus;
import org.wordclass.corpus.CorpusFormat;
import org.wordclass.corpus.TagColumn;
import org.wordclass.model.HmmModel;
import org.wordclass.model.ModelFile;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;

/**
 * {@code wordclass adapt}: re-estimates a model on untagged text by Baum-Welch (forward-backward
 * EM), with the published safeguards on by default. See docs/adaptation.md for what it measured.
 */
@Command(name = "adapt", mixinStandardHelpOptions = true,
    description = "Adapts a model to untagged text (files, or a stored field of a Lucene index) by Baum-Welch "
        + "re-estimation, tokenized by the same analysis chain the filter sees, and writes the adapted model.")
final class AdaptCommand extends BaseCommand {
  @Mixin
  ModelOption model;

  @ArgGroup(exclusive = true, multiplicity = "1")
  Input input;

  /** Where the untagged text comes from: files, or an index field. */
  static final class Input {
    @Option(names = "--text", paramLabel = "FILE", arity = "1..*",
        description = "UTF-8 text files (.gz too); a blank line ends a paragraph, sentences are split inside it.")
    List<Path> files;

    @ArgGroup(exclusive = false)
    IndexInput index;
  }

  /** A stored field of an existing index. */
  static final class IndexInput {
    @Option(names = "--index", required = true, paramLabel = "DIR", description = "A Lucene index folder.")
    Path directory;

    @Option(names = "--field", required = true, paramLabel = "NAME", description = "The stored field whose text is read.")
    String field;
  }

  @Option(names = "--out", required = true, paramLabel = "MODEL", description = "The adapted model file to write (.wcm).")
  Path out;

  @Mixin
  ChainOptions chain;

  @Option(names = "--held-out", paramLabel = "FILE",
      description = "A tagged file (CoNLL-U or plain) scored after each iteration; iterating stops, keeping the best "
          + "model, once its accuracy drops.")
  Path heldOut;

  @Option(names = "--held-out-tags", paramLabel = "upos|xpos",
      description = "Tag column of the held-out file. Default: the column the model was trained on.")
  TagColumn heldOutTags;

  @Option(names = "--iterations", paramLabel = "N", defaultValue = "" + Defaults.ITERATIONS, description = "Iterations at most. Default: ${DEFAULT-VALUE}.")
  int iterations;

  @Option(names = "--min-gain", paramLabel = "SHARE", defaultValue = "" + Defaults.MIN_RELATIVE_GAIN,
      description = "Stop when an iteration raises the text's log-likelihood by less than this share. Default: ${DEFAULT-VALUE}.")
  double minGain;

  @Option(names = "--new-weight", paramLabel = "λ", defaultValue = "" + Defaults.NEW_WEIGHT,
      description = "Weight of the re-estimated parameters against the starting ones (1: plain Baum-Welch). "
          + "Default: ${DEFAULT-VALUE}.")
  double newWeight;

  @Option(names = "--lexicon-constraint", negatable = true, defaultValue = "" + Defaults.LEXICON_CONSTRAINT,
      fallbackValue = "true",
      description = "Known words keep the tags the starting model allows them. Default: ${DEFAULT-VALUE}.")
  boolean lexiconConstraint;

  @Option(names = "--add-words-min-count", paramLabel = "N", defaultValue = "" + Defaults.ADD_WORDS_MIN_COUNT,
      description = "Unknown words seen at least N times in the text join the lexicon (0: none). Default: ${DEFAULT-VALUE}.")
  int addWordsMinCount;

  @Option(names = "--threads", paramLabel = "N", description = "Worker threads, at most one per core. Default: all cores.")
  Integer threads;

  @Override
  public Integer call() throws Exception {
    AdaptationOptions options = options();
    new CommandFiles().input("--model", model.path).countedInputs("--text", input.files)
        .input("--index", input.index == null ? null : input.index.directory).input("--held-out", heldOut)
        .output("--out", out).replacing("--out", "--model").check();
    HmmModel start = model.load();
    TextSource text = input.files != null
        ? new TextFileSource(input.files, chain.chain())
        : new IndexFieldSource(input.index.directory, input.index.field, chain.chain());
    Corpus heldOutCorpus = heldOut == null ? null : new Corpus(List.of(heldOut), CorpusFormat.guess(heldOut),
        Provenance.scoringColumn(start, model.name(), heldOutTags, "--held-out-tags"));
    Adaptation.Result result = new Adaptation(options, listener()).adapt(start, text, heldOutCorpus);
    ModelFile.write(result.model(), out);
    out().printf(Locale.ROOT, "kept iteration %d of %d (%s); model %s%n", result.keptIteration(),
        result.iterations().size() - 1, result.stop().name().toLowerCase(Locale.ROOT).replace('_', ' '), out);
    out().flush();
    warnIfTooBigForConfigStores(out, Files.size(out));
    return OK;
  }

  private AdaptationOptions options() {
    int cores = Runtime.getRuntime().availableProcessors();
    if (threads != null && (threads < 1 || threads > cores)) {
      throw new ParameterException(spec.commandLine(), "--threads must be between 1 and the " + cores
          + " cores this machine offers, not " + threads + " (more threads than cores only add cost)");
    }
    try {
      AdaptationOptions o = AdaptationOptions.DEFAULTS.withIterations(iterations, minGain).withNewWeight(newWeight)
          .withLexiconConstraint(lexiconConstraint).withAddedWords(addWordsMinCount);
      return threads == null ? o : o.withThreads(threads);
    } catch (IllegalArgumentException e) {
      throw new ParameterException(spec.commandLine(), "Invalid adaptation option: " + e.getMessage());
    }
  }

  /** One line per pass start and per iteration on the error stream, where progress goes. */
  private Adaptation.Listener listener() {
    return new Adaptation.Listener() {
      @Override
      public void passStarted(int iteration) {
        err().printf(Locale.ROOT, "adapt: pass %d over the text%n", iteration + 1);
        err().flush();
      }

      @Override
      public void iterationFinished(Adaptation.Iteration iteration, HmmModel adapted) {
        err().println("adapt: " + iteration);
        err().flush();
      }
    };
  }
}
