package org.wordclass.testing;

import java.util.Locale;
import java.util.Random;

/**
 * The bounds of one fuzz run: its seed (system property {@code wordclass.fuzz.seed}, a number or
 * {@code random}; default fixed, so CI repeats the same inputs) and its time budget in seconds
 * ({@code wordclass.fuzz.seconds}, default 20). Counts the executions and reports them with the
 * seed, so a failure can be replayed.
 */
public final class FuzzRun {
  private static final long DEFAULT_SEED = 0x5EED_F0221L;
  private static final double DEFAULT_SECONDS = 20;

  private final String name;
  private final long seed;
  private final long startNanos = System.nanoTime();
  private final long deadline;
  private long executions;

  public FuzzRun(String name) {
    this.name = name;
    this.seed = seedProperty();
    double seconds = Double.parseDouble(System.getProperty("wordclass.fuzz.seconds", Double.toString(DEFAULT_SECONDS)));
    this.deadline = startNanos + (long) (seconds * 1e9);
  }

  private static long seedProperty() {
    String value = System.getProperty("wordclass.fuzz.seed", "");
    if (value.isBlank()) {
      return DEFAULT_SEED;
    }
    return value.equals("random") ? new Random().nextLong() : Long.decode(value);
  }

  public Random random() {
    return new Random(seed);
  }

  /** Counts one more execution while time is left. */
  public boolean next() {
    if (System.nanoTime() >= deadline) {
      return false;
    }
    executions++;
    return true;
  }

  public long executions() {
    return executions;
  }

  /** How to replay the current input: seed and execution number. */
  public String where() {
    return name + " seed " + seed + " execution " + executions;
  }

  /** One line for the test log. */
  public String summary() {
    double seconds = (System.nanoTime() - startNanos) / 1e9;
    return String.format(Locale.ROOT, "%s: %d executions in %.1f s, seed %d (-Dwordclass.fuzz.seed=%d replays it)",
        name, executions, seconds, seed, seed);
  }
}
