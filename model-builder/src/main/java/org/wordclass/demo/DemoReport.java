package org.wordclass.demo;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;

/**
 * Everything the demo shows, as data: the collection, the two analysis chains, the comparisons
 * and, if asked for, every notice's tagging. The text table and the JSON are two views of it.
 *
 * @param notices how many notices were indexed
 * @param plainChain the chain of the field without classes
 * @param classedChain the chain of the field with classes
 * @param comparisons one per query, in the order asked
 * @param tagging each notice's tokens with their classes; null unless asked for
 */
public record DemoReport(
    int notices, String plainChain, String classedChain, List<Comparison> comparisons, List<NoticeTagging> tagging) {
  /** A notice's tokens as {@code token/CLASS}, in order. */
  public record NoticeTagging(String id, List<String> tokens) {}

  /** Runs {@code queries} over {@code index}; with {@code withTagging}, tags every notice too. */
  public static DemoReport of(NoticeIndex index, List<DemoQuery> queries, boolean withTagging) throws IOException {
    List<Comparison> comparisons = new ArrayList<>();
    for (DemoQuery query : queries) {
      comparisons.add(Comparison.of(index, query));
    }
    return new DemoReport(index.notices().size(), NoticeIndex.PLAIN_CHAIN.toString(), NoticeIndex.CLASSED_CHAIN.toString(),
        comparisons, withTagging ? tagging(index) : null);
  }

  private static List<NoticeTagging> tagging(NoticeIndex index) throws IOException {
    List<NoticeTagging> tagging = new ArrayList<>();
    for (Notice notice : index.notices()) {
      tagging.add(new NoticeTagging(notice.id(), index.tagging(notice)));
    }
    return tagging;
  }
}
