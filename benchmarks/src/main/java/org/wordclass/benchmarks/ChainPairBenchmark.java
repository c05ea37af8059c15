package org.wordclass.benchmarks;

import java.util.List;
import org.apache.lucene.analysis.Analyzer;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;

/**
 * What the benchmarks that compare a chain with the word-class filter against the same chain
 * without it share: the EWT test sentences and the two analyzers, built once per trial, for each
 * pair of {@link Chains}.
 */
@State(Scope.Thread)
public abstract class ChainPairBenchmark {
  /** Which pair of chains; see {@link Chains}. */
  @Param({Chains.MINIMAL, Chains.STEMMED})
  public String chain;

  protected List<String> texts;
  protected Analyzer withFilter;
  protected Analyzer withoutFilter;

  @Setup
  public void buildChains() {
    texts = Ewt.testTexts();
    withFilter = Chains.build(chain, true);
    withoutFilter = Chains.build(chain, false);
  }

  @TearDown
  public void closeChains() {
    withFilter.close();
    withoutFilter.close();
  }
}
