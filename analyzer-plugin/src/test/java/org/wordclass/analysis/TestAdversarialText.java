package org.wordclass.analysis;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import java.util.stream.IntStream;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.Tokenizer;
import org.apache.lucene.analysis.core.KeywordTokenizer;
import org.apache.lucene.analysis.core.WhitespaceTokenizer;
import org.apache.lucene.analysis.standard.StandardTokenizer;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.analysis.tokenattributes.TermFrequencyAttribute;
import org.apache.lucene.tests.analysis.BaseTokenStreamTestCase;
import org.apache.lucene.util.AttributeFactory;
import org.wordclass.model.DefaultModel;
import org.wordclass.model.HmmModel;

/**
 * Hostile and unusual text through real tokenizers and {@link WordClassFilter}: very long tokens,
 * unpaired surrogates, a million tokens in one field, only punctuation, only unknown words, mixed
 * scripts and control characters. Each must give one class of the model per token and pass
 * Lucene's consistency checks (the same tokens whichever way the text is read); Lucene's random
 * text checks run over the same chains. All text is invented.
 */
public class TestAdversarialText extends BaseTokenStreamTestCase {
  private static final HmmModel MODEL = DefaultModel.get();
  private static final Set<String> CLASSES = Set.copyOf(MODEL.tags().names());
  private static final int LONG_TOKEN = 100_000;

  private static final List<String> TEXTS = List.of(
      "They book a \uD800 table \uDC00 now\uD83D and\uDE00 then \uDC00\uD800 .",
      "!!! ... , ; : ? ( ) [ ] { } -- — ’ “ ” « » ¿ ¡ … · • ※",
      "Grelvin brodlish quazzled vorpish snaffles ; Tremblo zindered fluxomatically .",
      "Mixed: Москва строит 東京タワー и القاهرة 🏙️ near Zürich 👩‍👩‍👧 ok 42 km² ١٢٣ 한국어",
      "e\u0301 A\u200Db \u202Eright\u202C \uFEFFbom \u0000nul \u000Bvt \u000Cff \u0085nel \u2028ls",
      "𝔘𝔫𝔦𝔠𝔬𝔡𝔢 𝟙𝟚𝟛 👍🏽👍🏽👍🏽 \uD83D\uDC4D\uD83C");

  private static Analyzer chain(String tokenizer, WordClassOptions options) {
    return new Analyzer() {
      @Override
      protected TokenStreamComponents createComponents(String fieldName) {
        Tokenizer source = switch (tokenizer) {
          case "whitespace" -> new WhitespaceTokenizer(AttributeFactory.DEFAULT_ATTRIBUTE_FACTORY, 1024 * 1024);
          case "keyword" -> new KeywordTokenizer();
          default -> new StandardTokenizer();
        };
        return new TokenStreamComponents(source, new WordClassFilter(source, options));
      }
    };
  }

  private static WordClassOptions randomOptions() {
    return WordClassOptions.of(MODEL)
        .withOrder(1 + random().nextInt(2))
        .withConfidence(random().nextBoolean())
        .withQualifiedTerms(random().nextBoolean())
        .withMaxWindow(random().nextBoolean() ? 1 + random().nextInt(16) : WordClassOptions.DEFAULT_MAX_WINDOW);
  }

  /** Terms and classes of {@code text}, checking every class belongs to the model. */
  private static List<String[]> tagged(Analyzer a, String text) throws IOException {
    List<String[]> out = new ArrayList<>();
    try (TokenStream ts = a.tokenStream("f", text)) {
      CharTermAttribute term = ts.addAttribute(CharTermAttribute.class);
      WordClassAttribute cls = ts.addAttribute(WordClassAttribute.class);
      ts.reset();
      while (ts.incrementToken()) {
        assertTrue("class of '" + term + "': " + cls.getWordClass(), CLASSES.contains(cls.getWordClass()));
        out.add(new String[] {term.toString(), cls.getWordClass()});
      }
      ts.end();
    }
    return out;
  }

  public void testHostileTextsAreTaggedConsistently() throws IOException {
    for (String tokenizer : List.of("whitespace", "standard", "keyword")) {
      try (Analyzer a = chain(tokenizer, randomOptions())) {
        for (String text : TEXTS) {
          // the standard tokenizer drops punctuation, so it may find no token at all
          assertTrue(tokenizer + ": " + text, tagged(a, text).size() > (tokenizer.equals("standard") ? -1 : 0));
          if (!(tokenizer.equals("standard") && Character.isHighSurrogate(text.charAt(text.length() - 1)))) {
            // Lucene's StandardTokenizer alone, without this filter, loses the final offset of a
            // text that ends in an unpaired high surrogate when read in pieces; the other chains check it
            checkAnalysisConsistency(random(), a, random().nextBoolean(), text);
          }
        }
      }
    }
  }

  public void testLongTokenIsOneTaggedToken() throws IOException {
    String token = "Grelvin\u0416\u6771".repeat(LONG_TOKEN / 9 + 1).substring(0, LONG_TOKEN);
    for (String tokenizer : List.of("whitespace", "keyword")) {
      try (Analyzer a = chain(tokenizer, WordClassOptions.of(MODEL))) {
        List<String[]> out = tagged(a, token);
        assertEquals(tokenizer, 1, out.size());
        assertEquals(token, out.get(0)[0]);
        checkAnalysisConsistency(random(), a, false, "short " + token + " words");
      }
    }
  }

  public void testMillionTokensInOneField() throws IOException {
    int tokens = 1_000_000;
    String text = IntStream.range(0, tokens).mapToObj(i -> i % 10 == 9 ? "." : "word").collect(Collectors.joining(" "));
    try (Analyzer a = chain("whitespace", WordClassOptions.of(MODEL))) {
      assertEquals(tokens, tagged(a, text).size());
    }
  }

  /**
   * Punctuation only: every mark gets a class. The bundled model was trained on the standard
   * tokenizer's tokens, which hold no punctuation, so it knows none and gives each mark one of
   * its open classes; a chain that keeps punctuation should use a model trained through it.
   */
  public void testOnlyPunctuationGetsClasses() throws IOException {
    Set<String> classes = Set.copyOf(MODEL.tags().names());
    try (Analyzer a = chain("whitespace", WordClassOptions.of(MODEL))) {
      List<String[]> tokens = tagged(a, ". , ; : ? ! ( ) \" ...");
      assertEquals(10, tokens.size());
      for (String[] token : tokens) {
        assertTrue(token[0] + " " + token[1], classes.contains(token[1]));
      }
    }
  }

  /** Words the model cannot know get one of its open classes, the only ones it allows for them. */
  public void testOnlyUnknownWordsGetOpenClasses() throws IOException {
    Set<String> open = IntStream.range(0, MODEL.unknownWords().openTagCount())
        .mapToObj(k -> MODEL.tags().name(MODEL.unknownWords().openTag(k))).collect(Collectors.toSet());
    try (Analyzer a = chain("whitespace", WordClassOptions.of(MODEL))) {
      for (String[] token : tagged(a, TEXTS.get(2).replace(" ;", "").replace(" .", ""))) {
        assertEquals(-1, MODEL.lexicon().lookup(token[0]));
        assertTrue(token[0] + " " + token[1], open.contains(token[1]));
      }
    }
  }

  /**
   * Lucene's indexing chain adds attributes (such as the term frequency) after reset(): the
   * filter's pooled token copies must follow. Found by {@link #testRandomUnicodeText}, whose
   * random data is sometimes indexed.
   */
  public void testAttributesAddedAfterResetAreKept() throws IOException {
    try (Analyzer a = chain("whitespace", WordClassOptions.of(MODEL))) {
      assertEquals(4, tagged(a, "They book a table").size());
      try (TokenStream ts = a.tokenStream("f", "I read a good book")) {
        ts.reset();
        TermFrequencyAttribute freq = ts.addAttribute(TermFrequencyAttribute.class);
        int tokens = 0;
        while (ts.incrementToken()) {
          assertEquals(1, freq.getTermFrequency());
          tokens++;
        }
        ts.end();
        assertEquals(5, tokens);
      }
    }
  }

  public void testRandomUnicodeText() throws IOException {
    for (String tokenizer : List.of("whitespace", "standard")) {
      try (Analyzer a = chain(tokenizer, randomOptions())) {
        checkRandomData(random(), a, 200 * RANDOM_MULTIPLIER, 20, false);
        checkRandomData(random(), a, 10 * RANDOM_MULTIPLIER, 4096, false);
      }
    }
  }
}
