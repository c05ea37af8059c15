package org.wordclass.benchmarks;

import java.io.IOException;
import java.io.UncheckedIOException;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.custom.CustomAnalyzer;

/**
 * The two analysis chains every side-by-side comparison uses: Lucene's standard tokenizer and
 * lower-casing, with or without the word-class filter (bundled model, its own order, no
 * confidences) in between, where the filter belongs.
 */
public final class Chains {
  private Chains() {}

  public static Analyzer build(boolean wordClass) {
    try {
      CustomAnalyzer.Builder builder = CustomAnalyzer.builder().withTokenizer("standard");
      if (wordClass) {
        builder.addTokenFilter("wordClass");
      }
      return builder.addTokenFilter("lowercase").build();
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }
}
