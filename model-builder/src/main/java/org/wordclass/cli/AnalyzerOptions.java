package org.wordclass.cli;

import java.util.Map;
import java.util.function.Consumer;
import org.apache.lucene.analysis.Analyzer;
import org.wordclass.corpus.AnalysisChain;
import org.wordclass.corpus.AnalyzerAlignment;
import org.wordclass.corpus.Sentence;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * Options that run a corpus's raw sentence text through a Lucene analysis chain, the part of an
 * index-time chain that comes before the word-class filter, and align the emitted tokens with
 * the gold words (a mixin). See {@link AnalyzerAlignment} for the alignment rules.
 */
final class AnalyzerOptions {
  @Option(names = "--through-analyzer",
      description = "Use the tokens an analysis chain emits from each sentence's raw text (# text = lines) "
          + "instead of the treebank's own tokens.")
  boolean enabled;

  @Mixin
  ChainOptions chainOptions;

  @Option(names = "--skip-bad-sentences",
      description = "Skip, and count, sentences without raw text or whose text does not match their words, "
          + "instead of stopping at the first.")
  boolean skipBadSentences;

  private Analyzer analyzer;
  private AnalyzerAlignment alignment;

  /** The chain named by the options. */
  AnalysisChain chain() {
    return chainOptions.chain();
  }

  /**
   * {@code action} on each sentence as the options want it: as it is, or as aligned analyzer
   * tokens. Later calls (one per pass over a corpus) share the first call's analyzer.
   */
  Consumer<Sentence> feeding(Consumer<Sentence> action) {
    if (!enabled) {
      return action;
    }
    if (analyzer == null) {
      analyzer = chain().build();
      alignment = new AnalyzerAlignment(analyzer, skipBadSentences);
    }
    return sentence -> {
      Sentence aligned = alignment.align(sentence);
      if (aligned != null) {
        action.accept(aligned);
      }
    };
  }

  /** How tokens and gold words were matched, after a pass; null when not through an analyzer. */
  Map<String, Long> alignmentCounts() {
    return alignment == null ? null : alignment.summary();
  }

  /** Provenance entries that say which chain a model was trained through. */
  void describeInto(Map<String, String> provenance) {
    if (enabled) {
      provenance.put("analysis.chain", chain().toString());
      alignment.summary().forEach((k, v) -> provenance.put("analysis." + k, Long.toString(v)));
    }
  }

  void close() {
    if (analyzer != null) {
      analyzer.close();
    }
  }
}
