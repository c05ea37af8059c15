package org.wordclass.benchmarks;

import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.wordclass.corpus.Sentence;
import org.wordclass.model.HmmModel;
import org.wordclass.training.HmmEstimator;
import org.wordclass.training.TagCounts;
import org.wordclass.training.TrainingOptions;

/**
 * Training time (counting plus estimation with the default options) on the first 1/8, 1/4, 1/2
 * and all of the EWT training sentences, one shot per measurement, to show how cost grows with
 * the corpus. Reading the file is left out: the sentences are parsed once, before timing.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class TrainingBenchmark {
  /** The corpus is cut to 1/share of its sentences. */
  @Param({"8", "4", "2", "1"})
  public int share;

  private List<Sentence> sentences;

  @Setup
  public void setUp() {
    List<Sentence> all = Ewt.trainSentences();
    sentences = all.subList(0, all.size() / share);
  }

  @Benchmark
  public HmmModel train() {
    TagCounts counts = new TagCounts();
    for (Sentence s : sentences) {
      counts.add(s.words(), s.tags());
    }
    return new HmmEstimator(TrainingOptions.DEFAULTS).estimate(counts, Map.of());
  }
}
