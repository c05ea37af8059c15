package org.wordclass.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wordclass.model.ShippedModels;
import org.wordclass.testing.Corpora;

/**
 * The language pack shipped in the analyzer jar is rebuilt, byte for byte, by the command in
 * models/pack.properties and docs/languages.md ({@code build-pack}, training every model on its
 * UD treebank in ../shared/corpora). If this fails, the builder's output or the recipe changed:
 * rebuild the pack with that command and commit it. About a minute on one core.
 */
class LanguagePackRebuildTest {
  @TempDir
  Path dir;

  @Test
  void buildPackRebuildsEveryShippedModelAndTheIndexByteForByte() throws Exception {
    PackRecipe recipe = PackMeasure.recipe();
    recipe.entries().forEach(e -> Corpora.require(e.train()));
    Cli.Result r = Cli.run("build-pack", "--recipe", PackMeasure.recipePath().toString(),
        "--corpora", Corpora.root().toString(), "--out", dir.toString());
    assertEquals(0, r.exitCode(), r::toString);
    for (PackRecipe.Entry entry : recipe.entries()) {
      assertArrayEquals(PackMeasure.shippedBytes(entry.model()), Files.readAllBytes(dir.resolve(entry.model())),
          "the rebuilt " + entry.language() + " model differs from the shipped " + entry.model());
    }
    String index = Files.readString(dir.resolve("languages.properties"), StandardCharsets.UTF_8);
    assertArrayEquals(PackMeasure.shippedBytes("languages.properties"), index.getBytes(StandardCharsets.UTF_8),
        "the rebuilt index differs from the shipped " + ShippedModels.INDEX);
  }
}
