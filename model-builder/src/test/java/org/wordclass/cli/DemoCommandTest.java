package org.wordclass.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.lucene.analysis.standard.StandardTokenizer;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.wordclass.decoding.Tagger;
import org.wordclass.demo.Notice;
import org.wordclass.model.DefaultModel;
import picocli.CommandLine;

/**
 * {@code wordclass demo} says what it shows truthfully. Expectations come from the bundled model
 * itself, tagging each notice here with a {@link Tagger} over the standard tokenizer's tokens, and
 * from the reader's classes of the collection; no hit list is written into the test.
 */
class DemoCommandTest {
  private static final Pattern RECALL_LOST =
      Pattern.compile("recall lost: doc (\\S+): '[^']*' was tagged (\\S+), so the (\\S+)-restricted query misses it");

  private static List<Notice> notices;
  /** Per notice id, each token lowercased with the tags the tagger gave it there. */
  private static Map<String, Map<String, TreeSet<String>>> tagged;
  private static Cli.Result text;
  private static JsonNode json;

  @BeforeAll
  static void runDemoAndTagIndependently() throws IOException {
    notices = Notice.bundled();
    tagged = new LinkedHashMap<>();
    Tagger tagger = new Tagger(DefaultModel.get());
    for (Notice notice : notices) {
      List<String> tokens = standardTokens(notice.text());
      String[] tags = tagger.tagNames(tokens);
      Map<String, TreeSet<String>> byWord = new LinkedHashMap<>();
      for (int i = 0; i < tags.length; i++) {
        byWord.computeIfAbsent(tokens.get(i).toLowerCase(Locale.ROOT), w -> new TreeSet<>()).add(tags[i]);
      }
      tagged.put(notice.id(), byWord);
    }
    text = Cli.run("demo");
    Cli.Result data = Cli.run("demo", "--json");
    assertEquals(0, data.exitCode(), data::toString);
    json = new ObjectMapper().readTree(data.out());
  }

  private static List<String> standardTokens(String text) throws IOException {
    List<String> tokens = new ArrayList<>();
    try (StandardTokenizer tokenizer = new StandardTokenizer()) {
      tokenizer.setReader(new StringReader(text));
      CharTermAttribute term = tokenizer.addAttribute(CharTermAttribute.class);
      tokenizer.reset();
      while (tokenizer.incrementToken()) {
        tokens.add(term.toString());
      }
      tokenizer.end();
    }
    return tokens;
  }

  private static TreeSet<String> tagsOf(String noticeId, String word) {
    return tagged.get(noticeId).getOrDefault(word, new TreeSet<>());
  }

  private static Notice notice(String id) {
    return notices.stream().filter(n -> n.id().equals(id)).findFirst().orElseThrow();
  }

  private static List<String> strings(JsonNode array) {
    List<String> values = new ArrayList<>();
    array.forEach(node -> values.add(node.asText()));
    return values;
  }

  private static List<JsonNode> comparisons(boolean restricted) {
    List<JsonNode> found = new ArrayList<>();
    json.get("comparisons").forEach(c -> {
      if (c.get("wordClass").isNull() != restricted) {
        found.add(c);
      }
    });
    assertFalse(found.isEmpty(), "the showcase has " + (restricted ? "restricted" : "boosted") + " comparisons");
    return found;
  }

  @Test
  void runsCleanlyOnOneScreen() {
    assertEquals(0, text.exitCode(), text::toString);
    assertEquals("", text.err());
    long lines = text.out().lines().count();
    assertTrue(lines <= 80, lines + " lines:\n" + text.out());
    assertTrue(text.out().lines().allMatch(line -> line.length() <= 120), text.out());
  }

  @Test
  void restrictedHitsAreThePlainHitsTheTaggerClassedSo() {
    for (JsonNode c : comparisons(true)) {
      String word = c.get("word").asText();
      String wordClass = c.get("wordClass").asText();
      List<String> plain = strings(c.get("plainHits"));
      List<String> restricted = strings(c.get("comparedHits"));
      assertTrue(plain.containsAll(restricted), c.toString());
      List<String> expected = new ArrayList<>();
      for (Notice notice : notices) {
        if (tagsOf(notice.id(), word).contains(wordClass)) {
          expected.add(notice.id());
        }
      }
      assertEquals(new TreeSet<>(expected), new TreeSet<>(restricted), c.toString());
      assertTrue(plain.size() > restricted.size(), "a restriction that narrows nothing shows nothing: " + c);
    }
  }

  @Test
  void everyRowShowsTheTagTheTaggerGave() {
    json.get("comparisons").forEach(c -> c.get("rows").forEach(row -> {
      String id = row.get("id").asText();
      assertEquals(List.copyOf(tagsOf(id, c.get("word").asText())), strings(row.get("tags")), row.toString());
      String reader = row.get("reader").isNull() ? null : row.get("reader").asText();
      assertEquals(notice(id).readerClass(c.get("word").asText()), reader, row.toString());
      String line = "  " + id + " ";
      assertTrue(text.out().lines().anyMatch(l -> l.startsWith(line) && l.contains(String.join("+", strings(row.get("tags"))))),
          "the table shows doc " + id + " with its tag");
    }));
  }

  @Test
  void aRestrictionRemovesAWrongClassHit() {
    boolean removed = false;
    for (JsonNode c : comparisons(true)) {
      String word = c.get("word").asText();
      String wordClass = c.get("wordClass").asText();
      List<String> restricted = strings(c.get("comparedHits"));
      for (String id : strings(c.get("plainHits"))) {
        String reader = notice(id).readerClass(word);
        removed |= !restricted.contains(id) && reader != null && !reader.equals(wordClass)
            && !tagsOf(id, word).contains(wordClass);
      }
    }
    assertTrue(removed, "some restricted query leaves out a notice where the word really has another class");
    assertTrue(text.out().contains("precision up: "), text.out());
  }

  @Test
  void theRecallLossPrintedIsReal() {
    Matcher m = RECALL_LOST.matcher(text.out());
    assertTrue(m.find(), "the demo shows a use the restriction loses:\n" + text.out());
    String id = m.group(1);
    String taggedAs = m.group(2);
    String wordClass = m.group(3);
    JsonNode c = comparisons(true).stream()
        .filter(x -> x.get("wordClass").asText().equals(wordClass) && strings(x.get("plainHits")).contains(id))
        .findFirst().orElseThrow();
    String word = c.get("word").asText();
    assertTrue(strings(c.get("plainHits")).contains(id));
    assertFalse(strings(c.get("comparedHits")).contains(id));
    assertEquals(wordClass, notice(id).readerClass(word), "the lost notice really uses '" + word + "' as " + wordClass);
    assertEquals(new TreeSet<>(List.of(taggedAs)), tagsOf(id, word), "the tagger really says " + taggedAs);
    assertNotEquals(wordClass, taggedAs);
  }

  @Test
  void boostingPutsANounUseFirstAndKeepsEveryHit() {
    for (JsonNode c : comparisons(false)) {
      String word = c.get("word").asText();
      List<String> plain = strings(c.get("plainHits"));
      List<String> boosted = strings(c.get("comparedHits"));
      assertEquals(new TreeSet<>(plain), new TreeSet<>(boosted), c.toString());
      String first = boosted.get(0);
      assertEquals(Set.of("NOUN"), tagsOf(first, word), c.toString());
      assertEquals("NOUN", notice(first).readerClass(word), c.toString());
      assertFalse(tagsOf(plain.get(0), word).contains("NOUN"), "the plain ranking led with another use: " + c);
    }
  }

  @Test
  void outputExplainsAndMentionsTheTags() {
    // the explanation is wrapped, so compare with line breaks as spaces
    String out = text.out().replaceAll("\\s+", " ");
    for (String expected : new String[] {"hidden Markov model", "Legend", "tagged", "reader", "VERB", "NOUN", "PROPN"}) {
      assertTrue(out.contains(expected), expected + " in\n" + out);
    }
    assertTrue(out.matches(".* [A-Z]+! .*"), "a disagreement of tagger and reader marked with ! in\n" + out);
  }

  /**
   * Notice 02 (our invented notice) opens with the imperative "Book early"; the reader's class,
   * VERB, is the demo's own reader column. EWT train has "Book" only in mid-sentence, as a name,
   * so it came out PROPN until capitalised first words known only from mid-sentence were looked
   * up in lower case. As "book" the bundled model still prefers NOUN to VERB there (0.58 against
   * 0.42), so what this checks is that the name is gone, not that the verb is found.
   */
  @Test
  void sentenceInitialBookIsNoLongerTakenForAName() {
    assertEquals("VERB", notice("02").readerClass("book"));
    assertFalse(tagsOf("02", "book").contains("PROPN"), tagsOf("02", "book").toString());
  }

  @Test
  void ownQueriesAndEveryNoticesTagging() {
    Cli.Result r = Cli.run("demo", "--query", "Light:noun", "--query", "ferry", "--show-tags");
    assertEquals(0, r.exitCode(), r::toString);
    assertTrue(r.out().contains("Light:NOUN  --  plain 'light' vs 'light' tagged NOUN (term light_noun)"), r::toString);
    assertTrue(r.out().contains("ferry  --  plain 'ferry'"), r::toString);
    assertFalse(r.out().contains("board:VERB"), "own queries replace the showcase: " + r);
    Tagger tagger = new Tagger(DefaultModel.get());
    for (Notice notice : notices) {
      List<String> tokens = standardTokensUnchecked(notice.text());
      String[] tags = tagger.tagNames(tokens);
      StringBuilder line = new StringBuilder("  " + notice.id() + " ");
      for (int i = 0; i < tags.length; i++) {
        line.append(' ').append(tokens.get(i)).append('/').append(tags[i]);
      }
      assertTrue(r.out().lines().anyMatch(line.toString()::equals), line + " in\n" + r.out());
    }
  }

  private static List<String> standardTokensUnchecked(String text) {
    try {
      return standardTokens(text);
    } catch (IOException e) {
      throw new AssertionError(e);
    }
  }

  @Test
  void aQueryThatIsNotOneWordOrClassIsAUsageError() {
    for (String bad : new String[] {"book:NOUNISH", "two words", ":VERB"}) {
      Cli.Result r = Cli.run("demo", "--query", bad);
      assertEquals(CommandLine.ExitCode.USAGE, r.exitCode(), r::toString);
      assertTrue(r.err().startsWith("wordclass demo: --query " + bad + ": "), r::toString);
      assertEquals("", r.out());
    }
  }
}
