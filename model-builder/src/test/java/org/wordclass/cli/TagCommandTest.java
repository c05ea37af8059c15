package org.wordclass.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.BufferedReader;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.StringReader;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.TimeUnit;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.standard.StandardTokenizer;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.analysis.tokenattributes.OffsetAttribute;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wordclass.analysis.WordClassAttribute;
import org.wordclass.analysis.WordClassOptions;
import org.wordclass.corpus.AnalysisChain;
import org.wordclass.model.DefaultModel;

/**
 * {@code wordclass tag} runs the index's analysis chain, the word-class filter last, and shows
 * what that filter wrote: invented sentences with the bundled model, compared with Lucene's own
 * standard tokenizer and with a plain analysis run of the same chain; strict UTF-8 input.
 */
class TagCommandTest {
  private static final ObjectMapper JSON = new ObjectMapper();

  /** One printed token line: text, offsets, class and the rest. */
  record Line(String token, int start, int end, String wordClass, List<String> rest) {
    static Line parse(String line) {
      List<String> f = List.of(line.split("\t", -1));
      return new Line(f.get(0), Integer.parseInt(f.get(1)), Integer.parseInt(f.get(2)), f.get(3), f.subList(4, f.size()));
    }
  }

  @TempDir Path dir;

  private static List<Line> tokens(Cli.Result r) {
    assertEquals(0, r.exitCode(), r::toString);
    return r.out().lines().filter(l -> !l.isEmpty()).map(Line::parse).toList();
  }

  private static Cli.Result withStandardInput(byte[] input, String... args) {
    InputStream saved = System.in;
    try {
      System.setIn(new ByteArrayInputStream(input));
      return Cli.run(args);
    } finally {
      System.setIn(saved);
    }
  }

  private static String classOf(List<Line> lines, String token) {
    return lines.stream().filter(l -> l.token().equals(token)).findFirst().orElseThrow(() -> new AssertionError(token + ": " + lines))
        .wordClass();
  }

  /**
   * "board" after the modal "will" is a verb, "ferry" after "the" a noun (common practice: the
   * UD guidelines' VERB and NOUN); the full stop is not a token, since the default chain
   * (sentenceStandard) keeps the standard tokenizer's tokens, and Unicode word segmentation,
   * which it follows, drops punctuation (common practice).
   */
  @Test
  void theCrewWillBoardTheFerry() {
    List<Line> lines = tokens(Cli.run("tag", "The crew will board the ferry."));
    assertEquals(List.of("The", "crew", "will", "board", "the", "ferry"), lines.stream().map(Line::token).toList());
    assertEquals("VERB", classOf(lines, "board"));
    assertEquals("NOUN", classOf(lines, "ferry"));
    for (Line l : lines) {
      double confidence = Double.parseDouble(l.rest().get(0));
      assertTrue(confidence > 0 && confidence <= 1, l::toString);
    }
  }

  /** A chain that keeps punctuation gets it tagged as the treebanks tag it: PUNCT (UD guidelines). */
  @Test
  void aChainThatKeepsPunctuationTagsItPunct() {
    List<Line> lines = tokens(Cli.run("tag", "--tokenizer", "pattern:pattern=\\w+|[^\\w\\s],group=0", "--no-confidence",
        "The crew will board the ferry."));
    assertEquals(List.of("The", "crew", "will", "board", "the", "ferry", "."), lines.stream().map(Line::token).toList());
    assertEquals("VERB", classOf(lines, "board"));
    assertEquals("NOUN", classOf(lines, "ferry"));
    assertEquals("PUNCT", classOf(lines, "."));
    assertEquals(0, lines.get(0).rest().size(), "no confidence column with --no-confidence");
  }

  /**
   * "table" after "a" is a noun, "for" an adposition, "two" a numeral (UD guidelines: NOUN, ADP,
   * NUM; common practice); the comma and the full stop are not tokens of the default chain.
   */
  @Test
  void bookATableForTwoPlease() {
    List<Line> lines = tokens(Cli.run("tag", "Book a table for two, please."));
    assertEquals(List.of("Book", "a", "table", "for", "two", "please"), lines.stream().map(Line::token).toList());
    assertEquals("NOUN", classOf(lines, "table"));
    assertEquals("ADP", classOf(lines, "for"));
    assertEquals("NUM", classOf(lines, "two"));
    // with a chain that keeps punctuation, the comma and the full stop are PUNCT (UD guidelines)
    List<Line> kept = tokens(Cli.run("tag", "--tokenizer", "pattern:pattern=\\w+|[^\\w\\s],group=0", "Book a table for two, please."));
    assertEquals(List.of("Book", "a", "table", "for", "two", ",", "please", "."), kept.stream().map(Line::token).toList());
    assertEquals("PUNCT", classOf(kept, ","));
    assertEquals("PUNCT", classOf(kept, "."));
  }

  /** Offsets are the standard tokenizer's (Lucene's StandardTokenizer run here on the same text), relative to the whole input. */
  @Test
  void offsetsAreTheStandardTokenizers() throws IOException {
    String text = "The crew will board the ferry.  Book a table for two, please!\nCafé au lait costs 3.50 — or “free” on Mondays.";
    List<Line> lines = tokens(Cli.run("tag", text));
    List<String> expected = new ArrayList<>();
    try (StandardTokenizer standard = new StandardTokenizer()) {
      CharTermAttribute term = standard.getAttribute(CharTermAttribute.class);
      OffsetAttribute offsets = standard.getAttribute(OffsetAttribute.class);
      standard.setReader(new StringReader(text));
      standard.reset();
      while (standard.incrementToken()) {
        expected.add(term + " " + offsets.startOffset() + " " + offsets.endOffset());
      }
      standard.end();
    }
    assertEquals(expected, lines.stream().map(l -> l.token() + " " + l.start() + " " + l.end()).toList());
    for (Line l : lines) {
      assertEquals(l.token(), text.substring(l.start(), l.end()));
    }
  }

  /**
   * The classes and offsets of {@code tag}, {@code tag --explain} and {@code tag --json} are those
   * a plain analysis run of the same chain writes (the default chain and the bundled model, built
   * here without the command), sentence by sentence as the tokenizer marks them.
   */
  @Test
  void explainAndJsonAgreeWithThePlainAnalysisOfTheSameChain() throws IOException {
    String text = "The crew will board the ferry. Book a table for two, please. Board at the south ramp before the horn sounds.";
    List<String> expected = new ArrayList<>();
    try (Analyzer analyzer = AnalysisChain.DEFAULT.buildWithWordClass(WordClassOptions.of(DefaultModel.get()));
        TokenStream stream = analyzer.tokenStream("body", text)) {
      CharTermAttribute term = stream.getAttribute(CharTermAttribute.class);
      OffsetAttribute offsets = stream.getAttribute(OffsetAttribute.class);
      WordClassAttribute wordClass = stream.getAttribute(WordClassAttribute.class);
      stream.reset();
      while (stream.incrementToken()) {
        expected.add(term + " " + offsets.startOffset() + " " + offsets.endOffset() + " " + wordClass.getWordClass());
      }
      stream.end();
    }
    assertEquals(21, expected.size(), expected::toString);
    List<Line> plain = tokens(Cli.run("tag", "--no-confidence", text));
    assertEquals(expected, plain.stream().map(l -> l.token() + " " + l.start() + " " + l.end() + " " + l.wordClass()).toList());
    List<Line> explained = tokens(Cli.run("tag", "--explain", text));
    assertEquals(expected, explained.stream().map(l -> l.token() + " " + l.start() + " " + l.end() + " " + l.wordClass()).toList());
    for (Line l : explained) {
      assertEquals(3, l.rest().size(), l::toString);
    }

    JsonNode report = JSON.readTree(Cli.run("tag", "--json", text).out());
    assertEquals("sentenceStandard", report.get("chain").asText());
    JsonNode sentences = report.get("sentences");
    assertEquals(3, sentences.size(), "three sentences, as the tokenizer marks them");
    List<String> fromJson = new ArrayList<>();
    for (JsonNode sentence : sentences) {
      for (JsonNode t : sentence.get("tokens")) {
        fromJson.add(t.get("token").asText() + " " + t.get("start").asInt() + " " + t.get("end").asInt() + " "
            + t.get("wordClass").asText());
        // the chosen class's confidence is above every alternative's probability
        for (JsonNode a : t.get("alternatives")) {
          assertTrue(a.get("probability").asDouble() <= t.get("confidence").asDouble() + 1e-9, t::toString);
        }
      }
    }
    assertEquals(expected, fromJson);
  }

  /**
   * An invented imperative after a sentence without a full stop (UD tags imperatives VERB; common
   * practice): {@code tag} decodes the boundary as the filter does by default, says so in {@code
   * --explain} and {@code --json}, and {@code --boundaries tokenizer} reads the word in mid-sentence.
   */
  @Test
  void decodedBoundaryShownAndSwitchable() throws Exception {
    String text = "The kettle is broken again Start the coffee machine instead";
    String start = Cli.run("tag", "--explain", text).out().lines().filter(l -> l.startsWith("Start\t")).findFirst().orElseThrow();
    assertEquals("VERB", start.split("\t")[3], start);
    assertTrue(start.contains("opens a sentence"), start);
    JsonNode tokens = JSON.readTree(Cli.run("tag", "--json", text).out()).get("sentences").get(0).get("tokens");
    for (JsonNode t : tokens) {
      assertEquals(t.get("token").asText().equals("Start"), t.get("opensSentence").asBoolean(), t::toString);
    }
    String off = Cli.run("tag", "--boundaries", "tokenizer", "--explain", text).out().lines()
        .filter(l -> l.startsWith("Start\t")).findFirst().orElseThrow();
    assertEquals("NOUN", off.split("\t")[3], off);
    assertFalse(off.contains("opens a sentence"), off);
    Cli.Result bad = Cli.run("tag", "--boundaries", "sentences", text);
    assertTrue(bad.exitCode() != 0 && bad.err().contains("--boundaries"), bad::toString);
  }

  /** A blank line where the tokenizer starts a new sentence: here at a full stop and at a line break. */
  @Test
  void aBlankLineBetweenSentences() {
    Cli.Result r = Cli.run("tag", "--no-confidence", "The crew will board the ferry. Book a table\nplease");
    assertEquals(0, r.exitCode(), r::toString);
    List<String> lines = r.out().lines().toList();
    assertEquals(List.of("The", "crew", "will", "board", "the", "ferry", "", "Book", "a", "table", "", "please"),
        lines.stream().map(l -> l.split("\t")[0]).toList());
  }

  @Test
  void standardInputIsOneFieldValueReadAsAStream() {
    byte[] input = "The crew will board the ferry.\nBook a table for two, please.\n".getBytes(StandardCharsets.UTF_8);
    List<Line> fromStdin = tokens(withStandardInput(input, "tag", "--no-confidence"));
    assertEquals(tokens(Cli.run("tag", "--no-confidence", "The crew will board the ferry.\nBook a table for two, please.\n")),
        fromStdin);
    assertEquals(31, fromStdin.get(6).start(), "offsets count from the start of the input: 'Book' on the second line");
  }

  /** A leading byte-order mark is skipped, as the corpus readers skip it: same tokens, offsets from the text after it. */
  @Test
  void aLeadingByteOrderMarkIsSkipped() {
    byte[] text = "Book a table".getBytes(StandardCharsets.UTF_8);
    byte[] withMark = new byte[text.length + 3];
    withMark[0] = (byte) 0xEF;
    withMark[1] = (byte) 0xBB;
    withMark[2] = (byte) 0xBF;
    System.arraycopy(text, 0, withMark, 3, text.length);
    assertEquals(tokens(withStandardInput(text, "tag")), tokens(withStandardInput(withMark, "tag")));
  }

  @Test
  void invalidUtf8IsRefusedNamingTheInputAndLine() throws IOException {
    byte[] latin1 = "Book a table\nat the caf\u00e9 please\n".getBytes(StandardCharsets.ISO_8859_1);
    assertRefused(withStandardInput(latin1, "tag"), "wordclass tag: standard input:2: is not valid UTF-8 (MalformedInputException)");
    Path file = Files.write(dir.resolve("notes.txt"), latin1);
    assertRefused(Cli.run("tag", "--text", file.toString()), "wordclass tag: " + file + ":2: is not valid UTF-8 (MalformedInputException)");
    // UTF-16 with its byte order mark FF FE: not UTF-8 at its first byte
    Path utf16 = Files.write(dir.resolve("utf16.txt"), "\uFEFFBook a table".getBytes(StandardCharsets.UTF_16LE));
    assertRefused(Cli.run("tag", "--text", utf16.toString()), "wordclass tag: " + utf16 + ":1: is not valid UTF-8 (MalformedInputException)");
  }

  @Test
  void nulIsRefusedNamingTheInputAndLine() throws IOException {
    byte[] withNul = "Book a table\n\nfor two\0 please\n".getBytes(StandardCharsets.UTF_8);
    assertRefused(withStandardInput(withNul, "tag", "--json"), "wordclass tag: standard input:3: " + MalformedInputTableTest.NUL);
    // UTF-16 without a byte order mark is mostly NUL bytes
    Path utf16 = Files.write(dir.resolve("utf16le.txt"), "Book a table".getBytes(StandardCharsets.UTF_16LE));
    assertRefused(Cli.run("tag", "--text", utf16.toString()), "wordclass tag: " + utf16 + ":1: " + MalformedInputTableTest.NUL);
  }

  private static void assertRefused(Cli.Result r, String message) {
    assertEquals(Failures.INPUT_ERROR, r.exitCode(), r::toString);
    assertEquals(message, r.err().lines().findFirst().orElse(""), r::toString);
    assertEquals(1, r.err().lines().count(), r::toString);
  }

  /** {@code --language} picks a shipped model as the filter's language argument does; a code not shipped is refused. */
  @Test
  void languagePicksAShippedModel() {
    // "chat" after "Le" is a noun, "dort" a verb (common practice, French grammar)
    List<Line> french = tokens(Cli.run("tag", "--language", "fr", "--no-confidence", "Le chat dort dans la cuisine."));
    assertEquals("NOUN", classOf(french, "chat"));
    assertEquals("VERB", classOf(french, "dort"));
    Cli.Result unknown = Cli.run("tag", "--language", "xx", "word");
    assertEquals(2, unknown.exitCode(), unknown::toString);
    assertTrue(unknown.err().startsWith("wordclass tag: --language: no model is shipped for 'xx'; shipped: "), unknown::toString);
    Cli.Result both = Cli.run("tag", "--language", "fr", "--model", "x.wcm", "word");
    assertEquals(2, both.exitCode(), both::toString);
    assertTrue(both.err().startsWith("wordclass tag: --model and --language cannot both be given"), both::toString);
  }

  /** A component Lucene does not know, or an argument it refuses, is a mistake on the command line, not an internal error. */
  @Test
  void aChainLuceneCannotBuildIsRefusedAsAMistake() throws IOException {
    Path corpus = Files.writeString(dir.resolve("c.conllu"), "# text = Hi\n1\tHi\thi\tINTJ\t_\t_\t_\t_\t_\t_\n\n");
    List<List<String>> commands = List.of(List.of("tag", "--tokenizer", "nosuch", "word"), List.of("tag", "--filter", "stop:bogus=1", "word"),
        List.of("tag", "--filter", "stop:ignoreCase", "word"),
        List.of("evaluate", "--corpus", corpus.toString(), "--through-analyzer", "--tokenizer", "nosuch"));
    for (List<String> args : commands) {
      Cli.Result r = Cli.run(args.toArray(String[]::new));
      assertEquals(2, r.exitCode(), r::toString);
      assertTrue(r.err().lines().anyMatch(l -> l.startsWith("wordclass " + args.get(0) + ": --tokenizer/--filter: ")), r::toString);
      assertFalse(r.err().contains("internal error"), r::toString);
    }
  }

  @Test
  void filtersBeforeTheWordClassFilterAreRun() {
    List<Line> lines = tokens(Cli.run("tag", "--filter", "lowercase", "--no-confidence", "BOOK a Table"));
    assertEquals(List.of("book", "a", "table"), lines.stream().map(Line::token).toList());
    assertFalse(lines.isEmpty());
  }

  /**
   * 20 MB without a line break through a child JVM with a 64 MB heap: the input is read as a
   * stream through the chain, so memory stays bounded by the tokenizer's buffer and the filter's
   * window. The command it replaces read the input line by line into a String and split it into a
   * list of tokens, some 200 MB here; the issue measured 5.5 GB and an OutOfMemoryError for 50 MB.
   */
  @Test
  void twentyMegabytesWithoutALineBreakInASmallHeap() throws Exception {
    String sentence = "The crew will board the ferry at the south ramp. ";
    Path input = dir.resolve("long.txt");
    try (Writer w = Files.newBufferedWriter(input, StandardCharsets.UTF_8)) {
      for (int n = 0; n < 20_000_000 / sentence.length(); n++) {
        w.write(sentence);
      }
    }
    long length = Files.size(input);
    Path output = dir.resolve("tagged.txt");
    Path errors = dir.resolve("errors.txt");
    Path java = Path.of(System.getProperty("java.home"), "bin", "java");
    String classPath = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
    long started = System.nanoTime();
    Process child = new ProcessBuilder(java.toString(), "-Xmx64m", "-cp", classPath, WordclassCommand.class.getName(), "tag",
        "--no-confidence").redirectInput(input.toFile()).redirectOutput(output.toFile()).redirectError(errors.toFile()).start();
    assertTrue(child.waitFor(5, TimeUnit.MINUTES), "the child JVM did not finish");
    System.out.printf(Locale.ROOT, "tag: %,d bytes without a line break in %.1f s, heap -Xmx64m%n", length,
        (System.nanoTime() - started) / 1e9);
    assertEquals(0, child.exitValue(), () -> "stderr: " + readQuietly(errors));
    long tokens = 0;
    String last = null;
    try (BufferedReader lines = Files.newBufferedReader(output, StandardCharsets.UTF_8)) {
      for (String line = lines.readLine(); line != null; line = lines.readLine()) {
        if (!line.isEmpty()) {
          tokens++;
          last = line;
        }
      }
    }
    assertEquals(10 * (length / sentence.length()), tokens);
    // the last token is the last sentence's "ramp", at offsets counted over the whole input, with the
    // class it gets in that sentence alone: sentence by sentence, as the tokenizer marks them
    String alone = classOf(tokens(Cli.run("tag", "--no-confidence", sentence)), "ramp");
    assertEquals("ramp\t" + (length - 6) + "\t" + (length - 2) + "\t" + alone, last);
  }

  private static String readQuietly(Path file) {
    try {
      return Files.readString(file);
    } catch (IOException e) {
      return e.toString();
    }
  }
}
