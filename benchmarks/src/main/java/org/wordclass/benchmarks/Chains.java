package org.wordclass.benchmarks;

import java.io.IOException;
import java.io.UncheckedIOException;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.custom.CustomAnalyzer;

/**
 * The analysis chains every side-by-side comparison uses, each with or without the word-class
 * filter (bundled model, its own order, no confidences) right after the tokenizer, where it
 * belongs: {@link #MINIMAL}, Lucene's standard tokenizer and lower-casing, the cheapest chain a
 * search engine would use, and {@link #STEMMED}, the same with the Porter stemmer, the chain of
 * the Solr configuration set in {@code config-examples}.
 */
public final class Chains {
  public static final String MINIMAL = "minimal";
  public static final String STEMMED = "stemmed";

  private Chains() {}

  /** The minimal chain. */
  public static Analyzer build(boolean wordClass) {
    return build(MINIMAL, wordClass);
  }

  public static Analyzer build(String chain, boolean wordClass) {
    try {
      CustomAnalyzer.Builder builder = CustomAnalyzer.builder().withTokenizer("standard");
      if (wordClass) {
        builder.addTokenFilter("wordClass");
      }
      builder.addTokenFilter("lowercase");
      switch (chain) {
        case MINIMAL:
          break;
        case STEMMED:
          builder.addTokenFilter("porterStem");
          break;
        default:
          throw new IllegalArgumentException("no chain named " + chain);
      }
      return builder.build();
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }
}
