package org.wordclass.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wordclass.model.DefaultModel;
import org.wordclass.testing.Corpora;

/**
 * The bundled model is rebuilt, byte for byte, by the command documented in docs/accuracy.md and
 * the README (training on UD English EWT train through Lucene's standard tokenizer). If this
 * fails, either the builder changed its output (rebuild the model with that command and commit
 * it) or the build is no longer deterministic.
 */
class BundledModelRebuildTest {
  @TempDir
  Path dir;

  @Test
  void documentedCommandRebuildsTheBundledModelByteForByte() throws Exception {
    Path out = dir.resolve("en-ewt-upos.wcm");
    Cli.Result r = Cli.run("train", "--corpus", Corpora.ewtTrain().toString(), "--through-analyzer",
        "--documents", "--with-treebank-tokens", "--note", "language=en", "--note", "model=en-ewt-upos", "--note", "licence=CC BY-SA 4.0",
        "--note", "source=UniversalDependencies/UD_English-EWT @ 15d613d8", "--note", "treebank=UD English EWT", "--out", out.toString());
    assertEquals(0, r.exitCode(), r::toString);
    byte[] bundled;
    try (InputStream in = DefaultModel.class.getClassLoader().getResourceAsStream(DefaultModel.RESOURCE)) {
      bundled = in.readAllBytes();
    }
    assertArrayEquals(bundled, Files.readAllBytes(out), "the rebuilt model differs from " + DefaultModel.RESOURCE);
  }
}
