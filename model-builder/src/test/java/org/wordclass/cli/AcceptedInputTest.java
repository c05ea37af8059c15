package org.wordclass.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wordclass.model.Lexicon;
import org.wordclass.model.ModelFile;
import org.wordclass.testing.Corpora;
import org.wordclass.training.TagCounts;

/**
 * Option values and inputs the command line accepts end in a result or in a one-line refusal
 * (exit code 2), never in "internal error ... this looks like a bug", an out-of-memory error, a
 * hang, or a figure that misleads without a word.
 */
class AcceptedInputTest {
  private static final ObjectMapper JSON = new ObjectMapper();

  @TempDir
  static Path dir;

  static Path corpus;
  static Path model;

  @BeforeAll
  static void trainOnce() throws IOException {
    corpus = InventedCorpus.write(dir.resolve("c.conllu"), InventedCorpus.conllu(InventedCorpus.sentences(200, 3L, false)));
    model = dir.resolve("m.wcm");
    assertOk(Cli.run("train", "--corpus", corpus.toString(), "--out", model.toString()));
  }

  private static Cli.Result assertOk(Cli.Result r) {
    assertEquals(0, r.exitCode(), r::toString);
    assertFalse(r.err().contains("looks like a bug"), r::toString);
    return r;
  }

  private static void assertRefused(Cli.Result r, String message) {
    assertEquals(2, r.exitCode(), r::toString);
    // progress lines may come first
    assertEquals(message, r.err().lines().filter(l -> l.startsWith("wordclass ")).findFirst().orElse(""), r::toString);
    assertFalse(r.err().contains("looks like a bug"), r::toString);
  }

  private static List<String> openTags(Path m) throws IOException {
    Cli.Result r = assertOk(Cli.run("inspect", "--model", m.toString(), "--json"));
    List<String> open = new ArrayList<>();
    JSON.readTree(r.out()).get("openTags").forEach(t -> open.add(t.asText()));
    return open;
  }

  /**
   * German GSD dev (../shared/corpora): {@code --min-tag-share 0.5} and {@code 0.6} crashed with
   * "word 'als' needs one or more tags". Every word keeps at least its most frequent tag.
   */
  @Test
  void minTagShareInItsRangeKeepsEachWordsMostFrequentTag() throws IOException {
    Path german = Corpora.require("ud-german-gsd/de_gsd-ud-dev.conllu");
    for (String share : List.of("0.5", "0.6", "0.99")) {
      Path out = dir.resolve("de-" + share + ".wcm");
      assertOk(Cli.run("train", "--corpus", german.toString(), "--min-tag-share", share, "--out", out.toString()));
      // 'als' (as, than) is a conjunction (SCONJ, CCONJ) and an adposition in German GSD: one tag stays
      Cli.Result tagged = assertOk(Cli.run("tag", "--model", out.toString(), "--no-confidence", "als"));
      assertTrue(tagged.out().startsWith("als\t"), tagged::toString);
      Lexicon lexicon = ModelFile.read(out).lexicon();
      int tags = lexicon.stateCount(lexicon.lookup("als"));
      assertTrue(share.equals("0.99") ? tags == 1 : tags >= 1, share + ": " + tags);
    }
  }

  /**
   * More distinct tags than a model holds ({@link TagCounts#MAX_TAGS}) are refused while the
   * corpus is read, at the line of the first tag too many; 2,000 tags used to end in a
   * NegativeArraySizeException, 600 in 3.6 GB and 45 s of work before a crash.
   */
  @Test
  void tooManyTagsAreRefusedAtTheLineOfTheFirstOneTooMany() throws IOException {
    StringBuilder text = new StringBuilder();
    for (int t = 0; t < 2000; t++) {
      text.append("w").append(t).append("\tT").append(t).append("\n\n");
    }
    Path many = Files.writeString(dir.resolve("many.txt"), text);
    Path out = dir.resolve("many.wcm");
    int line = 2 * TagCounts.MAX_TAGS + 1;
    assertRefused(Cli.run("train", "--corpus", many.toString(), "--tags", "xpos", "--order", "2", "--out", out.toString()),
        "wordclass train: " + many + ":" + line + ": tag 'T" + TagCounts.MAX_TAGS + "' is one more distinct tag than the "
            + TagCounts.MAX_TAGS + " a model can hold");
    assertFalse(Files.exists(out));
  }

  /** /dev/zero ran out of memory, /dev/urandom hung: both are refused before a byte is read. */
  @Test
  void devicesAsModelAreRefused() {
    for (String device : List.of("/dev/zero", "/dev/urandom")) {
      assumeTrue(Files.exists(Path.of(device)), "skipped: no " + device);
      for (String command : List.of("evaluate", "inspect", "tag")) {
        List<String> args = new ArrayList<>(List.of(command, "--model", device));
        if (command.equals("evaluate")) {
          args.addAll(List.of("--corpus", corpus.toString()));
        } else if (command.equals("tag")) {
          args.add("word");
        }
        assertRefused(Cli.run(args.toArray(String[]::new)), "wordclass " + command + ": " + device
            + ": not an ordinary file (a device, pipe or socket); a model is read from a file written by train or adapt");
      }
    }
  }

  @Test
  void learningCurveSizesMustBePositive() {
    for (String size : List.of("0", "-5")) {
      Cli.Result r = Cli.run("learning-curve", "--corpus", corpus.toString(), "--eval", corpus.toString(), "--sizes", "100," + size);
      assertEquals(2, r.exitCode(), r::toString);
      assertTrue(r.err().startsWith("wordclass learning-curve: --sizes are numbers of sentences, each at least 1, not " + size),
          r::toString);
    }
  }

  @Test
  void adaptThreadsAreBoundedByTheCores() throws IOException {
    Path text = Files.writeString(dir.resolve("t.txt"), "The otter slept.\n");
    int cores = Runtime.getRuntime().availableProcessors();
    Path out = dir.resolve("adapted.wcm");
    for (String threads : List.of("10000", Integer.toString(cores + 1), "0")) {
      Cli.Result r = Cli.run("adapt", "--model", model.toString(), "--text", text.toString(), "--threads", threads,
          "--out", out.toString());
      assertEquals(2, r.exitCode(), r::toString);
      assertTrue(r.err().startsWith("wordclass adapt: --threads must be between 1 and the " + cores
          + " cores this machine offers, not " + threads), r::toString);
    }
    assertFalse(Files.exists(out));
  }

  /** An XPOS model scored on UPOS came out at 0.089 with exit code 0. */
  @Test
  void tagColumnOtherThanTheModelsIsRefusedNamingBoth() throws IOException {
    Path xpos = dir.resolve("xpos.wcm");
    assertOk(Cli.run("train", "--corpus", corpus.toString(), "--tags", "xpos", "--out", xpos.toString()));
    assertRefused(Cli.run("evaluate", "--model", xpos.toString(), "--corpus", corpus.toString(), "--tags", "upos"),
        "wordclass evaluate: " + xpos + ": was trained on the xpos column, but --tags upos asks to score it on upos tags; "
            + "use --tags xpos or leave it out");
    Path text = Files.writeString(dir.resolve("held.txt"), "The otter slept.\n");
    assertRefused(Cli.run("adapt", "--model", xpos.toString(), "--text", text.toString(), "--held-out", corpus.toString(),
            "--held-out-tags", "upos", "--threads", "1", "--out", dir.resolve("x2.wcm").toString()),
        "wordclass adapt: " + xpos + ": was trained on the xpos column, but --held-out-tags upos asks to score it on upos "
            + "tags; use --held-out-tags xpos or leave it out");
    // without --tags, the model's own column is used, and the figure is a real one
    String scored = assertOk(Cli.run("evaluate", "--model", xpos.toString(), "--corpus", corpus.toString())).out();
    double accuracy = Double.parseDouble(scored.lines().filter(l -> l.startsWith("accuracy")).findFirst().orElseThrow()
        .substring("accuracy".length()).trim());
    assertTrue(accuracy > 0.9, scored);
  }

  /**
   * German GSD dev: {@code --open-class-min-share} 0.3 gave one open class, 0.5 all 16
   * (PUNCT and DET among them). A larger share now never gives more open classes.
   */
  @Test
  void openClassesShrinkAsTheirShareGrows() throws IOException {
    Path german = Corpora.require("ud-german-gsd/de_gsd-ud-dev.conllu");
    List<Integer> counts = new ArrayList<>();
    List<String> previous = null;
    for (String share : List.of("0.01", "0.1", "0.3", "0.5", "0.9")) {
      Path out = dir.resolve("open-" + share + ".wcm");
      assertOk(Cli.run("train", "--corpus", german.toString(), "--open-class-min-share", share, "--out", out.toString()));
      List<String> open = openTags(out);
      counts.add(open.size());
      if (previous != null) {
        assertTrue(previous.containsAll(open), share + ": " + open + " not within " + previous);
      }
      previous = open;
    }
    // words seen once in German are mostly nouns (common practice): the last class standing
    assertEquals(List.of("NOUN"), previous, counts::toString);
    assertTrue(counts.get(0) > 1, counts::toString);
  }

  /** A figure that is not defined reads "none" (or its line part is left out), never NaN. */
  @Test
  void undefinedFiguresAreNotPrintedAsNaN() throws IOException {
    // scored on its own training corpus, the model meets no unknown word
    String evaluated = assertOk(Cli.run("evaluate", "--model", model.toString(), "--corpus", corpus.toString())).out();
    assertTrue(evaluated.contains("unknown words    none  (0 tokens, 0.0%)"), evaluated);
    Path text = Files.writeString(dir.resolve("gain.txt"), "The otter slept on the bank.\nThe otter swam.\n");
    Cli.Result adapted = assertOk(Cli.run("adapt", "--model", model.toString(), "--text", text.toString(), "--iterations", "1",
        "--threads", "1", "--out", dir.resolve("gain.wcm").toString()));
    Cli.Result folds = assertOk(Cli.run("cross-validate", "--corpus", corpus.toString(), "--folds", "2"));
    for (Cli.Result r : List.of(adapted, folds)) {
      assertFalse((r.out() + r.err()).toLowerCase(Locale.ROOT).contains("nan"), r::toString);
    }
    assertFalse(evaluated.toLowerCase(Locale.ROOT).contains("nan"), evaluated);
    assertTrue(adapted.err().contains("iteration 0: log-likelihood"), adapted::toString);
  }

  /** The JSON report keeps writing an undefined figure as null. */
  @Test
  void jsonReportsKeepNullForUndefinedFigures() throws IOException {
    Path report = dir.resolve("own.json");
    assertOk(Cli.run("evaluate", "--model", model.toString(), "--corpus", corpus.toString(), "--report", report.toString()));
    JsonNode json = JSON.readTree(report.toFile());
    assertTrue(json.get("unknownAccuracy").isNull(), json::toString);
  }
}
