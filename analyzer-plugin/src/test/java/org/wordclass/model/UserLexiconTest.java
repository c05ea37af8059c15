package org.wordclass.model;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The user lexicon file format: what is accepted, and the file, line and reason of each refusal. */
class UserLexiconTest {
  private static final TagSet TAGS = new TagSet(List.of("DET", "NOUN", "VERB", "NN:U"));
  private static final String FILE = "kitchen.txt";

  private static UserLexicon parse(String text) throws LexiconFormatException {
    return UserLexicon.parse(text.getBytes(StandardCharsets.UTF_8), FILE, TAGS);
  }

  private static String refusal(String text) {
    return assertThrows(LexiconFormatException.class, () -> parse(text)).getMessage();
  }

  @Test
  void readsWordsClassesWeightsCaseAndComments() throws Exception {
    UserLexicon lexicon = parse("""
        # kitchen words
        cook\tNOUN:3 VERB   # a person, mostly

          roast   VERB  NOUN:0.5   case=any
        Gearbox NOUN case=exact
        """);
    List<UserLexicon.Entry> entries = lexicon.entries();
    assertEquals(3, entries.size());
    UserLexicon.Entry cook = entries.get(0);
    assertEquals("cook", cook.word());
    assertEquals(2, cook.line());
    assertArrayEquals(new int[] {1, 2}, cook.tags());
    assertArrayEquals(new double[] {3, 1}, cook.weights());
    assertFalse(cook.anyCase());
    assertTrue(entries.get(1).anyCase());
    assertEquals(4, entries.get(1).line());
    assertArrayEquals(new double[] {1, 0.5}, entries.get(1).weights());
    assertFalse(entries.get(2).anyCase());
  }

  @Test
  void byteOrderMarkAndWindowsLineEndsAreAccepted() throws Exception {
    byte[] text = "\uFEFFcook NOUN\r\nzest VERB\r\n".getBytes(StandardCharsets.UTF_8);
    UserLexicon lexicon = UserLexicon.parse(text, FILE, TAGS);
    assertEquals("cook", lexicon.entries().get(0).word());
    assertEquals("zest", lexicon.entries().get(1).word());
    assertArrayEquals(new int[] {2}, lexicon.entries().get(1).tags());
  }

  @Test
  void aClassWhoseNameHoldsAColonIsTakenWhole() throws Exception {
    UserLexicon.Entry entry = parse("kilo NN:U NOUN:2").entries().get(0);
    assertArrayEquals(new int[] {3, 1}, entry.tags());
    assertArrayEquals(new double[] {1, 2}, entry.weights());
  }

  @Test
  void caseInsensitiveEntriesCoverLowerCapitalisedAndUpperForms() throws Exception {
    assertEquals(Set.of("zEst", "zest", "Zest", "ZEST"), parse("zEst VERB case=any").entries().get(0).forms());
    assertEquals(Set.of("Zest"), parse("Zest VERB").entries().get(0).forms());
    assertEquals(Set.of("éclair", "Éclair", "ÉCLAIR"), parse("éclair NOUN case=any").entries().get(0).forms());
  }

  @Test
  void anEmptyFileIsAnEmptyLexicon() throws Exception {
    assertTrue(parse("# nothing yet\n\n").entries().isEmpty());
    assertTrue(parse("").entries().isEmpty());
  }

  @Test
  void provenanceNamesTheFileWithoutFoldersItsChecksumAndEntryCount() throws Exception {
    byte[] text = "cook NOUN\nzest VERB\n".getBytes(StandardCharsets.UTF_8);
    UserLexicon lexicon = UserLexicon.parse(text, "conf/lexicons/kitchen.txt", TAGS);
    assertEquals("kitchen.txt", lexicon.provenance().get("lexicon.file"));
    assertEquals("2", lexicon.provenance().get("lexicon.entries"));
    assertEquals(Checksums.sha256(text), lexicon.provenance().get("lexicon.sha256"));
  }

  @Test
  void malformedLinesAreRefusedWithFileLineAndReason() {
    assertEquals("kitchen.txt:2: expected a word and one or more classes, such as 'cook NOUN VERB:2', not 'cook'",
        refusal("zest VERB\ncook\n"));
    assertEquals("kitchen.txt:1: expected a word and one or more classes, such as 'cook NOUN VERB:2', not 'cook case=any'",
        refusal("cook case=any # no class"));
    assertEquals("kitchen.txt:1: the weight of NOUN must be a positive number, not 'heavy'", refusal("cook NOUN:heavy"));
    assertEquals("kitchen.txt:1: the weight of NOUN must be a positive number, not '0'", refusal("cook NOUN:0"));
    assertEquals("kitchen.txt:1: the weight of NOUN must be a positive number, not '-2'", refusal("cook NOUN:-2"));
    assertEquals("kitchen.txt:1: the weight of NOUN must be a positive number, not 'Infinity'", refusal("cook NOUN:Infinity"));
    assertEquals("kitchen.txt:1: class NOUN is given twice", refusal("cook NOUN VERB NOUN:2"));
    assertEquals("kitchen.txt:1: unknown option 'case=upper'; the case option is case=exact or case=any",
        refusal("cook NOUN case=upper"));
    assertEquals("kitchen.txt:1: the case option is given twice", refusal("cook NOUN case=any case=exact"));
  }

  @Test
  void unknownClassesAreRefusedListingTheModelsClasses() {
    assertEquals("kitchen.txt:3: unknown class 'NUON'; the model's classes are DET NOUN VERB NN:U",
        refusal("# typo below\ncook NOUN\nroast VERB NUON\n"));
    // class names are case-sensitive, as the model spells them
    assertEquals("kitchen.txt:1: unknown class 'noun'; the model's classes are DET NOUN VERB NN:U", refusal("cook noun"));
  }

  @Test
  void duplicateEntriesAreRefusedNamingTheFirstLine() {
    assertEquals("kitchen.txt:3: 'cook' is listed twice (first on line 1)", refusal("cook NOUN\nzest VERB\ncook VERB\n"));
    assertEquals("kitchen.txt:2: 'ZEST' is listed twice in any case (first on line 1)",
        refusal("zest VERB case=any\nZEST NOUN case=any\n"));
    // lower-cased char by char (Spelling), ΟΔΟΣ and οδος have different lower-case forms but
    // share the written form ΟΔΟΣ; final sigma from Unicode's SpecialCasing.txt, from memory
    assertEquals("kitchen.txt:2: 'οδος' is listed twice in any case (first on line 1)",
        refusal("ΟΔΟΣ NOUN case=any\nοδος NOUN case=any\n"));
  }

  @Test
  void caseAnyFormsAreLowerCasedCharByChar() throws Exception {
    // the dotted capital I lower-cases to a plain i (UnicodeData.txt simple mapping, from
    // memory), as the decoder lower-cases a first word: not to i with a combining dot
    assertEquals(Set.of("İzmir", "izmir", "Izmir", "İZMIR"), parse("İzmir NOUN case=any").entries().get(0).forms());
  }

  @Test
  void anExactEntryMayRefineACaseInsensitiveOne() throws Exception {
    // "may" the verb in any case, "May" the month as written: not a duplicate
    assertEquals(2, parse("may VERB case=any\nMay NOUN\n").entries().size());
    // and differently written exact entries are different words
    assertEquals(2, parse("cook NOUN\nCook NOUN\n").entries().size());
  }

  @Test
  void invalidUtf8IsRefusedWithItsLine() {
    byte[] text = {'c', 'o', 'o', 'k', ' ', 'N', 'O', 'U', 'N', '\n', 'z', (byte) 0xC3, ' ', 'V', 'E', 'R', 'B', '\n'};
    LexiconFormatException e = assertThrows(LexiconFormatException.class, () -> UserLexicon.parse(text, FILE, TAGS));
    assertEquals("kitchen.txt:2: not valid UTF-8", e.getMessage());
    assertEquals(FILE, e.file());
    assertEquals(2, e.line());
    assertEquals("not valid UTF-8", e.reason());
  }

  @Test
  void anOversizedStreamIsRefusedBeforeParsing() {
    byte[] big = new byte[UserLexicon.MAX_FILE_BYTES + 1];
    LexiconFormatException e = assertThrows(LexiconFormatException.class,
        () -> UserLexicon.readBytes(new ByteArrayInputStream(big), FILE));
    assertEquals("kitchen.txt: larger than any user lexicon (16777216 bytes)", e.getMessage());
  }

  @Test
  void aFileIsNamedAsGiven(@TempDir Path dir) throws Exception {
    Path file = Files.writeString(dir.resolve("bad.txt"), "cook NOUN\ncook VERB\n");
    LexiconFormatException e = assertThrows(LexiconFormatException.class, () -> UserLexicon.read(file, TAGS));
    assertEquals(file + ":2: 'cook' is listed twice (first on line 1)", e.getMessage());
    assertEquals("cook", UserLexicon.read(Files.writeString(dir.resolve("ok.txt"), "cook NOUN\n"), TAGS).entries().get(0).word());
  }
}
