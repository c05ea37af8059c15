package org.wordclass.model;

import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Random;
import java.util.zip.ZipEntry;
import java.util.zip.ZipOutputStream;
import org.apache.lucene.codecs.CodecUtil;
import org.apache.lucene.store.IndexOutput;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wordclass.testing.TestModels;

/**
 * Files that are not models of ours, of a newer version, or crafted with a valid checksum but
 * impossible contents are refused with a message that says so.
 */
class ModelFileForeignTest {
  private static final String NOT_A_MODEL = "not a word-class model file";
  private static final Duration FAST = Duration.ofSeconds(2);

  @TempDir Path dir;

  @Test
  void randomBytesAreNotAModel() {
    Random rnd = new Random(5L);
    for (int length : new int[] {1, 20, 21, 100, 4096}) {
      byte[] bytes = new byte[length];
      rnd.nextBytes(bytes);
      assertMessage(bytes, NOT_A_MODEL);
    }
  }

  @Test
  void emptyFileIsNotAModel() throws IOException {
    Path empty = Files.createFile(dir.resolve("empty.wcm"));
    ModelFormatException e = assertRefused(() -> ModelFile.read(empty));
    assertContains(e, NOT_A_MODEL);
    assertContains(e, empty.toString());
  }

  @Test
  void zipFileIsNotAModel() throws IOException {
    ByteArrayOutputStream bytes = new ByteArrayOutputStream();
    try (ZipOutputStream zip = new ZipOutputStream(bytes)) {
      zip.putNextEntry(new ZipEntry("model.wcm"));
      zip.write(TestModels.bytes(TestModels.small()));
      zip.closeEntry();
    }
    assertMessage(bytes.toByteArray(), NOT_A_MODEL);
  }

  @Test
  void textFileIsNotAModel() {
    assertMessage("1\tthe\t_\tDET\tDT\t_\t2\tdet\t_\t_\n".repeat(10).getBytes(StandardCharsets.UTF_8), NOT_A_MODEL);
  }

  /** A well-formed Lucene file (valid header and checksum) of another codec. */
  @Test
  void luceneFileOfAnotherCodecIsNotAModel() {
    byte[] bytes = TestModels.write(out -> {
      CodecUtil.writeHeader(out, "Lucene90FieldInfos", ModelFile.VERSION_CURRENT);
      out.writeVInt(0);
      CodecUtil.writeFooter(out);
    });
    assertMessage(bytes, NOT_A_MODEL);
  }

  @Test
  void newerVersionIsRefusedNamingBothVersions() {
    int newer = ModelFile.VERSION_CURRENT + 1;
    byte[] bytes = TestModels.withHeaderAndFooter(newer, out -> out.writeVInt(0));
    ModelFormatException e = assertMessage(bytes, "has format version " + newer + ", newer than this reader supports");
    assertContains(e, "versions " + ModelFile.VERSION_START + " to " + ModelFile.VERSION_CURRENT);
  }

  @Test
  void olderVersionIsRefusedNamingBothVersions() {
    int older = ModelFile.VERSION_START - 1;
    byte[] bytes = TestModels.withHeaderAndFooter(older, out -> out.writeVInt(0));
    ModelFormatException e = assertMessage(bytes, "has format version " + older + ", older than this reader supports");
    assertContains(e, "versions " + ModelFile.VERSION_START + " to " + ModelFile.VERSION_CURRENT);
  }

  @Test
  void hugeTagCountIsRefusedBeforeAllocating() {
    byte[] bytes = crafted(out -> {
      out.writeVInt(0); // provenance entries
      out.writeByte((byte) 2); // order
      out.writeVInt(1 << 20); // tags
    });
    assertFastRefusal(bytes, "declares 1048576 tags but only ");
  }

  @Test
  void hugeLexiconIsRefusedBeforeAllocating() {
    byte[] bytes = crafted(out -> {
      writeTwoTagPrefix(out);
      out.writeVInt(1 << 30); // lexicon words
    });
    assertFastRefusal(bytes, "declares 1073741824 lexicon words but only ");
  }

  @Test
  void hugeProvenanceIsRefusedBeforeAllocating() {
    assertFastRefusal(crafted(out -> out.writeVInt(Integer.MAX_VALUE)), "declares 2147483647 provenance entries");
  }

  /** A string (here a provenance key) whose declared length is far beyond the file. */
  @Test
  void hugeStringIsRefusedBeforeAllocating() {
    byte[] bytes = crafted(out -> {
      out.writeVInt(1);
      out.writeVInt(Integer.MAX_VALUE - 8); // length of the key in bytes
    });
    assertFastRefusal(bytes, "declares 2147483639 bytes of a string but only ");
  }

  @Test
  void negativeStringLengthIsRefused() {
    byte[] bytes = crafted(out -> {
      out.writeVInt(1);
      out.writeVInt(-5); // a five-byte vint that reads back negative
    });
    assertFastRefusal(bytes, "declares -5 bytes of a string");
  }

  /**
   * Every declared size fits the bytes left, but a word's text takes up the footer, so reading
   * runs off the end of the file.
   */
  @Test
  void readingPastTheEndIsRefused() {
    byte[] bytes = crafted(out -> {
      writeTwoTagPrefix(out);
      out.writeVInt(1); // one lexicon word
      out.writeVInt(CodecUtil.footerLength()); // its length: exactly the footer's bytes
    });
    assertMessage(bytes, "the model file is inconsistent");
  }

  /** Found by ModelFileFuzzTest; the reader checks the fifth byte itself, since Lucene 10 no longer does. */
  @Test
  void malformedVIntIsRefusedAsAFormatError() {
    byte[] bytes = crafted(out -> out.writeBytes(new byte[] {(byte) 0xFF, (byte) 0xFF, (byte) 0xFF, (byte) 0xFF, (byte) 0x7F}, 5));
    assertMessage(bytes, "the model file is inconsistent: a vInt of more than 32 bits");
  }

  @Test
  void hugeSuffixTrieIsRefusedBeforeAllocating() {
    byte[] bytes = crafted(out -> {
      writeTwoTagPrefix(out);
      out.writeVInt(0); // lexicon words
      out.writeLong(Double.doubleToLongBits(1.0)); // theta
      out.writeVInt(4); // longest ending
      out.writeVInt(1); // one open tag
      out.writeVInt(0); // tag A
      out.writeLong(0);
      out.writeLong(0); // priors
      out.writeLong(0);
      out.writeLong(0); // priors of capitalised words
      out.writeLong(Double.doubleToLongBits(1.0)); // base distribution
      for (int i = 0; i < WordShape.values().length; i++) {
        out.writeVInt(0);
      }
      out.writeVInt(1); // one trie
      out.writeVInt(Integer.MAX_VALUE); // its nodes
    });
    assertFastRefusal(bytes, "declares 2147483647 trie nodes but only ");
  }

  @Test
  void tagIndexOutOfRangeIsRefused() {
    byte[] bytes = crafted(out -> {
      writeTwoTagPrefix(out);
      out.writeVInt(1);
      out.writeString("word");
      out.writeVInt(1);
      out.writeByte((byte) 0); // no contexts
      out.writeVInt(7); // state 7 of a 2-state model
      out.writeInt(0);
    });
    assertMessage(bytes, "tag index 7 out of range");
  }

  @Test
  void duplicateTagNamesAreRefused() {
    byte[] bytes = crafted(out -> {
      out.writeVInt(0);
      out.writeByte((byte) 1);
      out.writeVInt(2);
      out.writeString("A");
      out.writeString("A");
      for (int i = 0; i < 9 + 27; i++) {
        out.writeLong(0);
      }
      out.writeVInt(0);
    });
    assertMessage(bytes, "duplicate tag name: A");
  }

  /** Provenance none, order 1, tags A and B, zeroed transition tables: what precedes the lexicon. */
  private static void writeTwoTagPrefix(IndexOutput out) throws IOException {
    out.writeVInt(0);
    out.writeByte((byte) 1);
    out.writeVInt(2);
    out.writeString("A");
    out.writeString("B");
    out.writeVInt(2); // one state per tag
    for (int tag = 0; tag < 2; tag++) {
      out.writeVInt(tag);
      out.writeByte((byte) 0);
    }
    out.writeByte((byte) 0); // no lower-case lookup of first words
    out.writeLong(Double.doubleToLongBits(0));
    for (int i = 0; i < 9 + 27; i++) {
      out.writeInt(Float.floatToIntBits((float) Math.log(1.0 / 3)));
    }
  }

  private static byte[] crafted(TestModels.Body body) {
    return TestModels.withHeaderAndFooter(ModelFile.VERSION_CURRENT, body);
  }

  private static void assertFastRefusal(byte[] bytes, String message) {
    assertTimeoutPreemptively(FAST, () -> assertMessage(bytes, message));
  }

  private static ModelFormatException assertMessage(byte[] bytes, String message) {
    ModelFormatException e = ModelFileCorruptionTest.assertRefused(bytes, "expected '" + message + "'");
    assertContains(e, message);
    assertContains(e, "corrupt.wcm: ");
    return e;
  }

  private interface Load {
    void run() throws IOException;
  }

  private static ModelFormatException assertRefused(Load load) {
    try {
      load.run();
    } catch (ModelFormatException e) {
      return e;
    } catch (Throwable t) {
      throw new AssertionError("expected a ModelFormatException but got " + t, t);
    }
    throw new AssertionError("the file was accepted");
  }

  private static void assertContains(Exception e, String part) {
    assertTrue(e.getMessage().contains(part), "message '" + e.getMessage() + "' should contain '" + part + "'");
  }
}
