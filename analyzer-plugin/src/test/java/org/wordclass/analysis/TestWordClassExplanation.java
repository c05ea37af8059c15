package org.wordclass.analysis;

import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.Tokenizer;
import org.apache.lucene.analysis.core.WhitespaceTokenizer;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.tests.analysis.BaseTokenStreamTestCase;
import org.apache.lucene.tests.analysis.MockTokenizer;
import org.wordclass.decoding.CandidateSource;
import org.wordclass.model.DefaultModel;
import org.wordclass.model.HmmModel;
import org.wordclass.model.LexiconOverlay;
import org.wordclass.model.TagSet;
import org.wordclass.model.UserLexicon;
import org.wordclass.model.WordShape;

/**
 * {@link WordClassExplanationAttribute} as {@link WordClassFilter} fills it on request: the
 * explanation comes from the decoding that wrote the class, so it agrees with it; off by default,
 * when the attribute is not even added. Invented sentences with the bundled model.
 */
public class TestWordClassExplanation extends BaseTokenStreamTestCase {
  private static final HmmModel BUNDLED = DefaultModel.get();
  private static final TagSet TAGS = BUNDLED.tags();

  /** What the stream said of one token. */
  private record Explained(String term, String wordClass, double confidence, CandidateSource source, String lookedUpAs,
      String ending, WordShape shape, double[] probabilities) {
    double probability(String tag) {
      return probabilities[TAGS.indexOf(tag)];
    }
  }

  private static List<Explained> explain(String text, WordClassOptions options) throws IOException {
    Tokenizer tokenizer = new WhitespaceTokenizer();
    tokenizer.setReader(new StringReader(text));
    TokenStream stream = new WordClassFilter(tokenizer, options);
    CharTermAttribute term = stream.getAttribute(CharTermAttribute.class);
    WordClassAttribute wordClass = stream.getAttribute(WordClassAttribute.class);
    WordClassExplanationAttribute why = stream.hasAttribute(WordClassExplanationAttribute.class)
        ? stream.getAttribute(WordClassExplanationAttribute.class) : new WordClassExplanationAttributeImpl();
    List<Explained> out = new ArrayList<>();
    stream.reset();
    while (stream.incrementToken()) {
      double[] p = new double[why.getClassCount()];
      for (int t = 0; t < p.length; t++) {
        p[t] = why.getClassProbability(t);
      }
      out.add(new Explained(term.toString(), wordClass.getWordClass(), wordClass.getConfidence(), why.getSource(),
          why.getLookedUpAs(), why.getEnding(), why.getShape(), p));
    }
    stream.end();
    stream.close();
    return out;
  }

  private static WordClassOptions explaining(HmmModel model) {
    return WordClassOptions.of(model).withConfidence(true).withExplain(true);
  }

  private static HmmModel withLexicon(String text) throws IOException {
    return LexiconOverlay.apply(BUNDLED, UserLexicon.parse(text.getBytes(StandardCharsets.UTF_8), "kitchen.txt", TAGS));
  }

  /** The written class's probability is its confidence, and every token's probabilities sum to one. */
  public void testProbabilitiesAgreeWithTheClassWritten() throws IOException {
    for (int order = 1; order <= 2; order++) {
      for (Explained e : explain("The crew will board the ferry at the south ramp", explaining(BUNDLED).withOrder(order))) {
        assertEquals(TAGS.size(), e.probabilities().length);
        assertEquals(e.term(), e.confidence(), e.probability(e.wordClass()), 1e-12);
        double sum = 0;
        for (double p : e.probabilities()) {
          sum += p;
        }
        assertEquals(e.term(), 1.0, sum, 1e-9);
      }
    }
  }

  /** Where each token's candidates came from: user lexicon, known word, unknown word by ending and shape. */
  public void testSourcesWithAUserLexicon() throws IOException {
    List<Explained> explained = explain("We roast the broth", explaining(withLexicon("roast NOUN VERB\n")));
    assertEquals(4, explained.size());
    Explained we = explained.get(0);
    assertEquals(CandidateSource.KNOWN, we.source());
    assertNull(we.lookedUpAs());
    assertNull(we.ending());
    assertNull(we.shape());
    Explained roast = explained.get(1);
    assertEquals(CandidateSource.USER_LEXICON, roast.source());
    assertEquals("VERB", roast.wordClass());
    // only the listed classes have any probability, and the other one stays a candidate
    assertEquals(1.0, roast.probability("NOUN") + roast.probability("VERB"), 1e-9);
    assertTrue(roast.probability("NOUN") > 0);
    Explained broth = explained.get(3);
    assertEquals(CandidateSource.UNKNOWN, broth.source());
    assertEquals("oth", broth.ending());
    assertEquals(WordShape.LOWER, broth.shape());
  }

  /** A capitalised first word missing from the lexicon is looked up in lower case, and says so. */
  public void testLowerCasedFirstWord() throws IOException {
    Explained stir = explain("Stir the soup", explaining(BUNDLED)).get(0);
    assertEquals(CandidateSource.LOWERCASED_FIRST_WORD, stir.source());
    assertEquals("stir", stir.lookedUpAs());
  }

  /** Off by default: the attribute is not added, and asking for it changes no class. */
  public void testOffByDefaultAndTheClassesAreTheSame() throws IOException {
    Tokenizer tokenizer = new WhitespaceTokenizer();
    assertFalse(new WordClassFilter(tokenizer, WordClassOptions.of(BUNDLED)).hasAttribute(WordClassExplanationAttribute.class));
    String text = "Book a table for two please and the crew will board the ferry";
    for (int window : new int[] {3, 512}) {
      List<String> plain = new ArrayList<>();
      for (Explained e : explain(text, WordClassOptions.of(BUNDLED).withMaxWindow(window).withExplain(false))) {
        plain.add(e.wordClass());
      }
      List<String> explained = new ArrayList<>();
      for (Explained e : explain(text, WordClassOptions.of(BUNDLED).withMaxWindow(window).withExplain(true))) {
        explained.add(e.wordClass());
        assertTrue(Double.isNaN(e.confidence()));
      }
      assertEquals(plain, explained);
    }
  }

  /** Lucene's random-text checks (reuse, offsets, clearing attributes) with explanations on. */
  public void testRandomStringsWithExplanations() throws IOException {
    WordClassOptions options = explaining(BUNDLED).withQualifiedTerms(random().nextBoolean())
        .withMaxWindow(random().nextBoolean() ? 1 + random().nextInt(8) : WordClassOptions.DEFAULT_MAX_WINDOW);
    Analyzer a = new Analyzer() {
      @Override
      protected TokenStreamComponents createComponents(String fieldName) {
        Tokenizer tokenizer = new MockTokenizer(MockTokenizer.WHITESPACE, false);
        return new TokenStreamComponents(tokenizer, new WordClassFilter(tokenizer, options));
      }
    };
    try (a) {
      checkRandomData(random(), a, 300 * RANDOM_MULTIPLIER);
    }
  }

  /**
   * An invented imperative after a sentence without a full stop (UD tags imperatives VERB; common
   * practice): the explanation says the decoder opened a sentence there, and only there.
   */
  public void testExplanationSaysWhereTheDecoderOpenedASentence() throws IOException {
    String text = "The kettle is broken again Start the coffee machine instead";
    List<Boolean> opens = new ArrayList<>();
    Tokenizer tokenizer = new WhitespaceTokenizer();
    tokenizer.setReader(new StringReader(text));
    try (TokenStream stream = new WordClassFilter(tokenizer, explaining(BUNDLED))) {
      WordClassExplanationAttribute why = stream.getAttribute(WordClassExplanationAttribute.class);
      stream.reset();
      while (stream.incrementToken()) {
        opens.add(why.opensSentence());
      }
      stream.end();
    }
    List<Boolean> expected = new ArrayList<>(java.util.Collections.nCopies(10, false));
    expected.set(5, true);
    assertEquals(expected, opens);
    assertEquals("VERB", explain(text, explaining(BUNDLED)).get(5).wordClass());
  }

  public void testAttributeClearCopyCloneEqualsReflection() {
    WordClassExplanationAttributeImpl att = new WordClassExplanationAttributeImpl();
    assertNull(att.getSource());
    assertEquals(0, att.getClassCount());
    WordClassExplanationAttributeImpl empty = att.clone();
    assertEquals(empty, att);

    att.setSource(CandidateSource.UNKNOWN, null, "oth", WordShape.LOWER);
    att.setOpensSentence(true);
    double[] p = att.classProbabilities(3);
    p[0] = 0.25;
    p[2] = 0.75;
    WordClassExplanationAttributeImpl copy = new WordClassExplanationAttributeImpl();
    att.copyTo(copy);
    assertEquals(att, copy);
    assertEquals(att.hashCode(), copy.hashCode());
    WordClassExplanationAttributeImpl clone = att.clone();
    assertEquals(att, clone);
    p[0] = 0.5;
    assertEquals("a clone owns its probabilities", 0.25, clone.getClassProbability(0), 0.0);
    assertNotEquals(att, clone);

    Map<String, Object> seen = new HashMap<>();
    att.reflectWith((attClass, key, value) -> seen.put(key, value instanceof double[] d ? List.of(d[0], d[1], d[2]) : value));
    Map<String, Object> expected = new HashMap<>();
    expected.put("source", CandidateSource.UNKNOWN);
    expected.put("lookedUpAs", null);
    expected.put("ending", "oth");
    expected.put("shape", WordShape.LOWER);
    expected.put("opensSentence", true);
    expected.put("classProbabilities", List.of(0.5, 0.0, 0.75));
    assertEquals(expected, seen);

    att.clear();
    assertEquals(empty, att);
    expectThrows(IndexOutOfBoundsException.class, () -> att.getClassProbability(0));
  }
}
