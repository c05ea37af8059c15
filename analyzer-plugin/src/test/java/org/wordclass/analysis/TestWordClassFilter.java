package org.wordclass.analysis;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.TokenFilter;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.Tokenizer;
import org.apache.lucene.analysis.core.WhitespaceTokenizer;
import org.apache.lucene.analysis.payloads.PayloadHelper;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.analysis.tokenattributes.SentenceAttribute;
import org.apache.lucene.tests.analysis.BaseTokenStreamTestCase;
import org.apache.lucene.tests.analysis.CannedTokenStream;
import org.apache.lucene.tests.analysis.Token;
import org.apache.lucene.tests.analysis.MockTokenizer;
import org.apache.lucene.util.BytesRef;
import org.wordclass.decoding.SentenceBoundaries;
import org.wordclass.decoding.Tagger;
import org.wordclass.model.DefaultModel;
import org.wordclass.model.HmmModel;

/** Tokens, classes, payloads and positions of {@link WordClassFilter} with the bundled model. */
public class TestWordClassFilter extends BaseTokenStreamTestCase {

  private static WordClassOptions defaults() {
    return WordClassOptions.of(DefaultModel.get());
  }

  /** Whitespace tokens tagged with {@code options}. */
  private static Analyzer analyzer(WordClassOptions options) {
    return new Analyzer() {
      @Override
      protected TokenStreamComponents createComponents(String fieldName) {
        Tokenizer tokenizer = new WhitespaceTokenizer();
        return new TokenStreamComponents(tokenizer, new WordClassFilter(tokenizer, options));
      }
    };
  }

  private static TokenStream tag(String text, WordClassOptions options) {
    Tokenizer tokenizer = new WhitespaceTokenizer();
    tokenizer.setReader(new java.io.StringReader(text));
    return new WordClassFilter(tokenizer, options);
  }

  public void testVerbReading() throws IOException {
    assertTokenStreamContents(
        tag("They book a table", defaults()),
        new String[] {"They", "book", "a", "table"},
        new int[] {0, 5, 10, 12},
        new int[] {4, 9, 11, 17},
        new String[] {"PRON", "VERB", "DET", "NOUN"},
        new int[] {1, 1, 1, 1},
        17);
  }

  public void testNounReading() throws IOException {
    try (Analyzer a = analyzer(defaults())) {
      assertAnalyzesTo(
          a,
          "I read a good book",
          new String[] {"I", "read", "a", "good", "book"},
          new int[] {0, 2, 7, 9, 14},
          new int[] {1, 6, 8, 13, 18},
          new String[] {"PRON", "VERB", "DET", "ADJ", "NOUN"},
          new int[] {1, 1, 1, 1, 1});
    }
  }

  public void testTagPayload() throws IOException {
    assertPayloads(PayloadEncoding.TAG, utf8("PRON"), utf8("VERB"), utf8("DET"), utf8("NOUN"));
  }

  public void testIndexPayload() throws IOException {
    assertPayloads(PayloadEncoding.INDEX, indexOf("PRON"), indexOf("VERB"), indexOf("DET"), indexOf("NOUN"));
  }

  public void testWeightPayload() throws IOException {
    HmmModel model = DefaultModel.get();
    ClassWeights weights = ClassWeights.of(model.tags(), Map.of("NOUN", 2f, "VERB", 1.5f), 0.5f, "weights");
    WordClassOptions options = defaults().withPayload(PayloadEncoding.WEIGHT).withWeights(weights);
    assertTokenStreamContents(
        tag("They book a table", options),
        new String[] {"They", "book", "a", "table"},
        null, null, null, null, null, 17, null, null, true,
        new byte[][] {weight(0.5f), weight(1.5f), weight(0.5f), weight(2f)});
  }

  public void testUpstreamPayloadKeptWithNoneReplacedOtherwise() throws IOException {
    Token book = new Token("book", 0, 4);
    book.setPayload(new BytesRef("upstream"));
    assertTokenStreamContents(
        new WordClassFilter(new CannedTokenStream(book), defaults()), new String[] {"book"},
        null, null, null, null, null, null, null, null, true, new byte[][] {utf8("upstream")});
    assertTokenStreamContents(
        new WordClassFilter(new CannedTokenStream(book), defaults().withPayload(PayloadEncoding.TAG)), new String[] {"book"},
        null, null, null, null, null, null, null, null, true, new byte[][] {utf8("NOUN")});
  }

  private void assertPayloads(PayloadEncoding encoding, byte[]... expected) throws IOException {
    assertTokenStreamContents(
        tag("They book a table", defaults().withPayload(encoding)),
        new String[] {"They", "book", "a", "table"},
        null, null, new String[] {"PRON", "VERB", "DET", "NOUN"}, null, null, 17, null, null, true, expected);
  }

  private static byte[] utf8(String text) {
    return text.getBytes(StandardCharsets.UTF_8);
  }

  private static byte[] indexOf(String tag) {
    return new byte[] {(byte) DefaultModel.get().tags().indexOf(tag)};
  }

  private static byte[] weight(float weight) {
    return PayloadHelper.encodeFloat(weight);
  }

  public void testQualifiedTermsShareThePosition() throws IOException {
    assertTokenStreamContents(
        tag("They book a table", defaults().withQualifiedTerms(true)),
        new String[] {"They", "They_PRON", "book", "book_VERB", "a", "a_DET", "table", "table_NOUN"},
        new int[] {0, 0, 5, 5, 10, 10, 12, 12},
        new int[] {4, 4, 9, 9, 11, 11, 17, 17},
        new String[] {"PRON", "PRON", "VERB", "VERB", "DET", "DET", "NOUN", "NOUN"},
        new int[] {1, 0, 1, 0, 1, 0, 1, 0},
        new int[] {1, 1, 1, 1, 1, 1, 1, 1},
        17,
        new boolean[] {false, true, false, true, false, true, false, true},
        true);
  }

  public void testSeparator() throws IOException {
    assertTokenStreamContents(
        tag("I read a good book", defaults().withQualifiedTerms(true).withSeparator("|")),
        new String[] {"I", "I|PRON", "read", "read|VERB", "a", "a|DET", "good", "good|ADJ", "book", "book|NOUN"});
  }

  public void testKeepClassesLeavesPositionGaps() throws IOException {
    TokenStream kept = new WordClassSelectFilter(
        tag("They book a table", defaults()), DefaultModel.get().tags(), List.of("NOUN", "VERB"), true);
    assertTokenStreamContents(
        kept, new String[] {"book", "table"}, new int[] {5, 12}, new int[] {9, 17},
        new String[] {"VERB", "NOUN"}, new int[] {2, 2}, null, 17, 0, null, true, null);
  }

  public void testDropClassesCarriesTrailingGapToEnd() throws IOException {
    TokenStream dropped = new WordClassSelectFilter(
        tag("They book a table quickly", defaults()), DefaultModel.get().tags(), List.of("DET", "ADV"), false);
    assertTokenStreamContents(
        dropped, new String[] {"They", "book", "table"}, new int[] {0, 5, 12}, new int[] {4, 9, 17},
        new String[] {"PRON", "VERB", "NOUN"}, new int[] {1, 1, 2}, null, 25, 1, null, true, null);
  }

  public void testDroppingAlsoDropsQualifiedTwin() throws IOException {
    TokenStream dropped = new WordClassSelectFilter(
        tag("They book a table", defaults().withQualifiedTerms(true)), DefaultModel.get().tags(), List.of("DET"), false);
    assertTokenStreamContents(
        dropped,
        new String[] {"They", "They_PRON", "book", "book_VERB", "table", "table_NOUN"},
        new int[] {1, 0, 1, 0, 2, 0});
  }

  public void testConfidence() throws IOException {
    List<String> tokens = words("Riders park their bikes outside the shop");
    Tagger.Tagging expected = new Tagger(DefaultModel.get()).tag(tokens, true);
    List<Double> seen = confidences(tag(String.join(" ", tokens), defaults().withConfidence(true)));
    for (int i = 0; i < tokens.size(); i++) {
      assertEquals(expected.confidences()[i], seen.get(i), 1e-12);
      assertTrue(seen.get(i) > 0 && seen.get(i) <= 1 + 1e-9);
    }
    for (double off : confidences(tag("They book a table", defaults()))) {
      assertTrue(Double.isNaN(off));
    }
  }

  private static List<Double> confidences(TokenStream stream) throws IOException {
    WordClassAttribute classAtt = stream.getAttribute(WordClassAttribute.class);
    List<Double> out = new ArrayList<>();
    stream.reset();
    while (stream.incrementToken()) {
      out.add(classAtt.getConfidence());
    }
    stream.end();
    stream.close();
    return out;
  }

  /** The filter decodes exactly as the model's own tagger does on the same tokens. */
  public void testTagsEqualTaggerDecoding() throws IOException {
    String[] sentences = {
      "Riders park their bikes outside the shop",
      "The shop sits next to the park",
      "Our club cooks a big stew every Friday and everyone brings bread",
      "Zorblat quickly glimped the frobnicated Wexton !",
      "Ana fixes the chain while Tom tests the brakes",
    };
    for (SentenceBoundaries boundaries : SentenceBoundaries.values()) {
      for (int order = 1; order <= 2; order++) {
        Tagger tagger = new Tagger(new org.wordclass.decoding.Decoder(DefaultModel.get(), order, boundaries));
        for (String sentence : sentences) {
          List<String> tokens = words(sentence);
          assertEquals(sentence + ", " + boundaries, Arrays.asList(tagger.tagNames(tokens)),
              types(tag(sentence, defaults().withOrder(order).withBoundaries(boundaries))));
        }
      }
    }
  }

  /**
   * Two invented sentences in one field without a full stop between them, the second opening with
   * an imperative, which UD tags VERB (UD guidelines, common practice): in mid-sentence the
   * capitalised word is read as a noun; with decoded boundaries it opens a sentence.
   */
  public void testDecodedBoundaryBeforeAnImperative() throws IOException {
    String text = "The kettle is broken again Start the coffee machine instead";
    String[] terms = text.split(" ");
    assertEquals(List.of("DET", "NOUN", "AUX", "VERB", "ADV", "VERB", "DET", "NOUN", "NOUN", "ADV"), types(tag(text, defaults())));
    List<String> off = types(tag(text, defaults().withBoundaries(SentenceBoundaries.TOKENIZER)));
    assertEquals("without decoded boundaries Start is read in mid-sentence", "NOUN", off.get(5));
    try (Analyzer a = new Analyzer() {
          @Override
          protected TokenStreamComponents createComponents(String fieldName) {
            Tokenizer tokenizer = new SentenceStandardTokenizer();
            return new TokenStreamComponents(tokenizer, new WordClassFilter(tokenizer, defaults()));
          }
        }) {
      // the JDK's sentence rules find no boundary here, so the filter's decoding has to
      assertAnalyzesTo(a, text, terms, new String[] {"DET", "NOUN", "AUX", "VERB", "ADV", "VERB", "DET", "NOUN", "NOUN", "ADV"});
    }
  }

  /** With a small window each cut piece is decoded alone, as a sentence of its own. */
  public void testWindowCutDecodesEachWindowAlone() throws IOException {
    String text = "Our club cooks a big stew every Friday and everyone brings bread and the stew needs a slow cook";
    List<String> tokens = words(text);
    Tagger tagger = new Tagger(DefaultModel.get(), WordClassOptions.DEFAULT_BOUNDARIES);
    for (int window : new int[] {1, 2, 3, 5, 7, tokens.size() - 1, tokens.size(), 512, Integer.MAX_VALUE}) {
      List<String> expected = new ArrayList<>();
      for (int from = 0; from < tokens.size(); from += window) {
        expected.addAll(Arrays.asList(tagger.tagNames(tokens.subList(from, Math.min(tokens.size(), from + window)))));
      }
      assertEquals("window " + window, expected, types(tag(text, defaults().withMaxWindow(window))));
    }
  }

  /** Sentences marked by the SentenceAttribute are decoded one by one, also together with window cuts. */
  public void testSentenceAttributeBoundaries() throws IOException {
    String text = "They book a table . I read a good book . We ride through the park every Sunday .";
    List<List<String>> sentences = List.of(
        words("They book a table ."), words("I read a good book ."), words("We ride through the park every Sunday ."));
    Tagger tagger = new Tagger(DefaultModel.get(), WordClassOptions.DEFAULT_BOUNDARIES);
    for (int window : new int[] {512, 4, 1}) {
      List<String> expected = new ArrayList<>();
      for (List<String> sentence : sentences) {
        for (int from = 0; from < sentence.size(); from += window) {
          expected.addAll(Arrays.asList(tagger.tagNames(sentence.subList(from, Math.min(sentence.size(), from + window)))));
        }
      }
      Tokenizer tokenizer = new WhitespaceTokenizer();
      tokenizer.setReader(new java.io.StringReader(text));
      TokenStream tagged = new WordClassFilter(new FullStopSentences(tokenizer), defaults().withMaxWindow(window));
      assertEquals("window " + window, expected, types(tagged));
    }
  }

  public void testReuseAcrossDocuments() throws IOException {
    try (Analyzer a = analyzer(defaults().withQualifiedTerms(true).withPayload(PayloadEncoding.TAG))) {
      for (int round = 0; round < 3; round++) {
        assertAnalyzesTo(a, "They book a table", new String[] {"They", "They_PRON", "book", "book_VERB", "a", "a_DET", "table", "table_NOUN"});
        assertAnalyzesTo(a, "", new String[0]);
        assertAnalyzesTo(a, "I read a good book", new String[] {"I", "I_PRON", "read", "read_VERB", "a", "a_DET", "good", "good_ADJ", "book", "book_NOUN"});
      }
    }
  }

  /**
   * A consumer may add an attribute after reset(), as Lucene's indexing chain does, to a reused
   * stream whose pooled copies of tokens were made without it.
   */
  public void testAttributeAddedAfterResetOnAReusedStream() throws IOException {
    try (Analyzer a = analyzer(defaults())) {
      assertEquals(List.of("They", "book", "a", "table"), terms(a, "They book a table", false));
      assertEquals(List.of("We", "book", "the", "hall"), terms(a, "We book the hall", true));
    }
  }

  private static List<String> terms(Analyzer a, String text, boolean addFlagsAfterReset) throws IOException {
    try (TokenStream stream = a.tokenStream("body", text)) {
      CharTermAttribute term = stream.addAttribute(CharTermAttribute.class);
      stream.reset();
      if (addFlagsAfterReset) {
        stream.addAttribute(org.apache.lucene.analysis.tokenattributes.FlagsAttribute.class);
      }
      List<String> words = new ArrayList<>();
      while (stream.incrementToken()) {
        words.add(term.toString());
      }
      stream.end();
      return words;
    }
  }

  public void testRandomStrings() throws IOException {
    for (boolean confidence : new boolean[] {false, true}) {
      // explanations ride along with confidences, so the checks cover their attribute too
      WordClassOptions options = randomOptions().withConfidence(confidence).withExplain(confidence).withQualifiedTerms(true);
      try (Analyzer a = mockAnalyzer(options)) {
        checkRandomData(random(), a, 1000 * RANDOM_MULTIPLIER);
      }
    }
  }

  /** Random text with decoded boundaries at every capitalised token, explanations and confidences on (Lucene's random checks: offsets, positions, reuse, threads). */
  public void testRandomStringsWithDecodedBoundaries() throws IOException {
    WordClassOptions options = randomOptions().withBoundaries(SentenceBoundaries.DECODED).withConfidence(true).withExplain(true);
    try (Analyzer a = mockAnalyzer(options)) {
      checkRandomData(random(), a, 1000 * RANDOM_MULTIPLIER);
    }
    try (Analyzer a = new Analyzer() {
          @Override
          protected TokenStreamComponents createComponents(String fieldName) {
            Tokenizer tokenizer = new SentenceStandardTokenizer();
            return new TokenStreamComponents(tokenizer, new WordClassFilter(tokenizer, options));
          }
        }) {
      checkRandomData(random(), a, 500 * RANDOM_MULTIPLIER, 200);
    }
  }

  public void testRandomLongStrings() throws IOException {
    WordClassOptions options = randomOptions().withConfidence(random().nextBoolean()).withQualifiedTerms(true);
    try (Analyzer a = mockAnalyzer(options)) {
      checkRandomData(random(), a, 20 * RANDOM_MULTIPLIER, 8192);
    }
  }

  public void testRandomWithSentencesAndSelection() throws IOException {
    WordClassOptions options = randomOptions().withQualifiedTerms(random().nextBoolean());
    Analyzer a = new Analyzer() {
      @Override
      protected TokenStreamComponents createComponents(String fieldName) {
        Tokenizer tokenizer = new MockTokenizer(MockTokenizer.WHITESPACE, false);
        TokenStream tagged = new WordClassFilter(new FullStopSentences(tokenizer), options);
        return new TokenStreamComponents(tokenizer, new WordClassSelectFilter(tagged, options.model().tags(), List.of("NOUN", "PUNCT"), false));
      }
    };
    try (a) {
      checkRandomData(random(), a, 500 * RANDOM_MULTIPLIER, 200);
    }
  }

  public void testEmptyTermIsTagged() throws IOException {
    TokenStream tagged = new WordClassFilter(
        new CannedTokenStream(new Token("They", 0, 4), new Token("", 5, 5), new Token("book", 6, 10)), defaults());
    assertEquals(3, types(tagged).size());
  }

  private static WordClassOptions randomOptions() {
    WordClassOptions options = defaults().withOrder(random().nextBoolean() ? 1 : 2);
    options = options.withPayload(PayloadEncoding.values()[random().nextInt(PayloadEncoding.values().length)]);
    options = options.withBoundaries(SentenceBoundaries.values()[random().nextInt(SentenceBoundaries.values().length)]);
    return options.withMaxWindow(random().nextBoolean() ? 1 + random().nextInt(8) : WordClassOptions.DEFAULT_MAX_WINDOW);
  }

  private static Analyzer mockAnalyzer(WordClassOptions options) {
    return new Analyzer() {
      @Override
      protected TokenStreamComponents createComponents(String fieldName) {
        Tokenizer tokenizer = new MockTokenizer(MockTokenizer.WHITESPACE, false);
        return new TokenStreamComponents(tokenizer, new WordClassFilter(tokenizer, options));
      }
    };
  }

  private static List<String> words(String text) {
    return Arrays.asList(text.split(" "));
  }

  private static List<String> types(TokenStream stream) throws IOException {
    WordClassAttribute classAtt = stream.getAttribute(WordClassAttribute.class);
    List<String> out = new ArrayList<>();
    stream.reset();
    while (stream.incrementToken()) {
      out.add(classAtt.getWordClass());
    }
    stream.end();
    stream.close();
    return out;
  }

  /** Starts a new sentence after each token that ends with a full stop, as sentence-aware tokenizers would. */
  static final class FullStopSentences extends TokenFilter {
    private final CharTermAttribute termAtt = addAttribute(CharTermAttribute.class);
    private final SentenceAttribute sentenceAtt = addAttribute(SentenceAttribute.class);
    private int sentence;
    private boolean ended;

    FullStopSentences(TokenStream input) {
      super(input);
    }

    @Override
    public boolean incrementToken() throws IOException {
      if (!input.incrementToken()) {
        return false;
      }
      if (ended) {
        sentence++;
      }
      sentenceAtt.setSentenceIndex(sentence);
      ended = termAtt.length() > 0 && termAtt.charAt(termAtt.length() - 1) == '.';
      return true;
    }

    @Override
    public void reset() throws IOException {
      super.reset();
      sentence = 0;
      ended = false;
    }
  }
}
