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

  @Option(names = "--documents",
      description = "With --through-analyzer: run each document (from one '# newdoc' comment to the next; a file "
          + "without them is one document) through the chain as one field value, its sentences joined as running "
          + "text, instead of each sentence on its own. The tokens are decoded, or learnt from, sentence by sentence "
          + "where the chain's tokenizer marks sentences (sentenceStandard does), as the filter decodes them.")
  boolean documents;

  @Option(names = "--skip-bad-sentences",
      description = "Skip, and count, sentences without raw text or whose text does not match their words, "
          + "instead of stopping at the first.")
  boolean skipBadSentences;

  private Analyzer analyzer;
  private AnalyzerAlignment alignment;
  private AnalyzerAlignment.Feed feed;

  /** The chain named by the options. */
  AnalysisChain chain() {
    return chainOptions.chain();
  }

  /**
   * {@code action} on each sentence as the options want it: as it is, or as aligned analyzer
   * tokens; call {@link #finish} after the last sentence. Later calls (one per pass over a corpus)
   * share the first call's analyzer.
   */
  Consumer<Sentence> feeding(Consumer<Sentence> action) {
    if (!enabled) {
      return action;
    }
    if (analyzer == null) {
      analyzer = chain().build();
      alignment = new AnalyzerAlignment(analyzer, skipBadSentences);
    }
    feed = alignment.feed(documents ? AnalyzerAlignment.Unit.DOCUMENT : AnalyzerAlignment.Unit.SENTENCE, action);
    return feed;
  }

  /** Hands on the last document, in document mode. */
  void finish() {
    if (feed != null) {
      feed.finish();
    }
  }

  /** What one field value held, for reports. */
  String unit() {
    return documents ? "document" : "sentence";
  }

  /** How tokens and gold words were matched, after a pass; null when not through an analyzer. */
  Map<String, Long> alignmentCounts() {
    return alignment == null ? null : alignment.summary();
  }

  /** Provenance entries that say which chain a model was trained through. */
  void describeInto(Map<String, String> provenance) {
    if (enabled) {
      provenance.put("analysis.chain", chain().toString());
      provenance.put("analysis.fieldValue", unit());
      alignment.summary().forEach((k, v) -> provenance.put("analysis." + k, Long.toString(v)));
    }
  }

  void close() {
    if (analyzer != null) {
      analyzer.close();
    }
  }
}
