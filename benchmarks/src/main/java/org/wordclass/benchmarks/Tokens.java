package org.wordclass.benchmarks;

import org.openjdk.jmh.annotations.AuxCounters;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/**
 * Tokens processed, reported by JMH next to the primary score as a rate (the secondary result
 * {@code tokens}, in tokens per second), so that benchmarks over inputs of different lengths
 * compare in the unit the targets are stated in.
 */
@State(Scope.Thread)
@AuxCounters(AuxCounters.Type.OPERATIONS)
public class Tokens {
  public long tokens;

  @Setup(Level.Iteration)
  public void reset() {
    tokens = 0;
  }
}
