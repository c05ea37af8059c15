package org.wordclass.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wordclass.model.DefaultModel;
import org.wordclass.model.ShippedModels;

/**
 * {@code train}, {@code adapt} and {@code inspect} say in one line when a model file is too big to
 * keep in a SolrCloud config set (ZooKeeper's default limit; see docs/solr.md), and nothing otherwise.
 */
class ConfigStoreWarningTest {
  /** Invented words listed in a user lexicon: each one is a lexicon entry in the model file. */
  private static final int LISTED_WORDS = 90_000;

  @TempDir
  static Path dir;

  static Path corpus;
  static Path bigModel;
  static Cli.Result bigTraining;

  @BeforeAll
  static void trainABigModel() throws Exception {
    corpus = InventedCorpus.write(dir.resolve("train.conllu"), InventedCorpus.conllu(InventedCorpus.sentences(200, 5, false)));
    StringBuilder lexicon = new StringBuilder();
    for (int i = 0; i < LISTED_WORDS; i++) {
      lexicon.append(String.format(Locale.ROOT, "plonk%05d NOUN%n", i));
    }
    Path lexiconFile = Files.writeString(dir.resolve("catalogue.txt"), lexicon, StandardCharsets.UTF_8);
    bigModel = dir.resolve("big.wcm");
    bigTraining = ok("train", "--corpus", corpus.toString(), "--lexicon", lexiconFile.toString(), "--out", bigModel.toString());
  }

  private static Cli.Result ok(String... args) {
    Cli.Result r = Cli.run(args);
    assertEquals(0, r.exitCode(), r::toString);
    return r;
  }

  private static List<String> warnings(Cli.Result r) {
    return r.err().lines().filter(line -> line.contains("warning")).toList();
  }

  private static void assertOneWarning(Cli.Result r, String command, Path model) throws Exception {
    List<String> warnings = warnings(r);
    assertEquals(1, warnings.size(), r::toString);
    String expected = String.format(Locale.ROOT, "%s: warning: %s is %,d bytes, 1 MiB or more", command, model, Files.size(model));
    assertTrue(warnings.get(0).startsWith(expected), r::toString);
  }

  @Test
  void trainWarnsOfAModelOverOneMebibyte() throws Exception {
    assertTrue(Files.size(bigModel) > BaseCommand.CONFIG_STORE_LIMIT_BYTES, () -> bigModel + ": " + bigModel.toFile().length());
    assertOneWarning(bigTraining, "train", bigModel);
  }

  @Test
  void trainSaysNothingOfASmallModel() throws Exception {
    Path small = dir.resolve("small.wcm");
    Cli.Result r = ok("train", "--corpus", corpus.toString(), "--out", small.toString());
    assertTrue(Files.size(small) < BaseCommand.CONFIG_STORE_LIMIT_BYTES);
    assertEquals(List.of(), warnings(r));
  }

  @Test
  void inspectWarnsOfTheBigModelOnly() throws Exception {
    assertOneWarning(ok("inspect", "--model", bigModel.toString()), "inspect", bigModel);
    // and leaves JSON on standard output untouched
    Cli.Result json = ok("inspect", "--model", bigModel.toString(), "--json");
    assertTrue(json.out().startsWith("{"), json::toString);
    assertOneWarning(json, "inspect", bigModel);
  }

  @Test
  void adaptWarnsWhenItsResultIsOverTheLimit() throws Exception {
    Path text = Files.writeString(dir.resolve("notes.txt"), "The plonk00001 stands by the door.\n".repeat(5));
    Path adapted = dir.resolve("adapted.wcm");
    Cli.Result r = ok("adapt", "--model", bigModel.toString(), "--text", text.toString(), "--out", adapted.toString(),
        "--iterations", "1", "--threads", "1");
    assertOneWarning(r, "adapt", adapted);
  }

  /** The model in the jar must fit a config set unchanged: a change that grows it past 1 MiB fails here. */
  @Test
  void theBundledModelStaysUnderTheLimit() throws Exception {
    long size;
    try (InputStream in = DefaultModel.class.getClassLoader().getResourceAsStream(DefaultModel.RESOURCE)) {
      size = in.readAllBytes().length;
    }
    assertTrue(size < BaseCommand.CONFIG_STORE_LIMIT_BYTES, "bundled model: " + size + " bytes");
    Cli.Result r = ok("inspect");
    assertFalse(r.err().contains("warning"), r::toString);
  }

  /**
   * Every model of the language pack fits a config set too, and docs/solr.md gives each one's
   * size as it is, so a rebuilt pack with stale figures in the docs fails here.
   */
  @Test
  void everyShippedModelStaysUnderTheLimitWithItsSizeInTheDocs() throws Exception {
    String docs = Files.readString(Path.of("..", "docs", "solr.md"), StandardCharsets.UTF_8);
    for (var shipped : ShippedModels.resources().entrySet()) {
      long size = ShippedModels.readBytes(shipped.getKey()).length;
      assertTrue(size < BaseCommand.CONFIG_STORE_LIMIT_BYTES, shipped + ": " + size + " bytes");
      String file = shipped.getValue().substring(ShippedModels.FOLDER.length());
      String sizeCells = String.format(Locale.ROOT, "| `%s` | %,d | %,d bytes", file, size, BaseCommand.CONFIG_STORE_LIMIT_BYTES - size);
      assertTrue(docs.contains(sizeCells), () -> "docs/solr.md lacks the row of " + file + ": " + sizeCells);
    }
  }
}
