package org.wordclass.model;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.apache.lucene.codecs.CodecUtil;
import org.apache.lucene.index.CorruptIndexException;
import org.apache.lucene.index.IndexFormatTooNewException;
import org.apache.lucene.index.IndexFormatTooOldException;
import org.apache.lucene.store.BufferedChecksumIndexInput;
import org.apache.lucene.store.ByteBuffersDataInput;
import org.apache.lucene.store.ByteBuffersDataOutput;
import org.apache.lucene.store.ByteBuffersIndexInput;
import org.apache.lucene.store.ChecksumIndexInput;
import org.apache.lucene.store.DataInput;
import org.apache.lucene.store.DataOutput;
import org.apache.lucene.store.IndexInput;
import org.apache.lucene.store.IndexOutput;
import org.apache.lucene.store.OutputStreamIndexOutput;

/**
 * Reads and writes the model file format ({@code .wcm}), described in {@code docs/model-format.md}:
 * a Lucene {@link CodecUtil} header naming the format and its version, the provenance block,
 * the tag set, the transition tables, the lexicon and the unknown-word model, then a footer with
 * a CRC-32 checksum of everything before it. This class sequences header, components and footer;
 * each component writes and reads its own fields ({@code writeTo} and {@code readFrom} on
 * {@link TagSet}, {@link StateSpace}, {@link HmmModel.DecodingCues}, the transition tables,
 * {@link Lexicon}, {@link UnknownWordModel} with its {@link AffixTrie}s and
 * {@link LowerCaseFormCue}, and the provenance on {@link HmmModel}), checking its sizes with
 * {@link Limits}.
 *
 * <p>Loading verifies the header first (so a foreign or newer file is named as such), then the
 * checksum of the whole file (so a changed or truncated byte is caught before any parsing), then
 * parses with every declared size checked against the bytes that remain, so a crafted header
 * cannot make the loader allocate more than the file could hold. Writing is deterministic (no
 * timestamps; maps in key order) and goes through a temporary file that is moved into place, so
 * a crash never leaves a half-written model.
 */
public final class ModelFile {
  /** Codec name in the header; a file with another name is not a model of ours. */
  public static final String CODEC = "WordClassHmm";

  public static final int VERSION_START = 1;
  /**
   * Version 2 adds to the unknown-word model the priors of capitalised words, the cue of the
   * lower-case forms of capitalised words and the tries of word beginnings.
   */
  public static final int VERSION_CAPITALISED_PRIORS = 2;
  /**
   * Version 3 lets the byte of the first-word cue hold a second bit: capitalised first words
   * known only from mid-sentence are looked up in lower case as well.
   */
  public static final int VERSION_FIRST_WORD_BITS = 3;
  /**
   * Version 4 ends the unknown-word model with a byte naming its {@link EndingAlphabet}. A model
   * whose endings are as written is still written as version 3 (the oldest version that holds
   * it), so that it keeps its bytes and older readers.
   */
  public static final int VERSION_ENDING_ALPHABET = 4;
  public static final int VERSION_CURRENT = VERSION_ENDING_ALPHABET;

  /** Largest model file this reader accepts, a guard against reading a wrong file whole. */
  public static final long MAX_FILE_BYTES = 1L << 30;

  /** Magic and codec name as {@link CodecUtil#writeHeader} writes them: how every model file starts. */
  private static final byte[] HEADER_PREFIX = headerPrefix();

  private ModelFile() {}

  /** Writes {@code model} to {@code target} atomically (temporary file, then move). */
  public static void write(HmmModel model, Path target) throws IOException {
    AtomicFiles.write(target, stream -> {
      try (IndexOutput out = new OutputStreamIndexOutput(target.toString(), target.getFileName().toString(), stream, 1 << 16)) {
        write(model, out);
      }
    });
  }

  /**
   * Writes {@code model} to {@code out}, header to footer, in the oldest format version that
   * holds it ({@link #VERSION_ENDING_ALPHABET} only for folded endings).
   */
  public static void write(HmmModel model, IndexOutput out) throws IOException {
    int version = model.unknownWords().formatVersion();
    CodecUtil.writeHeader(out, CODEC, version);
    model.writeProvenanceTo(out);
    out.writeByte((byte) model.order());
    model.tags().writeTo(out);
    model.states().writeTo(out);
    model.cues().writeTo(out);
    model.transitions().writeTo(out);
    model.lexicon().writeTo(out);
    model.unknownWords().writeTo(out, version);
    CodecUtil.writeFooter(out);
  }

  static void writeDoubles(DataOutput out, double[] values) throws IOException {
    for (double v : values) {
      out.writeLong(Double.doubleToLongBits(v));
    }
  }

  /** Reads the model file at {@code path}. */
  public static HmmModel read(Path path) throws IOException {
    return read(readBytes(path), path.toString());
  }

  /**
   * The bytes of the model file at {@code path}, read whole only once it is known to be an
   * ordinary file of at most {@link #MAX_FILE_BYTES} that starts with a model header: a device
   * ({@code /dev/zero}, {@code /dev/urandom}), a pipe or a folder is refused before any byte is
   * read, a foreign file after its first bytes.
   */
  public static byte[] readBytes(Path path) throws IOException {
    BasicFileAttributes attributes = Files.readAttributes(path, BasicFileAttributes.class);
    if (!attributes.isRegularFile()) {
      throw new ModelFormatException(path + ": not an ordinary file (" + (attributes.isDirectory() ? "a folder" : "a device, pipe or socket")
          + "); a model is read from a file written by train or adapt");
    }
    if (attributes.size() > MAX_FILE_BYTES) {
      throw new ModelFormatException(path + ": " + attributes.size() + " bytes is larger than any model (" + MAX_FILE_BYTES + ")");
    }
    try (InputStream in = Files.newInputStream(path)) {
      byte[] header = in.readNBytes(CodecUtil.headerLength(CODEC));
      checkHeader(new ByteBuffersIndexInput(new ByteBuffersDataInput(List.of(ByteBuffer.wrap(header))), path.toString()),
          path.toString());
      byte[] rest = in.readNBytes((int) MAX_FILE_BYTES + 1 - header.length);
      if (header.length + rest.length > MAX_FILE_BYTES) {
        throw new ModelFormatException(path + ": larger than any model (" + MAX_FILE_BYTES + " bytes)");
      }
      byte[] all = Arrays.copyOf(header, header.length + rest.length);
      System.arraycopy(rest, 0, all, header.length, rest.length);
      return all;
    }
  }

  /** Reads a model from a stream, such as a resource of a jar or a Solr config set. */
  public static HmmModel read(InputStream stream, String name) throws IOException {
    byte[] bytes = stream.readNBytes((int) MAX_FILE_BYTES + 1);
    if (bytes.length > MAX_FILE_BYTES) {
      throw new ModelFormatException(name + ": larger than any model (" + MAX_FILE_BYTES + " bytes)");
    }
    return read(bytes, name);
  }

  /** Reads a model held in memory; {@code name} appears in every error message. */
  public static HmmModel read(byte[] bytes, String name) throws IOException {
    IndexInput raw = new ByteBuffersIndexInput(new ByteBuffersDataInput(List.of(ByteBuffer.wrap(bytes))), name);
    checkHeader(raw, name);
    verifyChecksum(raw, name);
    raw.seek(0);
    ChecksumIndexInput in = new BufferedChecksumIndexInput(raw);
    try {
      int version = CodecUtil.checkHeader(in, CODEC, VERSION_START, VERSION_CURRENT);
      HmmModel model = readBody(in, version, name);
      CodecUtil.checkFooter(in);
      return model;
    } catch (ModelFormatException e) {
      throw e;
    } catch (IOException | IllegalArgumentException | IndexOutOfBoundsException e) {
      // the bytes are in memory: every I/O error here (end of input, a malformed vInt) is the content's
      throw new ModelFormatException(name + ": the model file is inconsistent: " + e.getMessage(), e);
    }
  }

  private static void checkHeader(IndexInput in, String name) throws IOException {
    if (in.length() < CodecUtil.headerLength(CODEC)) {
      throw new ModelFormatException(name + ": not a word-class model file (only " + in.length() + " bytes)");
    }
    // compared here, since CodecUtil would first read a codec name of whatever length a foreign
    // or damaged file declares
    byte[] start = new byte[HEADER_PREFIX.length];
    in.readBytes(start, 0, start.length);
    in.seek(0);
    if (!Arrays.equals(start, HEADER_PREFIX)) {
      throw new ModelFormatException(name + ": not a word-class model file (its header does not name the "
          + CODEC + " format)");
    }
    try {
      CodecUtil.checkHeader(in, CODEC, VERSION_START, VERSION_CURRENT);
    } catch (IndexFormatTooNewException e) {
      throw new ModelFormatException(
          name + ": the model file has format version " + e.getVersion() + ", newer than this reader supports (versions "
              + VERSION_START + " to " + VERSION_CURRENT + "); use a newer wordclass release", e);
    } catch (IndexFormatTooOldException e) {
      throw new ModelFormatException(
          name + ": the model file has format version " + e.getVersion() + ", older than this reader supports (versions "
              + VERSION_START + " to " + VERSION_CURRENT + "); rebuild the model", e);
    } catch (CorruptIndexException e) {
      throw new ModelFormatException(name + ": not a word-class model file (its header does not name the "
          + CODEC + " format)", e);
    }
  }

  private static byte[] headerPrefix() {
    ByteBuffersDataOutput out = new ByteBuffersDataOutput();
    try {
      CodecUtil.writeHeader(out, CODEC, VERSION_CURRENT);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return Arrays.copyOf(out.toArrayCopy(), CodecUtil.headerLength(CODEC) - Integer.BYTES);
  }

  private static void verifyChecksum(IndexInput in, String name) throws IOException {
    try {
      CodecUtil.checksumEntireFile(in);
    } catch (CorruptIndexException e) {
      throw new ModelFormatException(name + ": the model file is corrupt or truncated (checksum check failed: "
          + e.getMessage() + ")", e);
    }
  }

  private static HmmModel readBody(ChecksumIndexInput in, int version, String name) throws IOException {
    Limits limits = new Limits(in, name);
    Map<String, String> provenance = HmmModel.readProvenance(in, limits);
    int order = in.readByte();
    TagSet tags = TagSet.readFrom(in, limits);
    StateSpace states = StateSpace.readFrom(in, limits, tags.size());
    HmmModel.DecodingCues cues = HmmModel.DecodingCues.readFrom(in, limits, version);
    HmmModel.Transitions transitions = HmmModel.Transitions.readFrom(in, limits, states.size());
    Lexicon lexicon = Lexicon.readFrom(in, limits, states.size());
    UnknownWordModel unknown = UnknownWordModel.readFrom(in, limits, tags.size(), version, lexicon, states);
    return new HmmModel(order, tags, states, cues, transitions.logBigram(), transitions.logTrigram(), lexicon, unknown,
        provenance);
  }

  /** Checks declared sizes against the bytes left in the file before anything is allocated. */
  record Limits(IndexInput in, String name) {
    int count(long declared, int minBytesEach, String what) throws ModelFormatException {
      long left = in.length() - in.getFilePointer();
      if (declared < 0 || declared * minBytesEach > left) {
        throw new ModelFormatException(name + ": the model file declares " + declared + " " + what
            + " but only " + left + " bytes remain");
      }
      return (int) declared;
    }

    /** A string as {@link DataOutput#writeString} writes it, its length checked before allocating. */
    String string() throws IOException {
      int length = count(vInt(in), 1, "bytes of a string");
      byte[] bytes = new byte[length];
      in.readBytes(bytes, 0, length);
      return new String(bytes, StandardCharsets.UTF_8);
    }
  }

  /**
   * A vInt as {@link DataOutput#writeVInt} writes it. Read here rather than by
   * {@link DataInput#readVInt}, since Lucene 10 no longer refuses a fifth byte carrying more than
   * the 32nd bit, and a damaged file must be refused the same way on every Lucene version.
   */
  static int vInt(DataInput in) throws IOException {
    int value = 0;
    for (int shift = 0; shift < 28; shift += 7) {
      byte b = in.readByte();
      value |= (b & 0x7F) << shift;
      if (b >= 0) {
        return value;
      }
    }
    byte last = in.readByte();
    if ((last & 0xF0) != 0) {
      throw new IOException("a vInt of more than 32 bits");
    }
    return value | (last << 28);
  }

  static double[] readDoubles(DataInput in, int count) throws IOException {
    double[] values = new double[count];
    for (int i = 0; i < count; i++) {
      values[i] = Double.longBitsToDouble(in.readLong());
    }
    return values;
  }

  static int tagIndex(int tag, int tagCount) throws CorruptIndexException {
    if (tag < 0 || tag >= tagCount) {
      throw new CorruptIndexException("tag index " + tag + " out of range", "model");
    }
    return tag;
  }
}
