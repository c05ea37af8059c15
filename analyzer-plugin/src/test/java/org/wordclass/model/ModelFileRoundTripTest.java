package org.wordclass.model;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wordclass.testing.TestModels;

/** Writing and reading a model file gives back the same model; the same model gives the same bytes. */
class ModelFileRoundTripTest {
  /** Words whose unknown-word scores are compared, one or more per shape and ending in the tries. */
  private static final List<String> PROBES = List.of("walked", "talked", "stable", "Bern", "BERN", "x", "", "42", "...", "ending",
      "Walks", "RUN", "The", "wall", "tab", "Berlin");

  @TempDir Path dir;

  @Test
  void smallModelSurvivesWriteAndRead() throws IOException {
    HmmModel model = TestModels.small();
    assertSameModel(model, ModelFile.read(TestModels.bytes(model), "small"));
  }

  @Test
  void randomModelsSurviveWriteAndReadThroughFiles() throws IOException {
    Random seeds = new Random(8L);
    for (int i = 0; i < 50; i++) {
      long seed = seeds.nextLong();
      HmmModel model = TestModels.random(new Random(seed), 1 + (i % 2));
      Path file = dir.resolve("m" + i + ".wcm");
      ModelFile.write(model, file);
      assertSameModel(model, ModelFile.read(file));
    }
  }

  @Test
  void writingIsDeterministic() throws IOException {
    ModelFile.write(TestModels.small(), dir.resolve("a.wcm"));
    ModelFile.write(TestModels.small(), dir.resolve("b.wcm"));
    assertArrayEquals(Files.readAllBytes(dir.resolve("a.wcm")), Files.readAllBytes(dir.resolve("b.wcm")));
    assertArrayEquals(Files.readAllBytes(dir.resolve("a.wcm")), TestModels.bytes(TestModels.small()));
  }

  @Test
  void provenanceOrderOfInsertionDoesNotChangeTheBytes() {
    HmmModel model = TestModels.small();
    Map<String, String> reversed = new LinkedHashMap<>();
    List<String> keys = List.copyOf(model.provenance().keySet());
    for (int i = keys.size() - 1; i >= 0; i--) {
      reversed.put(keys.get(i), model.provenance().get(keys.get(i)));
    }
    assertArrayEquals(TestModels.bytes(model), TestModels.bytes(withProvenance(model, reversed)));
  }

  /**
   * A version-1 file (one prior row in the unknown-word model, no lower-case forms, no beginnings) is still
   * read, its prior serving words with and without a capital alike. Made from a version-2 file
   * of a model whose two rows are equal and which has neither lower-case forms nor beginnings, by
   * dropping the second row and the two bytes that say so and writing header and footer of
   * version 1.
   */
  @Test
  void versionOneFileIsReadWithOnePriorForEveryWord() throws IOException {
    HmmModel small = TestModels.small();
    UnknownWordModel u = small.unknownWords();
    UnknownWordModel onePrior = UnknownWordModel.builder().theta(u.theta()).openTags(u.openTags(), u.baseDistribution())
        .logPrior(u.logPrior()).endings(u.maxEndingLength(), u.trieOfShape(), u.endingTries()).build();
    HmmModel model = new HmmModel(small.order(), small.tags(), small.states(), small.cues(), small.logBigramTable(),
        small.logTrigramTable(), small.lexicon(), onePrior, small.provenance());
    byte[] current = TestModels.bytes(model);
    byte[] row = new byte[8 * u.logPrior().length];
    java.nio.ByteBuffer.wrap(row).order(java.nio.ByteOrder.LITTLE_ENDIAN).asDoubleBuffer().put(u.logPrior());
    int first = indexOf(current, row);
    int second = first + row.length;
    assertArrayEquals(row, java.util.Arrays.copyOfRange(current, second, second + row.length), "two equal rows");
    // version 1 has neither the second row nor the two last bytes of the body: the flag of
    // lower-case forms and the length of beginnings
    assertEquals(0, current[current.length - 18], "no lower-case forms");
    assertEquals(0, current[current.length - 17], "no beginnings");
    byte[] body = new byte[current.length - 21 - 16 - row.length - 2];
    System.arraycopy(current, 21, body, 0, second - 21);
    System.arraycopy(current, second + row.length, body, second - 21, current.length - 18 - second - row.length);
    byte[] versionOne = TestModels.withHeaderAndFooter(ModelFile.VERSION_START, out -> out.writeBytes(body, body.length));
    HmmModel read = ModelFile.read(versionOne, "v1");
    assertSameModel(model, read);
    assertArrayEquals(u.logPrior(), read.unknownWords().logPriorCapitalised());
    assertArrayEquals(current, TestModels.bytes(read), "written again in the current version");
  }

  /**
   * Both first-word cues survive writing and reading; a version-2 file, whose cue byte holds only
   * the lookup of unknown first words, is read with the newer cue off; a version-3 byte with a
   * bit no cue has is refused. The cue byte is found as the one byte of the body that differs
   * between the same model written with and without the newer cue.
   */
  @Test
  void firstWordCuesAreOneBitEachFromVersionThree() throws IOException {
    HmmModel on = withCues(TestModels.small(), new HmmModel.DecodingCues(true, -0.5, true));
    HmmModel off = withCues(TestModels.small(), new HmmModel.DecodingCues(true, -0.5, false));
    assertEquals(on.cues(), ModelFile.read(TestModels.bytes(on), "on").cues());
    assertEquals(off.cues(), ModelFile.read(TestModels.bytes(off), "off").cues());
    byte[] a = TestModels.bytes(on);
    byte[] b = TestModels.bytes(off);
    int header = 21;
    int footer = 16;
    int cueByte = -1;
    for (int i = header; i < a.length - footer; i++) {
      if (a[i] != b[i]) {
        assertEquals(-1, cueByte, "one differing byte");
        cueByte = i;
      }
    }
    assertEquals(3, a[cueByte]);
    assertEquals(1, b[cueByte]);
    byte[] body = java.util.Arrays.copyOfRange(a, header, a.length - footer);
    byte[] versionTwo = TestModels.withHeaderAndFooter(ModelFile.VERSION_CAPITALISED_PRIORS,
        out -> out.writeBytes(body, body.length));
    assertEquals(new HmmModel.DecodingCues(true, -0.5, false), ModelFile.read(versionTwo, "v2").cues());
    body[cueByte - header] = 7;
    byte[] unknownBit = TestModels.withHeaderAndFooter(ModelFile.VERSION_FIRST_WORD_BITS,
        out -> out.writeBytes(body, body.length));
    ModelFormatException e = org.junit.jupiter.api.Assertions.assertThrows(ModelFormatException.class,
        () -> ModelFile.read(unknownBit, "bits"));
    org.junit.jupiter.api.Assertions.assertTrue(e.getMessage().contains("first-word cue bits 7"), e.getMessage());
  }

  /**
   * A model with folded endings is written as version 4, its body that of the same model with
   * endings as written (a version-3 file) plus the alphabet byte, and read back with its
   * alphabet; an alphabet byte no alphabet has is refused.
   */
  @Test
  void foldedEndingsAreWrittenAsVersionFourAndOthersAsVersionThree() throws IOException {
    HmmModel plain = TestModels.small();
    HmmModel folded = withUnknownWords(plain,
        plain.unknownWords().toBuilder().endingAlphabet(EndingAlphabet.TURKISH_VOWEL_HARMONY).build());
    byte[] a = TestModels.bytes(plain);
    byte[] b = TestModels.bytes(folded);
    int header = 21;
    int footer = 16;
    assertEquals(ModelFile.VERSION_FIRST_WORD_BITS, a[header - 1]);
    assertEquals(ModelFile.VERSION_ENDING_ALPHABET, b[header - 1]);
    assertEquals(a.length + 1, b.length);
    assertArrayEquals(java.util.Arrays.copyOfRange(a, header, a.length - footer),
        java.util.Arrays.copyOfRange(b, header, b.length - footer - 1), "the same body before the alphabet byte");
    assertEquals(EndingAlphabet.TURKISH_VOWEL_HARMONY.ordinal(), b[b.length - footer - 1]);
    HmmModel read = ModelFile.read(b, "folded");
    assertSameModel(folded, read);
    assertEquals(EndingAlphabet.TURKISH_VOWEL_HARMONY, read.unknownWords().endingAlphabet());
    assertEquals(EndingAlphabet.AS_WRITTEN, ModelFile.read(a, "plain").unknownWords().endingAlphabet());
    assertArrayEquals(b, TestModels.bytes(read), "written again as it was read");

    byte[] body = java.util.Arrays.copyOfRange(b, header, b.length - footer);
    body[body.length - 1] = 9;
    byte[] unknownAlphabet = TestModels.withHeaderAndFooter(ModelFile.VERSION_ENDING_ALPHABET,
        out -> out.writeBytes(body, body.length));
    ModelFormatException e = org.junit.jupiter.api.Assertions.assertThrows(ModelFormatException.class,
        () -> ModelFile.read(unknownAlphabet, "alphabet"));
    org.junit.jupiter.api.Assertions.assertTrue(e.getMessage().contains("unknown ending alphabet 9"), e.getMessage());
  }

  private static HmmModel withUnknownWords(HmmModel m, UnknownWordModel unknown) {
    return new HmmModel(m.order(), m.tags(), m.states(), m.cues(), m.logBigramTable(), m.logTrigramTable(), m.lexicon(),
        unknown, m.provenance());
  }

  private static HmmModel withCues(HmmModel m, HmmModel.DecodingCues cues) {
    return new HmmModel(m.order(), m.tags(), m.states(), cues, m.logBigramTable(), m.logTrigramTable(), m.lexicon(),
        m.unknownWords(), m.provenance());
  }

  private static int indexOf(byte[] haystack, byte[] needle) {
    outer:
    for (int i = 0; i + needle.length <= haystack.length; i++) {
      for (int j = 0; j < needle.length; j++) {
        if (haystack[i + j] != needle[j]) {
          continue outer;
        }
      }
      return i;
    }
    throw new AssertionError("prior row not found");
  }

  /** The bundled model, read and written again, gives back its own bytes. */
  @Test
  void bundledModelRewritesToTheSameBytes() throws IOException {
    byte[] original = bundledBytes();
    HmmModel model = ModelFile.read(original, DefaultModel.RESOURCE);
    assertArrayEquals(original, TestModels.bytes(model));
    assertSameModel(DefaultModel.get(), model);
  }

  static byte[] bundledBytes() throws IOException {
    try (InputStream in = ModelFileRoundTripTest.class.getClassLoader().getResourceAsStream(DefaultModel.RESOURCE)) {
      return in.readAllBytes();
    }
  }

  static HmmModel withProvenance(HmmModel m, Map<String, String> provenance) {
    return new HmmModel(m.order(), m.tags(), m.logBigramTable(), m.logTrigramTable(), m.lexicon(), m.unknownWords(), provenance);
  }

  static void assertSameModel(HmmModel expected, HmmModel actual) {
    assertEquals(expected.order(), actual.order());
    assertEquals(expected.tags(), actual.tags());
    assertArrayEquals(expected.logBigramTable(), actual.logBigramTable());
    assertArrayEquals(expected.logTrigramTable(), actual.logTrigramTable());
    assertEquals(new HashMap<>(expected.provenance()), new HashMap<>(actual.provenance()));
    assertSameLexicon(expected.lexicon(), actual.lexicon());
    assertSameUnknownWords(expected.unknownWords(), actual.unknownWords());
  }

  private static void assertSameLexicon(Lexicon expected, Lexicon actual) {
    assertEquals(expected.size(), actual.size());
    List<Lexicon.Entry> expectedEntries = expected.entries();
    List<Lexicon.Entry> actualEntries = actual.entries();
    for (int w = 0; w < expected.size(); w++) {
      Lexicon.Entry e = expectedEntries.get(w);
      Lexicon.Entry a = actualEntries.get(w);
      assertEquals(e.word(), a.word());
      assertArrayEquals(e.states(), a.states(), e.word());
      assertArrayEquals(e.logEmissions(), a.logEmissions(), e.word());
      assertEquals(w, actual.lookup(e.word()), e.word());
    }
  }

  private static void assertSameUnknownWords(UnknownWordModel expected, UnknownWordModel actual) {
    assertEquals(expected.theta(), actual.theta());
    assertEquals(expected.maxEndingLength(), actual.maxEndingLength());
    assertArrayEquals(expected.openTags(), actual.openTags());
    assertArrayEquals(expected.logPrior(), actual.logPrior());
    assertArrayEquals(expected.logPriorCapitalised(), actual.logPriorCapitalised());
    assertEquals(expected.maxBeginningLength(), actual.maxBeginningLength());
    assertEquals(expected.endingAlphabet(), actual.endingAlphabet());
    for (int i = 0; expected.maxBeginningLength() > 0 && i < 2; i++) {
      assertSameTrie(expected.beginningTries()[i], actual.beginningTries()[i]);
    }
    assertEquals(expected.lowerCaseForms() == null, actual.lowerCaseForms() == null);
    if (expected.lowerCaseForms() != null) {
      assertArrayEquals(expected.lowerCaseForms().logStatePrior(), actual.lowerCaseForms().logStatePrior());
      assertArrayEquals(expected.lowerCaseForms().factors(), actual.lowerCaseForms().factors());
      assertEquals(expected.lowerCaseForms().forms().size(), actual.lowerCaseForms().forms().size());
    }
    assertArrayEquals(expected.baseDistribution(), actual.baseDistribution());
    assertArrayEquals(expected.trieOfShape(), actual.trieOfShape());
    assertEquals(expected.endingTries().length, actual.endingTries().length);
    for (int i = 0; i < expected.endingTries().length; i++) {
      assertSameTrie(expected.endingTries()[i], actual.endingTries()[i]);
    }
    for (String word : PROBES) {
      assertArrayEquals(scores(expected, word), scores(actual, word), "unknown-word scores of '" + word + "'");
    }
  }

  private static void assertSameTrie(AffixTrie expected, AffixTrie actual) {
    assertArrayEquals(expected.childStart, actual.childStart);
    assertArrayEquals(expected.childChar, actual.childChar);
    assertArrayEquals(expected.countStart, actual.countStart);
    assertArrayEquals(expected.countTag, actual.countTag);
    assertArrayEquals(expected.countValue, actual.countValue);
  }

  private static double[] scores(UnknownWordModel model, String word) {
    int k = model.openTagCount();
    double[] out = new double[k + 1];
    out[k] = model.logEmissions(word.toCharArray(), 0, word.length(), new double[k], out);
    return out;
  }
}
