package org.wordclass.model;

import java.io.IOException;
import java.lang.invoke.MethodHandles;
import java.lang.invoke.VarHandle;
import java.util.Arrays;
import org.apache.lucene.store.DataInput;
import org.apache.lucene.store.DataOutput;

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
 *   <li>endings are counted and looked up in the model's {@link EndingAlphabet}: as written, or
 *       with the letters a language's suffixes alternate folded into one (Turkish vowel harmony),
 *       one table step per character;
 *   <li>where the model has them, two further cues multiply that distribution: what the word's
 *       lower-case form mostly is, for a word written with a capital ({@link LowerCaseFormCue}),
 *       and the tags of rare words with the same first letters, {@code P(t | beginning) / P(t)}
 *       ({@link #beginningFactor}), as if beginning and ending were independent given the tag;
 *   <li>the result is inverted with Bayes' rule, {@code P(w|s) ∝ P(s|w) / P(s)}; the factor
 *       {@code P(w)} is the same for every tag of a token and cancels in decoding. The divisor
 *       is kept twice, for words written with a capital and for the others: where a model
 *       splits tags by capitalisation, the state a word can take is the tag together with its
 *       spelling, and dividing by the tag's prior alone would count the spelling twice (once
 *       in the ending statistics, once in the transitions into the state). Models without that
 *       split keep {@code P(t)} in both.
 * </ul>
 *
 * <p>Only open-class tags, those seen with rare words in training, are candidates. Scoring one
 * word costs one trie step per character of its ending and of its beginning, a lookup of its
 * lower-case form if it is capitalised, and a sum per open tag. The distribution of an ending
 * and the factors of a beginning depend on nothing but the trie node the word reaches, so their
 * logarithms are kept per node, worked out (and allocated, about 100 bytes) by the first word that
 * reaches it: later words read them. Safe to share between threads: the parameters never change,
 * and the kept values are published whole (release store, acquire load); two threads filling the
 * same node compute the same values.
 */
public final class UnknownWordModel {
  private final double theta;
  private final int maxEndingLength;
  private final int[] openTags;
  private final double[] logPrior;
  private final double[] logPriorCapitalised;
  private final double[] baseDistribution;
  private final int[] trieOfShape;
  private final LowerCaseFormCue lowerCaseForms;
  private final int maxBeginningLength;
  private final AffixTrie[] beginningTries;
  private final int[][] openOfBeginningCount;
  private final AffixTrie[] endingTries;
  /** How endings are spelled in {@link #endingTries}: each char of a word is folded by it before a trie step. */
  private final EndingAlphabet endingAlphabet;
  /**
   * Per trie, per count entry: the index of its tag among the open tags, or -1 for a closed
   * tag. Found once here rather than by a binary search for every count of every ending that
   * an unknown word is scored with.
   */
  private final int[][] openOfCount;
  /** Per trie and node, {@code log P(t | ending)} over the open tags once a word has reached it, else null. */
  private final double[][][] endingDistribution;
  /** Per beginning trie and node, the logarithm of {@link #beginningFactor} of each open tag once a word has reached it, else null. */
  private final double[][][] beginningFactors;
  private static final VarHandle NODE = MethodHandles.arrayElementVarHandle(double[][].class);

  /** A model from the parts {@code b} was given; see {@link Builder} for what each is. */
  private UnknownWordModel(Builder b) {
    this(b.theta, b.maxEndingLength, b.openTags, b.logPrior, b.logPriorCapitalised == null ? b.logPrior
        : b.logPriorCapitalised, b.baseDistribution, b.trieOfShape, b.endingTries, b.lowerCaseForms,
        b.maxBeginningLength, b.beginningTries, b.endingAlphabet);
  }

  private UnknownWordModel(
      double theta,
      int maxEndingLength,
      int[] openTags,
      double[] logPrior,
      double[] logPriorCapitalised,
      double[] baseDistribution,
      int[] trieOfShape,
      AffixTrie[] endingTries,
      LowerCaseFormCue lowerCaseForms,
      int maxBeginningLength,
      AffixTrie[] beginningTries,
      EndingAlphabet endingAlphabet) {
    if (endingAlphabet == null) {
      throw new IllegalArgumentException("an unknown-word model needs an ending alphabet");
    }
    if (openTags == null || logPrior == null || baseDistribution == null || trieOfShape == null || endingTries == null) {
      throw new IllegalArgumentException("an unknown-word model needs open tags, priors, a base distribution and ending tries");
    }
    if (maxBeginningLength < 0 || (maxBeginningLength > 0 && (beginningTries == null || beginningTries.length != 2))) {
      throw new IllegalArgumentException("a model of word beginnings needs two tries and a positive length: "
          + maxBeginningLength);
    }
    if (logPriorCapitalised.length != logPrior.length) {
      throw new IllegalArgumentException("one prior per tag expected for capitalised words as for the others");
    }
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
      if (t < 0 || t >= endingTries.length) {
        throw new IllegalArgumentException("trie index out of range: " + t);
      }
    }
    for (int i = 0; i < openTags.length; i++) {
      if (openTags[i] < 0 || openTags[i] >= logPrior.length || (i > 0 && openTags[i] <= openTags[i - 1])) {
        throw new IllegalArgumentException("open tags must be distinct ascending tag indexes");
      }
      if (!(baseDistribution[i] > 0) || !Double.isFinite(logPrior[openTags[i]])
          || !Double.isFinite(logPriorCapitalised[openTags[i]])) {
        throw new IllegalArgumentException("open tag " + openTags[i] + " has no probability mass");
      }
    }
    this.theta = theta;
    this.maxEndingLength = maxEndingLength;
    this.openTags = openTags.clone();
    this.logPrior = logPrior.clone();
    this.logPriorCapitalised = logPriorCapitalised.clone();
    this.baseDistribution = baseDistribution.clone();
    this.trieOfShape = trieOfShape.clone();
    this.lowerCaseForms = lowerCaseForms;
    this.maxBeginningLength = maxBeginningLength;
    this.beginningTries = maxBeginningLength > 0 ? beginningTries.clone() : null;
    int[] openOfTag = openIndexOfTags(this.openTags, logPrior.length);
    this.openOfBeginningCount = maxBeginningLength > 0 ? new int[2][] : null;
    for (int t = 0; maxBeginningLength > 0 && t < 2; t++) {
      openOfBeginningCount[t] = openIndexes(beginningTries[t], openOfTag);
    }
    this.endingTries = endingTries.clone();
    this.endingAlphabet = endingAlphabet;
    this.openOfCount = new int[endingTries.length][];
    for (int t = 0; t < endingTries.length; t++) {
      openOfCount[t] = openIndexes(endingTries[t], openOfTag);
    }
    this.endingDistribution = perNode(this.endingTries);
    this.beginningFactors = maxBeginningLength > 0 ? perNode(this.beginningTries) : null;
  }

  /** Per tag of the tag set, its index among the open tags, or -1. */
  private static int[] openIndexOfTags(int[] openTags, int tagCount) {
    int[] open = new int[tagCount];
    Arrays.fill(open, -1);
    for (int k = 0; k < openTags.length; k++) {
      open[openTags[k]] = k;
    }
    return open;
  }

  /** Per count entry of {@code trie}: the open index of its tag, or -1 for a closed tag (or one outside the tag set). */
  private static int[] openIndexes(AffixTrie trie, int[] openOfTag) {
    int[] open = new int[trie.countTag.length];
    for (int i = 0; i < open.length; i++) {
      int tag = trie.countTag[i];
      open[i] = tag >= 0 && tag < openOfTag.length ? openOfTag[tag] : -1;
    }
    return open;
  }

  private static double[][][] perNode(AffixTrie[] tries) {
    double[][][] kept = new double[tries.length][][];
    for (int t = 0; t < tries.length; t++) {
      kept[t] = new double[tries[t].nodeCount()][];
    }
    return kept;
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
   * Writes {@code log P(word | openTag(k))}, up to a constant shared by all k, into {@code out[k]},
   * for the states of words written as this one is: with the capitalised prior if its first
   * character is a capital letter. That is the state a decoder admits for the word everywhere but
   * as the first word of a sentence, where no word counts as capitalised; {@link
   * #logEmissions(char[], int, int, boolean, double[], double[])} takes the state's spelling.
   *
   * @param scratch at least {@link #openTagCount()} long; overwritten
   * @return length of the longest ending that was found in the counts
   */
  public int logEmissions(char[] buf, int off, int len, double[] scratch, double[] out) {
    return logEmissions(buf, off, len, Spelling.startsWithCapital(buf, off, len), scratch, out);
  }

  /**
   * Writes {@code log P(word | state of openTag(k))}, up to a constant shared by all k, into
   * {@code out[k]}, for the states of words written with a capital in mid-sentence if {@code
   * capitalisedState}, otherwise for the others.
   *
   * @param scratch at least {@link #openTagCount()} long; overwritten
   * @return length of the longest ending that was found in the counts
   */
  public int logEmissions(char[] buf, int off, int len, boolean capitalisedState, double[] scratch, double[] out) {
    // the product of the cues, summed in logarithms: each cue's logarithms are kept, not the
    // product's, since the ending and the beginning of a word are kept at different nodes
    WordShape shape = WordShape.classify(buf, off, len);
    int depth = logEndingDistribution(shape, buf, off, len, scratch, out);
    if (lowerCaseForms != null) {
      lowerCaseForms.addLogFactors(shape, buf, off, len, out);
    }
    if (beginningTries != null) {
      double[] logFactors = logBeginningFactors(shape, buf, off, len);
      for (int k = 0; k < openTags.length; k++) {
        out[k] += logFactors[k];
      }
    }
    double[] prior = capitalisedState ? logPriorCapitalised : logPrior;
    for (int i = 0; i < openTags.length; i++) {
      out[i] -= prior[openTags[i]];
    }
    return depth;
  }

  /**
   * Writes the logarithm of {@link #tagDistribution} of the word with θ into {@code out}, read
   * from the node its longest known ending reaches where a word has reached it before.
   *
   * @return length of that ending
   */
  private int logEndingDistribution(WordShape shape, char[] buf, int off, int len, double[] scratch, double[] out) {
    int t = trieOfShape[shape.ordinal()];
    AffixTrie trie = endingTries[t];
    int node = 0;
    int depth = 0;
    for (int next; depth < Math.min(len, maxEndingLength) && (next = trie.child(node, endingAlphabet.fold(buf[off + len - 1 - depth]))) >= 0; depth++) {
      node = next;
    }
    double[] kept = (double[]) NODE.getAcquire(endingDistribution[t], node);
    if (kept == null) {
      kept = new double[openTags.length];
      tagDistribution(buf, off, len, theta, scratch, kept);
      for (int k = 0; k < kept.length; k++) {
        kept[k] = Math.log(kept[k]);
      }
      NODE.setRelease(endingDistribution[t], node, kept);
    }
    System.arraycopy(kept, 0, out, 0, openTags.length);
    return depth;
  }

  /**
   * The logarithm of {@link #beginningFactor} of every open tag for the word, kept per node of the
   * beginning trie: the factor depends only on the deepest node the word's beginning reaches,
   * since abstraction along the path stops where a node holds no count of an open tag, and so
   * do all nodes below it.
   */
  private double[] logBeginningFactors(WordShape shape, char[] buf, int off, int len) {
    int group = shape.capitalisationOnly() == WordShape.CAPITALISED ? 1 : 0;
    AffixTrie trie = beginningTries[group];
    int node = 0;
    for (int depth = 0, next; depth < Math.min(len, maxBeginningLength)
        && (next = trie.child(node, Spelling.lowerCase(buf[off + depth]))) >= 0; depth++) {
      node = next;
    }
    double[] kept = (double[]) NODE.getAcquire(beginningFactors[group], node);
    if (kept == null) {
      kept = new double[openTags.length];
      for (int k = 0; k < kept.length; k++) {
        kept[k] = Math.log(beginningFactor(buf, off, len, k));
      }
      NODE.setRelease(beginningFactors[group], node, kept);
    }
    return kept;
  }

  /**
   * Writes {@code P(openTag(k) | ending, shape)} into {@code out[k]}, by successive abstraction
   * with weight {@code weight}: from the distribution over all rare words, through the root of
   * the shape's trie (all rare words of the shape), to the longest ending that was counted.
   *
   * @return length of the longest ending that was found in the counts
   */
  public int tagDistribution(char[] buf, int off, int len, double weight, double[] scratch, double[] out) {
    int t = trieOfShape[WordShape.classify(buf, off, len).ordinal()];
    AffixTrie trie = endingTries[t];
    int[] openOf = openOfCount[t];
    // the shape's own distribution, abstracted to the one over all rare words
    System.arraycopy(baseDistribution, 0, out, 0, openTags.length);
    openCounts(trie, openOf, 0, scratch);
    abstractTo(scratch, openTags.length, weight, out);
    int node = 0;
    int depth = 0;
    while (depth < Math.min(len, maxEndingLength)) {
      int next = trie.child(node, endingAlphabet.fold(buf[off + len - 1 - depth]));
      if (next < 0) {
        break;
      }
      node = next;
      depth++;
      openCounts(trie, openOf, node, scratch);
      abstractTo(scratch, openTags.length, weight, out);
    }
    return depth;
  }

  /**
   * The nodes of the word's ending trie that {@link #tagDistribution} abstracts through, root
   * first, into {@code nodes} (at least {@link #maxEndingLength()} + 1 long): a read-only view for
   * training code that scores a word with some counts taken out (leave-one-out).
   *
   * @return the number of nodes written, the length of the longest counted ending plus one
   */
  public int endingPath(char[] buf, int off, int len, int[] nodes) {
    AffixTrie trie = endingTries[trieOfShape[WordShape.classify(buf, off, len).ordinal()]];
    int count = 0;
    nodes[count++] = 0;
    for (int node = 0, next; count - 1 < Math.min(len, maxEndingLength)
        && (next = trie.child(node, endingAlphabet.fold(buf[off + len - count]))) >= 0; node = next) {
      nodes[count++] = next;
    }
    return count;
  }

  /** Writes the counts of each open tag at {@code node} of the word's ending trie into {@code out}. */
  public void openCountsAt(char[] buf, int off, int len, int node, double[] out) {
    int t = trieOfShape[WordShape.classify(buf, off, len).ordinal()];
    openCounts(endingTries[t], openOfCount[t], node, out);
  }

  /** The share of open tag {@code k} among all rare training words, where abstraction starts. */
  public double baseProbability(int k) {
    return baseDistribution[k];
  }

  private void openCounts(AffixTrie trie, int[] openOf, int node, double[] out) {
    Arrays.fill(out, 0, openTags.length, 0.0);
    for (int i = trie.countStart[node], end = trie.countStart[node + 1]; i < end; i++) {
      int open = openOf[i];
      if (open >= 0) {
        out[open] = trie.countValue[i];
      }
    }
  }

  /**
   * One step of successive abstraction over the first {@code n} entries: {@code dist := (counts /
   * Σ counts + weight dist) / (1 + weight)}; nothing where the counts are all zero.
   */
  public static void abstractTo(double[] counts, int n, double weight, double[] dist) {
    double counted = 0;
    for (int i = 0; i < n; i++) {
      counted += counts[i];
    }
    if (counted == 0) {
      return;
    }
    double norm = 1.0 / (1.0 + weight);
    for (int i = 0; i < n; i++) {
      dist[i] = (counts[i] / counted + weight * dist[i]) * norm;
    }
  }

  /**
   * {@code P(openTag(k) | beginning) / P(openTag(k))} among the rare words of the word's
   * capitalisation: successive abstraction over the lower-cased first characters, from the
   * distribution over all rare words through the trie's root (all rare words of that
   * capitalisation, the divisor) to the longest beginning that was counted. One open tag at a
   * time, so that it needs no buffer: the path is short and its nodes hold few counts.
   */
  double beginningFactor(char[] buf, int off, int len, int k) {
    int group = WordShape.classify(buf, off, len).capitalisationOnly() == WordShape.CAPITALISED ? 1 : 0;
    AffixTrie trie = beginningTries[group];
    int[] openOf = openOfBeginningCount[group];
    double dist = baseDistribution[k];
    double root = Double.NaN;
    int node = 0;
    for (int depth = 0; ; depth++) {
      double counted = 0;
      double own = 0;
      for (int i = trie.countStart[node], end = trie.countStart[node + 1]; i < end; i++) {
        if (openOf[i] >= 0) {
          counted += trie.countValue[i];
          if (openOf[i] == k) {
            own = trie.countValue[i];
          }
        }
      }
      if (counted == 0) {
        break;
      }
      if (depth == 0) {
        root = (own + 1.0) / (counted + 1.0 * openTags.length);
      }
      dist = (own / counted + theta * dist) / (1 + theta);
      if (depth == Math.min(len, maxBeginningLength)) {
        break;
      }
      node = trie.child(node, Spelling.lowerCase(buf[off + depth]));
      if (node < 0) {
        break;
      }
    }
    return Double.isNaN(root) ? 1 : dist / root;
  }

  public double theta() {
    return theta;
  }

  public int maxEndingLength() {
    return maxEndingLength;
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

  double[] logPriorCapitalised() {
    return logPriorCapitalised;
  }

  /** The log prior {@code tag}'s probability is divided by for words not written with a capital. */
  public double logPrior(int tag) {
    return logPrior[tag];
  }

  /** The log prior {@code tag}'s probability is divided by for words in the capitalised state. */
  public double logPriorCapitalised(int tag) {
    return logPriorCapitalised[tag];
  }

  /** Whether words written with a capital are divided by other priors than the rest. */
  public boolean hasCapitalisedPriors() {
    return !Arrays.equals(logPrior, logPriorCapitalised);
  }

  double[] baseDistribution() {
    return baseDistribution;
  }

  int[] trieOfShape() {
    return trieOfShape;
  }

  AffixTrie[] endingTries() {
    return endingTries;
  }

  /** How the endings are spelled that the model counts and looks up. */
  public EndingAlphabet endingAlphabet() {
    return endingAlphabet;
  }

  /**
   * The oldest model file version that holds this model: {@link ModelFile#VERSION_ENDING_ALPHABET}
   * if its endings are folded, else {@link ModelFile#VERSION_FIRST_WORD_BITS}, so that a model
   * without the newer field keeps the bytes, and the readers, of the version before.
   */
  int formatVersion() {
    return endingAlphabet == EndingAlphabet.AS_WRITTEN ? ModelFile.VERSION_FIRST_WORD_BITS
        : ModelFile.VERSION_ENDING_ALPHABET;
  }

  /** Longest word beginning consulted; 0 if the model does not look at beginnings. */
  public int maxBeginningLength() {
    return maxBeginningLength;
  }

  /**
   * Counts of word beginnings, or null if the model has none: for words not written with a
   * capital ([0]) and those that are ([1], {@link WordShape#CAPITALISED} and {@link
   * WordShape#ALL_CAPS}), tries of the rare training words lower-cased and reversed, so that a
   * trie's path from the root spells a beginning.
   */
  public AffixTrie[] beginningTries() {
    return beginningTries == null ? null : beginningTries.clone();
  }

  /**
   * Writes the model in the model file's layout ({@code docs/model-format.md}): θ, the open tags,
   * both prior rows, the base distribution, the tries of endings, the lower-case form cue behind
   * a flag byte, then the longest beginning and, if positive, the two tries of beginnings, and
   * from {@link ModelFile#VERSION_ENDING_ALPHABET} the ending alphabet as a byte; {@code version}
   * is the file's, at least {@link #formatVersion()}.
   */
  void writeTo(DataOutput out, int version) throws IOException {
    if (version < formatVersion()) {
      throw new IllegalArgumentException("a model with ending alphabet " + endingAlphabet.optionName()
          + " needs model file version " + formatVersion() + ", not " + version);
    }
    out.writeLong(Double.doubleToLongBits(theta));
    out.writeVInt(maxEndingLength);
    out.writeVInt(openTags.length);
    for (int t : openTags) {
      out.writeVInt(t);
    }
    ModelFile.writeDoubles(out, logPrior);
    ModelFile.writeDoubles(out, logPriorCapitalised);
    ModelFile.writeDoubles(out, baseDistribution);
    for (int t : trieOfShape) {
      out.writeVInt(t);
    }
    out.writeVInt(endingTries.length);
    for (AffixTrie trie : endingTries) {
      trie.writeTo(out);
    }
    out.writeByte((byte) (lowerCaseForms == null ? 0 : 1));
    if (lowerCaseForms != null) {
      lowerCaseForms.writeTo(out);
    }
    out.writeVInt(maxBeginningLength);
    if (maxBeginningLength > 0) {
      for (AffixTrie trie : beginningTries) {
        trie.writeTo(out);
      }
    }
    if (version >= ModelFile.VERSION_ENDING_ALPHABET) {
      out.writeByte((byte) endingAlphabet.ordinal());
    }
  }

  /**
   * Reads a model {@link #writeTo} wrote in format {@code version}, checking every declared size
   * against the bytes left before allocating and every tag against {@code tagCount}. Before
   * {@link ModelFile#VERSION_CAPITALISED_PRIORS} a file has one prior row, which then serves
   * both, and neither lower-case forms nor beginnings; before {@link
   * ModelFile#VERSION_ENDING_ALPHABET} endings are as written. The lower-case form cue looks its words up
   * in {@code lexicon}, over {@code states}.
   */
  static UnknownWordModel readFrom(DataInput in, ModelFile.Limits limits, int tagCount, int version, Lexicon lexicon,
      StateSpace states) throws IOException {
    boolean fromVersion2 = version >= ModelFile.VERSION_CAPITALISED_PRIORS;
    double theta = Double.longBitsToDouble(in.readLong());
    int maxEnding = ModelFile.vInt(in);
    int openCount = limits.count(ModelFile.vInt(in), 1, "open tags");
    int[] open = new int[openCount];
    for (int i = 0; i < openCount; i++) {
      open[i] = ModelFile.tagIndex(ModelFile.vInt(in), tagCount);
    }
    double[] logPrior = ModelFile.readDoubles(in, limits.count(tagCount, 8, "tag priors"));
    double[] logPriorCapitalised = fromVersion2
        ? ModelFile.readDoubles(in, limits.count(tagCount, 8, "tag priors of capitalised words")) : logPrior;
    double[] base = ModelFile.readDoubles(in, limits.count(openCount, 8, "open-tag probabilities"));
    int[] trieOfShape = new int[WordShape.values().length];
    for (int i = 0; i < trieOfShape.length; i++) {
      trieOfShape[i] = ModelFile.vInt(in);
    }
    AffixTrie[] tries = new AffixTrie[limits.count(ModelFile.vInt(in), 1, "ending tries")];
    for (int i = 0; i < tries.length; i++) {
      tries[i] = AffixTrie.readFrom(in, limits, tagCount);
    }
    LowerCaseFormCue cue = fromVersion2 && in.readByte() != 0
        ? LowerCaseFormCue.readFrom(in, limits, tagCount, openCount, lexicon, states) : null;
    int maxBeginning = fromVersion2 ? ModelFile.vInt(in) : 0;
    AffixTrie[] beginningTries = maxBeginning > 0
        ? new AffixTrie[] {AffixTrie.readFrom(in, limits, tagCount), AffixTrie.readFrom(in, limits, tagCount)} : null;
    EndingAlphabet alphabet = version >= ModelFile.VERSION_ENDING_ALPHABET ? endingAlphabet(in.readByte(), limits)
        : EndingAlphabet.AS_WRITTEN;
    return builder().theta(theta).openTags(open, base).logPriors(logPrior, logPriorCapitalised)
        .endings(maxEnding, trieOfShape, tries).lowerCaseForms(cue).beginnings(maxBeginning, beginningTries)
        .endingAlphabet(alphabet).build();
  }

  private static EndingAlphabet endingAlphabet(byte code, ModelFile.Limits limits) throws IOException {
    if (code < 0 || code >= EndingAlphabet.values().length) {
      throw new org.apache.lucene.index.CorruptIndexException("unknown ending alphabet " + code, limits.name());
    }
    return EndingAlphabet.values()[code];
  }

  /** The cue of the lower-case forms of capitalised words, or null if the model has none. */
  public LowerCaseFormCue lowerCaseForms() {
    return lowerCaseForms;
  }

  /** The ending counts words of {@code shape} are scored with; shapes may share one. */
  public AffixTrie endingTrie(WordShape shape) {
    return endingTries[trieOfShape[shape.ordinal()]];
  }

  /** Approximate heap size in bytes. */
  public long ramBytesUsed() {
    long bytes = 16L * (openTags.length + 2L * logPrior.length);
    for (AffixTrie t : endingTries) {
      bytes += 14L * t.nodeCount() + 10L * t.countTag.length;
    }
    if (lowerCaseForms != null) {
      bytes += lowerCaseForms.ramBytesUsed();
    }
    if (beginningTries != null) {
      for (AffixTrie t : beginningTries) {
        bytes += 14L * t.nodeCount() + 10L * t.countTag.length;
      }
    }
    return bytes;
  }

  /** A builder with nothing set. */
  public static Builder builder() {
    return new Builder();
  }

  /** A builder holding this model's parts, to change some of them. */
  public Builder toBuilder() {
    return new Builder().theta(theta).endings(maxEndingLength, trieOfShape, endingTries).openTags(openTags, baseDistribution)
        .logPriors(logPrior, logPriorCapitalised).lowerCaseForms(lowerCaseForms)
        .beginnings(maxBeginningLength, beginningTries).endingAlphabet(endingAlphabet);
  }

  /**
   * The parts of an unknown-word model, set by name; {@link #build} checks them together. Needed:
   * {@link #theta}, {@link #openTags}, {@link #logPriors} and {@link #endings}; the cue of
   * lower-case forms and the tries of word beginnings are optional.
   */
  public static final class Builder {
    private double theta = Double.NaN;
    private int maxEndingLength;
    private int[] openTags;
    private double[] logPrior;
    private double[] logPriorCapitalised;
    private double[] baseDistribution;
    private int[] trieOfShape;
    private AffixTrie[] endingTries;
    private LowerCaseFormCue lowerCaseForms;
    private int maxBeginningLength;
    private AffixTrie[] beginningTries;
    private EndingAlphabet endingAlphabet = EndingAlphabet.AS_WRITTEN;

    private Builder() {}

    /** Weight of the shorter ending in successive abstraction; finite and positive. */
    public Builder theta(double weight) {
      this.theta = weight;
      return this;
    }

    /**
     * The tags an unknown word may take, ascending, with their distribution over all rare words
     * (one per open tag, summing to 1).
     */
    public Builder openTags(int[] tags, double[] distribution) {
      this.openTags = tags;
      this.baseDistribution = distribution;
      return this;
    }

    /**
     * The log prior each tag's probability is divided by, one per tag of the tag set: for words
     * not written with a capital (or in a state that does not say so), and for words in the
     * state of words written with a capital.
     */
    public Builder logPriors(double[] plain, double[] capitalised) {
      this.logPrior = plain;
      this.logPriorCapitalised = capitalised;
      return this;
    }

    /** One log prior for every word, as in a model without capitalisation states. */
    public Builder logPrior(double[] prior) {
      return logPriors(prior, prior);
    }

    /**
     * The ending counts: one trie per group of shapes, {@code trieOfShape} giving the trie of each
     * {@link WordShape} ordinal, consulted up to {@code maxLength} characters.
     */
    public Builder endings(int maxLength, int[] trieOfShape, AffixTrie[] tries) {
      this.maxEndingLength = maxLength;
      this.trieOfShape = trieOfShape;
      this.endingTries = tries;
      return this;
    }

    /** The cue of the lower-case forms of capitalised words; null for none. */
    public Builder lowerCaseForms(LowerCaseFormCue cue) {
      this.lowerCaseForms = cue;
      return this;
    }

    /**
     * Two tries of word beginnings, for words not written with a capital and for the others
     * (see {@link #beginningTries()}), consulted up to {@code maxLength} characters; 0 and null
     * for none.
     */
    public Builder beginnings(int maxLength, AffixTrie[] tries) {
      this.maxBeginningLength = maxLength;
      this.beginningTries = tries;
      return this;
    }

    /** How the ending tries spell endings; {@link EndingAlphabet#AS_WRITTEN} unless set. */
    public Builder endingAlphabet(EndingAlphabet alphabet) {
      this.endingAlphabet = alphabet;
      return this;
    }

    /** @throws IllegalArgumentException if the parts do not make a model together */
    public UnknownWordModel build() {
      return new UnknownWordModel(this);
    }
  }
}
