package org.wordclass.demo;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Predicate;
import java.util.stream.Collectors;
import org.wordclass.demo.Comparison.Row;

/**
 * The one-line notes under a comparison: what the word classes gained or cost there, judged by
 * the reader's classes of the collection. Every note is computed from the hits, never written in
 * advance, so a change of model or notices changes the notes with it.
 */
final class Notes {
  private final String word;
  private final Map<String, Notice> notices;

  Notes(String word, Map<String, Notice> notices) {
    this.word = word;
    this.notices = notices;
  }

  /** Notes on a search restricted to {@code wordClass}: what it rightly removed, lost and let through. */
  List<String> restricted(String wordClass, List<Row> rows) {
    if (rows.isEmpty()) {
      return List.of(absent());
    }
    List<Row> judged = where(rows, row -> row.reader() != null);
    if (judged.isEmpty()) {
      return List.of("no notice says which class '" + word + "' has; the tags column shows what the tagger decided");
    }
    List<String> notes = new ArrayList<>();
    List<Row> restricted = where(judged, row -> row.comparedRank() > 0);
    notes.add(String.format(Locale.ROOT, "%s uses, by the reader: %d of %d plain hits, %d of %d restricted hits",
        wordClass, count(judged, wordClass), judged.size(), count(restricted, wordClass), restricted.size()));
    List<Row> removed = where(judged, row -> row.comparedRank() == 0 && row.judgedOtherThan(wordClass));
    if (!removed.isEmpty()) {
      notes.add("precision up: " + removed.size() + " wrong-class hit" + (removed.size() == 1 ? "" : "s")
          + " removed (" + ids(removed) + ")");
    }
    for (Row lost : where(judged, row -> row.comparedRank() == 0 && wordClass.equals(row.reader()))) {
      notes.add("recall lost: doc " + lost.id() + ": " + quote(lost) + " was tagged " + lost.tagLabel()
          + ", so the " + wordClass + "-restricted query misses it");
    }
    for (Row kept : where(restricted, row -> row.judgedOtherThan(wordClass))) {
      notes.add("false hit: doc " + kept.id() + ": " + quote(kept) + " is a " + kept.reader() + " but was tagged "
          + kept.tagLabel() + ", so the " + wordClass + "-restricted query keeps it");
    }
    return notes;
  }

  /** Notes on the noun-boosted search: which use leads each ranking; the hits are the same. */
  List<String> boosted(List<Row> rows) {
    if (rows.isEmpty()) {
      return List.of(absent());
    }
    List<String> notes = new ArrayList<>();
    Row plainFirst = rows.stream().filter(row -> row.plainRank() > 0).min(Comparator.comparingInt(Row::plainRank)).orElseThrow();
    Row boostedFirst = rows.get(0);
    notes.add("first hit: plain doc " + plainFirst.id() + " (" + plainFirst.tagLabel() + ", " + quote(plainFirst)
        + "), noun-boosted doc " + boostedFirst.id() + " (" + boostedFirst.tagLabel() + ", " + quote(boostedFirst) + ")");
    boolean sameHits = rows.stream().allMatch(row -> row.plainRank() > 0 && row.comparedRank() > 0);
    notes.add((sameHits ? "the same " + rows.size() + " hits in both: weighting reorders, it removes nothing"
        : "the hits differ, which weighting alone should never do"));
    return notes;
  }

  private String absent() {
    return "no notice has '" + word + "'";
  }

  private static List<Row> where(List<Row> rows, Predicate<Row> test) {
    return rows.stream().filter(test).collect(Collectors.toList());
  }

  private static long count(List<Row> rows, String wordClass) {
    return rows.stream().filter(row -> wordClass.equals(row.reader())).count();
  }

  private static String ids(List<Row> rows) {
    return rows.stream().map(Row::id).collect(Collectors.joining(", "));
  }

  private String quote(Row row) {
    return "'" + Snippets.phrase(notices.get(row.id()).text(), word) + "'";
  }
}
