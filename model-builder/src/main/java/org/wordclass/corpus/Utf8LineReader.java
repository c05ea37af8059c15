package org.wordclass.corpus;

import java.io.BufferedInputStream;
import java.io.ByteArrayOutputStream;
import java.io.Closeable;
import java.io.FilterInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.DigestInputStream;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.zip.GZIPInputStream;

/**
 * Reads a text file line by line as strict UTF-8, decoding each line on its own so that a broken
 * byte sequence is reported on the line that holds it. Files ending in {@code .gz} are
 * decompressed on the fly. The SHA-256 of the bytes as stored is computed while reading, for the
 * provenance of models built from the file, and the bytes read are counted, for progress display.
 */
public final class Utf8LineReader implements Closeable {
  private final String name;
  private final InputStream in;
  private final MessageDigest digest;
  private final ByteCounter counter;
  private final CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
      .onMalformedInput(CodingErrorAction.REPORT)
      .onUnmappableCharacter(CodingErrorAction.REPORT);
  private final ByteArrayOutputStream line = new ByteArrayOutputStream(256);
  private long lineNumber;
  private boolean sawAnyByte;

  public Utf8LineReader(Path path) throws IOException {
    this.name = path.toString();
    try {
      this.digest = MessageDigest.getInstance("SHA-256");
    } catch (NoSuchAlgorithmException e) {
      throw new IllegalStateException("the Java runtime has no SHA-256", e);
    }
    this.counter = new ByteCounter(Files.newInputStream(path));
    InputStream raw = new DigestInputStream(new BufferedInputStream(counter, 1 << 16), digest);
    if (path.getFileName().toString().endsWith(".gz")) {
      try {
        raw = new BufferedInputStream(new GZIPInputStream(raw, 1 << 16), 1 << 16);
      } catch (IOException e) {
        raw.close();
        throw new CorpusFormatException(name, 0, "not a readable gzip file (" + e.getMessage() + ")");
      }
    }
    this.in = raw;
  }

  public String name() {
    return name;
  }

  /** Number of the line most recently returned (1-based). */
  public long lineNumber() {
    return lineNumber;
  }

  /**
   * Bytes of the file as stored (compressed, for {@code .gz}) read so far; reading goes ahead in
   * blocks of 64 KiB, so this runs ahead of the lines returned by up to that much.
   */
  public long bytesRead() {
    return counter.count;
  }

  /** Whether the file had any byte at all. */
  public boolean sawAnyByte() {
    return sawAnyByte;
  }

  /** The next line without its line terminator, or null at the end of the file. */
  public String readLine() {
    line.reset();
    try {
      int b;
      boolean any = false;
      boolean carriageReturn = false;
      while ((b = in.read()) >= 0) {
        any = true;
        sawAnyByte = true;
        if (carriageReturn && b != '\n') {
          throw lineEndError();
        }
        if (b == '\n') {
          break;
        }
        carriageReturn = b == '\r';
        line.write(b);
      }
      if (!any) {
        return null;
      }
      if (b < 0 && carriageReturn) {
        throw lineEndError();
      }
    } catch (IOException e) {
      throw new CorpusFormatException(name, lineNumber + 1, "cannot be read: " + e.getMessage());
    }
    lineNumber++;
    byte[] bytes = line.toByteArray();
    int length = bytes.length;
    if (length > 0 && bytes[length - 1] == '\r') {
      length--;
    }
    try {
      String text = decoder.decode(ByteBuffer.wrap(bytes, 0, length)).toString();
      if (lineNumber == 1 && text.startsWith("\uFEFF")) {
        text = text.substring(1);
      }
      return text;
    } catch (CharacterCodingException e) {
      throw new CorpusFormatException(name, lineNumber, "is not valid UTF-8 (" + e.getClass().getSimpleName() + ")");
    }
  }

  /**
   * A carriage return not followed by a line feed: lines end in LF (or CR LF), as CoNLL-U
   * prescribes; a file with the CR-only line ends of old Mac OS would otherwise read as one line.
   */
  private CorpusFormatException lineEndError() {
    return new CorpusFormatException(name, lineNumber + 1, "carriage return (CR) without a line feed; lines must end in LF "
        + "or CR LF (convert CR-only line ends first)");
  }

  /** SHA-256 of the file's bytes as stored, valid once the whole file has been read. */
  public String sha256() {
    try {
      // drain what a reader stopped short of, so the digest covers the whole file
      while (in.read() >= 0) {
        // keep reading
      }
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return HexFormat.of().formatHex(digest.digest());
  }

  @Override
  public void close() throws IOException {
    in.close();
  }

  /** Counts the bytes taken from the file; sits below the buffer, so it is called once per block. */
  private static final class ByteCounter extends FilterInputStream {
    private long count;

    ByteCounter(InputStream in) {
      super(in);
    }

    @Override
    public int read() throws IOException {
      int b = super.read();
      if (b >= 0) {
        count++;
      }
      return b;
    }

    @Override
    public int read(byte[] buffer, int off, int len) throws IOException {
      int n = super.read(buffer, off, len);
      if (n > 0) {
        count += n;
      }
      return n;
    }

    @Override
    public long skip(long n) throws IOException {
      long skipped = super.skip(n);
      count += skipped;
      return skipped;
    }
  }
}
