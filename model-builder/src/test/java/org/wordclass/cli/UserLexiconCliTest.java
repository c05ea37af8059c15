package org.wordclass.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.IntStream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wordclass.model.Checksums;
import org.wordclass.model.HmmModel;
import org.wordclass.model.ModelFile;

/** {@code train --lexicon}, what {@code inspect} says of it, and {@code tag --lexicon --explain / --json}. */
class UserLexiconCliTest {
  private static final ObjectMapper JSON = new ObjectMapper();
  private static final String KITCHEN = """
      # invented corrections for the invented corpus
      kettle   VERB
      polish   NOUN:2 VERB
      quibble  VERB  case=any
      """;

  @TempDir
  static Path dir;

  static Path corpus;
  static Path lexicon;

  @BeforeAll
  static void writeInputs() throws Exception {
    corpus = InventedCorpus.write(dir.resolve("train.conllu"), InventedCorpus.conllu(InventedCorpus.sentences(200, 5, false)));
    lexicon = Files.writeString(dir.resolve("kitchen.txt"), KITCHEN);
  }

  private static Cli.Result ok(String... args) {
    Cli.Result r = Cli.run(args);
    assertEquals(0, r.exitCode(), r::toString);
    return r;
  }

  @Test
  void trainFoldsTheLexiconInAndInspectCountsItsEntries() throws Exception {
    Path out = dir.resolve("with-lexicon.wcm");
    Cli.Result trained = ok("train", "--corpus", corpus.toString(), "--lexicon", lexicon.toString(), "--out", out.toString());
    assertTrue(trained.out().contains("lexicon     3 entries from " + lexicon), trained::toString);

    HmmModel model = ModelFile.read(out);
    assertEquals("kitchen.txt", model.provenance().get("lexicon.file"));
    assertEquals(Checksums.sha256(Files.readAllBytes(lexicon)), model.provenance().get("lexicon.sha256"));
    assertEquals("3", model.provenance().get("lexicon.entries"));
    int verb = model.tags().indexOf("VERB");
    assertArrayEquals(model.states().statesOf(verb), statesOf(model, "kettle"), "the corpus's noun is now a verb only");
    for (String form : List.of("quibble", "Quibble", "QUIBBLE")) {
      assertArrayEquals(model.states().statesOf(verb), statesOf(model, form), form);
    }

    Cli.Result text = ok("inspect", "--model", out.toString());
    assertTrue(text.out().contains("user lexicon         3 entries from kitchen.txt"), text::toString);
    JsonNode json = JSON.readTree(ok("inspect", "--model", out.toString(), "--json").out());
    assertEquals(3, json.get("lexiconEntries").asInt());
  }

  @Test
  void aModelWithoutLexiconSaysNothingOfOne() throws Exception {
    Path out = dir.resolve("plain.wcm");
    ok("train", "--corpus", corpus.toString(), "--out", out.toString());
    assertFalse(ok("inspect", "--model", out.toString()).out().contains("user lexicon"));
    assertTrue(JSON.readTree(ok("inspect", "--model", out.toString(), "--json").out()).get("lexiconEntries").isNull());
  }

  private static int[] statesOf(HmmModel model, String word) {
    int w = model.lexicon().lookup(word);
    assertTrue(w >= 0, word);
    return IntStream.range(0, model.lexicon().stateCount(w)).map(k -> model.lexicon().state(w, k)).toArray();
  }

  @Test
  void aBadLexiconStopsTrainingAndTaggingNamingFileLineAndReason() throws Exception {
    Path bad = Files.writeString(dir.resolve("bad.txt"), "kettle VERB\npolish NOUN NUON\n");
    Path out = dir.resolve("never.wcm");
    Cli.Result train = Cli.run("train", "--corpus", corpus.toString(), "--lexicon", bad.toString(), "--out", out.toString());
    assertEquals(Failures.INPUT_ERROR, train.exitCode(), train::toString);
    assertTrue(train.err().lines().anyMatch(l -> l.startsWith("wordclass train: " + bad + ":2: unknown class 'NUON'; the model's classes are ")),
        train::toString);
    assertFalse(Files.exists(out), "no model is written");

    Cli.Result tag = Cli.run("tag", "--lexicon", bad.toString(), "some words");
    assertEquals(Failures.INPUT_ERROR, tag.exitCode(), tag::toString);
    assertTrue(tag.err().startsWith("wordclass tag: " + bad + ":2: unknown class 'NUON'"), tag::toString);
    assertFalse(tag.err().contains("\tat "), tag::toString);
  }

  @Test
  void explainSaysWhereEachTokensClassesCameFrom() throws Exception {
    Path cooking = Files.writeString(dir.resolve("cooking.txt"), "cook NOUN VERB\n");
    List<String> lines = ok("tag", "--explain", "--lexicon", cooking.toString(), "Stir the broth the cook made").out().lines().toList();
    assertEquals(6, lines.size(), lines::toString);
    String[][] fields = lines.stream().map(l -> l.split("\t")).toArray(String[][]::new);
    // token, start, end, class, confidence, how, next best
    for (String[] f : fields) {
      assertEquals(7, f.length, String.join("|", f));
    }
    assertEquals("known as 'stir' (first word, lower-cased)", fields[0][5]);
    assertEquals("known", fields[1][5]);
    assertEquals("unknown: ending 'oth', shape LOWER", fields[2][5]);
    assertEquals(List.of("cook", "19", "23", "NOUN", "user lexicon"), List.of(fields[4][0], fields[4][1], fields[4][2], fields[4][3],
        fields[4][5]));
    // the next best classes: the other listed class only, less probable than the chosen one
    String[] verb = fields[4][6].split(" ");
    assertEquals("VERB", verb[0]);
    assertTrue(Double.parseDouble(verb[1]) < Double.parseDouble(fields[4][4]), lines.get(4));
    assertEquals(1.0, Double.parseDouble(verb[1]) + Double.parseDouble(fields[4][4]), 1.5e-4, lines.get(4));
    // an unknown word has several alternatives, most probable first
    List<Double> alternatives = new ArrayList<>();
    for (String item : fields[2][6].split(", ")) {
      alternatives.add(Double.parseDouble(item.split(" ")[1]));
    }
    assertEquals(ExplainedTokens.ALTERNATIVES, alternatives.size(), lines.get(2));
    assertTrue(alternatives.get(0) >= alternatives.get(1) && alternatives.get(1) >= alternatives.get(2), lines.get(2));
  }

  @Test
  void jsonGivesTheSameExplanationForTools() throws Exception {
    Path cooking = Files.writeString(dir.resolve("cooking2.txt"), "cook NOUN VERB\n");
    JsonNode report = JSON.readTree(ok("tag", "--json", "--lexicon", cooking.toString(), "Stir the broth\nThe cook smiled").out());
    assertEquals(cooking.toString(), report.get("lexicon").asText());
    assertTrue(report.get("model").asText().contains("bundled"));
    JsonNode sentences = report.get("sentences");
    assertEquals(2, sentences.size());
    Set<String> expectedKeys = Set.of("token", "start", "end", "wordClass", "confidence", "source", "lookedUpAs", "ending",
        "endingLength", "shape", "opensSentence", "alternatives");
    for (JsonNode sentence : sentences) {
      for (JsonNode token : sentence.get("tokens")) {
        assertEquals(expectedKeys, fieldNames(token), token::toString);
      }
    }
    JsonNode stir = sentences.get(0).get("tokens").get(0);
    assertEquals("LOWERCASED_FIRST_WORD", stir.get("source").asText());
    assertEquals("stir", stir.get("lookedUpAs").asText());
    JsonNode broth = sentences.get(0).get("tokens").get(2);
    assertEquals("UNKNOWN", broth.get("source").asText());
    assertEquals("oth", broth.get("ending").asText());
    assertEquals(3, broth.get("endingLength").asInt());
    assertEquals("LOWER", broth.get("shape").asText());
    assertTrue(broth.get("alternatives").get(0).get("probability").isNumber());
    JsonNode cook = sentences.get(1).get("tokens").get(1);
    assertEquals(List.of("cook", "NOUN", "USER_LEXICON"),
        List.of(cook.get("token").asText(), cook.get("wordClass").asText(), cook.get("source").asText()));
    assertTrue(cook.get("ending").isNull() && cook.get("lookedUpAs").isNull(), cook::toString);
    assertEquals("VERB", cook.get("alternatives").get(0).get("wordClass").asText());
    assertEquals(1, cook.get("alternatives").size());
  }

  private static Set<String> fieldNames(JsonNode node) {
    Set<String> names = new TreeSet<>();
    for (Iterator<String> it = node.fieldNames(); it.hasNext(); ) {
      names.add(it.next());
    }
    return names;
  }
}
