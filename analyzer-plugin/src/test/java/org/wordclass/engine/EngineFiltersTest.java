package org.wordclass.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeFalse;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wordclass.analysis.PayloadEncoding;
import org.wordclass.analysis.WordClassFilterFactory;
import org.wordclass.model.DefaultModel;

/**
 * Every way an engine's filter settings can be wrong ends as an IllegalArgumentException (an
 * engine's HTTP 400) naming the filter, the argument or file and the reason.
 */
class EngineFiltersTest {
  @TempDir Path config;
  private byte[] bundled;

  @BeforeEach
  void copyTheBundledModel() throws IOException {
    try (InputStream in = DefaultModel.class.getClassLoader().getResourceAsStream(DefaultModel.RESOURCE)) {
      bundled = in.readAllBytes();
    }
    Files.createDirectories(config.resolve("wordclass"));
    Files.write(config.resolve("wordclass/en.wcm"), bundled);
    Files.writeString(config.resolve("wordclass/kitchen.txt"), "cook NOUN\n");
  }

  private WordClassFilterFactory create(String... pairs) {
    Map<String, String> settings = new LinkedHashMap<>();
    settings.put("type", "wordClass");
    for (int i = 0; i < pairs.length; i += 2) {
      settings.put(pairs[i], pairs[i + 1]);
    }
    return EngineFilters.create("tagger", settings, Set.of("type"), config);
  }

  private String refusal(String... pairs) {
    String message = assertThrows(IllegalArgumentException.class, () -> create(pairs)).getMessage();
    assertTrue(message.startsWith("the wordClass filter [tagger] cannot be used: "), message);
    return message;
  }

  private static void assertMentions(String message, String... parts) {
    for (String part : parts) {
      assertTrue(message.contains(part), () -> "'" + part + "' missing from: " + message);
    }
  }

  @Test
  void flatSettingsConfigureTheFactory() {
    WordClassFilterFactory factory = create("model", "wordclass/en.wcm", "lexicon", "wordclass/kitchen.txt",
        "payload", "weight", "weights.NOUN", "2.0", "weights.VERB", "1.5", "keepClasses.0", "NOUN", "keepClasses.1", "VERB");
    assertEquals(PayloadEncoding.WEIGHT, factory.options().payload());
    int noun = factory.options().model().tags().indexOf("NOUN");
    assertEquals(2.0f, factory.options().weights().weight(noun));
    assertEquals(1, factory.options().model().lexicon().userListedCount());
  }

  @Test
  void filtersNamingTheSameFileShareOneModel() throws IOException {
    Files.write(config.resolve("copy.wcm"), bundled);
    assertSame(create("model", "wordclass/en.wcm").options().model(), create("model", "copy.wcm").options().model());
  }

  @Test
  void unknownAndMalformedArgumentsAreNamed() {
    assertMentions(refusal("bogus", "1"), "Unknown parameters", "bogus");
    assertMentions(refusal("order", "3"), "'order'", "[1, 2]");
    assertMentions(refusal("weights.NOUN", "2.0"), "'weights'", "payload=\"weight\"");
    assertMentions(refusal("payload", "weight", "weights.NOUN", "heavy"), "'weights'", "NOUN:heavy");
  }

  @Test
  void classesTheModelDoesNotHaveAreNamed() {
    assertMentions(refusal("keepClasses.0", "NOUNS"), "'keepClasses'", "'NOUNS'", "VERB");
  }

  @Test
  void missingFilesAndDirectoriesAreNamed() {
    assertMentions(refusal("model", "wordclass/missing.wcm"), "'model'", "wordclass/missing.wcm", "no such file");
    assertMentions(refusal("lexicon", "wordclass/missing.txt"), "'lexicon'", "wordclass/missing.txt", "no such file");
    assertMentions(refusal("model", "wordclass"), "'model'", "wordclass", "is a directory");
  }

  @Test
  void namesLeadingOutsideTheConfigDirectoryAreRefused() {
    assertMentions(refusal("model", "../en.wcm"), "'model'", "../en.wcm", "leads outside the configuration directory");
    assertMentions(refusal("lexicon", "/etc/passwd"), "'lexicon'", "/etc/passwd", "leads outside");
  }

  @Test
  void corruptAndWrongKindFilesAreNamed() throws IOException {
    byte[] corrupt = bundled.clone();
    corrupt[corrupt.length / 2] ^= 0x55;
    Files.write(config.resolve("corrupt.wcm"), corrupt);
    assertMentions(refusal("model", "corrupt.wcm"), "corrupt.wcm");
    assertMentions(refusal("model", "wordclass/kitchen.txt"), "wordclass/kitchen.txt");
    assertMentions(refusal("lexicon", "wordclass/en.wcm"), "wordclass/en.wcm");
  }

  @Test
  void unreadableFilesAreNamed() throws IOException {
    assumeFalse("root".equals(System.getProperty("user.name")), "root reads every file, so nothing is unreadable");
    Files.setPosixFilePermissions(config.resolve("wordclass/en.wcm"), PosixFilePermissions.fromString("---------"));
    assertMentions(refusal("model", "wordclass/en.wcm"), "'model'", "wordclass/en.wcm", "may not read");
  }

  @Test
  void theSentenceTokenizerTakesTheLuceneFactorysArgumentsAndRefusesOthers() throws IOException {
    var factory = EngineFilters.sentenceTokenizer("sentences", Map.of("type", "sentenceStandard", "maxTokenLength", "5"),
        Set.of("type"));
    try (var tokenizer = factory.create()) {
      tokenizer.setReader(new java.io.StringReader("Ferries depart hourly."));
      var term = tokenizer.addAttribute(org.apache.lucene.analysis.tokenattributes.CharTermAttribute.class);
      tokenizer.reset();
      assertTrue(tokenizer.incrementToken());
      assertEquals("Ferri", term.toString(), "tokens longer than maxTokenLength are split, as the standard tokenizer does");
    }
    for (Map<String, String> bad : java.util.List.of(Map.of("maxTokenLength", "0"), Map.of("maxTokenLength", "five"),
        Map.of("language", "en"))) {
      String message = assertThrows(IllegalArgumentException.class,
          () -> EngineFilters.sentenceTokenizer("sentences", bad, Set.of("type"))).getMessage();
      assertTrue(message.startsWith("the sentenceStandard tokenizer [sentences] cannot be used: "), message);
      assertMentions(message, bad.keySet().iterator().next());
    }
  }
}
