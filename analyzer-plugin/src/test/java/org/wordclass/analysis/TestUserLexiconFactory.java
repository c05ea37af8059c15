package org.wordclass.analysis;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.Map;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.TokenFilterFactory;
import org.apache.lucene.analysis.custom.CustomAnalyzer;
import org.apache.lucene.tests.analysis.BaseTokenStreamTestCase;
import org.apache.lucene.util.ClasspathResourceLoader;
import org.apache.lucene.util.ResourceLoader;
import org.wordclass.model.DefaultModel;
import org.wordclass.model.HmmModel;
import org.wordclass.model.LexiconFormatException;

/** The factory's {@code lexicon} argument: read through the resource loader, applied, shared, refused whole. */
public class TestUserLexiconFactory extends BaseTokenStreamTestCase {
  private static final String SENTENCE = "The cook tastes the broth";

  /** Serves named texts from memory, as a configuration store might, and everything else from the class path. */
  private static final class TextLoader implements ResourceLoader {
    private final Map<String, byte[]> files = new HashMap<>();
    private final ResourceLoader classpath = new ClasspathResourceLoader(TestUserLexiconFactory.class.getClassLoader());

    TextLoader with(String name, String text) {
      files.put(name, text.getBytes(StandardCharsets.UTF_8));
      return this;
    }

    @Override
    public InputStream openResource(String resource) throws IOException {
      byte[] bytes = files.get(resource);
      return bytes != null ? new ByteArrayInputStream(bytes) : classpath.openResource(resource);
    }

    @Override
    public <T> Class<? extends T> findClass(String cname, Class<T> expectedType) {
      return classpath.findClass(cname, expectedType);
    }
  }

  private static Map<String, String> args(String... pairs) {
    Map<String, String> args = new HashMap<>();
    for (int i = 0; i < pairs.length; i += 2) {
      args.put(pairs[i], pairs[i + 1]);
    }
    return args;
  }

  private static HmmModel modelOf(ResourceLoader loader, String... pairs) throws IOException {
    WordClassFilterFactory factory = (WordClassFilterFactory) TokenFilterFactory.forName(WordClassFilterFactory.NAME, args(pairs));
    factory.inform(loader);
    return factory.options().model();
  }

  public void testCustomAnalyzerAppliesTheLexicon() throws IOException {
    TextLoader loader = new TextLoader().with("lexicons/kitchen.txt", "# the cook is a person here\ncook NOUN VERB\n");
    try (Analyzer plain = CustomAnalyzer.builder(loader).withTokenizer("standard").addTokenFilter("wordClass").build();
        Analyzer fixed = CustomAnalyzer.builder(loader).withTokenizer("standard")
            .addTokenFilter("wordClass", "lexicon", "lexicons/kitchen.txt").build()) {
      String[] words = SENTENCE.split(" ");
      assertAnalyzesTo(plain, SENTENCE, words, new String[] {"DET", "VERB", "VERB", "DET", "NOUN"});
      assertAnalyzesTo(fixed, SENTENCE, words, new String[] {"DET", "NOUN", "VERB", "DET", "NOUN"});
    }
  }

  public void testLexiconWorksWithANamedModelToo() throws IOException {
    TextLoader loader = new TextLoader().with("kitchen.txt", "cook NOUN\n");
    HmmModel model = modelOf(loader, "model", DefaultModel.RESOURCE, "lexicon", "kitchen.txt");
    assertEquals(1, model.lexicon().userListedCount());
    assertEquals("kitchen.txt", model.provenance().get("lexicon.file"));
  }

  public void testSameModelAndLexiconShareOneModel() throws IOException {
    TextLoader loader = new TextLoader()
        .with("a/kitchen.txt", "cook NOUN\n")
        .with("b/kitchen.txt", "cook NOUN\n")
        .with("c/kitchen.txt", "cook NOUN VERB\n");
    HmmModel first = modelOf(loader, "lexicon", "a/kitchen.txt");
    assertSame(first, modelOf(loader, "lexicon", "a/kitchen.txt", "order", "1"));
    assertSame("same bytes under another name", first, modelOf(loader, "lexicon", "b/kitchen.txt"));
    assertNotSame("other bytes", first, modelOf(loader, "lexicon", "c/kitchen.txt"));
    assertNotSame("the same lexicon on another model file", first,
        modelOf(loader, "model", DefaultModel.RESOURCE, "lexicon", "a/kitchen.txt"));
    assertNotSame(DefaultModel.get(), first);
  }

  public void testMalformedLexiconFailsInformWithFileLineAndReason() {
    assertRefused("kitchen.txt:2: unknown class 'NUON'; the model's classes are " + DefaultModel.get().tags(),
        "cook NOUN\nroast NUON VERB\n");
    assertRefused("kitchen.txt:3: 'cook' is listed twice (first on line 1)", "cook NOUN\n\ncook VERB\n");
    assertRefused("kitchen.txt:1: expected a word and one or more classes, such as 'cook NOUN VERB:2', not 'cook'", "cook\n");
    assertRefused("kitchen.txt:1: the weight of VERB must be a positive number, not 'lots'", "cook NOUN VERB:lots\n");
  }

  private static void assertRefused(String message, String text) {
    TextLoader loader = new TextLoader().with("kitchen.txt", text);
    WordClassFilterFactory factory = (WordClassFilterFactory) TokenFilterFactory.forName(WordClassFilterFactory.NAME,
        args("lexicon", "kitchen.txt"));
    LexiconFormatException e = expectThrows(LexiconFormatException.class, () -> factory.inform(loader));
    assertEquals(message, e.getMessage());
    // the factory was not left half-configured: it refuses to make filters
    expectThrows(IllegalStateException.class, () -> factory.create(null));
  }

  public void testMissingLexiconNamesTheArgumentAndResource() {
    IOException e = expectThrows(IOException.class, () -> modelOf(new TextLoader(), "lexicon", "conf/no-such-lexicon.txt"));
    assertTrue(e.getMessage(), e.getMessage().startsWith("'lexicon': cannot read the lexicon resource conf/no-such-lexicon.txt"));
  }

  public void testBlankLexiconArgumentFailsAtConstruction() {
    IllegalArgumentException e = expectThrows(IllegalArgumentException.class,
        () -> TokenFilterFactory.forName(WordClassFilterFactory.NAME, args("lexicon", " ")));
    assertEquals("'lexicon' must name a resource", e.getMessage());
  }
}
