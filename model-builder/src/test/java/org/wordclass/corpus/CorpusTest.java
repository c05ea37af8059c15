package org.wordclass.corpus;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.wordclass.corpus.CorpusFiles.lines;
import static org.wordclass.corpus.CorpusFiles.row;

import java.io.BufferedWriter;
import java.io.IOException;
import java.lang.ref.WeakReference;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Several corpus files read as one stream, their SHA-256 sums, and reading without holding. */
class CorpusTest {
  @TempDir Path dir;

  private List<Path> threeFiles() {
    return List.of(
        CorpusFiles.write(dir, "one.conllu", lines(row("1", "Hi", "INTJ"), "", row("1", "Go", "VERB"), "")),
        CorpusFiles.write(dir, "two.conllu.gz", lines("# text = Yes", row("1", "Yes", "INTJ"), "")),
        CorpusFiles.write(dir, "three.tsv", "No\tINTJ\n!\tPUNCT\n"));
  }

  @Test
  void readsSeveralFilesInOrderGuessingEachFormat() {
    List<Sentence> all = new ArrayList<>();
    new Corpus(threeFiles(), null, TagColumn.UPOS).forEachSentence(all::add);
    assertEquals(List.of(List.of("Hi"), List.of("Go"), List.of("Yes"), List.of("No", "!")), all.stream().map(Sentence::words).toList());
    assertEquals(dir.resolve("two.conllu.gz").toString(), all.get(2).file());
    assertEquals("Yes", all.get(2).text());
  }

  @Test
  void canBeReadMoreThanOnce() {
    Corpus corpus = new Corpus(threeFiles(), null, TagColumn.UPOS);
    int[] counts = new int[2];
    corpus.forEachSentence(s -> counts[0]++);
    corpus.forEachSentence(s -> counts[1]++);
    assertEquals(4, counts[0]);
    assertEquals(counts[0], counts[1]);
  }

  /** The digest is of the bytes as stored (the compressed ones for .gz), by java.security.MessageDigest. */
  @Test
  void sha256OfEachFileMatchesMessageDigest() throws Exception {
    List<Path> files = threeFiles();
    Corpus corpus = new Corpus(files, null, TagColumn.UPOS);
    corpus.forEachSentence(s -> { });
    Map<String, String> sums = corpus.sha256ByFile();
    assertEquals(3, sums.size());
    for (Path file : files) {
      assertEquals(sha256(file), sums.get(file.getFileName().toString()), file.toString());
    }
  }

  /** A trailing comment after the last sentence is still part of what the digest covers. */
  @Test
  void sha256CoversBytesAfterTheLastSentence() throws Exception {
    Path file = CorpusFiles.write(dir, "tail.conllu", lines(row("1", "Hi", "INTJ"), "", "# trailing comment", "", ""));
    Corpus corpus = new Corpus(List.of(file), null, TagColumn.UPOS);
    corpus.forEachSentence(s -> { });
    assertEquals(sha256(file), corpus.sha256ByFile().get("tail.conllu"));
  }

  private static String sha256(Path file) throws Exception {
    return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(file)));
  }

  @Test
  void errorInALaterFileNamesThatFile() {
    Path good = CorpusFiles.write(dir, "good.conllu", lines(row("1", "Hi", "INTJ"), ""));
    Path bad = CorpusFiles.write(dir, "bad.conllu", lines(row("1", "Hi", "HELLO"), ""));
    Corpus corpus = new Corpus(List.of(good, bad), null, TagColumn.UPOS);
    CorpusFormatException e = assertThrows(CorpusFormatException.class, () -> corpus.forEachSentence(s -> { }));
    assertEquals(bad.toString(), e.file());
    assertEquals(1, e.line());
  }

  @Test
  void noFilesIsRefused() {
    assertThrows(IllegalArgumentException.class, () -> new Corpus(List.of(), null, TagColumn.UPOS));
  }

  /**
   * 200,000 sentences are streamed: the count and the last line come out right, and sentences
   * already handed out are not kept by the corpus (weak references to the first thousand are
   * cleared by garbage collection half-way through the pass, while the
   * corpus and its reader are still in use).
   */
  @Test
  void largeCorpusIsStreamedNotHeld() throws IOException {
    int sentences = 200_000;
    Path file = dir.resolve("large.conllu");
    try (BufferedWriter out = Files.newBufferedWriter(file)) {
      for (String line : CorpusFiles.manySentences(sentences)) {
        out.write(line);
        out.write('\n');
      }
    }
    List<WeakReference<Sentence>> early = new ArrayList<>();
    long[] count = {0};
    boolean[] clearedMidway = {false};
    Sentence[] last = {null};
    new Corpus(List.of(file), null, TagColumn.UPOS).forEachSentence(s -> {
      if (count[0]++ < 1000) {
        early.add(new WeakReference<>(s));
      }
      if (count[0] == sentences / 2) {
        clearedMidway[0] = clearedAfterGc(early);
      }
      last[0] = s;
    });
    assertEquals(sentences, count[0]);
    assertEquals(List.of("w" + (sentences - 1)), last[0].words());
    assertEquals(3L * (sentences - 1) + 1, last[0].line());
    assertTrue(clearedMidway[0], "sentences already read were still reachable half-way through the pass");
  }

  private static boolean clearedAfterGc(List<WeakReference<Sentence>> refs) {
    for (int attempt = 0; attempt < 10; attempt++) {
      System.gc();
      if (refs.stream().allMatch(r -> r.get() == null)) {
        return true;
      }
    }
    return false;
  }
}
