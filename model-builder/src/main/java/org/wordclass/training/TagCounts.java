package org.wordclass.training;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.wordclass.corpus.Sentence;
import org.wordclass.model.Spelling;

/**
 * The counts an HMM is estimated from, gathered one sentence at a time: how often each word
 * carries each tag, after which state it does, and how often each state follows each pair of
 * states (with the sentence boundary as an extra state). Memory grows with the vocabulary and
 * the number of distinct trigrams, not with the corpus, so a corpus larger than memory can be
 * counted.
 *
 * <p>Counts are kept per raw state: a tag together with whether the word was written with a
 * capital in mid-sentence, so that {@link HmmEstimator} can choose to split tags by that cue or
 * not. Tags get provisional ids in order of first appearance; the estimator sorts them.
 *
 * <p>Latent sub-states are fitted to the sentences themselves, not to counts, so counts made for
 * such options ({@link #forOptions}) also keep the sentences; memory then grows with the corpus.
 */
public final class TagCounts {
  /** One tagged sentence, kept for training that needs more than counts. */
  public record TaggedSentence(List<String> words, List<String> tags) {}

  /**
   * Most distinct tags counted. The transition tables hold one cell per triple of states (a tag,
   * or a tag in two capitalisation states, plus the boundary): at 256 tags that is up to 513^3,
   * 135 million cells, about 1.6 GB while estimating; more would not fit the heap of an ordinary
   * machine, and from 2,000 tags on the cells no longer fit a Java array.
   */
  public static final int MAX_TAGS = 256;

  private final List<TaggedSentence> kept;
  private final Map<String, Integer> tagIds = new HashMap<>();
  private final List<String> tagNames = new ArrayList<>();
  private final Map<String, Map<Integer, Integer>> wordStates = new HashMap<>();
  private final Map<String, Map<Integer, Integer>> wordContexts = new HashMap<>();
  private final Map<Long, Long> trigrams = new HashMap<>();
  private long sentences;
  private long tokens;

  /** Counts that keep no sentence. */
  public TagCounts() {
    this(false);
  }

  private TagCounts(boolean keepSentences) {
    this.kept = keepSentences ? new ArrayList<>() : null;
  }

  /** Counts for training with {@code options}: they keep the sentences if latent sub-states need them. */
  public static TagCounts forOptions(TrainingOptions options) {
    return new TagCounts(options.latentRounds() > 0);
  }

  /**
   * Counts {@code sentence} as the decoder sees it: each run of tokens written together (an
   * analysis chain's pieces of a URL or an address, {@link Sentence#gaps}) one word with its tag.
   */
  public void add(Sentence sentence) {
    Sentence units = sentence.runsJoined();
    add(units.words(), units.tags());
  }

  /** Counts one tagged sentence; empty sentences are ignored. */
  public void add(List<String> words, List<String> tags) {
    if (words.size() != tags.size()) {
      throw new IllegalArgumentException("words and tags differ in length");
    }
    if (words.isEmpty()) {
      return;
    }
    sentences++;
    if (kept != null) {
      kept.add(new TaggedSentence(List.copyOf(words), List.copyOf(tags)));
    }
    int a = 0;
    int b = 0;
    for (int i = 0; i < words.size(); i++) {
      String word = words.get(i);
      int state = rawState(tagId(tags.get(i)), i > 0 && Spelling.startsWithCapital(word));
      wordStates.computeIfAbsent(word, w -> new HashMap<>(2)).merge(state, 1, Integer::sum);
      int c = state + 1;
      wordContexts.computeIfAbsent(word, w -> new HashMap<>(2)).merge((b << 16) | c, 1, Integer::sum);
      trigrams.merge(key(a, b, c), 1L, Long::sum);
      a = b;
      b = c;
      tokens++;
    }
    trigrams.merge(key(a, b, 0), 1L, Long::sum);
  }

  /** A tag id with the capitalisation bit. */
  static int rawState(int tagId, boolean capitalised) {
    return 2 * tagId + (capitalised ? 1 : 0);
  }

  static int tagOfRawState(int rawState) {
    return rawState >> 1;
  }

  static boolean isCapitalised(int rawState) {
    return (rawState & 1) != 0;
  }

  private int tagId(String tag) {
    Integer id = tagIds.get(tag);
    if (id == null) {
      if (tagNames.size() >= MAX_TAGS) {
        throw new IllegalArgumentException("tag '" + tag + "' is one more distinct tag than the " + MAX_TAGS + " a model can hold");
      }
      id = tagNames.size();
      tagIds.put(tag, id);
      tagNames.add(tag);
    }
    return id;
  }

  /** Packs three raw states, each plus one (0 = boundary). */
  static long key(int a, int b, int c) {
    return ((long) a << 32) | ((long) b << 16) | c;
  }

  public long sentences() {
    return sentences;
  }

  public long tokens() {
    return tokens;
  }

  /** The sentences counted, or null if they were not kept. */
  List<TaggedSentence> keptSentences() {
    return kept;
  }

  List<String> tagNames() {
    return tagNames;
  }

  /** Word to raw state to count. */
  Map<String, Map<Integer, Integer>> wordStates() {
    return wordStates;
  }

  /** Word to (previous raw state + 1) << 16 | (raw state + 1) to count. */
  Map<String, Map<Integer, Integer>> wordContexts() {
    return wordContexts;
  }

  /** Word to provisional tag id to count, whatever the capitalisation. */
  Map<String, Map<Integer, Integer>> wordTags() {
    Map<String, Map<Integer, Integer>> out = new HashMap<>(wordStates.size() * 2);
    wordStates.forEach((word, states) -> {
      Map<Integer, Integer> tags = new HashMap<>(2);
      states.forEach((state, n) -> tags.merge(tagOfRawState(state), n, Integer::sum));
      out.put(word, tags);
    });
    return out;
  }

  /** Raw-state trigrams, packed by {@link #key}. */
  Map<Long, Long> trigrams() {
    return trigrams;
  }
}
