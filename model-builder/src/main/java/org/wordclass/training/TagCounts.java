package org.wordclass.training;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The counts an HMM is estimated from, gathered one sentence at a time: how often each word
 * carries each tag, and how often each tag follows each pair of tags (with the sentence boundary
 * as an extra tag). Memory grows with the vocabulary and the number of distinct tag trigrams,
 * not with the corpus, so a corpus larger than memory can be counted.
 *
 * <p>Tags get provisional ids in order of first appearance; {@link HmmEstimator} sorts them.
 */
public final class TagCounts {
  private final Map<String, Integer> tagIds = new HashMap<>();
  private final List<String> tagNames = new ArrayList<>();
  private final Map<String, Map<Integer, Integer>> wordTags = new HashMap<>();
  private final Map<Long, Long> trigrams = new HashMap<>();
  private long sentences;
  private long tokens;

  /** Counts one tagged sentence; empty sentences are ignored. */
  public void add(List<String> words, List<String> tags) {
    if (words.size() != tags.size()) {
      throw new IllegalArgumentException("words and tags differ in length");
    }
    if (words.isEmpty()) {
      return;
    }
    sentences++;
    int a = 0;
    int b = 0;
    for (int i = 0; i < words.size(); i++) {
      int tag = tagId(tags.get(i));
      wordTags.computeIfAbsent(words.get(i), w -> new HashMap<>(2)).merge(tag, 1, Integer::sum);
      int c = tag + 1;
      trigrams.merge(key(a, b, c), 1L, Long::sum);
      a = b;
      b = c;
      tokens++;
    }
    trigrams.merge(key(a, b, 0), 1L, Long::sum);
  }

  private int tagId(String tag) {
    Integer id = tagIds.get(tag);
    if (id == null) {
      if (tagNames.size() >= Short.MAX_VALUE - 1) {
        throw new IllegalArgumentException("too many distinct tags");
      }
      id = tagNames.size();
      tagIds.put(tag, id);
      tagNames.add(tag);
    }
    return id;
  }

  /** Packs three states (0 = boundary, tag id + 1 otherwise). */
  static long key(int a, int b, int c) {
    return ((long) a << 32) | ((long) b << 16) | c;
  }

  public long sentences() {
    return sentences;
  }

  public long tokens() {
    return tokens;
  }

  List<String> tagNames() {
    return tagNames;
  }

  Map<String, Map<Integer, Integer>> wordTags() {
    return wordTags;
  }

  Map<Long, Long> trigrams() {
    return trigrams;
  }
}
