package org.wordclass.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.util.List;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wordclass.model.HmmModel;
import org.wordclass.model.ModelFile;

/** Trains on invented corpora, then evaluates, inspects and tags with the models, all in-process. */
class WorkflowTest {
  private static final ObjectMapper JSON = new ObjectMapper();

  @TempDir
  static Path dir;

  static Path trainConllu;
  static Path evalConllu;
  static Path model;

  @BeforeAll
  static void trainOnce() throws Exception {
    trainConllu = InventedCorpus.write(dir.resolve("train.conllu"), InventedCorpus.conllu(InventedCorpus.sentences(300, 1, false)));
    evalConllu = InventedCorpus.write(dir.resolve("eval.conllu"), InventedCorpus.conllu(InventedCorpus.sentences(120, 2, true)));
    model = Files.createDirectories(dir.resolve("models")).resolve("invented.wcm");
    Cli.Result r = Cli.run("train", "--corpus", trainConllu.toString(), "--out", model.toString());
    assertEquals(0, r.exitCode(), r::toString);
  }

  @Test
  void trainPrintsASummaryAndRecordsFileNamesNotPaths() throws Exception {
    Path out = dir.resolve("summary.wcm");
    Cli.Result r = Cli.run("train", "--corpus", trainConllu.toString(), "--out", out.toString());
    assertEquals(0, r.exitCode(), r::toString);
    for (String label : List.of("sentences   300", "tokens", "tags", "vocabulary", "time")) {
      assertTrue(r.out().contains(label), r::toString);
    }
    HmmModel trained = ModelFile.read(out);
    assertEquals("train.conllu", trained.provenance().get("corpus.1.file"));
    assertEquals("conllu", trained.provenance().get("corpus.1.format"));
    assertEquals("upos", trained.provenance().get("corpus.tags"));
    assertEquals(sha256(Files.readAllBytes(trainConllu)), trained.provenance().get("corpus.1.sha256"));
    assertNotNull(trained.provenance().get("builder.version"));
    assertFalse(trained.provenance().containsValue(trainConllu.toString()));
    assertTrue(r.err().lines().count() <= 2, () -> "without a terminal, progress is a start and an end line: " + r);
  }

  @Test
  void undefinedFiguresAreNullInJson() throws Exception {
    Path json = dir.resolve("seen.json");
    Cli.Result r = Cli.run("evaluate", "--model", model.toString(), "--corpus", trainConllu.toString(), "--report", json.toString());
    assertEquals(0, r.exitCode(), r::toString);
    JsonNode report = JSON.readTree(json.toFile());
    assertEquals(0, report.get("unknownTokens").asLong(), "every word of the training corpus is known");
    assertTrue(report.get("unknownAccuracy").isNull(), report::toString);
    assertTrue(report.get("accuracy").isNumber(), report::toString);
  }

  @Test
  void trainsOnPlainAndCompressedFilesAndOnXpos() throws Exception {
    List<List<InventedCorpus.Word>> sentences = InventedCorpus.sentences(150, 3, false);
    Path plain = InventedCorpus.write(dir.resolve("train.tsv.gz"), InventedCorpus.plain(sentences));
    Path conlluGz = InventedCorpus.write(dir.resolve("train2.conllu.gz"), InventedCorpus.conllu(sentences));
    Path fromPlain = dir.resolve("plain.wcm");
    Path fromGz = dir.resolve("xpos.wcm");
    assertEquals(0, Cli.run("train", "--corpus", plain.toString(), "--order", "1", "--out", fromPlain.toString()).exitCode());
    Cli.Result r = Cli.run("train", "--corpus", conlluGz.toString(), "--tags", "xpos", "--out", fromGz.toString());
    assertEquals(0, r.exitCode(), r::toString);
    assertEquals("plain", ModelFile.read(fromPlain).provenance().get("corpus.1.format"));
    assertEquals(1, ModelFile.read(fromPlain).order());
    HmmModel xpos = ModelFile.read(fromGz);
    assertTrue(xpos.tags().names().contains("NNP"), xpos.tags()::toString);
    assertEquals("xpos", xpos.provenance().get("corpus.tags"));
  }

  @Test
  void trainingOptionsReachTheModel() throws Exception {
    Path out = dir.resolve("options.wcm");
    Cli.Result r = Cli.run("train", "--corpus", trainConllu.toString(), "--out", out.toString(),
        "--no-shape-classes", "--suffix-weight", "0.5", "--max-suffix-length", "4", "--rare-word-max-count", "3",
        "--open-class-min-share", "0.01");
    assertEquals(0, r.exitCode(), r::toString);
    var provenance = ModelFile.read(out).provenance();
    assertEquals("false", provenance.get("option.shapeClasses"));
    assertEquals("0.5", provenance.get("option.suffixWeight"));
    assertEquals("4", provenance.get("option.maxSuffixLength"));
    assertEquals("3", provenance.get("option.rareWordMaxCount"));
    assertEquals("0.01", provenance.get("option.openClassMinShare"));
    assertEquals(0, Cli.run("train", "--corpus", trainConllu.toString(), "--out", out.toString(),
        "--shape-classes", "--suffix-weight", "tag-spread").exitCode());
    assertEquals("true", ModelFile.read(out).provenance().get("option.shapeClasses"));
    assertEquals("tag-spread", ModelFile.read(out).provenance().get("option.suffixWeight"));
  }

  @Test
  void latentRoundsSplitTheStates() throws Exception {
    Path out = dir.resolve("latent.wcm");
    Cli.Result r = Cli.run("train", "--corpus", trainConllu.toString(), "--out", out.toString(),
        "--order", "1", "--latent-rounds", "1");
    assertEquals(0, r.exitCode(), r::toString);
    HmmModel latent = ModelFile.read(out);
    assertEquals("1", latent.provenance().get("option.latentRounds"));
    // each state split in two, half of the splits merged back
    int states = ModelFile.read(model).states().size();
    assertEquals(states + states / 2, latent.states().size());
    assertEquals(picocli.CommandLine.ExitCode.USAGE, Cli.run("train", "--corpus", trainConllu.toString(),
        "--out", out.toString(), "--latent-rounds", "-1").exitCode());
  }

  @Test
  void trainingTwiceGivesTheSameBytesWhereverTheInputLies() throws Exception {
    Path elsewhere = Files.createDirectories(dir.resolve("elsewhere"));
    Path copy = Files.copy(trainConllu, elsewhere.resolve("train.conllu"));
    Path first = dir.resolve("first.wcm");
    Path second = elsewhere.resolve("second.wcm");
    assertEquals(0, Cli.run("train", "--corpus", trainConllu.toString(), "--out", first.toString()).exitCode());
    assertEquals(0, Cli.run("train", "--corpus", copy.toString(), "--out", second.toString()).exitCode());
    assertEquals(-1, Files.mismatch(first, second));
  }

  @Test
  void evaluateWritesJsonHtmlAndPngReports() throws Exception {
    Files.createDirectories(dir.resolve("reports"));
    Path json = dir.resolve("reports/eval.json");
    Path html = dir.resolve("reports/eval.html");
    Path png = dir.resolve("reports/eval.png");
    Cli.Result r = Cli.run("evaluate", "--model", model.toString(), "--corpus", evalConllu.toString(),
        "--report", json.toString(), "--html", html.toString(), "--png", png.toString());
    assertEquals(0, r.exitCode(), r::toString);
    assertTrue(r.out().contains("accuracy"), r::toString);

    JsonNode report = JSON.readTree(json.toFile());
    for (String key : List.of("accuracy", "knownAccuracy", "unknownAccuracy")) {
      assertTrue(report.get(key).isNumber(), key);
      double value = report.get(key).asDouble();
      assertTrue(value >= 0 && value <= 1, key + " = " + value);
    }
    assertTrue(report.get("tokens").asLong() > 0);
    assertTrue(report.get("accuracy").asDouble() > 0.8, report::toString);
    assertTrue(report.get("unknownTokens").asLong() > 0, "the evaluation corpus should hold unknown words");

    String page = Files.readString(html, StandardCharsets.UTF_8);
    assertTrue(page.contains("<table class=\"heatmap\">"), "heat map table");
    assertTrue(page.contains("background:#"), "coloured cells");
    assertFalse(page.contains("<script") || page.contains("src=") || page.contains("href="), "self-contained");

    int tags = ModelFile.read(model).tags().size();
    BufferedImage image = ImageIO.read(png.toFile());
    assertNotNull(image, "a decodable PNG");
    assertEquals(HeatmapImage.width(tags), image.getWidth());
    assertEquals(HeatmapImage.height(tags), image.getHeight());
    try (var files = Files.list(dir.resolve("reports"))) {
      assertEquals(3, files.count(), "no temporary file left behind");
    }
  }

  /**
   * The per-tag table uses labels of our own, the gold count first, the same in the text, JSON
   * and HTML reports (it used to copy a machine-learning library's column set and order down to
   * the word "support").
   */
  @Test
  void perTagTableHasTheSameOwnLabelsInTextJsonAndHtml() throws Exception {
    Path json = dir.resolve("labels.json");
    Path html = dir.resolve("labels.html");
    Cli.Result r = Cli.run("evaluate", "--model", model.toString(), "--corpus", evalConllu.toString(),
        "--report", json.toString(), "--html", html.toString());
    assertEquals(0, r.exitCode(), r::toString);
    String header = r.out().lines().filter(l -> l.startsWith("per tag")).findFirst().orElseThrow();
    assertEquals(List.of("per", "tag", "gold", "words", "tagged", "words", "recall", "precision", "F1"),
        List.of(header.trim().split(" +")));
    JsonNode noun = JSON.readTree(json.toFile()).get("perTag").get(0);
    List<String> keys = new java.util.ArrayList<>();
    noun.fieldNames().forEachRemaining(keys::add);
    assertEquals(List.of("tag", "goldWords", "taggedWords", "recall", "precision", "f1"), keys);
    String page = Files.readString(html, StandardCharsets.UTF_8);
    assertTrue(page.contains("<tr><th>tag</th><th>gold words</th><th>tagged words</th><th>recall</th><th>precision</th>"
        + "<th>F1</th></tr>"), page);
    for (String output : List.of(r.out(), Files.readString(json), page)) {
      assertFalse(output.contains("support"), output);
    }
    // the figures themselves: gold words of a tag add up to the tokens, as do its tagged words
    long gold = 0;
    long tagged = 0;
    for (JsonNode t : JSON.readTree(json.toFile()).get("perTag")) {
      gold += t.get("goldWords").asLong();
      tagged += t.get("taggedWords").asLong();
    }
    long tokens = JSON.readTree(json.toFile()).get("tokens").asLong();
    assertEquals(tokens, gold);
    assertEquals(tokens, tagged);
  }

  @Test
  void inspectDescribesTheModel() throws Exception {
    Cli.Result text = Cli.run("inspect", "--model", model.toString());
    assertEquals(0, text.exitCode(), text::toString);
    assertTrue(text.out().contains("corpus.1.file") && text.out().contains("train.conllu"), text::toString);
    assertTrue(text.out().contains("strongest transitions"), text::toString);

    Cli.Result json = Cli.run("inspect", "--model", model.toString(), "--json");
    assertEquals(0, json.exitCode(), json::toString);
    JsonNode d = JSON.readTree(json.out());
    byte[] bytes = Files.readAllBytes(model);
    assertEquals(bytes.length, d.get("fileBytes").asLong());
    assertEquals(sha256(bytes), d.get("sha256").asText());
    assertEquals(2, d.get("order").asInt());
    assertEquals(InspectCommand.TOP_TRANSITIONS, d.get("strongestTransitions").size());
    assertTrue(d.get("vocabulary").asInt() > 50);
    assertTrue(d.get("openTags").toString().contains("NOUN"));
    assertTrue(d.get("heapBytes").asLong() > 0);
  }

  @Test
  void tagPrintsOneLinePerTokenWithConfidence() {
    Cli.Result r = Cli.run("tag", "--model", model.toString(), "the quiet otter slept near a kettle.");
    assertEquals(0, r.exitCode(), r::toString);
    List<String> lines = r.out().lines().toList();
    // the default chain keeps the standard tokenizer's tokens: no full stop
    assertEquals(7, lines.size(), r::toString);
    String[] expected = {"DET", "ADJ", "NOUN", "VERB", "ADP", "DET", "NOUN"};
    for (int i = 0; i < expected.length; i++) {
      String[] fields = lines.get(i).split("\t");
      assertEquals(5, fields.length, lines.get(i));
      assertEquals(expected[i], fields[3], lines.get(i));
      double confidence = Double.parseDouble(fields[4]);
      assertTrue(confidence > 0 && confidence <= 1, lines.get(i));
    }
  }

  @Test
  void tagReadsSentencesFromStandardInput() {
    InputStream saved = System.in;
    try {
      System.setIn(new ByteArrayInputStream("Maribel laughed .\n\nwe will mend it !\n".getBytes(StandardCharsets.UTF_8)));
      Cli.Result r = Cli.run("tag", "--model", model.toString(), "--no-confidence");
      assertEquals(0, r.exitCode(), r::toString);
      // token, offsets in the whole input, class; a line break starts a sentence (sentenceStandard)
      assertEquals("Maribel\t0\t7\tPROPN\nlaughed\t8\t15\tVERB\n\nwe\t19\t21\tPRON\nwill\t22\t26\tAUX\nmend\t27\t31\tVERB\n"
          + "it\t32\t34\tPRON\n",
          r.out().replace(System.lineSeparator(), "\n"));
    } finally {
      System.setIn(saved);
    }
  }

  @Test
  void crossValidatePrintsEveryFold() throws Exception {
    Path json = dir.resolve("cv.json");
    Cli.Result r = Cli.run("cross-validate", "--corpus", trainConllu.toString(), "--folds", "3", "--report", json.toString());
    assertEquals(0, r.exitCode(), r::toString);
    for (int fold = 1; fold <= 3; fold++) {
      assertTrue(r.out().contains("fold " + fold + "/3"), r::toString);
    }
    assertTrue(r.out().contains("mean") && r.out().contains("±"), r::toString);
    JsonNode report = JSON.readTree(json.toFile());
    assertEquals(3, report.get("perFold").size());
    assertEquals(300, report.get("perFold").findValues("sentences").stream().mapToLong(JsonNode::asLong).sum());
    double accuracy = report.get("accuracy").asDouble();
    assertTrue(accuracy > 0.8 && accuracy <= 1, report::toString);
  }

  static String sha256(byte[] bytes) throws Exception {
    return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
  }
}
