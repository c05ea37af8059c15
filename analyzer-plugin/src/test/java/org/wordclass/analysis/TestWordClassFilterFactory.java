package org.wordclass.analysis;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.util.HashMap;
import java.util.Map;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.TokenFilterFactory;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.custom.CustomAnalyzer;
import org.apache.lucene.tests.analysis.BaseTokenStreamTestCase;
import org.apache.lucene.tests.analysis.MockTokenizer;
import org.apache.lucene.util.ClasspathResourceLoader;
import org.apache.lucene.util.ResourceLoader;
import org.wordclass.decoding.SentenceBoundaries;
import org.wordclass.model.DefaultModel;
import org.wordclass.model.HmmModel;
import org.wordclass.model.ModelFormatException;
import org.wordclass.model.ShippedModels;

/** The factory through Lucene's SPI and CustomAnalyzer, its argument checks and model sharing. */
public class TestWordClassFilterFactory extends BaseTokenStreamTestCase {
  private static final ResourceLoader CLASSPATH = new ClasspathResourceLoader(TestWordClassFilterFactory.class.getClassLoader());

  private static Map<String, String> args(String... pairs) {
    Map<String, String> args = new HashMap<>();
    for (int i = 0; i < pairs.length; i += 2) {
      args.put(pairs[i], pairs[i + 1]);
    }
    return args;
  }

  private static WordClassFilterFactory informed(ResourceLoader loader, String... pairs) throws IOException {
    TokenFilterFactory factory = TokenFilterFactory.forName(WordClassFilterFactory.NAME, args(pairs));
    ((WordClassFilterFactory) factory).inform(loader);
    return (WordClassFilterFactory) factory;
  }

  private static TokenStream whitespace(String text) {
    MockTokenizer tokenizer = new MockTokenizer(MockTokenizer.WHITESPACE, false);
    tokenizer.setReader(new java.io.StringReader(text));
    return tokenizer;
  }

  public void testForName() throws IOException {
    WordClassFilterFactory factory = informed(CLASSPATH, "payload", "tag", "qualifiedTerms", "true", "separator", "/");
    assertSame(DefaultModel.get(), factory.options().model());
    assertTokenStreamContents(
        factory.create(whitespace("They book a table")),
        new String[] {"They", "They/PRON", "book", "book/VERB", "a", "a/DET", "table", "table/NOUN"},
        null, null, new String[] {"PRON", "PRON", "VERB", "VERB", "DET", "DET", "NOUN", "NOUN"},
        new int[] {1, 0, 1, 0, 1, 0, 1, 0});
  }

  public void testKeepAndDropClasses() throws IOException {
    assertTokenStreamContents(
        informed(CLASSPATH, "keepClasses", "NOUN, VERB").create(whitespace("They book a table")),
        new String[] {"book", "table"}, null, null, null, new int[] {2, 2}, null, 17, 0, null, true, null);
    assertTokenStreamContents(
        informed(CLASSPATH, "dropClasses", "PRON,DET").create(whitespace("They book a table")),
        new String[] {"book", "table"}, null, null, null, new int[] {2, 2}, null, 17, 0, null, true, null);
  }

  public void testOrderAndWindowReachTheFilter() throws IOException {
    WordClassOptions options = informed(
        CLASSPATH, "order", "1", "confidence", "true", "maxWindow", "64", "payload", "weight", "weights", "NOUN:2.0,PROPN:2.0,VERB:1.5", "defaultWeight", "0.5")
        .options();
    assertEquals(1, options.order());
    assertTrue(options.confidence());
    assertEquals(64, options.maxWindow());
    assertEquals(PayloadEncoding.WEIGHT, options.payload());
    HmmModel model = options.model();
    assertEquals(2.0f, options.weights().weight(model.tags().indexOf("PROPN")), 0f);
    assertEquals(1.5f, options.weights().weight(model.tags().indexOf("VERB")), 0f);
    assertEquals(0.5f, options.weights().weight(model.tags().indexOf("DET")), 0f);
    assertEquals(model.order(), informed(CLASSPATH).options().order());
    assertEquals(SentenceBoundaries.DECODED, informed(CLASSPATH).options().boundaries());
    assertEquals(SentenceBoundaries.TOKENIZER, informed(CLASSPATH, "boundaries", "tokenizer").options().boundaries());
  }

  /** {@code language=} picks a model of the pack shipped in the jar (see docs/languages.md). */
  public void testLanguagePicksAShippedModel() throws IOException {
    HmmModel french = informed(CLASSPATH, "language", "fr").options().model();
    assertEquals("fr-gsd-upos", french.name());
    assertEquals("fr", french.provenance().get("note.language"));
    assertEquals("fr_gsd-ud-dev.conllu", french.provenance().get("corpus.1.file"));
    assertSame("every field asking for the same language shares one model", french,
        informed(CLASSPATH, "language", "fr").options().model());
    assertSame(DefaultModel.get(), informed(CLASSPATH, "language", "en").options().model());
    assertSame("no is the Bokmaal model", informed(CLASSPATH, "language", "nb").options().model(),
        informed(CLASSPATH, "language", "no").options().model());
    for (String language : ShippedModels.resources().keySet()) {
      HmmModel model = informed(CLASSPATH, "language", language).options().model();
      assertTrue(language + " has the UPOS noun class", model.tags().indexOf("NOUN") >= 0);
    }
  }

  public void testLanguageWithLexiconAppliesItToTheShippedModel() throws IOException {
    // the loader serves only the lexicon: a shipped model comes from the jar, whatever the loader
    ResourceLoader loader = new BytesLoader("lex.txt", "livre NOUN\n".getBytes(java.nio.charset.StandardCharsets.UTF_8));
    HmmModel model = informed(loader, "language", "fr", "lexicon", "lex.txt").options().model();
    assertEquals("fr-gsd-upos", model.name());
    assertNotSame(informed(CLASSPATH, "language", "fr").options().model(), model);
  }

  public void testLanguageRefusals() {
    IllegalArgumentException both = expectThrows(IllegalArgumentException.class,
        () -> TokenFilterFactory.forName(WordClassFilterFactory.NAME, args("language", "fr", "model", "my.wcm")));
    assertTrue(both.getMessage(), both.getMessage().contains("'model' and 'language' cannot both be given"));
    IllegalArgumentException unknown = expectThrows(IllegalArgumentException.class,
        () -> TokenFilterFactory.forName(WordClassFilterFactory.NAME, args("language", "da")));
    assertTrue(unknown.getMessage(), unknown.getMessage().contains("'da'"));
    assertTrue(unknown.getMessage(), unknown.getMessage().contains("cs, de, en, es, fi, fr, id, it, nb, nl, no, pt, ru, sv, tr"));
    expectThrows(IllegalArgumentException.class,
        () -> TokenFilterFactory.forName(WordClassFilterFactory.NAME, args("language", "FR")));
  }

  /** The analysis screen (attribute reflection) names the model that tagged each token. */
  public void testAttributeNamesTheModel() throws IOException {
    TokenStream stream = informed(CLASSPATH, "language", "de").create(whitespace("Wir buchen einen Tisch"));
    WordClassAttribute att = stream.addAttribute(WordClassAttribute.class);
    stream.reset();
    while (stream.incrementToken()) {
      assertEquals("de-gsd-upos", att.getModelName());
      assertTrue(stream.reflectAsString(false), stream.reflectAsString(false).contains("model=de-gsd-upos"));
    }
    stream.end();
    stream.close();
  }

  public void testCustomAnalyzer() throws IOException {
    try (Analyzer analyzer = CustomAnalyzer.builder()
        .withTokenizer("standard")
        .addTokenFilter("wordClass", "qualifiedTerms", "true", "payload", "index")
        .addTokenFilter("lowercase")
        .build()) {
      assertAnalyzesTo(
          analyzer,
          "They book a table.",
          new String[] {"they", "they_pron", "book", "book_verb", "a", "a_det", "table", "table_noun"},
          new int[] {0, 0, 5, 5, 10, 10, 12, 12},
          new int[] {4, 4, 9, 9, 11, 11, 17, 17},
          new String[] {"PRON", "PRON", "VERB", "VERB", "DET", "DET", "NOUN", "NOUN"},
          new int[] {1, 0, 1, 0, 1, 0, 1, 0});
    }
  }

  public void testBadArgumentsNameTheArgument() {
    assertRejected("Unknown parameters", "colour", "blue");
    assertRejected("'payload'", "payload", "bytes");
    assertRejected("'confidence'", "confidence", "yes");
    assertRejected("'qualifiedTerms'", "qualifiedTerms", "1");
    assertRejected("'order'", "order", "3");
    assertRejected("'maxWindow'", "maxWindow", "0");
    assertRejected("'maxWindow'", "maxWindow", "many");
    assertRejected("'separator'", "separator", "");
    assertRejected("'boundaries'", "boundaries", "sentences");
    assertRejected("'boundaries'", "boundaries", "Decoded");
    assertRejected("'weights'", "payload", "weight", "weights", "NOUN=2");
    assertRejected("'weights'", "payload", "weight", "weights", "NOUN:heavy");
    assertRejected("'weights'", "payload", "weight", "weights", "NOUN:2,NOUN:3");
    assertRejected("'weights'", "payload", "tag", "weights", "NOUN:2");
    assertRejected("'defaultWeight'", "payload", "weight", "defaultWeight", "NaN");
    assertRejected("'keepClasses' and 'dropClasses'", "keepClasses", "NOUN", "dropClasses", "VERB");
    assertRejected("'keepClasses'", "keepClasses", " , ");
  }

  private static void assertRejected(String expectedInMessage, String... pairs) {
    IllegalArgumentException e =
        expectThrows(IllegalArgumentException.class, () -> TokenFilterFactory.forName("wordClass", args(pairs)));
    assertTrue(e.getMessage(), e.getMessage().contains(expectedInMessage));
  }

  public void testUnknownClassesFailAtInform() {
    assertUnknownClass("keepClasses", "NOUN,NOUNS", "NOUNS");
    assertUnknownClass("dropClasses", "ARTICLE", "ARTICLE");
    IllegalArgumentException e = expectThrows(
        IllegalArgumentException.class, () -> informed(CLASSPATH, "payload", "weight", "weights", "NOUN:2,Verb:1.5"));
    assertTrue(e.getMessage(), e.getMessage().contains("'weights'") && e.getMessage().contains("'Verb'"));
  }

  private static void assertUnknownClass(String argument, String value, String bad) {
    IllegalArgumentException e = expectThrows(IllegalArgumentException.class, () -> informed(CLASSPATH, argument, value));
    String message = e.getMessage();
    assertTrue(message, message.contains("'" + argument + "'") && message.contains("'" + bad + "'"));
    assertTrue("lists the model's classes: " + message, message.contains(DefaultModel.get().tags().names().toString()));
  }

  public void testCreateBeforeInformFails() {
    TokenFilterFactory factory = TokenFilterFactory.forName("wordClass", args());
    expectThrows(IllegalStateException.class, () -> factory.create(whitespace("book")));
  }

  public void testNamedModelIsSharedAcrossFactoriesAndLoaders() throws IOException {
    HmmModel first = informed(CLASSPATH, "model", DefaultModel.RESOURCE).options().model();
    HmmModel second = informed(CLASSPATH, "model", DefaultModel.RESOURCE, "order", "1").options().model();
    ResourceLoader otherLoader = new ClasspathResourceLoader(getClass());
    HmmModel third = informed(otherLoader, "model", "/" + DefaultModel.RESOURCE).options().model();
    assertSame(first, second);
    assertSame(first, third);
    assertEquals(DefaultModel.get().tags(), first.tags());
  }

  public void testBrokenModelIsNamed() {
    String name = "org/wordclass/analysis/not-a-model.wcm";
    ModelFormatException e = expectThrows(ModelFormatException.class, () -> informed(CLASSPATH, "model", name));
    assertTrue(e.getMessage(), e.getMessage().contains(name));
  }

  public void testCorruptedModelIsNamed() throws IOException {
    byte[] bytes;
    try (InputStream in = CLASSPATH.openResource(DefaultModel.RESOURCE)) {
      bytes = in.readAllBytes();
    }
    bytes[bytes.length / 2] ^= 0x5A;
    ResourceLoader loader = new BytesLoader("conf/damaged.wcm", bytes);
    ModelFormatException e = expectThrows(ModelFormatException.class, () -> informed(loader, "model", "conf/damaged.wcm"));
    assertTrue(e.getMessage(), e.getMessage().contains("conf/damaged.wcm"));
  }

  public void testMissingModelIsNamed() {
    IOException e = expectThrows(IOException.class, () -> informed(CLASSPATH, "model", "conf/no-such-model.wcm"));
    assertTrue(e.getMessage(), e.getMessage().contains("'model'") && e.getMessage().contains("conf/no-such-model.wcm"));
  }

  /** Serves one resource from memory, as a configuration store might. */
  private static final class BytesLoader implements ResourceLoader {
    private final String name;
    private final byte[] bytes;

    BytesLoader(String name, byte[] bytes) {
      this.name = name;
      this.bytes = bytes;
    }

    @Override
    public InputStream openResource(String resource) throws IOException {
      if (!resource.equals(name)) {
        throw new IOException("no resource " + resource);
      }
      return new ByteArrayInputStream(bytes);
    }

    @Override
    public <T> Class<? extends T> findClass(String cname, Class<T> expectedType) {
      throw new UnsupportedOperationException();
    }
  }
}
