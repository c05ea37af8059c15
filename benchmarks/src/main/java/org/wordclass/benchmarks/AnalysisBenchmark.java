package org.wordclass.benchmarks;

import java.io.IOException;
import java.util.concurrent.TimeUnit;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;

/**
 * Analysis throughput of each chain of {@link Chains} with and without the word-class
 * filter. One operation analyses every EWT test sentence, each as its own field value; the
 * {@code tokens} secondary result is tokens per second.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
public class AnalysisBenchmark extends ChainPairBenchmark {
  @Benchmark
  public long withFilter(Tokens counter) throws IOException {
    return analyze(withFilter, counter);
  }

  @Benchmark
  public long withoutFilter(Tokens counter) throws IOException {
    return analyze(withoutFilter, counter);
  }

  /** Consumes every token; the summed term lengths keep the work from being optimised away. */
  private long analyze(Analyzer analyzer, Tokens counter) throws IOException {
    long chars = 0;
    for (String text : texts) {
      try (TokenStream stream = analyzer.tokenStream("body", text)) {
        CharTermAttribute term = stream.addAttribute(CharTermAttribute.class);
        stream.reset();
        while (stream.incrementToken()) {
          chars += term.length();
          counter.tokens++;
        }
        stream.end();
      }
    }
    return chars;
  }
}
