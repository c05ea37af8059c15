package org.wordclass.model;

import java.lang.invoke.MethodHandles;
import java.lang.invoke.VarHandle;
import java.util.Arrays;

/**
 * Emission scores for words the lexicon does not hold, from their endings and spelling shape, in
 * the manner of Brants (2000), "TnT: a statistical part-of-speech tagger":
 *
 * <ul>
 *   <li>tag distributions of word endings are counted over rare training words only, since
 *       unknown words behave like rare ones;
 *   <li>distributions of longer and shorter endings are combined by successive abstraction,
 *       {@code P(t|l_{n-i+1..n}) = (P^(t|l_{n-i+1..n}) + θ P(t|l_{n-i+2..n})) / (1 + θ)};
 *   <li>each spelling shape (see {@link WordShape}) keeps its own counts, abstracted in turn to
 *       the distribution over all rare words;
 *   <li>the result is inverted with Bayes' rule, {@code P(w|t) ∝ P(t|ending) / P(t)}; the
 *       factor {@code P(ending)} is the same for every tag of a token and cancels in decoding.
 * </ul>
 *
 * <p>Only open-class tags, those seen with rare words in training, are candidates. Scoring one
 * word costs one trie step per character of its ending and one pass over the open tags; the
 * first word to reach an ending also pays one pass per character of it and allocates the
 * ending's scores, which every later word with that ending reads. Safe to share between threads:
 * its parameters never change, and the scores it keeps are published safely.
 */
public final class UnknownWordModel {
  private final double theta;
  private final int maxSuffixLength;
  private final int[] openTags;
  private final double[] logPrior;
  private final double[] baseDistribution;
  private final int[] trieOfShape;
  private final SuffixTrie[] tries;
  /**
   * Per trie, per count entry: the index of its tag among the open tags, or -1 for a closed
   * tag. Found once here rather than by a binary search for every count of every ending that
   * an unknown word is scored with.
   */
  private final int[][] openOfCount;
  /**
   * Per trie and node, {@code log P(t | ending)} over the open tags once a word has reached that
   * node, else null: successive abstraction gives each node one distribution, fixed by its path
   * from the root, so it is worked out the first time a word ends there and read back for every
   * later word, instead of once per unknown token. Filled on demand rather than at load time, so
   * loading stays fast and only the endings text really has take memory (about 100 bytes each).
   * Threads may fill the same node at once; they compute the same values, and the release store
   * and acquire load publish each array whole.
   */
  private final double[][][] nodeLogDistribution;
  private static final VarHandle NODE = MethodHandles.arrayElementVarHandle(double[][].class);

  /**
   * @param theta weight of the shorter ending in successive abstraction
   * @param maxSuffixLength longest ending consulted
   * @param openTags tags an unknown word may take, ascending
   * @param logPrior {@code log P(t)} over all training tokens, one per tag of the tag set
   * @param baseDistribution tag distribution over all rare words, one per open tag, summing to 1
   * @param trieOfShape index into {@code tries} for each {@link WordShape} ordinal
   * @param tries ending counts, one trie per group of shapes
   */
  public UnknownWordModel(
      double theta,
      int maxSuffixLength,
      int[] openTags,
      double[] logPrior,
      double[] baseDistribution,
      int[] trieOfShape,
      SuffixTrie[] tries) {
    if (!(theta > 0) || Double.isInfinite(theta)) {
      throw new IllegalArgumentException("suffix weight must be finite and positive: " + theta);
    }
    if (openTags.length == 0 || baseDistribution.length != openTags.length) {
      throw new IllegalArgumentException("an unknown-word model needs one or more open tags");
    }
    if (trieOfShape.length != WordShape.values().length) {
      throw new IllegalArgumentException("one trie index per word shape expected");
    }
    for (int t : trieOfShape) {
      if (t < 0 || t >= tries.length) {
        throw new IllegalArgumentException("trie index out of range: " + t);
      }
    }
    for (int i = 0; i < openTags.length; i++) {
      if (openTags[i] < 0 || openTags[i] >= logPrior.length || (i > 0 && openTags[i] <= openTags[i - 1])) {
        throw new IllegalArgumentException("open tags must be distinct ascending tag indexes");
      }
      if (!(baseDistribution[i] > 0) || Double.isInfinite(logPrior[openTags[i]])) {
        throw new IllegalArgumentException("open tag " + openTags[i] + " has no probability mass");
      }
    }
    this.theta = theta;
    this.maxSuffixLength = maxSuffixLength;
    this.openTags = openTags.clone();
    this.logPrior = logPrior.clone();
    this.baseDistribution = baseDistribution.clone();
    this.trieOfShape = trieOfShape.clone();
    this.tries = tries.clone();
    this.openOfCount = new int[tries.length][];
    for (int t = 0; t < tries.length; t++) {
      openOfCount[t] = new int[tries[t].countTag.length];
      for (int i = 0; i < openOfCount[t].length; i++) {
        openOfCount[t][i] = Math.max(-1, Arrays.binarySearch(this.openTags, tries[t].countTag[i]));
      }
    }
    this.nodeLogDistribution = new double[tries.length][][];
    for (int t = 0; t < tries.length; t++) {
      nodeLogDistribution[t] = new double[tries[t].nodeCount()][];
    }
  }

  /** Number of candidate tags of every unknown word. */
  public int openTagCount() {
    return openTags.length;
  }

  /** The {@code k}-th open tag. */
  public int openTag(int k) {
    return openTags[k];
  }

  /**
   * Writes {@code log P(word | openTag(k))}, up to a constant shared by all k, into {@code out[k]}.
   *
   * @param scratch at least {@link #openTagCount()} long; overwritten
   * @return length of the longest ending that was found in the counts
   */
  public int logEmissions(char[] buf, int off, int len, double[] scratch, double[] out) {
    int t = trieOfShape[WordShape.classify(buf, off, len).ordinal()];
    SuffixTrie trie = tries[t];
    int node = 0;
    int depth = 0;
    for (int next; depth < Math.min(len, maxSuffixLength) && (next = trie.child(node, buf[off + len - 1 - depth])) >= 0; depth++) {
      node = next;
    }
    double[] logDistribution = (double[]) NODE.getAcquire(nodeLogDistribution[t], node);
    if (logDistribution == null) {
      logDistribution = new double[openTags.length];
      tagDistribution(buf, off, len, theta, null, scratch, logDistribution);
      for (int i = 0; i < logDistribution.length; i++) {
        logDistribution[i] = Math.log(logDistribution[i]);
      }
      NODE.setRelease(nodeLogDistribution[t], node, logDistribution);
    }
    for (int i = 0; i < openTags.length; i++) {
      out[i] = logDistribution[i] - logPrior[openTags[i]];
    }
    return depth;
  }

  /**
   * Writes {@code P(openTag(k) | ending, shape)} into {@code out[k]}, by successive abstraction
   * with weight {@code weight}. With {@code heldOut} (counts per open tag) those counts are taken
   * out of every ending on the word's path first, which scores a training word as if it had
   * not been seen: the leave-one-out estimate used to choose θ.
   *
   * @return length of the longest ending that was found in the counts
   */
  public int tagDistribution(char[] buf, int off, int len, double weight, long[] heldOut, double[] scratch, double[] out) {
    int t = trieOfShape[WordShape.classify(buf, off, len).ordinal()];
    SuffixTrie trie = tries[t];
    int[] openOf = openOfCount[t];
    // the shape's own distribution, abstracted to the one over all rare words
    System.arraycopy(baseDistribution, 0, out, 0, openTags.length);
    abstractTo(trie, openOf, 0, weight, heldOut, out, scratch);
    int node = 0;
    int depth = 0;
    while (depth < Math.min(len, maxSuffixLength)) {
      int next = trie.child(node, buf[off + len - 1 - depth]);
      if (next < 0) {
        break;
      }
      node = next;
      depth++;
      abstractTo(trie, openOf, node, weight, heldOut, out, scratch);
    }
    return depth;
  }

  /** dist := (P^(t | node) + θ dist) / (1 + θ), over open tags. */
  private void abstractTo(SuffixTrie trie, int[] openOf, int node, double weight, long[] heldOut, double[] dist,
      double[] scratch) {
    int k = openTags.length;
    Arrays.fill(scratch, 0, k, 0.0);
    for (int i = trie.countStart[node], end = trie.countStart[node + 1]; i < end; i++) {
      int open = openOf[i];
      if (open >= 0) {
        scratch[open] = trie.countValue[i];
      }
    }
    double counted = 0;
    for (int i = 0; i < k; i++) {
      if (heldOut != null) {
        scratch[i] = Math.max(0, scratch[i] - heldOut[i]);
      }
      counted += scratch[i];
    }
    if (counted == 0) {
      return;
    }
    double norm = 1.0 / (1.0 + weight);
    for (int i = 0; i < k; i++) {
      dist[i] = (scratch[i] / counted + weight * dist[i]) * norm;
    }
  }

  public double theta() {
    return theta;
  }

  public int maxSuffixLength() {
    return maxSuffixLength;
  }

  int[] openTags() {
    return openTags;
  }

  /** Index of {@code tag} among the open tags, or a negative number if it is closed. */
  public int openIndex(int tag) {
    return Arrays.binarySearch(openTags, tag);
  }

  double[] logPrior() {
    return logPrior;
  }

  /** {@code log P(tag)} over all training tokens. */
  public double logPrior(int tag) {
    return logPrior[tag];
  }

  double[] baseDistribution() {
    return baseDistribution;
  }

  int[] trieOfShape() {
    return trieOfShape;
  }

  SuffixTrie[] tries() {
    return tries;
  }

  /** The ending counts words of {@code shape} are scored with; shapes may share one. */
  public SuffixTrie suffixTrie(WordShape shape) {
    return tries[trieOfShape[shape.ordinal()]];
  }

  /** Approximate heap size in bytes. */
  public long ramBytesUsed() {
    long bytes = 16L * (openTags.length + logPrior.length);
    for (SuffixTrie t : tries) {
      bytes += 18L * t.nodeCount() + 10L * t.countTag.length;
    }
    return bytes;
  }
}
