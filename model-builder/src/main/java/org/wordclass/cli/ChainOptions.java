package org.wordclass.cli;

import java.util.ArrayList;
import java.util.List;
import org.wordclass.corpus.AnalysisChain;
import picocli.CommandLine.Option;

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

  private AnalysisChain chain;

  /** The chain named by the options. */
  AnalysisChain chain() {
    if (chain == null) {
      chain = AnalysisChain.of(tokenizer, filters);
    }
    return chain;
  }
}
