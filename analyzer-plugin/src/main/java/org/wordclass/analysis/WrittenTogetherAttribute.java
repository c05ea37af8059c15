package org.wordclass.analysis;

import org.apache.lucene.util.Attribute;

/**
 * Marks a token written together with the token before it, as part of one run such as a URL, an
 * e-mail address, a path or a date that the tokenizer cut into pieces ({@code www.site.com/image}
 * comes out as {@code www.site.com} and {@code image}), and holds the characters between the two
 * (the gap, here {@code /}), so that {@link WordClassFilter} can decode the run as one word,
 * observed as written. Set by {@link SentenceStandardTokenizer}; tokens of other tokenizers, and
 * the first token of every run, have an empty gap.
 *
 * <p>Cost: the gap is copied into a buffer owned by the attribute, which grows to the longest gap
 * seen and is then reused; setting and clearing allocate nothing.
 */
public interface WrittenTogetherAttribute extends Attribute {
  /** Whether this token continues the previous token's run: its gap is not empty. */
  boolean continuesRun();

  /** The gap's characters are {@code gapBuffer()[0..gapLength())}; valid until the next change. */
  char[] gapBuffer();

  /** Number of characters between the previous token and this one; 0 unless {@link #continuesRun}. */
  int gapLength();

  /** Sets the gap to {@code buffer[offset..offset+length)}; length 0 marks a token that starts a run. */
  void setGap(char[] buffer, int offset, int length);
}
