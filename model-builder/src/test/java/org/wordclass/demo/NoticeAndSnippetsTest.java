package org.wordclass.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.StringReader;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** The collection's line format and the pieces of text the tables and notes quote. */
class NoticeAndSnippetsTest {
  private static List<Notice> read(String text) throws IOException {
    return Notice.read(new BufferedReader(new StringReader(text)));
  }

  @Test
  void readsNoticesWithTheReadersClasses() throws IOException {
    List<Notice> notices = read("# a comment\n\n07 | Please board here. | Board=VERB light=NOUN\n08 | No judgement. |\n");
    assertEquals(List.of(
        new Notice("07", "Please board here.", Map.of("board", "VERB", "light", "NOUN")),
        new Notice("08", "No judgement.", Map.of())), notices);
    assertEquals("VERB", notices.get(0).readerClass("board"));
    assertNull(notices.get(1).readerClass("board"));
  }

  @Test
  void malformedLinesNameTheirLine() {
    IOException noColumns = assertThrows(IOException.class, () -> read("\n07 Please board here.\n"));
    assertTrue(noColumns.getMessage().endsWith(":2: expected 'ID | TEXT | word=CLASS ...'"), noColumns.getMessage());
    IOException badJudgement = assertThrows(IOException.class, () -> read("07 | Please board. | board\n"));
    assertTrue(badJudgement.getMessage().contains(":1: 'board' is not word=CLASS"), badJudgement.getMessage());
  }

  @Test
  void bundledCollectionIsSmallAndJudged() throws IOException {
    List<Notice> notices = Notice.bundled();
    assertTrue(notices.size() >= 15 && notices.size() <= 30, notices.size() + " notices");
    assertTrue(notices.stream().filter(n -> !n.readerClasses().isEmpty()).count() >= 15);
  }

  @Test
  void snippetMarksTheWholeWordAndStartsAtAWord() {
    String text = "The notice board by the waiting room lists every change to the timetable.";
    assertEquals("The notice [board] by the waiting room...", Snippets.around(text, "board", 46));
    assertEquals("...by the waiting [room] lists every change to...", Snippets.around(text, "room", 46));
    // 'boarding' is another word, not a match
    assertEquals("...so [board] now.", Snippets.around("When boarding starts, so board now.", "board", 20));
  }

  @Test
  void phraseQuotesTheNeighbours() {
    assertEquals("Book early", Snippets.phrase("Book early for the regatta.", "book"));
    assertEquals("ticket check takes", Snippets.phrase("The ticket check takes place.", "check"));
    assertEquals("the office", Snippets.phrase("Please return it to the office.", "office"));
    assertEquals("ferry", Snippets.phrase("No such word.", "ferry"));
  }
}
