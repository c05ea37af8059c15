package org.wordclass.analysis;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.Tokenizer;
import org.apache.lucene.analysis.standard.StandardTokenizer;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.analysis.tokenattributes.TypeAttribute;
import org.apache.lucene.tests.analysis.BaseTokenStreamTestCase;
import org.wordclass.decoding.Tagger;
import org.wordclass.model.DefaultModel;

/**
 * {@link WordClassFilter} on runs of tokens written together ({@link WrittenTogetherAttribute}):
 * a URL or an e-mail address that the standard tokenizer cut into pieces is decoded as one word,
 * as the treebanks have it (UD English EWT tags a whole address as one word: X, PROPN or NOUN),
 * so all its tokens get one class, one confidence and one explanation.
 */
public class TestWordClassFilterRuns extends BaseTokenStreamTestCase {
  // invented; the shapes are those of EWT dev (a site with a path ending in a date, an address)
  private static final String TEXT =
      "The photos are at www.ferrytimes.example/image/2005.09 and questions go to crew371@mail.example today.";

  private static Analyzer chain(boolean sentenceStandard, WordClassOptions options) {
    return new Analyzer() {
      @Override
      protected TokenStreamComponents createComponents(String fieldName) {
        Tokenizer tokenizer = sentenceStandard ? new SentenceStandardTokenizer() : new StandardTokenizer();
        return new TokenStreamComponents(tokenizer, new WordClassFilter(tokenizer, options));
      }
    };
  }

  /** Per token: term, class, confidence and explanation. */
  private static List<String[]> tagged(Analyzer a, String text) throws IOException {
    List<String[]> out = new ArrayList<>();
    try (TokenStream ts = a.tokenStream("f", text)) {
      CharTermAttribute term = ts.addAttribute(CharTermAttribute.class);
      TypeAttribute type = ts.addAttribute(TypeAttribute.class);
      WordClassAttribute wordClass = ts.addAttribute(WordClassAttribute.class);
      ts.reset();
      while (ts.incrementToken()) {
        WordClassExplanationAttribute explanation = ts.hasAttribute(WordClassExplanationAttribute.class)
            ? ts.getAttribute(WordClassExplanationAttribute.class) : null;
        out.add(new String[] {term.toString(), type.type(), Double.toString(wordClass.getConfidence()),
            explanation == null ? "" : describe(explanation)});
      }
      ts.end();
    }
    return out;
  }

  private static String describe(WordClassExplanationAttribute e) {
    StringBuilder s = new StringBuilder().append(e.getSource()).append(' ').append(e.getLookedUpAs()).append(' ')
        .append(e.getEnding()).append(' ').append(e.getShape());
    for (int c = 0; c < e.getClassCount(); c++) {
      s.append(' ').append(e.getClassProbability(c));
    }
    return s.toString();
  }

  private static List<String[]> between(List<String[]> tokens, String first, String last) {
    int from = indexOf(tokens, first);
    return tokens.subList(from, indexOf(tokens, last) + 1);
  }

  private static int indexOf(List<String[]> tokens, String term) {
    for (int i = 0; i < tokens.size(); i++) {
      if (tokens.get(i)[0].equals(term)) {
        return i;
      }
    }
    throw new AssertionError(term + " not among the tokens");
  }

  public void testUrlAndAddressEachGetOneClass() throws IOException {
    WordClassOptions options = WordClassOptions.of(DefaultModel.get()).withConfidence(true).withExplain(true);
    try (Analyzer a = chain(true, options)) {
      List<String[]> tokens = tagged(a, TEXT);
      List<String[]> url = between(tokens, "www.ferrytimes.example", "2005.09");
      List<String[]> address = between(tokens, "crew371", "mail.example");
      assertEquals(3, url.size());
      assertEquals(2, address.size());
      for (List<String[]> run : List.of(url, address)) {
        for (String[] token : run) {
          assertEquals(token[0], run.get(0)[1], token[1]);
          assertEquals(token[0], run.get(0)[2], token[2]);
          assertEquals(token[0], run.get(0)[3], token[3]);
        }
      }
      // the words around keep their own classes
      assertEquals("ADP", tokens.get(indexOf(tokens, "at"))[1]);
      assertEquals("CCONJ", tokens.get(indexOf(tokens, "and"))[1]);
    }
  }

  /** Without runs (Lucene's own standard tokenizer) the pieces are decoded one by one, as before. */
  public void testStandardTokenizerDecodesThePiecesApart() throws IOException {
    try (Analyzer a = chain(false, WordClassOptions.of(DefaultModel.get()))) {
      List<String[]> url = between(tagged(a, TEXT), "www.ferrytimes.example", "2005.09");
      assertEquals("2005.09 alone is a number", "NUM", url.get(2)[1]);
      assertNotEquals("image alone is not a number", "NUM", url.get(1)[1]);
    }
  }

  /** The filter and the tagger of tools decode runs alike: one decoding path. */
  public void testFilterEqualsTaggerWithGaps() throws IOException {
    Tagger tagger = new Tagger(DefaultModel.get());
    List<String> tokens = new ArrayList<>();
    List<String> gaps = new ArrayList<>();
    try (Analyzer tokenizer = new Analyzer() {
          @Override
          protected TokenStreamComponents createComponents(String fieldName) {
            return new TokenStreamComponents(new SentenceStandardTokenizer());
          }
        };
        TokenStream ts = tokenizer.tokenStream("f", TEXT)) {
      CharTermAttribute term = ts.addAttribute(CharTermAttribute.class);
      WrittenTogetherAttribute run = ts.addAttribute(WrittenTogetherAttribute.class);
      ts.reset();
      while (ts.incrementToken()) {
        tokens.add(term.toString());
        gaps.add(new String(run.gapBuffer(), 0, run.gapLength()));
      }
      ts.end();
    }
    int[] expected = tagger.tag(tokens, gaps, false).tags();
    try (Analyzer a = chain(true, WordClassOptions.of(DefaultModel.get()))) {
      List<String[]> tagged = tagged(a, TEXT);
      for (int i = 0; i < expected.length; i++) {
        assertEquals(tokens.get(i), DefaultModel.get().tags().name(expected[i]), tagged.get(i)[1]);
      }
    }
  }

  /** A token removed between two pieces (a stop filter upstream) ends the run: they were not written together. */
  public void testRemovedTokenEndsTheRun() throws IOException {
    String text = "see ferry.example/the/timetable now"; // invented
    Analyzer withStop = new Analyzer() {
      @Override
      protected TokenStreamComponents createComponents(String fieldName) {
        Tokenizer tokenizer = new SentenceStandardTokenizer();
        TokenStream stop = new org.apache.lucene.analysis.StopFilter(tokenizer,
            org.apache.lucene.analysis.CharArraySet.copy(java.util.Set.of("the")));
        return new TokenStreamComponents(tokenizer,
            new WordClassFilter(stop, WordClassOptions.of(DefaultModel.get()).withConfidence(true)));
      }
    };
    List<String> tokens = List.of("see", "ferry.example", "timetable", "now");
    Tagger.Tagging apart = new Tagger(DefaultModel.get()).tag(tokens, true);
    List<String[]> tagged = tagged(withStop, text);
    withStop.close();
    assertEquals(tokens.size(), tagged.size());
    for (int i = 0; i < tokens.size(); i++) {
      assertEquals(tokens.get(i), tagged.get(i)[0]);
      assertEquals(tokens.get(i), DefaultModel.get().tags().name(apart.tags()[i]), tagged.get(i)[1]);
      // a run would give both pieces one confidence; apart each has its own
      assertEquals(tokens.get(i), Double.toString(apart.confidences()[i]), tagged.get(i)[2]);
    }
  }

  public void testRandomStringsWithRuns() throws IOException {
    WordClassOptions options = WordClassOptions.of(DefaultModel.get()).withConfidence(true).withExplain(true);
    try (Analyzer a = chain(true, options)) {
      checkRandomData(random(), a, 100 * RANDOM_MULTIPLIER);
    }
    try (Analyzer a = chain(true, WordClassOptions.of(DefaultModel.get()).withMaxWindow(3))) {
      // windows cut inside runs
      checkRandomData(random(), a, 100 * RANDOM_MULTIPLIER);
    }
  }
}
