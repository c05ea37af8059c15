package org.wordclass.cli;

import java.util.ArrayList;
import java.util.List;
import org.wordclass.corpus.AnalysisChain;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * The Lucene analysis chain that comes before the word-class filter at index time, named by SPI
 * names the way {@code CustomAnalyzer} takes them (a mixin): commands that read text use it to
 * see the tokens the filter will see.
 */
final class ChainOptions {
  @Option(names = "--tokenizer", paramLabel = "NAME[:key=value,...]", defaultValue = "sentenceStandard",
      description = "Tokenizer of the chain, by its Lucene SPI name with arguments. Default: ${DEFAULT-VALUE} "
          + "(the standard tokenizer's tokens, with sentences marked for the word-class filter).")
  String tokenizer;

  @Option(names = "--filter", paramLabel = "NAME[:key=value,...]",
      description = "A token filter that comes before the word-class filter, by its Lucene SPI name with arguments; "
          + "repeat for more, in chain order (for example --filter lowercase).")
  List<String> filters = new ArrayList<>();

  /** The command these options belong to, for refusing a chain that cannot be built as a mistake on its command line. */
  @Spec(Spec.Target.MIXEE)
  CommandSpec command;

  private AnalysisChain chain;

  /**
   * The chain named by the options. A name or argument Lucene does not know is refused here, as
   * a mistake on the command line with Lucene's message, rather than later as an internal error:
   * the chain is built once to check it (making the factories, a fraction of a millisecond).
   */
  AnalysisChain chain() {
    if (chain == null) {
      try {
        AnalysisChain named = AnalysisChain.of(tokenizer, filters);
        named.build().close();
        chain = named;
      } catch (IllegalArgumentException e) {
        throw new ParameterException(command.commandLine(), "--tokenizer/--filter: " + e.getMessage());
      }
    }
    return chain;
  }
}
