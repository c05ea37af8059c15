package org.wordclass.benchmarks;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.List;
import org.wordclass.decoding.Decoder;
import org.wordclass.decoding.Lattice;
import org.wordclass.decoding.SentenceBoundaries;
import org.wordclass.model.DefaultModel;

/**
 * One pass of the decoder workload over the EWT test sentences with the bundled model at order 2
 * (or the order named by {@code -Dwordclass.order}; sentence boundaries as {@code
 * -Dwordclass.boundaries} names them, {@code tokenizer} by default, builds from the one that added
 * it), timed in CPU time of the running thread and split into filling the lattices and filling them
 * plus Viterbi. {@link SideBySide} loads this class from each build it compares, each in a class
 * loader of its own, so that every build decodes with its own code and its own bundled model.
 */
public final class DecoderPass {
  private static final ThreadMXBean THREADS = ManagementFactory.getThreadMXBean();
  private static List<char[][]> sentences;
  private static Decoder decoder;
  private static int[] best;
  private static long tokens;

  private DecoderPass() {}

  /** Reads the sentences and loads the model; call once before {@link #pass}. */
  public static void prepare() {
    sentences = Ewt.testTokens();
    // order 2 is the default; -Dwordclass.order=1 measures the first-order kernel
    decoder = new Decoder(DefaultModel.get(), Integer.getInteger("wordclass.order", 2),
        SentenceBoundaries.parse(System.getProperty("wordclass.boundaries", "tokenizer"), "wordclass.boundaries"));
    best = new int[sentences.stream().mapToInt(s -> s.length).max().orElse(0)];
    tokens = Ewt.tokenCount(sentences);
  }

  /** CPU nanoseconds per token of filling the lattices alone, and of filling them and decoding. */
  public static double[] pass() {
    Lattice lattice = decoder.lattice();
    long start = THREADS.getCurrentThreadCpuTime();
    for (char[][] sentence : sentences) {
      fill(lattice, sentence);
    }
    long filled = THREADS.getCurrentThreadCpuTime();
    for (char[][] sentence : sentences) {
      fill(lattice, sentence);
      decoder.viterbi(best);
    }
    long decoded = THREADS.getCurrentThreadCpuTime();
    return new double[] {(filled - start) / (double) tokens, (decoded - filled) / (double) tokens};
  }

  private static void fill(Lattice lattice, char[][] sentence) {
    lattice.clear();
    for (char[] token : sentence) {
      lattice.add(token, 0, token.length);
    }
  }
}
