package org.wordclass.adaptation;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.text.BreakIterator;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Consumer;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.wordclass.corpus.AnalysisChain;

/**
 * Cuts running text into sentences and each sentence into the tokens an analysis chain makes of
 * it, the same tokens the word-class filter sees at index time.
 *
 * <p>The rule: a paragraph is a run of non-blank lines, joined with spaces; a blank line always
 * ends a sentence. Inside a paragraph, sentences end where the JDK's sentence {@link
 * BreakIterator} (root locale) puts a boundary: after {@code .}, {@code !} or {@code ?} (with any
 * closing quotes or brackets) followed by white space and a word that does not continue the
 * sentence, and after a paragraph separator (a full stop inside a number does not end one; one
 * after an abbreviation followed by a capital does, a known limit of so simple a rule, and a
 * harmless one for re-estimation). Sentence ends cannot be taken from the tokens,
 * since the standard tokenizer drops punctuation. A paragraph longer than {@link
 * #MAX_PARAGRAPH_CHARS} is cut at a line end, which bounds memory on text without blank lines.
 *
 * <p>Not thread-safe.
 */
final class SentenceTokenizer implements AutoCloseable {
  static final int MAX_PARAGRAPH_CHARS = 1 << 16;

  private final Analyzer analyzer;
  private final BreakIterator sentences = BreakIterator.getSentenceInstance(Locale.ROOT);
  private final StringBuilder paragraph = new StringBuilder();
  private final Consumer<List<String>> sink;

  SentenceTokenizer(AnalysisChain chain, Consumer<List<String>> sink) {
    this.analyzer = chain.build();
    this.sink = sink;
  }

  /** Takes one line of text; a blank one ends the paragraph. */
  void line(String line) {
    if (line.isBlank()) {
      endParagraph();
      return;
    }
    if (paragraph.length() > 0) {
      paragraph.append(' ');
    }
    paragraph.append(line);
    if (paragraph.length() >= MAX_PARAGRAPH_CHARS) {
      endParagraph();
    }
  }

  /** Takes a whole text (such as a stored field value), line by line, and ends its last paragraph. */
  void text(String text) {
    text.lines().forEach(this::line);
    endParagraph();
  }

  void endParagraph() {
    if (paragraph.length() == 0) {
      return;
    }
    String text = paragraph.toString();
    paragraph.setLength(0);
    sentences.setText(text);
    int start = sentences.first();
    for (int end = sentences.next(); end != BreakIterator.DONE; start = end, end = sentences.next()) {
      List<String> tokens = tokens(text.substring(start, end));
      if (!tokens.isEmpty()) {
        sink.accept(tokens);
      }
    }
  }

  private List<String> tokens(String sentence) {
    List<String> out = new ArrayList<>();
    try (TokenStream stream = analyzer.tokenStream("text", sentence)) {
      CharTermAttribute term = stream.addAttribute(CharTermAttribute.class);
      stream.reset();
      while (stream.incrementToken()) {
        out.add(term.toString());
      }
      stream.end();
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return out;
  }

  @Override
  public void close() {
    endParagraph();
    analyzer.close();
  }
}
