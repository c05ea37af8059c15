package org.wordclass.corpus;

import java.io.BufferedInputStream;
import java.io.Closeable;
import java.io.FilterInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.DigestInputStream;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.zip.GZIPInputStream;

/**
 * Reads a text file line by line as strict UTF-8 ({@link StrictUtf8Reader}: a broken byte
 * sequence or a NUL is reported on the line that holds it, a leading byte-order mark is skipped);
 * lines end in LF or CR LF, and a CR alone is refused. Files ending in {@code .gz} are
 * decompressed on the fly. The SHA-256 of the bytes as stored is computed while reading, for the
 * provenance of models built from the file, and the bytes read are counted, for progress display.
 */
public final class Utf8LineReader implements Closeable {
  private final String name;
  private final InputStream in;
  private final MessageDigest digest;
  private final ByteCounter counter;
  private final StrictUtf8Reader text;
  private final char[] buffer = new char[StrictUtf8Reader.BUFFER];
  private int position;
  private int limit;
  private final StringBuilder line = new StringBuilder(256);
  private long lineNumber;

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
        // no buffer above: a BufferedInputStream would drop the bytes it holds when a cut file ends the inflater
        raw = new GZIPInputStream(raw, 1 << 16);
      } catch (IOException e) {
        raw.close();
        throw new CorpusFormatException(name, 0, "not a readable gzip file (" + e.getMessage() + ")");
      }
    }
    this.in = raw;
    this.text = new StrictUtf8Reader(raw, name);
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
    return text.sawAnyByte();
  }

  /** The next line without its line terminator, or null at the end of the file. */
  public String readLine() {
    line.setLength(0);
    boolean any = false;
    boolean carriageReturn = false;
    int c;
    while ((c = next()) >= 0) {
      any = true;
      if (carriageReturn && c != '\n') {
        throw lineEndError();
      }
      if (c == '\n') {
        break;
      }
      carriageReturn = c == '\r';
      line.append((char) c);
    }
    if (!any) {
      return null;
    }
    if (c < 0 && carriageReturn) {
      throw lineEndError();
    }
    lineNumber++;
    if (carriageReturn) {
      line.setLength(line.length() - 1);
    }
    return line.toString();
  }

  /** The next character, or -1 at the end of the file. */
  private int next() {
    if (position == limit) {
      limit = text.read(buffer, 0, buffer.length);
      position = 0;
      if (limit < 0) {
        limit = 0;
        return -1;
      }
    }
    return buffer[position++];
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
