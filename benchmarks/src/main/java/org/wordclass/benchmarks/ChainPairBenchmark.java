package org.wordclass.benchmarks;

import java.util.List;
import org.apache.lucene.analysis.Analyzer;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.TearDown;

/**
 * What the benchmarks that compare a chain with the word-class filter against the same chain
 * without it share: the EWT test sentences and the two analyzers, built once per trial.
 */
abstract class ChainPairBenchmark {
  protected List<String> texts;
  protected Analyzer withFilter;
  protected Analyzer withoutFilter;

  @Setup
  public void buildChains() {
    texts = Ewt.testTexts();
    withFilter = Chains.build(true);
    withoutFilter = Chains.build(false);
  }

  @TearDown
  public void closeChains() {
    withFilter.close();
    withoutFilter.close();
  }
}
