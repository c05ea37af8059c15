package org.wordclass.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.lang.ref.WeakReference;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.custom.CustomAnalyzer;
import org.apache.lucene.util.ClasspathResourceLoader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wordclass.model.DefaultModel;
import org.wordclass.model.HmmModel;

/**
 * An analyzer rebuilt from its configuration again and again, as a search server does on every
 * configuration reload, does not accumulate copies of the model: while a model is referenced,
 * every reload gets the very same instance, and the heap after {@value #RELOADS} reloads is
 * within a model's size of the heap before. Once no analyzer uses it, the model is freed.
 */
class AnalyzerReloadTest {
  private static final int RELOADS = 200;
  private static final String TEXT = "They book a table near the old bakery .";

  @TempDir Path conf;

  private interface Config {
    CustomAnalyzer.Builder builder() throws IOException;
  }

  private static Analyzer build(Config config, String... modelArgs) throws IOException {
    return config.builder().withTokenizer("standard").addTokenFilter("wordClass", modelArgs).build();
  }

  private static HmmModel modelOf(Analyzer analyzer) {
    return ((WordClassFilterFactory) ((CustomAnalyzer) analyzer).getTokenFilterFactories().get(0)).options().model();
  }

  private static int analyze(Analyzer analyzer) throws IOException {
    int tokens = 0;
    try (TokenStream ts = analyzer.tokenStream("f", TEXT)) {
      ts.reset();
      while (ts.incrementToken()) {
        tokens++;
      }
      ts.end();
    }
    return tokens;
  }

  @Test
  void bundledModel() throws IOException {
    assertReloadsShareOneModel("bundled model", CustomAnalyzer::builder);
  }

  @Test
  void modelFileThroughTheFileSystemLoader() throws IOException {
    try (InputStream in = getClass().getClassLoader().getResourceAsStream(DefaultModel.RESOURCE)) {
      Files.write(conf.resolve("en.wcm"), in.readAllBytes());
    }
    assertReloadsShareOneModel("model=en.wcm, file system", () -> CustomAnalyzer.builder(conf), "model", "en.wcm");
  }

  @Test
  void modelResourceThroughTheClasspathLoader() throws IOException {
    ClasspathResourceLoader loader = new ClasspathResourceLoader(getClass().getClassLoader());
    assertReloadsShareOneModel("model=resource, class path", () -> CustomAnalyzer.builder(loader), "model", DefaultModel.RESOURCE);
  }

  private static void assertReloadsShareOneModel(String what, Config config, String... modelArgs) throws IOException {
    WeakReference<HmmModel> model = reload(what, config, modelArgs);
    if (modelArgs.length > 0) {
      // a model loaded by name is held weakly by the cache: it goes once its analyzers do
      for (int i = 0; i < 20 && model.get() != null; i++) {
        System.gc();
      }
      assertNull(model.get(), what + ": the model outlived every analyzer that used it");
    }
  }

  /** Reloads {@value #RELOADS} times while the first analyzer is open; returns its model, weakly. */
  private static WeakReference<HmmModel> reload(String what, Config config, String... modelArgs) throws IOException {
    Analyzer first = build(config, modelArgs);
    HmmModel model = modelOf(first);
    long before = usedHeapAfterGc();
    long start = System.nanoTime();
    for (int i = 0; i < RELOADS; i++) {
      try (Analyzer reloaded = build(config, modelArgs)) {
        assertSame(model, modelOf(reloaded), "reload " + i);
        assertEquals(8, analyze(reloaded)); // the standard tokenizer drops the full stop
      }
    }
    double millisEach = (System.nanoTime() - start) / 1e6 / RELOADS;
    long after = usedHeapAfterGc();
    System.out.printf(Locale.ROOT, "%s: %d reloads, %.1f ms each; used heap after GC %.1f MB before, %.1f MB after "
        + "(model about %.1f MB)%n", what, RELOADS, millisEach, before / 1e6, after / 1e6, model.ramBytesUsed() / 1e6);
    assertTrue(after - before < model.ramBytesUsed(), what + ": heap grew by " + (after - before) + " bytes");
    first.close();
    return new WeakReference<>(model);
  }

  private static long usedHeapAfterGc() {
    Runtime rt = Runtime.getRuntime();
    long used = Long.MAX_VALUE;
    for (int i = 0; i < 5; i++) {
      System.gc();
      used = Math.min(used, rt.totalMemory() - rt.freeMemory());
    }
    return used;
  }
}
