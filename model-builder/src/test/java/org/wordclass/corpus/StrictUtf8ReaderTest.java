package org.wordclass.corpus;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The strict UTF-8 decoding every text reader of the builder shares: text comes through whole
 * however the bytes arrive (sequences split between reads, surrogate pairs), problems are reported
 * on their line after the text before them, and a leading byte-order mark is skipped. The
 * expected decodings are the JDK's own UTF-8 encoder's (common practice: RFC 3629).
 */
class StrictUtf8ReaderTest {
  /** Gives at most a few bytes per read, so that multi-byte sequences are split between reads. */
  private static final class Trickle extends InputStream {
    private final InputStream in;
    private final Random random = new Random(20261202);

    Trickle(byte[] bytes) {
      this.in = new ByteArrayInputStream(bytes);
    }

    @Override
    public int read() throws IOException {
      return in.read();
    }

    @Override
    public int read(byte[] b, int off, int len) throws IOException {
      return in.read(b, off, Math.min(len, 1 + random.nextInt(7)));
    }
  }

  /** Everything the reader hands out, read in pieces of random size, until the end or a problem. */
  private static String readAll(StrictUtf8Reader reader, StringBuilder seen) {
    Random random = new Random(7);
    char[] buffer = new char[10_000];
    for (int n; (n = reader.read(buffer, 0, 1 + random.nextInt(buffer.length))) >= 0; ) {
      seen.append(buffer, 0, n);
    }
    return seen.toString();
  }

  private static String text(int lines) {
    StringBuilder s = new StringBuilder();
    for (int i = 0; i < lines; i++) {
      s.append("line ").append(i + 1).append(": café, 日本語, 𝄞 clef, naïve\n");
    }
    return s.toString();
  }

  @Test
  void textComesThroughWholeWhateverTheReads() {
    String text = text(5_000);
    byte[] bytes = text.getBytes(StandardCharsets.UTF_8);
    assertEquals(text, readAll(new StrictUtf8Reader(new Trickle(bytes), "t"), new StringBuilder()));
    assertEquals(text, readAll(new StrictUtf8Reader(new ByteArrayInputStream(bytes), "t"), new StringBuilder()));
  }

  @Test
  void anInvalidByteFarInIsReportedOnItsLineAfterTheTextBeforeIt() {
    String before = text(4_999);
    byte[] good = before.getBytes(StandardCharsets.UTF_8);
    byte[] bytes = new byte[good.length + 8];
    System.arraycopy(good, 0, bytes, 0, good.length);
    byte[] bad = {'c', 'a', 'f', (byte) 0xE9, ' ', 'o', 'k', '\n'};  // Latin-1 é
    System.arraycopy(bad, 0, bytes, good.length, bad.length);
    StringBuilder seen = new StringBuilder();
    CorpusFormatException e = assertThrows(CorpusFormatException.class,
        () -> readAll(new StrictUtf8Reader(new Trickle(bytes), "notes.txt"), seen));
    assertEquals("notes.txt:5000: is not valid UTF-8 (MalformedInputException)", e.getMessage());
    assertEquals(before + "caf", seen.toString());
  }

  @Test
  void aNulIsReportedOnItsLine() {
    StringBuilder seen = new StringBuilder();
    byte[] bytes = (text(3) + "a\0b\n").getBytes(StandardCharsets.UTF_8);
    CorpusFormatException e = assertThrows(CorpusFormatException.class,
        () -> readAll(new StrictUtf8Reader(new Trickle(bytes), "standard input"), seen));
    assertTrue(e.getMessage().startsWith("standard input:4: holds a NUL character (byte 0)"), e::getMessage);
    assertEquals(text(3) + "a", seen.toString());
  }

  @Test
  void aSequenceCutAtTheEndIsNotUtf8() {
    byte[] cut = {'o', 'k', '\n', 'c', 'a', 'f', (byte) 0xC3};
    CorpusFormatException e = assertThrows(CorpusFormatException.class,
        () -> readAll(new StrictUtf8Reader(new ByteArrayInputStream(cut), "f"), new StringBuilder()));
    assertEquals("f:2: is not valid UTF-8 (MalformedInputException)", e.getMessage());
  }

  @Test
  void onlyALeadingByteOrderMarkIsSkipped() {
    byte[] bytes = "\uFEFFBook\uFEFF a table".getBytes(StandardCharsets.UTF_8);
    assertEquals("Book\uFEFF a table", readAll(new StrictUtf8Reader(new Trickle(bytes), "f"), new StringBuilder()));
    StrictUtf8Reader markOnly = new StrictUtf8Reader(new ByteArrayInputStream(new byte[] {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF}), "f");
    assertEquals("", readAll(markOnly, new StringBuilder()));
    assertTrue(markOnly.sawAnyByte());
    StrictUtf8Reader empty = new StrictUtf8Reader(new ByteArrayInputStream(new byte[0]), "f");
    assertEquals("", readAll(empty, new StringBuilder()));
    assertFalse(empty.sawAnyByte());
  }

  @Test
  void aReadFailureNamesTheInput() {
    InputStream failing = new InputStream() {
      @Override
      public int read() throws IOException {
        throw new IOException("Input/output error");
      }
    };
    CorpusFormatException e = assertThrows(CorpusFormatException.class,
        () -> readAll(new StrictUtf8Reader(failing, "disk.txt"), new StringBuilder()));
    assertEquals("disk.txt:1: cannot be read: Input/output error", e.getMessage());
  }
}
