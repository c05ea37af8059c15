package org.wordclass.benchmarks;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.List;
import java.util.Locale;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.TokenStream;
import org.wordclass.decoding.Decoder;
import org.wordclass.decoding.Lattice;
import org.wordclass.model.DefaultModel;

/**
 * The decoder and analysis workloads of the JMH benchmarks timed in CPU time of the running
 * thread rather than wall time: on a machine shared with other busy processes, time spent
 * waiting for a core does not count, so builds compared one after another stay comparable. It
 * complements JMH for before/after measurements and does not replace it. Prints tokens per
 * CPU-second, the best of several rounds after warm-up. Runs from source against any build:
 * {@code java -cp JAR CpuTime.java [rounds]}.
 */
public final class CpuTime {
  private static final ThreadMXBean THREADS = ManagementFactory.getThreadMXBean();

  private CpuTime() {}

  /** A workload that processes the test set once and returns how many tokens it processed. */
  private interface Pass {
    long run() throws IOException;
  }

  public static void main(String[] args) throws IOException {
    int rounds = args.length > 0 ? Integer.parseInt(args[0]) : 10;
    List<char[][]> sentences = Ewt.testTokens();
    List<String> texts = Ewt.testTexts();
    Decoder decoder = new Decoder(DefaultModel.get(), 2);
    int[] best = new int[sentences.stream().mapToInt(s -> s.length).max().orElse(0)];
    report("decoder order 2", rounds, () -> decode(decoder, sentences, best));
    for (String chain : new String[] {Chains.MINIMAL, Chains.STEMMED}) {
      try (Analyzer with = Chains.build(chain, true); Analyzer without = Chains.build(chain, false)) {
        report(chain + " with filter", rounds, () -> analyze(with, texts));
        report(chain + " without filter", rounds, () -> analyze(without, texts));
      }
    }
  }

  private static void report(String name, int rounds, Pass pass) throws IOException {
    double bestRate = 0;
    for (int r = 0; r < 2 * rounds; r++) {
      long start = THREADS.getCurrentThreadCpuTime();
      long tokens = pass.run();
      double rate = tokens / ((THREADS.getCurrentThreadCpuTime() - start) / 1e9);
      // the first half warms up the compiler
      bestRate = r < rounds ? 0 : Math.max(bestRate, rate);
    }
    System.out.printf(Locale.ROOT, "%-24s %,12.0f tokens per CPU-second%n", name, bestRate);
  }

  private static long decode(Decoder decoder, List<char[][]> sentences, int[] best) {
    long tokens = 0;
    Lattice lattice = decoder.lattice();
    for (char[][] sentence : sentences) {
      lattice.clear();
      for (char[] token : sentence) {
        lattice.add(token, 0, token.length);
      }
      decoder.viterbi(best);
      tokens += sentence.length;
    }
    return tokens;
  }

  private static long analyze(Analyzer analyzer, List<String> texts) throws IOException {
    long tokens = 0;
    for (String text : texts) {
      try (TokenStream stream = analyzer.tokenStream("body", text)) {
        stream.reset();
        while (stream.incrementToken()) {
          tokens++;
        }
        stream.end();
      }
    }
    return tokens;
  }
}
