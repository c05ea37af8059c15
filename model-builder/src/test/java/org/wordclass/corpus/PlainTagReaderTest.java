package org.wordclass.corpus;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The plain format as {@link PlainTagReader} defines it: token TAB tag per line, blank lines between sentences; invented data. */
class PlainTagReaderTest {
  @TempDir Path dir;

  @Test
  void readsSentencesSeparatedByBlankLines() throws IOException {
    Path file = CorpusFiles.write(dir, "a.txt", "\n\nThe\tDT\nNew York\tNNP\n\n\n\nruns\tVBZ \n");
    List<Sentence> s = CorpusFiles.read(file, TagColumn.XPOS);
    assertEquals(2, s.size());
    assertEquals(List.of("The", "New York"), s.get(0).words());
    assertEquals(List.of("DT", "NNP"), s.get(0).tags());
    assertEquals(3, s.get(0).line());
    assertEquals(List.of("runs"), s.get(1).words());
    assertEquals(List.of("VBZ"), s.get(1).tags(), "trailing white space of a tag is stripped");
    assertEquals(8, s.get(1).line());
  }

  @Test
  void everyTokenIsFollowedByASpaceAndThereIsNoText() throws IOException {
    Sentence s = CorpusFiles.read(CorpusFiles.write(dir, "b.txt", "a\tDET\nb\tNOUN\n"), TagColumn.UPOS).get(0);
    assertArrayEquals(new boolean[] {true, true}, s.spaceAfter());
    assertNull(s.text());
  }

  @Test
  void gzipBomAndCrLf() throws IOException {
    Path file = CorpusFiles.write(dir, "c.tsv.gz", "\uFEFFYes\tINTJ\r\n!\tPUNCT\r\n\r\nNo\tINTJ\r\n");
    List<Sentence> s = CorpusFiles.read(file, TagColumn.UPOS);
    assertEquals(List.of("Yes", "!"), s.get(0).words());
    assertEquals(List.of("INTJ", "PUNCT"), s.get(0).tags());
    assertEquals(List.of("No"), s.get(1).words());
  }

  @Test
  void formatIsGuessedFromTheFileName() {
    assertEquals(CorpusFormat.CONLLU, CorpusFormat.guess(Path.of("x/en.conllu")));
    assertEquals(CorpusFormat.CONLLU, CorpusFormat.guess(Path.of("x/EN.CONLLU.GZ")));
    assertEquals(CorpusFormat.PLAIN, CorpusFormat.guess(Path.of("x/en.tsv")));
    assertEquals(CorpusFormat.PLAIN, CorpusFormat.guess(Path.of("x/en.txt.gz")));
  }
}
