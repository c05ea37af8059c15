package org.wordclass.analysis;

import java.io.IOException;
import java.io.Reader;
import java.text.BreakIterator;
import java.util.Arrays;
import java.util.Locale;
import org.apache.lucene.analysis.Tokenizer;
import org.apache.lucene.analysis.standard.StandardAnalyzer;
import org.apache.lucene.analysis.standard.StandardTokenizer;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.analysis.tokenattributes.OffsetAttribute;
import org.apache.lucene.analysis.tokenattributes.PositionIncrementAttribute;
import org.apache.lucene.analysis.tokenattributes.SentenceAttribute;
import org.apache.lucene.analysis.tokenattributes.TypeAttribute;
import org.apache.lucene.analysis.util.CharArrayIterator;
import org.apache.lucene.util.AttributeFactory;

/**
 * Lucene's {@link StandardTokenizer}, token for token (the same terms, offsets, types and
 * positions), that also numbers the sentences of running text in the {@link SentenceAttribute},
 * so that {@link WordClassFilter} decodes each sentence on its own instead of a whole field as
 * one: the standard tokenizer drops the punctuation that would tell the model where a sentence
 * ends, and without a boundary the last word of one sentence becomes the context of the first
 * word of the next.
 *
 * <p>A new sentence starts at a token when the text between it and the token before holds a
 * sentence boundary, as the JDK's sentence {@link BreakIterator} finds it in the surrounding text
 * (a full stop, question or exclamation mark followed by a word that does not start in lower
 * case; abbreviations are not known, so {@code Mr. Smith} is cut after {@code Mr}), or a line or
 * paragraph break (Unicode's sentence rules break there too; the JDK's rules do not).
 *
 * <p>It also marks, in the {@link WrittenTogetherAttribute}, a token written together with the one
 * before it: the gap between them is not empty, holds at most {@value #MAX_GAP} characters, all
 * of them {@linkplain #JOINERS joining characters} (slash, at sign and a few more; no whitespace),
 * and no sentence boundary. The filter decodes such a run (pieces of a URL, an e-mail address, a
 * path, a date) as one word, as the treebanks tag it.
 *
 * <p>Cost: the standard tokenizer's, plus a look at each gap between two tokens for the run mark
 * (copied only where it joins), copying each token's attributes once and, only where
 * the gap between two tokens holds a full stop, a question or exclamation mark, a line break or a
 * character outside Latin-1, one sentence break test over the two tokens and a few dozen
 * characters after them. Memory is bounded: the text kept for those tests is the current and the
 * previous token with their gap, at most {@value #KEPT_TEXT} characters plus the look-ahead,
 * whatever the length of the field.
 */
public final class SentenceStandardTokenizer extends Tokenizer {
  /** Characters after a token that the break test sees, enough for the rule on a following lower-case word. */
  static final int LOOK_AHEAD = 64;
  /** Most characters of text kept behind the inner tokenizer's read position (it reads ahead up to 4,096). */
  static final int KEPT_TEXT = 16_384;
  /**
   * Characters that join two tokens into one run when the gap between them holds nothing else:
   * chosen on UD English EWT dev (docs/accuracy.md, "Runs of tokens written together"). Left out
   * because they cost accuracy there: the hyphen (EWT splits most hyphenated words into words of
   * their own classes), the full stop (between two tokens mostly an ellipsis written without
   * spaces, {@code house...is}; the standard tokenizer keeps {@code www.site.com} whole) and the colon (mostly times and the
   * {@code http} of an address, which decode as well apart).
   */
  static final String JOINERS = "/@_=&?#%~+\\";
  /** Longest gap that joins a run ({@code ://} is three); longer ones are punctuation of their own. */
  static final int MAX_GAP = 8;

  private final CharTermAttribute termAtt = addAttribute(CharTermAttribute.class);
  private final OffsetAttribute offsetAtt = addAttribute(OffsetAttribute.class);
  private final PositionIncrementAttribute posIncAtt = addAttribute(PositionIncrementAttribute.class);
  private final TypeAttribute typeAtt = addAttribute(TypeAttribute.class);
  private final SentenceAttribute sentenceAtt = addAttribute(SentenceAttribute.class);
  private final WrittenTogetherAttribute runAtt = addAttribute(WrittenTogetherAttribute.class);

  private final TextWindow text = new TextWindow();
  private final StandardTokenizer inner = new StandardTokenizer();
  private final CharTermAttribute innerTerm = inner.getAttribute(CharTermAttribute.class);
  private final OffsetAttribute innerOffset = inner.getAttribute(OffsetAttribute.class);
  private final PositionIncrementAttribute innerPosInc = inner.getAttribute(PositionIncrementAttribute.class);
  private final TypeAttribute innerType = inner.getAttribute(TypeAttribute.class);
  private final BreakIterator sentences = BreakIterator.getSentenceInstance(Locale.ROOT);
  private final CharArrayIterator window = CharArrayIterator.newSentenceInstance();

  private int sentence;
  /** Start and end (in the uncorrected text) of the previous token, -1 before the first. */
  private int previousStart = -1;
  private int previousEnd = -1;

  /** The standard tokenizer's default longest token, {@value StandardAnalyzer#DEFAULT_MAX_TOKEN_LENGTH}. */
  public SentenceStandardTokenizer() {
    this(StandardAnalyzer.DEFAULT_MAX_TOKEN_LENGTH);
  }

  /** Longer tokens are split as the standard tokenizer splits them. */
  public SentenceStandardTokenizer(int maxTokenLength) {
    this(DEFAULT_TOKEN_ATTRIBUTE_FACTORY, maxTokenLength);
  }

  /** Attributes made by {@code factory}; longer tokens are split as the standard tokenizer splits them. */
  public SentenceStandardTokenizer(AttributeFactory factory, int maxTokenLength) {
    super(factory);
    inner.setMaxTokenLength(maxTokenLength);
  }

  @Override
  public boolean incrementToken() throws IOException {
    clearAttributes();
    if (!inner.incrementToken()) {
      return false;
    }
    int start = innerOffset.startOffset();
    int end = innerOffset.endOffset();
    int gap = 0;
    if (previousEnd >= 0) {
      if (sentenceStartsBetween(previousEnd, start, end)) {
        sentence++;
      } else {
        gap = joiningGap(previousEnd, start);
      }
    }
    if (gap > 0) {
      runAtt.setGap(text.buffer(), text.indexOf(previousEnd), gap);
    }
    previousStart = start;
    previousEnd = end;
    text.keepFrom(start);
    termAtt.copyBuffer(innerTerm.buffer(), 0, innerTerm.length());
    offsetAtt.setOffset(correctOffset(start), correctOffset(end));
    posIncAtt.setPositionIncrement(innerPosInc.getPositionIncrement());
    typeAtt.setType(innerType.type());
    sentenceAtt.setSentenceIndex(sentence);
    return true;
  }

  /** Whether a sentence boundary lies in the gap {@code (gapStart, tokenStart]} before a token ending at {@code tokenEnd}. */
  private boolean sentenceStartsBetween(int gapStart, int tokenStart, int tokenEnd) throws IOException {
    boolean mayEnd = false;
    // of a gap longer than the text kept, only its last part is still there to look at
    for (int i = Math.max(gapStart, text.start()); i < tokenStart; i++) {
      char c = text.charAt(i);
      if (isLineBreak(c)) {
        return true;
      }
      mayEnd |= c == '.' || c == '!' || c == '?' || (c > 0xFF && !Character.isWhitespace(c));
    }
    if (!mayEnd) {
      return false;
    }
    int to = text.ensureAvailable(tokenEnd + LOOK_AHEAD);
    int from = Math.max(text.start(), Math.max(previousStart, gapStart - KEPT_TEXT / 4));
    window.setText(text.buffer(), text.indexOf(from), to - from);
    sentences.setText(window);
    int boundary = sentences.following(Math.max(0, gapStart - from));
    return boundary != BreakIterator.DONE && boundary <= tokenStart - from;
  }

  /**
   * The length of the gap {@code [gapStart, tokenStart)} if it joins the two tokens around it into
   * one run: not empty, at most {@value #MAX_GAP} characters, all of them {@link #JOINERS}; else 0.
   */
  private int joiningGap(int gapStart, int tokenStart) {
    int length = tokenStart - gapStart;
    if (length == 0 || length > MAX_GAP || gapStart < text.start()) {
      return 0;
    }
    for (int i = gapStart; i < tokenStart; i++) {
      if (JOINERS.indexOf(text.charAt(i)) < 0) {
        return 0;
      }
    }
    return length;
  }

  /** CR, LF, NEL, and the line and paragraph separators: Unicode's sentence rules break after each. */
  private static boolean isLineBreak(char c) {
    return c == '\n' || c == '\r' || c == '\u0085' || c == '\u2028' || c == '\u2029';
  }

  @Override
  public void reset() throws IOException {
    super.reset();
    text.reset(input);
    inner.setReader(text);
    inner.reset();
    sentence = 0;
    previousStart = -1;
    previousEnd = -1;
  }

  @Override
  public void end() throws IOException {
    super.end();
    inner.end();
    int finalOffset = correctOffset(innerOffset.endOffset());
    offsetAtt.setOffset(finalOffset, finalOffset);
    posIncAtt.setPositionIncrement(innerPosInc.getPositionIncrement());
  }

  @Override
  public void close() throws IOException {
    inner.close();
    text.release();
    super.close();
  }

  /**
   * The field's text as the inner tokenizer reads it, keeping a bounded stretch behind the read
   * position so that the gaps between tokens can be looked at again, and able to read ahead of
   * the inner tokenizer for the break test.
   */
  private static final class TextWindow extends Reader {
    private Reader source;
    private char[] buffer = new char[8192];
    /** Offset in the text of {@code buffer[0]}. */
    private int base;
    /** Characters of the text in the buffer. */
    private int filled;
    /** Offset in the text of the next character the inner tokenizer reads. */
    private int readPosition;
    /** Offset before which the text is no longer needed. */
    private int keepFrom;
    private boolean exhausted;

    void reset(Reader source) {
      this.source = source;
      base = 0;
      filled = 0;
      readPosition = 0;
      keepFrom = 0;
      exhausted = false;
    }

    void release() {
      source = null;
    }

    int start() {
      return base;
    }

    char[] buffer() {
      return buffer;
    }

    int indexOf(int offset) {
      return offset - base;
    }

    char charAt(int offset) {
      return buffer[offset - base];
    }

    void keepFrom(int offset) {
      keepFrom = Math.max(keepFrom, offset);
    }

    /** Reads until the text up to {@code offset} is in the buffer or the text ends; returns the end of what is there. */
    int ensureAvailable(int offset) throws IOException {
      while (base + filled < offset && !exhausted) {
        fill();
      }
      return Math.min(offset, base + filled);
    }

    private void fill() throws IOException {
      if (filled == buffer.length) {
        int drop = Math.max(0, Math.max(keepFrom, readPosition - KEPT_TEXT) - base);
        drop = Math.min(drop, readPosition - base);
        if (drop > 0) {
          System.arraycopy(buffer, drop, buffer, 0, filled - drop);
          base += drop;
          filled -= drop;
        }
        if (filled == buffer.length) {
          buffer = Arrays.copyOf(buffer, buffer.length * 2);
        }
      }
      int n = source.read(buffer, filled, buffer.length - filled);
      if (n < 0) {
        exhausted = true;
      } else {
        filled += n;
      }
    }

    @Override
    public int read(char[] into, int off, int len) throws IOException {
      if (len == 0) {
        return 0;
      }
      while (readPosition == base + filled) {
        if (exhausted) {
          return -1;
        }
        fill();
      }
      int n = Math.min(len, base + filled - readPosition);
      System.arraycopy(buffer, readPosition - base, into, off, n);
      readPosition += n;
      return n;
    }

    @Override
    public void close() {
      // the tokenizer closes its own input
    }
  }
}
