package org.wordclass.benchmarks;

import java.io.IOException;
import java.lang.ref.Reference;
import java.util.Locale;
import org.openjdk.jol.info.GraphLayout;
import org.wordclass.model.DefaultModel;
import org.wordclass.model.HmmModel;
import org.wordclass.model.ModelFile;

/**
 * Heap occupied by the loaded bundled model, measured two ways in a JVM of its own (run it with
 * {@code java -cp benchmarks.jar}): JOL's walk of the object graph from the model (exact for
 * this JVM's object layout), and the used heap after a full collection before and after loading
 * (what a process really pays, including anything the walk cannot see). Also prints the cold
 * time of the very first load in this JVM, which JMH's warm average leaves out.
 */
public final class ModelHeap {
  private ModelHeap() {}

  public static void main(String[] args) throws IOException {
    byte[] bytes = ModelLoadBenchmark.bundledModelBytes();
    long before = usedAfterGc();
    long start = System.nanoTime();
    HmmModel model = ModelFile.read(bytes, DefaultModel.RESOURCE);
    long coldNanos = System.nanoTime() - start;
    long after = usedAfterGc();
    long graph = GraphLayout.parseInstance(model).totalSize();
    System.out.printf(Locale.ROOT, "model file         %,d bytes%n", bytes.length);
    System.out.printf(Locale.ROOT, "first load (cold)  %.1f ms%n", coldNanos / 1e6);
    System.out.printf(Locale.ROOT, "heap, JOL graph    %,d bytes (%.2f MiB)%n", graph, graph / 1048576.0);
    System.out.printf(Locale.ROOT, "heap, GC delta     %,d bytes (%.2f MiB)%n", after - before, (after - before) / 1048576.0);
    System.out.printf(Locale.ROOT, "ramBytesUsed()     %,d bytes (the model's own estimate)%n", model.ramBytesUsed());
    Reference.reachabilityFence(model);
  }

  /** Used heap once repeated full collections stop freeing anything. */
  private static long usedAfterGc() {
    Runtime runtime = Runtime.getRuntime();
    long used = Long.MAX_VALUE;
    for (int i = 0; i < 20; i++) {
      System.gc();
      long now = runtime.totalMemory() - runtime.freeMemory();
      if (now >= used) {
        return now;
      }
      used = now;
    }
    return used;
  }
}
