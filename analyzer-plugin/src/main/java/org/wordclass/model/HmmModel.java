package org.wordclass.model;

import java.io.IOException;
import java.util.Collections;
import java.util.Map;
import java.util.SortedMap;
import java.util.TreeMap;
import org.apache.lucene.index.CorruptIndexException;
import org.apache.lucene.store.DataInput;
import org.apache.lucene.store.DataOutput;

/**
 * A hidden Markov model of word classes: the tag set, the lexicon of known words with their
 * emission log-probabilities, an unknown-word model, and transition log-probabilities of both a
 * first-order (bigram) and a second-order (trigram) chain. {@link #order()} is the order the
 * model was trained to be decoded with; both tables are always present, so a decoder may choose.
 *
 * <p>Transitions and emissions are over hidden states ({@link #states()}); each state stands for
 * one tag, and a plain model has one state per tag. The sentence boundary is the extra state
 * {@link #boundary()} ({@code = states().size()}): it stands for "before the sentence" in a
 * context and for "end of sentence" as the next state. Tables are flat arrays indexed by
 * {@link #bigramIndex} and {@link #trigramIndex}.
 *
 * <p>Immutable and safe to share between threads; one loaded copy serves every analyzer.
 * Memory: {@code 16 (T+1)^3} bytes for the trigram tables plus the lexicon and the tries of word endings and beginnings.
 */
public final class HmmModel {
  private final int order;
  private final TagSet tags;
  private final StateSpace states;
  private final DecodingCues cues;
  private final double[] logBigram;
  private final double[] logTrigram;
  private final float[] logBigramFloats;
  private final float[] logTrigramFloats;
  private final double[] bigram;
  private final double[] trigram;
  private final Lexicon lexicon;
  private final UnknownWordModel unknownWords;
  private final SortedMap<String, String> provenance;

  /**
   * Cues a decoder applies beyond the tables.
   *
   * @param lowercaseFirstWord look an unknown capitalised first word of a sentence up in lower
   *     case ("Bake" as "bake"), since capitals there say nothing about the class
   * @param unseenContextLogWeight for words with context-dependent emissions: log of the weight
   *     of the plain emission when the previous state was never seen before the word
   * @param lowercaseMidSentenceFirstWord look a capitalised first word up in lower case also when
   *     it is known but only from mid-sentence ("Book" from titles, as a name): in a model with
   *     capitalisation states its lexicon entry then has no state a first word may take, and
   *     says nothing about it as a first word. No effect without capitalisation states
   */
  public record DecodingCues(boolean lowercaseFirstWord, double unseenContextLogWeight,
      boolean lowercaseMidSentenceFirstWord) {
    public static final DecodingCues NONE = new DecodingCues(false, 0);

    /** Cues without the lower-case lookup of first words known only from mid-sentence. */
    public DecodingCues(boolean lowercaseFirstWord, double unseenContextLogWeight) {
      this(lowercaseFirstWord, unseenContextLogWeight, false);
    }

    /** Bits of the first-word cue byte: unknown capitalised first words, and those known only from mid-sentence. */
    private static final int LOWERCASE_UNKNOWN_FIRST = 1;
    private static final int LOWERCASE_MID_SENTENCE_FIRST = 2;

    /**
     * Writes the cues in the model file's layout ({@code docs/model-format.md}): the first-word
     * cue byte, one bit per cue, then the unseen-context weight.
     */
    void writeTo(DataOutput out) throws IOException {
      out.writeByte((byte) ((lowercaseFirstWord ? LOWERCASE_UNKNOWN_FIRST : 0)
          | (lowercaseMidSentenceFirstWord ? LOWERCASE_MID_SENTENCE_FIRST : 0)));
      out.writeLong(Double.doubleToLongBits(unseenContextLogWeight));
    }

    /**
     * Reads cues {@link #writeTo} wrote in format {@code version}: before
     * {@link ModelFile#VERSION_FIRST_WORD_BITS} any non-zero first-word byte means the first bit
     * alone; from it, an unknown bit is refused.
     */
    static DecodingCues readFrom(DataInput in, ModelFile.Limits limits, int version) throws IOException {
      int firstWord = in.readByte();
      if (version < ModelFile.VERSION_FIRST_WORD_BITS) {
        firstWord = firstWord != 0 ? LOWERCASE_UNKNOWN_FIRST : 0;
      } else if ((firstWord & ~(LOWERCASE_UNKNOWN_FIRST | LOWERCASE_MID_SENTENCE_FIRST)) != 0) {
        throw new CorruptIndexException("unknown first-word cue bits " + firstWord, limits.name());
      }
      double unseenContextLogWeight = Double.longBitsToDouble(in.readLong());
      return new DecodingCues((firstWord & LOWERCASE_UNKNOWN_FIRST) != 0, unseenContextLogWeight,
          (firstWord & LOWERCASE_MID_SENTENCE_FIRST) != 0);
    }
  }

  /**
   * The two transition tables as the model file holds them ({@code docs/model-format.md}): the
   * bigram table, then the trigram table, each value a float32, since tables are kept at float
   * precision and floats lose nothing.
   */
  record Transitions(double[] logBigram, double[] logTrigram) {
    void writeTo(DataOutput out) throws IOException {
      writeFloats(out, logBigram);
      writeFloats(out, logTrigram);
    }

    /** Reads tables {@link #writeTo} wrote for {@code stateCount} states and the boundary, both sizes checked against the bytes left. */
    static Transitions readFrom(DataInput in, ModelFile.Limits limits, int stateCount) throws IOException {
      long n = stateCount + 1;
      double[] logBigram = readFloats(in, limits.count(n * n, 4, "bigram entries"));
      double[] logTrigram = readFloats(in, limits.count(n * n * n, 4, "trigram entries"));
      return new Transitions(logBigram, logTrigram);
    }

    private static void writeFloats(DataOutput out, double[] values) throws IOException {
      for (double v : values) {
        out.writeInt(Float.floatToIntBits((float) v));
      }
    }

    private static double[] readFloats(DataInput in, int count) throws IOException {
      double[] values = new double[count];
      for (int i = 0; i < count; i++) {
        values[i] = Float.intBitsToFloat(in.readInt());
      }
      return values;
    }
  }

  /** A model with one state per tag and no extra cues. */
  public HmmModel(
      int order,
      TagSet tags,
      double[] logBigram,
      double[] logTrigram,
      Lexicon lexicon,
      UnknownWordModel unknownWords,
      Map<String, String> provenance) {
    this(order, tags, StateSpace.oneStatePerTag(tags.size()), DecodingCues.NONE, logBigram, logTrigram, lexicon,
        unknownWords, provenance);
  }

  /**
   * A model over {@code states}; the transition tables are indexed by state, with the boundary
   * state {@code states.size()}, and the lexicon lists states.
   */
  public HmmModel(
      int order,
      TagSet tags,
      StateSpace states,
      DecodingCues cues,
      double[] logBigram,
      double[] logTrigram,
      Lexicon lexicon,
      UnknownWordModel unknownWords,
      Map<String, String> provenance) {
    if (order != 1 && order != 2) {
      throw new IllegalArgumentException("order must be 1 or 2, not " + order);
    }
    if (states.tagCount() != tags.size()) {
      throw new IllegalArgumentException("state space is for " + states.tagCount() + " tags, not " + tags.size());
    }
    int n = states.size() + 1;
    if (logBigram.length != (long) n * n || logTrigram.length != (long) n * n * n) {
      throw new IllegalArgumentException("transition tables do not match " + states.size() + " states");
    }
    for (int k = 0; k < unknownWords.openTagCount(); k++) {
      // an unknown word's candidates are the states of the open tags: none would leave it none
      if (unknownWords.openTag(k) >= tags.size() || states.statesOf(unknownWords.openTag(k)).length == 0) {
        throw new IllegalArgumentException("open tag " + unknownWords.openTag(k) + " has no state");
      }
    }
    this.order = order;
    this.tags = tags;
    this.states = states;
    this.cues = cues;
    this.logBigram = toFloatPrecision(logBigram);
    this.logTrigram = toFloatPrecision(logTrigram);
    this.logBigramFloats = toFloats(this.logBigram);
    this.logTrigramFloats = toFloats(this.logTrigram);
    this.bigram = exp(this.logBigram);
    this.trigram = exp(this.logTrigram);
    this.lexicon = lexicon;
    this.unknownWords = unknownWords;
    this.provenance = Collections.unmodifiableSortedMap(new TreeMap<>(provenance));
  }

  /** Tables are stored as floats; rounding here makes a trained model equal its loaded copy. */
  /**
   * This model with other transition tables, lexicon and provenance, and everything else (tag
   * set, states, cues, unknown-word model, order) kept: what re-estimation produces.
   */
  public HmmModel withParameters(double[] newLogBigram, double[] newLogTrigram, Lexicon newLexicon,
      Map<String, String> newProvenance) {
    return new HmmModel(order, tags, states, cues, newLogBigram, newLogTrigram, newLexicon, unknownWords, newProvenance);
  }

  private static double[] toFloatPrecision(double[] values) {
    double[] out = new double[values.length];
    for (int i = 0; i < values.length; i++) {
      out[i] = (float) values[i];
    }
    return out;
  }

  private static float[] toFloats(double[] values) {
    float[] out = new float[values.length];
    for (int i = 0; i < values.length; i++) {
      out[i] = (float) values[i];
    }
    return out;
  }

  private static double[] exp(double[] logs) {
    double[] out = new double[logs.length];
    for (int i = 0; i < logs.length; i++) {
      out[i] = Math.exp(logs[i]);
    }
    return out;
  }

  public int order() {
    return order;
  }

  public TagSet tags() {
    return tags;
  }

  /** The hidden states and the tag of each. */
  public StateSpace states() {
    return states;
  }

  public DecodingCues cues() {
    return cues;
  }

  /** The boundary state: before the first and after the last word of a sentence. */
  public int boundary() {
    return states.size();
  }

  public int bigramIndex(int previous, int next) {
    return previous * (states.size() + 1) + next;
  }

  public int trigramIndex(int first, int previous, int next) {
    int n = states.size() + 1;
    return (first * n + previous) * n + next;
  }

  /** {@code log P(next | previous)}. */
  public double logBigram(int previous, int next) {
    return logBigram[bigramIndex(previous, next)];
  }

  /** {@code log P(next | first, previous)}. */
  public double logTrigram(int first, int previous, int next) {
    return logTrigram[trigramIndex(first, previous, next)];
  }

  /** Both transition tables, for the model file. */
  Transitions transitions() {
    return new Transitions(logBigram, logTrigram);
  }

  /** The whole bigram log table; callers must not modify it. */
  public double[] logBigramTable() {
    return logBigram;
  }

  /** The whole trigram log table; callers must not modify it. */
  public double[] logTrigramTable() {
    return logTrigram;
  }

  /**
   * The bigram log table as floats, the same values as {@link #logBigramTable} (tables hold float
   * precision): Viterbi reads these, half the bytes in the processor's caches. Callers must not
   * modify it.
   */
  public float[] logBigramFloats() {
    return logBigramFloats;
  }

  /** The trigram log table as floats; see {@link #logBigramFloats}. Callers must not modify it. */
  public float[] logTrigramFloats() {
    return logTrigramFloats;
  }

  /** Bigram probabilities (not logs), for forward-backward; callers must not modify it. */
  public double[] bigramTable() {
    return bigram;
  }

  /** Trigram probabilities (not logs), for forward-backward; callers must not modify it. */
  public double[] trigramTable() {
    return trigram;
  }

  public Lexicon lexicon() {
    return lexicon;
  }

  public UnknownWordModel unknownWords() {
    return unknownWords;
  }

  /** Where the model came from: input files and checksums, counts, options, builder version. */
  public SortedMap<String, String> provenance() {
    return provenance;
  }

  /**
   * Writes the provenance in the model file's layout ({@code docs/model-format.md}): the number
   * of entries, then each key and value, in key order, so the same model gives the same bytes.
   */
  void writeProvenanceTo(DataOutput out) throws IOException {
    out.writeVInt(provenance.size());
    for (Map.Entry<String, String> e : provenance.entrySet()) {
      out.writeString(e.getKey());
      out.writeString(e.getValue());
    }
  }

  /** Reads provenance {@link #writeProvenanceTo} wrote, its size checked against the bytes left before anything is read. */
  static SortedMap<String, String> readProvenance(DataInput in, ModelFile.Limits limits) throws IOException {
    int size = limits.count(ModelFile.vInt(in), 2, "provenance entries");
    SortedMap<String, String> map = new TreeMap<>();
    for (int i = 0; i < size; i++) {
      map.put(limits.string(), limits.string());
    }
    return map;
  }

  /** Prefix of the provenance entries a model's builder added by hand (its name, licence, source). */
  public static final String NOTE_PREFIX = "note.";

  /** Provenance key of a model's name, such as {@code fr-gsd-upos}. */
  public static final String NAME_KEY = NOTE_PREFIX + "model";

  /**
   * A short name for the model, to show which model tagged a field: the name its builder gave it
   * (provenance {@value #NAME_KEY}), else the file it was trained on ({@code corpus.1.file}), else
   * {@code unnamed}.
   */
  public String name() {
    String name = provenance.get(NAME_KEY);
    if (name == null) {
      name = provenance.getOrDefault("corpus.1.file", "unnamed");
    }
    return name;
  }

  /** Approximate heap size in bytes of the loaded model. */
  public long ramBytesUsed() {
    return 20L * (logBigram.length + logTrigram.length) + 5L * states.size()
        + lexicon.ramBytesUsed()
        + unknownWords.ramBytesUsed();
  }
}
