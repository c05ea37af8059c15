package org.wordclass.benchmarks;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.List;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.TokenStream;

/**
 * One pass of the analysis workload of {@code AnalysisBenchmark} over the EWT test sentences,
 * timed in CPU time of the running thread: the chain without the word-class filter, then the same
 * chain with it. {@link SideBySide} {@code --analysis} loads this class from each build it
 * compares, like {@link DecoderPass}, so that the filter's own cost (buffering and restoring
 * tokens as well as decoding) is compared between builds in one JVM. The chain is {@link
 * Chains#MINIMAL} unless the system property {@code wordclass.chain} names another.
 */
public final class AnalysisPass {
  private static final ThreadMXBean THREADS = ManagementFactory.getThreadMXBean();
  private static List<String> texts;
  private static Analyzer without;
  private static Analyzer with;
  private static long tokens;

  private AnalysisPass() {}

  /** Reads the sentences and builds both chains; call once before {@link #pass}. */
  public static void prepare() {
    texts = Ewt.testTexts();
    String chain = System.getProperty("wordclass.chain", Chains.MINIMAL);
    without = Chains.build(chain, false);
    with = Chains.build(chain, true);
    tokens = analyze(without);
  }

  /** CPU nanoseconds per token of the chain without the filter, and of the chain with it. */
  public static double[] pass() {
    long start = THREADS.getCurrentThreadCpuTime();
    analyze(without);
    long plain = THREADS.getCurrentThreadCpuTime();
    analyze(with);
    long filtered = THREADS.getCurrentThreadCpuTime();
    return new double[] {(plain - start) / (double) tokens, (filtered - plain) / (double) tokens};
  }

  private static long analyze(Analyzer analyzer) {
    long count = 0;
    try {
      for (String text : texts) {
        try (TokenStream stream = analyzer.tokenStream("body", text)) {
          stream.reset();
          while (stream.incrementToken()) {
            count++;
          }
          stream.end();
        }
      }
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return count;
  }
}
