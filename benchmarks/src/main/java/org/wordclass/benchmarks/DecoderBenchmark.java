package org.wordclass.benchmarks;

import java.util.List;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.wordclass.decoding.Decoder;
import org.wordclass.decoding.Lattice;
import org.wordclass.model.DefaultModel;

/**
 * The decoder alone, on one thread: filling the lattice from char buffers and Viterbi, plus
 * forward-backward when confidences are on, over the EWT test sentences as the standard
 * tokenizer cuts them. No Lucene in the loop. {@code tokens} is tokens tagged per second.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
public class DecoderBenchmark {
  @Param({"1", "2"})
  public int order;

  @Param({"false", "true"})
  public boolean confidence;

  private List<char[][]> sentences;
  private Decoder decoder;
  private int[] best;

  @Setup
  public void setUp() {
    sentences = Ewt.testTokens();
    decoder = new Decoder(DefaultModel.get(), order);
    best = new int[sentences.stream().mapToInt(s -> s.length).max().orElse(0)];
  }

  @Benchmark
  public double decode(Tokens counter) {
    double sum = 0;
    Lattice lattice = decoder.lattice();
    for (char[][] sentence : sentences) {
      lattice.clear();
      for (char[] token : sentence) {
        lattice.add(token, 0, token.length);
      }
      decoder.viterbi(best);
      sum += confidence ? decoder.forwardBackward() : decoder.bestLogProbability();
      counter.tokens += sentence.length;
    }
    return sum;
  }
}
