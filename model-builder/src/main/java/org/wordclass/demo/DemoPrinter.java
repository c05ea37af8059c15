package org.wordclass.demo;

import java.io.PrintWriter;
import java.util.Locale;
import org.wordclass.demo.Comparison.Row;
import org.wordclass.demo.DemoReport.NoticeTagging;

/**
 * The demo as a terminal reads it: an explanation, a legend, then a table per comparison with
 * its notes. Plain ASCII, so that any terminal and any platform encoding show it unchanged.
 */
public final class DemoPrinter {
  private static final int WIDTH = 96;
  private static final String INTRO = "Word classes (parts of speech) let a search tell 'board the ferry' from"
      + " 'the notice board'. %d invented notices of the Skerry Sound ferry office are indexed in memory"
      + " twice: plainly, and through the wordClass filter, which tags every word with the bundled English"
      + " model (a hidden Markov model decoding each notice sentence by sentence), stores the class as payload"
      + " and adds a class-qualified term such as board_verb. A class-restricted query matches the word"
      + " only where the tagger gave it the class asked for: wrong-class hits go (precision up), and so"
      + " does every right use the tagger mis-tags (recall lost). A class-boosted query keeps every hit"
      + " and ranks the uses of a heavier class (here nouns) first, so a tagging error costs it rank,"
      + " never a hit.";
  private static final String[] LEGEND = {
    "Legend: plain, VERB, NOUNx2... = rank of the notice in that search (- = not found);",
    "  tagged = class the tagger gave the word in that notice, read back from the index;",
    "  reader = class a careful reader gives it (? = not judged); ! = tagger and reader disagree.",
    "  Classes are Universal Dependencies tags: NOUN, VERB, PROPN (proper noun), ADJ, ADV...",
  };
  private static final String TRY = "Your own: --query WORD[:CLASS], e.g. --query light:NOUN or --query check:VERB;"
      + " --show-tags prints every notice's tagging; --json for the data.";

  private final PrintWriter out;

  public DemoPrinter(PrintWriter out) {
    this.out = out;
  }

  public void print(DemoReport report) {
    out.println("wordclass demo: searching by word class");
    wrap(String.format(Locale.ROOT, INTRO, report.notices()));
    out.println();
    out.println("Index fields:  plain = " + report.plainChain());
    out.println("             classed = " + report.classedChain());
    for (String line : LEGEND) {
      out.println(line);
    }
    for (Comparison comparison : report.comparisons()) {
      out.println();
      print(comparison);
    }
    if (report.tagging() != null) {
      printTagging(report);
    }
    out.println();
    wrap(TRY);
    out.flush();
  }

  private void print(Comparison c) {
    String compared = c.wordClass() != null
        ? c.wordClass()
        : "NOUNx" + String.format(Locale.ROOT, "%.1f", NoticeIndex.NOUN_WEIGHT);
    out.println(c.query() + "  --  plain '" + c.word() + "' vs "
        + (c.wordClass() != null
            ? "'" + c.word() + "' tagged " + c.wordClass() + " (term " + c.word() + NoticeIndex.SEPARATOR
                + c.wordClass().toLowerCase(Locale.ROOT) + ")"
            : "'" + c.word() + "' with nouns weighted x" + NoticeIndex.NOUN_WEIGHT + " (payload scores)"));
    int rankWidth = Math.max(compared.length(), 5);
    String format = "  %-4s %5s  %" + rankWidth + "s  %-7s %-6s  %s%n";
    out.printf(Locale.ROOT, format, "doc", "plain", compared, "tagged", "reader", "notice");
    for (Row row : c.rows()) {
      out.printf(Locale.ROOT, format, row.id(), rank(row.plainRank()), rank(row.comparedRank()), tagged(row),
          row.reader() == null ? "?" : row.reader(), row.snippet());
    }
    for (String note : c.notes()) {
      out.println("  > " + note);
    }
  }

  private static String rank(int rank) {
    return rank == 0 ? "-" : Integer.toString(rank);
  }

  private static String tagged(Row row) {
    boolean disagree = row.reader() != null && !row.tags().contains(row.reader());
    return row.tagLabel() + (disagree ? "!" : "");
  }

  private void printTagging(DemoReport report) {
    out.println();
    out.println("Tagging of every notice (standard tokenizer, then wordClass):");
    for (NoticeTagging notice : report.tagging()) {
      out.println("  " + notice.id() + "  " + String.join(" ", notice.tokens()));
    }
  }

  /** Prints {@code text} in lines of at most {@link #WIDTH} characters, broken at spaces. */
  private void wrap(String text) {
    StringBuilder line = new StringBuilder();
    for (String word : text.split(" ")) {
      if (line.length() > 0 && line.length() + 1 + word.length() > WIDTH) {
        out.println(line);
        line.setLength(0);
      }
      line.append(line.length() == 0 ? "" : " ").append(word);
    }
    out.println(line);
  }
}
