package org.wordclass.corpus;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.wordclass.corpus.CorpusFiles.lines;
import static org.wordclass.corpus.CorpusFiles.row;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * CoNLL-U as the Universal Dependencies format description defines it (ten tab-separated columns;
 * comments; multiword-token ranges; empty nodes; SpaceAfter=No in MISC), on invented sentences.
 */
class ConlluReaderTest {
  @TempDir Path dir;

  /** "I don't know." with a multiword token 3-4 whose range line carries SpaceAfter=No. */
  private static final String DONT = lines(
      "# sent_id = invented-1",
      "# text = I really don't.",
      row("1", "I", "PRON", "PRP", "_"),
      row("2", "really", "ADV", "RB", "_"),
      row("3-4", "don't", "_", "_", "SpaceAfter=No"),
      row("3", "do", "AUX", "VBP", "_"),
      row("4", "n't", "PART", "RB", "_"),
      row("5", ".", "PUNCT", ".", "_"),
      "");

  @Test
  void readsWordsTagsAndText() throws IOException {
    Sentence s = CorpusFiles.read(CorpusFiles.write(dir, "a.conllu", DONT), TagColumn.UPOS).get(0);
    assertEquals(List.of("I", "really", "do", "n't", "."), s.words());
    assertEquals(List.of("PRON", "ADV", "AUX", "PART", "PUNCT"), s.tags());
    assertEquals("I really don't.", s.text());
    assertEquals(1, s.line(), "a sentence starts at its first comment");
  }

  @Test
  void readsTheXposColumnWhenAsked() throws IOException {
    Sentence s = CorpusFiles.read(CorpusFiles.write(dir, "a.conllu", DONT), TagColumn.XPOS).get(0);
    assertEquals(List.of("PRP", "RB", "VBP", "RB", "."), s.tags());
  }

  /** The words inside a range have no space between them; the range's SpaceAfter=No goes to its last word. */
  @Test
  void rangeLineDecidesTheSpaceAfterItsLastWord() throws IOException {
    Sentence s = CorpusFiles.read(CorpusFiles.write(dir, "a.conllu", DONT), TagColumn.UPOS).get(0);
    assertArrayEquals(new boolean[] {true, true, false, false, true}, s.spaceAfter());
  }

  @Test
  void rangeWithoutSpaceAfterNoKeepsTheSpace() throws IOException {
    String text = lines(
        row("1-2", "gonna", "_"), row("1", "gon", "VERB"), row("2", "na", "PART"), row("3", "go", "VERB", "VB", "SpaceAfter=No"),
        row("4", "!", "PUNCT"), "");
    Sentence s = CorpusFiles.read(CorpusFiles.write(dir, "b.conllu", text), TagColumn.UPOS).get(0);
    assertEquals(List.of("gon", "na", "go", "!"), s.words());
    assertArrayEquals(new boolean[] {false, true, false, true}, s.spaceAfter());
    assertNull(s.text());
  }

  @Test
  void emptyNodesAreSkipped() throws IOException {
    String text = lines(
        row("1", "Kim", "PROPN"), row("2", "left", "VERB"), row("2.1", "left", "VERB"), row("3", "early", "ADV"), "");
    Sentence s = CorpusFiles.read(CorpusFiles.write(dir, "c.conllu", text), TagColumn.UPOS).get(0);
    assertEquals(List.of("Kim", "left", "early"), s.words());
  }

  @Test
  void sentencesAndTheirFirstLines() throws IOException {
    String text = lines("# a comment", row("1", "Hi", "INTJ"), "", "", row("1", "Go", "VERB"), row("2", "!", "PUNCT"), "");
    Path file = CorpusFiles.write(dir, "d.conllu", text);
    List<Sentence> sentences = CorpusFiles.read(file, TagColumn.UPOS);
    assertEquals(2, sentences.size());
    assertEquals(1, sentences.get(0).line());
    assertEquals(5, sentences.get(1).line());
    assertEquals(file.toString(), sentences.get(1).file());
  }

  @Test
  void lastSentenceNeedsNoTrailingBlankLine() throws IOException {
    Path file = CorpusFiles.write(dir, "e.conllu", row("1", "Yes", "INTJ"));
    assertEquals(List.of("Yes"), CorpusFiles.read(file, TagColumn.UPOS).get(0).words());
  }

  @Test
  void gzipFilesAreDecompressed() throws IOException {
    List<Sentence> s = CorpusFiles.read(CorpusFiles.write(dir, "a.conllu.gz", DONT), TagColumn.UPOS);
    assertEquals(List.of("I", "really", "do", "n't", "."), s.get(0).words());
  }

  @Test
  void byteOrderMarkAndCrLfAreRemoved() throws IOException {
    String crlf = "\uFEFF" + DONT.replace("\n", "\r\n");
    Sentence s = CorpusFiles.read(CorpusFiles.write(dir, "bom.conllu", crlf), TagColumn.UPOS).get(0);
    assertEquals(List.of("I", "really", "do", "n't", "."), s.words());
    assertEquals(List.of("PRON", "ADV", "AUX", "PART", "PUNCT"), s.tags());
    assertEquals("I really don't.", s.text());
    assertArrayEquals(new boolean[] {true, true, false, false, true}, s.spaceAfter());
  }

  @Test
  void byteOrderMarkBeforeAWordLine() throws IOException {
    Path file = CorpusFiles.write(dir, "bom2.conllu", "\uFEFF" + lines(row("1", "Ja", "INTJ"), ""));
    assertEquals(List.of("Ja"), CorpusFiles.read(file, TagColumn.UPOS).get(0).words());
  }
}
