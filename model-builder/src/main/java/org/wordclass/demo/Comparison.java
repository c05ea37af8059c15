package org.wordclass.demo;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.wordclass.demo.NoticeIndex.Hit;

/**
 * A plain search for a word next to a class-aware one (restricted to a class, or with nouns
 * boosted), with the class the tagger gave the word in every notice found and notes on what the
 * classes gained or cost.
 *
 * @param query the query as the user would write it, such as {@code book:VERB}
 * @param word the word as indexed
 * @param wordClass the class restricted to, or null for the noun-boosted search
 * @param plainHits notice ids of the plain search, best first
 * @param comparedHits notice ids of the class-aware search, best first
 * @param rows every notice either search found, in the order the table shows them
 * @param notes what the comparison shows, one line each
 */
public record Comparison(
    String query, String word, String wordClass, List<String> plainHits, List<String> comparedHits,
    List<Row> rows, List<String> notes) {
  /**
   * One notice found.
   *
   * @param plainRank 1-based rank in the plain search, 0 when not found
   * @param comparedRank 1-based rank in the class-aware search, 0 when not found
   * @param tags the classes the word has in this notice, read back from the index
   * @param reader the class a careful reader gives the word here, or null if not judged
   */
  public record Row(String id, int plainRank, int comparedRank, List<String> tags, String reader, String snippet) {
    /** The tags as the table and the notes show them: {@code NOUN}, {@code NOUN+VERB}, or {@code -}. */
    public String tagLabel() {
      return tags.isEmpty() ? "-" : String.join("+", tags);
    }

    /** Whether a reader judged the word here and gave it another class than {@code wordClass}. */
    boolean judgedOtherThan(String wordClass) {
      return reader != null && !reader.equals(wordClass);
    }
  }

  /** How long a snippet the table shows. */
  static final int SNIPPET_WIDTH = 46;

  /** Runs both searches of {@code query} over {@code index}. */
  public static Comparison of(NoticeIndex index, DemoQuery query) throws IOException {
    String word = index.indexedForm(query.word());
    List<String> plain = ids(index.search(index.plainQuery(word)));
    List<String> compared = ids(index.search(query.restricted()
        ? index.restrictedQuery(word, query.wordClass())
        : index.nounBoostedQuery(word)));
    List<Row> rows = rows(index, word, plain, compared, query.restricted());
    Notes notes = new Notes(word, index.noticesById());
    List<String> noted = query.restricted() ? notes.restricted(query.wordClass(), rows) : notes.boosted(rows);
    return new Comparison(query.toString(), word, query.wordClass(), plain, compared, rows, noted);
  }

  private static List<String> ids(List<Hit> hits) {
    return hits.stream().map(hit -> hit.notice().id()).collect(Collectors.toList());
  }

  private static List<Row> rows(NoticeIndex index, String word, List<String> plain, List<String> compared, boolean restricted)
      throws IOException {
    Map<String, List<String>> tags = index.classesOf(word);
    Map<String, Notice> notices = index.noticesById();
    // the class-aware hits should be among the plain ones; a union shows it if they are not
    Set<String> found = new LinkedHashSet<>(plain);
    found.addAll(compared);
    List<Row> rows = new ArrayList<>();
    for (String id : found) {
      Notice notice = notices.get(id);
      rows.add(new Row(id, plain.indexOf(id) + 1, compared.indexOf(id) + 1, tags.getOrDefault(id, List.of()),
          notice.readerClass(word), Snippets.around(notice.text(), word, SNIPPET_WIDTH)));
    }
    // a restriction is read against the plain order; a boost is about the new order
    if (!restricted) {
      rows.sort(Comparator.comparingInt(Row::comparedRank));
    }
    return rows;
  }
}
