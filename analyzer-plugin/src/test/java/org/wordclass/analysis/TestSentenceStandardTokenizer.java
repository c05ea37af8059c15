package org.wordclass.analysis;

import java.io.IOException;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.Tokenizer;
import org.apache.lucene.analysis.TokenizerFactory;
import org.apache.lucene.analysis.charfilter.HTMLStripCharFilter;
import org.apache.lucene.analysis.standard.StandardTokenizer;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.analysis.tokenattributes.OffsetAttribute;
import org.apache.lucene.analysis.tokenattributes.PositionIncrementAttribute;
import org.apache.lucene.analysis.tokenattributes.SentenceAttribute;
import org.apache.lucene.analysis.tokenattributes.TypeAttribute;
import org.apache.lucene.tests.analysis.BaseTokenStreamTestCase;
import org.apache.lucene.tests.util.TestUtil;

/**
 * {@link SentenceStandardTokenizer} against Lucene's {@link StandardTokenizer}, the tokenizer it
 * must reproduce token for token, on random text of every kind Lucene's test framework makes,
 * and Lucene's own stress checks (random text, reuse, many threads). Sentence boundaries are
 * checked on invented text against what the JDK's sentence rules give.
 */
public class TestSentenceStandardTokenizer extends BaseTokenStreamTestCase {
  private static Analyzer sentenceChain() {
    return new Analyzer() {
      @Override
      protected TokenStreamComponents createComponents(String fieldName) {
        return new TokenStreamComponents(new SentenceStandardTokenizer());
      }
    };
  }

  private static Analyzer standardChain() {
    return new Analyzer() {
      @Override
      protected TokenStreamComponents createComponents(String fieldName) {
        return new TokenStreamComponents(new StandardTokenizer());
      }
    };
  }

  /** Term, start, end, type and position increment of every token, then the final offset. */
  private static List<String> tokens(Analyzer analyzer, String text) throws IOException {
    List<String> out = new ArrayList<>();
    try (TokenStream ts = analyzer.tokenStream("f", text)) {
      CharTermAttribute term = ts.addAttribute(CharTermAttribute.class);
      OffsetAttribute offset = ts.addAttribute(OffsetAttribute.class);
      TypeAttribute type = ts.addAttribute(TypeAttribute.class);
      PositionIncrementAttribute posInc = ts.addAttribute(PositionIncrementAttribute.class);
      ts.reset();
      while (ts.incrementToken()) {
        out.add(term + " " + offset.startOffset() + "-" + offset.endOffset() + " " + type.type() + " +" + posInc.getPositionIncrement());
      }
      ts.end();
      out.add("end " + offset.endOffset() + " +" + posInc.getPositionIncrement());
    }
    return out;
  }

  /** Each token with the number of its sentence. */
  private static String sentences(String text) throws IOException {
    StringBuilder out = new StringBuilder();
    try (Analyzer a = sentenceChain(); TokenStream ts = a.tokenStream("f", text)) {
      CharTermAttribute term = ts.addAttribute(CharTermAttribute.class);
      SentenceAttribute sentence = ts.addAttribute(SentenceAttribute.class);
      ts.reset();
      while (ts.incrementToken()) {
        out.append(out.length() == 0 ? "" : " ").append(term).append('/').append(sentence.getSentenceIndex());
      }
      ts.end();
    }
    return out.toString();
  }

  public void testSameTokensAsStandardTokenizerOnRandomText() throws IOException {
    try (Analyzer ours = sentenceChain(); Analyzer standard = standardChain()) {
      for (int i = 0; i < 2000; i++) {
        String text = switch (i % 4) {
          case 0 -> TestUtil.randomUnicodeString(random(), 200);
          case 1 -> TestUtil.randomRealisticUnicodeString(random(), 400);
          case 2 -> TestUtil.randomAnalysisString(random(), 300, false);
          default -> TestUtil.randomHtmlishString(random(), 200);
        };
        assertEquals(text, tokens(standard, text), tokens(ours, text));
      }
    }
  }

  public void testSameTokensAsStandardTokenizerOnLongRandomText() throws IOException {
    // longer than the text the tokenizer keeps, so that its buffer is compacted and grown
    try (Analyzer ours = sentenceChain(); Analyzer standard = standardChain()) {
      for (int i = 0; i < 20; i++) {
        StringBuilder text = new StringBuilder();
        while (text.length() < 3 * SentenceStandardTokenizer.KEPT_TEXT) {
          text.append(TestUtil.randomRealisticUnicodeString(random(), 40)).append(random().nextBoolean() ? ". " : " ");
          if (random().nextInt(50) == 0) {
            text.append(".".repeat(random().nextInt(20_000)));
          }
        }
        assertEquals(tokens(standard, text.toString()), tokens(ours, text.toString()));
      }
    }
  }

  public void testOffsetsCorrectedThroughCharFilter() throws IOException {
    String html = "<p>The crew will <b>board</b> the ferry.</p><p>Book a table for two, please.</p>";
    Analyzer ours = new Analyzer() {
      @Override
      protected TokenStreamComponents createComponents(String fieldName) {
        return new TokenStreamComponents(new SentenceStandardTokenizer());
      }

      @Override
      protected java.io.Reader initReader(String fieldName, java.io.Reader reader) {
        return new HTMLStripCharFilter(reader);
      }
    };
    Analyzer standard = new Analyzer() {
      @Override
      protected TokenStreamComponents createComponents(String fieldName) {
        return new TokenStreamComponents(new StandardTokenizer());
      }

      @Override
      protected java.io.Reader initReader(String fieldName, java.io.Reader reader) {
        return new HTMLStripCharFilter(reader);
      }
    };
    assertEquals(tokens(standard, html), tokens(ours, html));
    ours.close();
    standard.close();
  }

  public void testSentenceBoundaries() throws IOException {
    // invented text; the expected cuts are those of the JDK's sentence rules, plus line breaks
    assertEquals("The/0 crew/0 will/0 board/0 the/0 ferry/0 Book/1 a/1 table/1 for/1 two/1 please/1",
        sentences("The crew will board the ferry. Book a table for two, please."));
    assertEquals("Is/0 it/0 open/0 Yes/1 Board/2 at/2 the/2 south/2 ramp/2",
        sentences("Is it open? Yes! Board at the south ramp"));
    assertEquals("It/0 costs/0 3.5/0 euros/0 e.g/0 for/0 two/0", sentences("It costs 3.5 euros. e.g. for two"));
    assertEquals("Timetable/0 Ferries/1 leave/1 hourly/1", sentences("Timetable\nFerries leave hourly"));
    assertEquals("He/0 said/0 Stop/0 Then/1 he/1 left/1", sentences("He said \"Stop.\" Then he left."));
    assertEquals("", sentences(" . ! "));
  }

  /** Each token with its gap before it when it continues a run: {@code [gap]token}. */
  private static String runs(String text) throws IOException {
    StringBuilder out = new StringBuilder();
    try (Analyzer a = sentenceChain(); TokenStream ts = a.tokenStream("f", text)) {
      CharTermAttribute term = ts.addAttribute(CharTermAttribute.class);
      WrittenTogetherAttribute run = ts.addAttribute(WrittenTogetherAttribute.class);
      ts.reset();
      while (ts.incrementToken()) {
        out.append(out.length() == 0 ? "" : " ");
        if (run.continuesRun()) {
          out.append('[').append(run.gapBuffer(), 0, run.gapLength()).append(']');
        }
        out.append(term);
      }
      ts.end();
    }
    return out.toString();
  }

  public void testRunsOfTokensWrittenTogether() throws IOException {
    // invented text in the shapes EWT dev has (a path ending in a date, an e-mail address, b/c, a
    // date with slashes, a query string); the tokens are the standard tokenizer's (tested above)
    assertEquals("see www.ferry.example [//]timetable [/]2005.09 today",
        runs("see www.ferry.example//timetable/2005.09 today"));
    assertEquals("mail crew42 [@]ferry.example b [/]c 08 [/]16 [/]2000 or ferry.example [/]search q [=]rye [&]n [=]2",
        runs("mail crew42@ferry.example b/c 08/16/2000 or ferry.example/search?q=rye&n=2"));
    // the JDK's sentence rules end a sentence at that question mark, and a run never crosses one
    assertEquals("search/0 q/1", sentences("search?q"));
    // whitespace, characters outside the joining set (the hyphen, the colon, the full stop
    // between two tokens: chosen on EWT dev), a sentence boundary end a run
    assertEquals("ferry example b c one two long term at 10 30 2005 x",
        runs("ferry / example b, c one\n/two long-term at 10:30 2005./x"));
    // a run may not start a field; a gap longer than MAX_GAP is punctuation of its own
    assertEquals("ferry ferry", runs("//ferry" + "/".repeat(SentenceStandardTokenizer.MAX_GAP + 1) + "ferry"));
  }

  public void testRunGapsMatchTheTextOnRandomText() throws IOException {
    // the gap of every token is the text between it and the token before, when that text is
    // made of joining characters only; checked against the offsets (no char filter here)
    try (Analyzer a = sentenceChain()) {
      for (int i = 0; i < 1000; i++) {
        String text = randomTextWithJoiners();
        try (TokenStream ts = a.tokenStream("f", text)) {
          OffsetAttribute offset = ts.addAttribute(OffsetAttribute.class);
          SentenceAttribute sentence = ts.addAttribute(SentenceAttribute.class);
          WrittenTogetherAttribute run = ts.addAttribute(WrittenTogetherAttribute.class);
          ts.reset();
          int previousEnd = -1;
          int previousSentence = 0;
          while (ts.incrementToken()) {
            String between = previousEnd < 0 ? "" : text.substring(previousEnd, offset.startOffset());
            boolean joins = !between.isEmpty() && between.length() <= SentenceStandardTokenizer.MAX_GAP
                && between.chars().allMatch(c -> SentenceStandardTokenizer.JOINERS.indexOf(c) >= 0)
                && sentence.getSentenceIndex() == previousSentence;
            assertEquals(text, joins ? between : "", new String(run.gapBuffer(), 0, run.gapLength()));
            previousEnd = offset.endOffset();
            previousSentence = sentence.getSentenceIndex();
          }
          ts.end();
        }
      }
    }
  }

  private static String randomTextWithJoiners() {
    StringBuilder text = new StringBuilder();
    String pieces = SentenceStandardTokenizer.JOINERS + " .,-!\n";
    while (text.length() < 200) {
      text.append(random().nextBoolean() ? TestUtil.randomSimpleString(random(), 1, 8) : TestUtil.randomRealisticUnicodeString(random(), 1, 6));
      int gap = random().nextInt(4);
      for (int k = 0; k < gap; k++) {
        text.append(pieces.charAt(random().nextInt(pieces.length())));
      }
    }
    return text.toString();
  }

  public void testSentenceBoundaryAfterLongGap() throws IOException {
    String gap = " " + "-".repeat(3 * SentenceStandardTokenizer.KEPT_TEXT) + ". ";
    assertEquals("one/0 Two/1", sentences("one" + gap + "Two"));
  }

  public void testRandomStrings() throws IOException {
    try (Analyzer a = sentenceChain()) {
      checkRandomData(random(), a, 200 * RANDOM_MULTIPLIER);
    }
  }

  public void testRandomHugeStrings() throws IOException {
    try (Analyzer a = sentenceChain()) {
      checkRandomData(random(), a, 10 * RANDOM_MULTIPLIER, 8192);
    }
  }

  public void testReuseAndThreads() throws IOException {
    try (Analyzer a = sentenceChain()) {
      // several threads share the analyzer, each reusing its own tokenizer
      checkRandomData(random(), a, 100 * RANDOM_MULTIPLIER, 40, false, false);
    }
  }

  public void testFactoryBySpiName() throws IOException {
    Map<String, String> args = new HashMap<>();
    TokenizerFactory factory = TokenizerFactory.forName(SentenceStandardTokenizerFactory.NAME, args);
    Tokenizer tokenizer = factory.create();
    tokenizer.setReader(new StringReader("Ferries leave hourly. Book early."));
    assertTokenStreamContents(tokenizer, new String[] {"Ferries", "leave", "hourly", "Book", "early"});
    Map<String, String> bad = new HashMap<>(Map.of("maxTokenLenght", "10"));
    IllegalArgumentException e = expectThrows(IllegalArgumentException.class,
        () -> TokenizerFactory.forName(SentenceStandardTokenizerFactory.NAME, bad));
    assertTrue(e.getMessage(), e.getMessage().contains("maxTokenLenght"));
  }

  public void testMaxTokenLengthAsStandard() throws IOException {
    String text = "a".repeat(300) + " short. Next";
    Analyzer ours = new Analyzer() {
      @Override
      protected TokenStreamComponents createComponents(String fieldName) {
        return new TokenStreamComponents(new SentenceStandardTokenizer(100));
      }
    };
    Analyzer standard = new Analyzer() {
      @Override
      protected TokenStreamComponents createComponents(String fieldName) {
        StandardTokenizer t = new StandardTokenizer();
        t.setMaxTokenLength(100);
        return new TokenStreamComponents(t);
      }
    };
    assertEquals(tokens(standard, text), tokens(ours, text));
    ours.close();
    standard.close();
  }
}
