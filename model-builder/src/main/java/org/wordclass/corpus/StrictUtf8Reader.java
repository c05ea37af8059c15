package org.wordclass.corpus;

import java.io.IOException;
import java.io.InputStream;
import java.io.Reader;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;

/**
 * Decodes a byte stream as strict UTF-8 for every reader of text the builder has (corpora, text
 * to adapt on, text to tag): a byte sequence that is not UTF-8 and a NUL character are refused
 * with a {@link CorpusFormatException} naming the input and the line (lines end at LF), and a
 * byte-order mark at the very start is skipped, as UTF-8 text written by some Windows tools
 * begins with one. The text before a problem is handed out first; the exception comes with the
 * read that would have returned the offending character, so a reader of lines reports every
 * line before it.
 *
 * <p>Cost: the JDK's UTF-8 decoder plus one pass over the decoded characters (for NUL and line
 * ends); memory is two buffers of {@value #BUFFER} bytes and characters, whatever the input.
 */
public final class StrictUtf8Reader extends Reader {
  static final int BUFFER = 8192;

  private final String name;
  private final InputStream in;
  private final CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
      .onMalformedInput(CodingErrorAction.REPORT)
      .onUnmappableCharacter(CodingErrorAction.REPORT);
  private final ByteBuffer bytes = ByteBuffer.allocate(BUFFER).flip();
  private final CharBuffer chars = CharBuffer.allocate(BUFFER).flip();
  /** Line of the next character to be decoded, 1-based. */
  private long line = 1;
  private boolean atStart = true;
  private boolean endOfInput;
  private boolean flushed;
  private boolean sawAnyByte;
  /** What the decoder or the input stream found wrong, before its line is known. */
  private String problem;
  /** A problem found after the characters still in {@link #chars}; thrown once they are read. */
  private CorpusFormatException pending;

  /**
   * @param in the bytes, read in blocks of {@value #BUFFER}; closed with this reader
   * @param name how messages name the input: the path as the user gave it, or {@code standard input}
   */
  public StrictUtf8Reader(InputStream in, String name) {
    this.in = in;
    this.name = name;
  }

  public String name() {
    return name;
  }

  /** Whether the input had any byte at all (a byte-order mark alone counts). */
  public boolean sawAnyByte() {
    return sawAnyByte;
  }

  @Override
  public int read(char[] buffer, int off, int len) {
    if (len == 0) {
      return 0;
    }
    if (!chars.hasRemaining() && !fill()) {
      if (pending != null) {
        throw pending;
      }
      return -1;
    }
    int n = Math.min(len, chars.remaining());
    chars.get(buffer, off, n);
    return n;
  }

  /** Decodes the next characters; false when none are left before the end or a problem. */
  private boolean fill() {
    do {
      decodeSome();
    } while (!chars.hasRemaining() && pending == null && !flushed);
    return chars.hasRemaining();
  }

  /** Decodes into the empty {@link #chars} what the bytes at hand give, reading more only if they give nothing. */
  private void decodeSome() {
    chars.clear();
    while (pending == null && problem == null && !flushed) {
      CoderResult result = decoder.decode(bytes, chars, endOfInput);
      if (result.isError()) {
        // the characters decoded so far come first; the problem lies on the line they end on
        problem = "is not valid UTF-8 (" + (result.isMalformed() ? "MalformedInputException" : "UnmappableCharacterException") + ")";
        break;
      }
      if (result.isOverflow()) {
        break;
      }
      if (endOfInput) {
        decoder.flush(chars);
        flushed = true;
      } else if (chars.position() > 0) {
        break; // hand out what is there rather than wait for more input
      } else {
        readBytes();
      }
    }
    chars.flip();
    check();
  }

  private void readBytes() {
    bytes.compact();
    try {
      int n = in.read(bytes.array(), bytes.position(), bytes.remaining());
      if (n < 0) {
        endOfInput = true;
      } else {
        bytes.position(bytes.position() + n);
        sawAnyByte |= n > 0;
      }
    } catch (IOException e) {
      problem = "cannot be read: " + e.getMessage();
    }
    bytes.flip();
  }

  /**
   * Skips a leading byte-order mark, counts the lines of the characters just decoded and stops
   * them before a NUL. Line numbers of a problem found by the decoder are right too, since the
   * characters before it are counted here before anyone can see the problem.
   */
  private void check() {
    if (atStart && chars.hasRemaining()) {
      atStart = false;
      if (chars.get(chars.position()) == '\uFEFF') {
        chars.position(chars.position() + 1);
      }
    }
    for (int i = chars.position(); i < chars.limit(); i++) {
      char c = chars.get(i);
      if (c == '\n') {
        line++;
      } else if (c == '\0') {
        chars.limit(i);
        problem = null;
        pending = new CorpusFormatException(name, line, "holds a NUL character (byte 0), which text never does "
            + "(is it UTF-16, or not text at all?)");
        return;
      }
    }
    if (problem != null) {
      pending = new CorpusFormatException(name, line, problem);
      problem = null;
    }
  }

  @Override
  public void close() throws IOException {
    in.close();
  }
}
