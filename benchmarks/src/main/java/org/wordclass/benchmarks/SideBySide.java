package org.wordclass.benchmarks;

import java.lang.reflect.Method;
import java.net.URL;
import java.net.URLClassLoader;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Locale;

/**
 * Compares the decoder of several builds in one JVM: each {@code benchmarks.jar} gets a class
 * loader of its own, and their {@link DecoderPass}es run in turn, pass after pass, so that load
 * from other users of the machine, the processor's clock and the JIT's state fall on all of them
 * alike, to well within a second. Prints each build's best CPU time per token after warm-up. The
 * builds share the processor's caches, so absolute times come out higher than in a JVM of their
 * own; the comparison between them is the point. Each build must be a {@code benchmarks.jar}
 * (one that predates {@link DecoderPass} gets this jar's copy of it, run against the build's own
 * decoder and model). Usage: {@code java -cp benchmarks.jar org.wordclass.benchmarks.SideBySide
 * A.jar B.jar ...}; ratios are over the first. With {@code --analysis} first, the builds run
 * {@link AnalysisPass} instead: the analysis chain without and with the word-class filter, and
 * the ratio of their throughputs, which is the figure the filter's speed target is set on.
 */
public final class SideBySide {
  private static final int WARM_UP = 30;
  private static final int PASSES = 120;
  private static final URL SELF = SideBySide.class.getProtectionDomain().getCodeSource().getLocation();

  private SideBySide() {}

  public static void main(String[] args) throws Exception {
    boolean analysis = args.length > 0 && args[0].equals("--analysis");
    String[] jars = analysis ? Arrays.copyOfRange(args, 1, args.length) : args;
    Class<?> workload = analysis ? AnalysisPass.class : DecoderPass.class;
    Method[] passes = new Method[jars.length];
    for (int i = 0; i < jars.length; i++) {
      // the build's own classes first; DecoderPass from this jar where the build predates it
      URLClassLoader loader = new URLClassLoader(new URL[] {Path.of(jars[i]).toUri().toURL(), SELF},
          ClassLoader.getPlatformClassLoader());
      Class<?> pass = loader.loadClass(workload.getName());
      pass.getMethod("prepare").invoke(null);
      passes[i] = pass.getMethod("pass");
    }
    double[][] best = new double[jars.length][];
    for (int round = 0; round < PASSES; round++) {
      for (int i = 0; i < jars.length; i++) {
        double[] times = (double[]) passes[i].invoke(null);
        if (round >= WARM_UP) {
          best[i] = best[i] == null ? times : new double[] {Math.min(best[i][0], times[0]), Math.min(best[i][1], times[1])};
        }
      }
    }
    for (int i = 0; i < jars.length && analysis; i++) {
      System.out.printf(Locale.ROOT, "%-40s without filter %6.1f  with filter %6.1f ns/token, ratio %.3f, filter x%.2f%n",
          jars[i], best[i][0], best[i][1], best[i][0] / best[i][1], (best[0][1] - best[0][0]) / (best[i][1] - best[i][0]));
    }
    for (int i = 0; i < jars.length && !analysis; i++) {
      System.out.printf(Locale.ROOT, "%-40s fill %6.1f  fill+Viterbi %6.1f  (Viterbi %6.1f) ns/token, x%.2f%n",
          jars[i], best[i][0], best[i][1], best[i][1] - best[i][0], best[0][1] / best[i][1]);
    }
  }
}
