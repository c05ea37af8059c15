package org.wordclass.benchmarks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.util.Collection;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.results.RunResult;
import org.openjdk.jmh.runner.Runner;
import org.openjdk.jmh.runner.RunnerException;
import org.openjdk.jmh.runner.options.Options;
import org.openjdk.jmh.runner.options.OptionsBuilder;
import org.openjdk.jmh.runner.options.TimeValue;

/**
 * Runs every benchmark method once, in this JVM and on the smallest inputs, so that the module
 * cannot rot unnoticed: a benchmark that no longer compiles, finds no input or throws fails the
 * build. It measures nothing; {@code run.sh} does.
 */
class BenchmarksSmokeTest {
  private static final Set<String> EXPECTED = Set.of(
      "AnalysisBenchmark.withFilter", "AnalysisBenchmark.withoutFilter",
      "IndexingBenchmark.withFilter", "IndexingBenchmark.withoutFilter",
      "DecoderBenchmark.decode", "ModelLoadBenchmark.load", "TrainingBenchmark.train");

  @Test
  void everyBenchmarkRunsOnce() throws RunnerException {
    assumeCorpusPresent();
    Options options = new OptionsBuilder()
        .include(getClass().getPackageName() + ".*Benchmark")
        .forks(0)
        .warmupIterations(0)
        .measurementIterations(1)
        .mode(Mode.SingleShotTime)
        .timeUnit(TimeUnit.MILLISECONDS)
        .measurementTime(TimeValue.milliseconds(1))
        .param("share", "8")
        .shouldFailOnError(true)
        // JMH's progress report would fill the build log; it is kept beside the test reports
        .output("target/jmh-smoke.log")
        .build();
    Collection<RunResult> results = new Runner(options).run();
    Set<String> ran = new TreeSet<>();
    for (RunResult r : results) {
      String[] parts = r.getParams().getBenchmark().split("\\.");
      ran.add(parts[parts.length - 2] + "." + parts[parts.length - 1]);
      assertTrue(r.getPrimaryResult().getScore() > 0, r.getParams().getBenchmark());
    }
    assertEquals(new TreeSet<>(EXPECTED), ran);
    // four decoder configurations, two chains for each of the four chain benchmarks, one of the rest
    assertEquals(4 + 4 * 2 + 2, results.size());
  }

  /** On a machine without the treebanks the benchmarks have no input: skip, saying why (CI always has them). */
  private static void assumeCorpusPresent() {
    try {
      Ewt.file("en_ewt-ud-test.conllu");
    } catch (IllegalStateException missing) {
      assumeTrue(false, "skipped: " + missing.getMessage());
    }
  }
}
