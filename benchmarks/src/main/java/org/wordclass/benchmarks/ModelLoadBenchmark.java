package org.wordclass.benchmarks;

import java.io.IOException;
import java.io.InputStream;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.wordclass.model.DefaultModel;
import org.wordclass.model.HmmModel;
import org.wordclass.model.ModelFile;

/**
 * Time to parse the bundled model from its bytes (checksum, header, tables, lexicon, tries), as
 * a core reload or a first analyzer pays it. Reading the jar resource is left out. The warm
 * figure is the steady state; {@code ModelHeap} and the single-shot run of {@code run.sh} give
 * the heap and the cold first load.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class ModelLoadBenchmark {
  private byte[] bytes;

  @Setup
  public void setUp() throws IOException {
    bytes = bundledModelBytes();
  }

  static byte[] bundledModelBytes() throws IOException {
    try (InputStream in = DefaultModel.class.getClassLoader().getResourceAsStream(DefaultModel.RESOURCE)) {
      if (in == null) {
        throw new IllegalStateException("the bundled model " + DefaultModel.RESOURCE + " is not on the class path");
      }
      return in.readAllBytes();
    }
  }

  @Benchmark
  public HmmModel load() throws IOException {
    return ModelFile.read(bytes, DefaultModel.RESOURCE);
  }
}
