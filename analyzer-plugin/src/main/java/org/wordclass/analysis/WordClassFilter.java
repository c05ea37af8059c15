package org.wordclass.analysis;

import java.io.IOException;
import java.util.Arrays;
import java.util.Iterator;
import org.apache.lucene.analysis.TokenFilter;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.analysis.tokenattributes.KeywordAttribute;
import org.apache.lucene.analysis.tokenattributes.PayloadAttribute;
import org.apache.lucene.analysis.tokenattributes.PayloadAttributeImpl;
import org.apache.lucene.analysis.tokenattributes.PositionIncrementAttribute;
import org.apache.lucene.analysis.tokenattributes.SentenceAttribute;
import org.apache.lucene.analysis.tokenattributes.TypeAttribute;
import org.apache.lucene.util.AttributeImpl;
import org.apache.lucene.util.AttributeSource;
import org.apache.lucene.util.BytesRef;
import org.apache.lucene.util.BytesRefBuilder;
import org.wordclass.decoding.CandidateSource;
import org.wordclass.decoding.Decoder;
import org.wordclass.decoding.Lattice;
import org.wordclass.decoding.RunPositions;
import org.wordclass.model.HmmModel;
import org.wordclass.model.TagSet;
import org.wordclass.model.Spelling;
import org.wordclass.model.WordShape;

/**
 * Tags each token with its word class (part of speech), decoded by a hidden Markov model over the
 * token's sentence, so that later filters, the index and queries can tell {@code book} the noun
 * from {@code book} the verb.
 *
 * <p>The class is written to:
 *
 * <ul>
 *   <li>the {@link TypeAttribute}, so Lucene's type-based filters (such as {@link
 *       org.apache.lucene.analysis.core.TypeTokenFilter}) work after this one unchanged;
 *   <li>the {@link WordClassAttribute}, with the class index and, if asked for, the confidence;
 *   <li>the payload, in the chosen {@link PayloadEncoding} (which replaces any upstream payload;
 *       with {@link PayloadEncoding#NONE} the upstream payload is kept);
 *   <li>if asked for ({@link WordClassOptions#explain()}), the {@link
 *       WordClassExplanationAttribute}: how the candidate classes were chosen and every class's
 *       probability, from this very decoding, so that a tool shows what the index gets.
 * </ul>
 *
 * With qualified terms on, every token is followed by a second one at the same position (position
 * increment 0, same offsets, type the class): the word joined to its class, such as {@code
 * book_VERB}, so any engine can restrict a search to a class with a plain term query. It is
 * marked as a keyword so that stemmers downstream leave it whole. To keep or drop tokens by class,
 * follow this filter with {@link WordClassSelectFilter}; {@link WordClassFilterFactory} does so
 * for its {@code keepClasses} and {@code dropClasses} arguments. Everything else the upstream set
 * (term, positions, offsets, position lengths, flags, keyword marks, other attributes) passes
 * through unchanged.
 *
 * <h2>Decoding unit</h2>
 *
 * Tokens are buffered and decoded a sentence at a time: a sentence ends where the {@link
 * SentenceAttribute} value changes (set by sentence-aware tokenizers such as Lucene's OpenNLP
 * tokenizer) and at the end of the stream. Tokenizers that do not set it make the whole field one
 * sentence. To bound memory, at most {@link WordClassOptions#maxWindow()} tokens are buffered:
 * when the window is full it is decoded and emitted, and decoding starts afresh with the next
 * token, exactly as if a sentence ended there. Tags near such a cut can differ from those of an
 * uncut decoding, since each side loses the context of the other.
 *
 * <p>Where the tokenizer marks runs of tokens written together ({@link WrittenTogetherAttribute},
 * set by {@link SentenceStandardTokenizer}: the pieces of a URL, an e-mail address, a path or a
 * date), each run is decoded as one word, observed as its text as written (tokens and gaps), and
 * all its tokens get that word's class, confidence and explanation. A run cut by the window
 * starts afresh after the cut. Chains without the attribute decode token by token.
 *
 * <p>With {@link WordClassOptions#boundaries()} {@code DECODED}, the decoder also finds sentence
 * boundaries the tokenizer missed (a heading or a line without a full stop before the next
 * sentence): before each capitalised token it weighs the token as the first word of a new
 * sentence against the token in mid-sentence, in the same Viterbi pass that chooses the classes
 * (see {@link SentenceBoundaries}).
 *
 * <h2>Where it belongs in a chain</h2>
 *
 * Right after the tokenizer, before lowercasing, stemming and stop words: capital letters and
 * inflections are strong cues for the model (a capitalised unknown word is likely a proper noun,
 * one ending in {@code -ly} an adverb), and removed words are context the transitions rely on.
 * Placed after those filters it still works, with lower accuracy.
 *
 * <h2>Cost</h2>
 *
 * Viterbi costs O(K<sup>2</sup>) per token at order 1 and O(K<sup>3</sup>) at order 2, for K
 * candidate classes (one or two for most known words, all open classes for unknown words). With
 * the bundled English model on web text the decoder takes roughly 0.2 microseconds per token at
 * order 1 and 0.3 at order 2, and the whole filter about 0.4 at order 2: several times what
 * Lucene's standard tokenizer and lower-casing cost together; confidence (a forward-backward
 * pass) about doubles the decoding (figures and method in docs/performance.md). Decoded sentence
 * boundaries (the default) give capitalised tokens a second reading and cost about a fifth of the
 * filter's speed; {@code boundaries="tokenizer"} does without them. Memory is bounded
 * by the window: one pooled copy of the token's attributes per buffered token, kept for the life
 * of the filter, plus the decoder's buffers, a few kilobytes per token of the window at most.
 * Steady-state filtering allocates nothing per token, unless upstream payloads must be copied.
 * The window bound itself costs little: on running text cut every 512 tokens, fewer than 2 tags
 * in 10,000 differ from an uncut decoding.
 */
public final class WordClassFilter extends TokenFilter {
  private final CharTermAttribute termAtt = addAttribute(CharTermAttribute.class);
  private final TypeAttribute typeAtt = addAttribute(TypeAttribute.class);
  private final PositionIncrementAttribute posIncAtt = addAttribute(PositionIncrementAttribute.class);
  private final SentenceAttribute sentenceAtt = addAttribute(SentenceAttribute.class);
  private final WordClassAttribute classAtt = addAttribute(WordClassAttribute.class);
  /** Null unless the tokenizer marks runs of tokens written together, so that other chains decode as before. */
  private final WrittenTogetherAttribute runAtt;
  private final KeywordAttribute keywordAtt;
  private final PayloadAttribute payloadAtt;
  /** Null unless explanations are asked for, so that indexing pays one branch per token for them. */
  private final WordClassExplanationAttribute explanationAtt;
  /** Whether decoding runs forward-backward: for confidences or explanations. */
  private final boolean posteriors;

  private final WordClassOptions options;
  private final TagSet tags;
  private final String modelName;
  private final Decoder decoder;
  private final Lattice lattice;
  private final RunPositions positions;
  private final BytesRef[] payloads;
  private final BytesRefBuilder payload = new BytesRefBuilder();

  /** Copies of buffered tokens; while {@link #carried}, {@code slots[windowSize]} holds the next window's first. */
  private AttributeSource[] slots = new AttributeSource[0];
  private CharTermAttribute[] slotTerms = new CharTermAttribute[0];
  /** Per slot its run mark and position increment, when {@link #runAtt} is there. */
  private WrittenTogetherAttribute[] slotRuns = new WrittenTogetherAttribute[0];
  private PositionIncrementAttribute[] slotPosIncs = new PositionIncrementAttribute[0];
  /**
   * This stream's attribute implementations and, per slot, their clones in the same order, so
   * that saving and restoring a token copies impl to impl directly; {@link
   * AttributeSource#copyTo} would look every target impl up by class, twice per token. Impls
   * that {@link #emit} sets in full (the class, and the payload where this filter writes it) are
   * left out: copying them would be overwritten anyway.
   */
  private AttributeImpl[] liveImpls = new AttributeImpl[0];
  /** Where each of {@link #liveImpls} stands among all impls of the stream, in iteration order. */
  private int[] implPositions = new int[0];
  /** How many impls the stream had when the pool was built, the left-out ones included. */
  private int implCount;
  private AttributeImpl[][] slotImpls = new AttributeImpl[0][];
  private int[] best = new int[64];

  private int windowSize;
  private int next;
  private int windowSentence;
  /** The token read past the end of the last window (it began a new sentence) is in its slot. */
  private boolean carried;
  private boolean exhausted;
  private boolean qualifiedPending;
  /** Whether the pool was checked against the attributes since the last reset. */
  private boolean poolChecked;

  /** Tags with {@code model} using the defaults of {@link WordClassOptions#of}. */
  public WordClassFilter(TokenStream input, HmmModel model) {
    this(input, WordClassOptions.of(model));
  }

  public WordClassFilter(TokenStream input, WordClassOptions options) {
    super(input);
    this.options = options;
    this.tags = options.model().tags();
    this.modelName = options.model().name();
    this.decoder = new Decoder(options.model(), options.order(), options.boundaries());
    this.lattice = decoder.lattice();
    this.positions = new RunPositions(lattice);
    this.runAtt = hasAttribute(WrittenTogetherAttribute.class) ? getAttribute(WrittenTogetherAttribute.class) : null;
    this.payloads = options.payload().encodeAll(tags, options.weights());
    this.payloadAtt = options.payload() == PayloadEncoding.NONE ? null : addAttribute(PayloadAttribute.class);
    this.keywordAtt = options.qualifiedTerms() ? addAttribute(KeywordAttribute.class) : null;
    this.explanationAtt = options.explain() ? addAttribute(WordClassExplanationAttribute.class) : null;
    this.posteriors = options.confidence() || options.explain();
  }

  @Override
  public boolean incrementToken() throws IOException {
    if (qualifiedPending) {
      qualifiedPending = false;
      emitQualified(next - 1);
      return true;
    }
    if (next == windowSize && !fillWindow()) {
      return false;
    }
    emit(next++);
    qualifiedPending = options.qualifiedTerms();
    return true;
  }

  /** Buffers and decodes the next window; false when the input has no more tokens. */
  private boolean fillWindow() throws IOException {
    if (!poolChecked) {
      // consumers may add attributes after reset(), as Lucene's indexing chain does
      dropPoolIfAttributesChanged();
      poolChecked = true;
    }
    int size = 0;
    if (carried) {
      swapSlots(0, windowSize);
      carried = false;
      size = 1;
    }
    while (size < options.maxWindow() && !exhausted) {
      if (!input.incrementToken()) {
        exhausted = true;
        break;
      }
      int sentence = sentenceAtt.getSentenceIndex();
      save(size);
      if (size > 0 && sentence != windowSentence) {
        // this token starts the next sentence: keep it in its slot for the next window
        carried = true;
        windowSentence = sentence;
        break;
      }
      windowSentence = sentence;
      size++;
    }
    windowSize = size;
    next = 0;
    if (size > 0) {
      decode(size);
    }
    return size > 0;
  }

  private void decode(int size) {
    positions.clear();
    for (int i = 0; i < size; i++) {
      CharTermAttribute term = slotTerms[i];
      if (runAtt != null && continuesRun(i)) {
        WrittenTogetherAttribute run = slotRuns[i];
        positions.add(term.buffer(), 0, term.length(), run.gapBuffer(), 0, run.gapLength());
      } else {
        positions.add(term.buffer(), 0, term.length());
      }
    }
    positions.finish();
    best = Decoder.ensureCapacity(best, lattice.size());
    decoder.viterbi(best);
    if (posteriors) {
      decoder.forwardBackward();
    }
  }

  /**
   * Whether buffered token {@code i} continues the run of the token before it: marked so, and
   * right after it (a filter upstream that removed a token in between, such as a stop filter,
   * leaves a position gap, and the two were not written together).
   */
  private boolean continuesRun(int i) {
    return slotRuns[i].continuesRun() && slotPosIncs[i].getPositionIncrement() == 1;
  }

  /** Restores buffered token {@code i} and sets its class. */
  private void emit(int i) {
    AttributeImpl[] saved = slotImpls[i];
    for (int a = 0; a < saved.length; a++) {
      saved[a].copyTo(liveImpls[a]);
    }
    int p = positions.positionOf(i);
    int tag = lattice.candidateTag(p, best[p]);
    String name = tags.name(tag);
    double confidence = options.confidence() ? decoder.tagPosterior(p, best[p]) : Double.NaN;
    typeAtt.setType(name);
    classAtt.setWordClass(name, tag, confidence);
    classAtt.setModelName(modelName);
    if (payloadAtt != null) {
      // a private copy, so that a downstream filter editing the payload cannot change the table
      payload.copyBytes(payloads[tag]);
      payloadAtt.setPayload(payload.get());
    }
    if (explanationAtt != null) {
      explain(p);
      // a run opens a sentence at its first token only
      explanationAtt.setOpensSentence(lattice.opensSentence(p, best[p]) && (i == 0 || positions.positionOf(i - 1) != p));
    }
  }

  /**
   * Fills the explanation from lattice position {@code p}: of the token on its own, whose term is
   * restored in {@link #termAtt}, or of the run it belongs to.
   */
  private void explain(int p) {
    CandidateSource source = lattice.source(p, best[p]);
    boolean run = positions.isRun(p);
    char[] text = run ? positions.text() : termAtt.buffer();
    int start = run ? positions.runStart(p) : 0;
    int end = run ? positions.runEnd(p) : termAtt.length();
    if (source == CandidateSource.UNKNOWN) {
      int ending = lattice.matchedEndingLength(p);
      explanationAtt.setSource(source, null, new String(text, end - ending, ending), WordShape.classify(text, start, end - start));
    } else {
      String lookedUpAs = source == CandidateSource.LOWERCASED_FIRST_WORD ? Spelling.lowerCase(new String(text, start, end - start)) : null;
      explanationAtt.setSource(source, lookedUpAs, null, null);
    }
    decoder.tagPosteriors(p, explanationAtt.classProbabilities(tags.size()));
  }

  /** Restores token {@code i} again (downstream filters may have changed it) as its qualified twin. */
  private void emitQualified(int i) {
    emit(i);
    termAtt.append(options.separator()).append(classAtt.getWordClass());
    posIncAtt.setPositionIncrement(0);
    keywordAtt.setKeyword(true);
  }

  /** Copies the current token into pooled slot {@code i}, creating the slot on first use. */
  private void save(int i) {
    if (i >= slots.length) {
      // a window never holds more than maxWindow tokens, the carried one included
      int grown = Math.min(Math.max(i + 1, slots.length * 2), options.maxWindow());
      slots = Arrays.copyOf(slots, grown);
      slotTerms = Arrays.copyOf(slotTerms, grown);
      slotRuns = Arrays.copyOf(slotRuns, grown);
      slotPosIncs = Arrays.copyOf(slotPosIncs, grown);
      slotImpls = Arrays.copyOf(slotImpls, grown);
    }
    if (slots[i] == null) {
      slots[i] = cloneAttributes();
      slotTerms[i] = slots[i].getAttribute(CharTermAttribute.class);
      slotRuns[i] = runAtt == null ? null : slots[i].getAttribute(WrittenTogetherAttribute.class);
      slotPosIncs[i] = runAtt == null ? null : slots[i].getAttribute(PositionIncrementAttribute.class);
      slotImpls[i] = impls(slots[i]);
    }
    AttributeImpl[] saved = slotImpls[i];
    for (int a = 0; a < saved.length; a++) {
      liveImpls[a].copyTo(saved[a]);
    }
  }

  /** The impls of {@code source} that match {@link #liveImpls}, in the iteration order {@link #cloneAttributes} keeps. */
  private AttributeImpl[] impls(AttributeSource source) {
    AttributeImpl[] impls = new AttributeImpl[liveImpls.length];
    Iterator<AttributeImpl> it = source.getAttributeImplsIterator();
    int a = 0;
    for (int position = 0; a < impls.length; position++) {
      AttributeImpl impl = it.next();
      if (position == implPositions[a]) {
        if (impl.getClass() != liveImpls[a].getClass()) {
          throw new IllegalStateException("a clone of the token's attributes lists them in another order");
        }
        impls[a++] = impl;
      }
    }
    return impls;
  }

  /** Whether {@link #emit} sets every field of {@code impl}, so that it need not be saved and restored. */
  private boolean setInFull(AttributeImpl impl) {
    return impl == (Object) classAtt && impl.getClass() == WordClassAttributeImpl.class
        || payloadAtt != null && impl == (Object) payloadAtt && impl.getClass() == PayloadAttributeImpl.class;
  }

  private void swapSlots(int a, int b) {
    AttributeSource slot = slots[a];
    slots[a] = slots[b];
    slots[b] = slot;
    CharTermAttribute term = slotTerms[a];
    slotTerms[a] = slotTerms[b];
    slotTerms[b] = term;
    WrittenTogetherAttribute run = slotRuns[a];
    slotRuns[a] = slotRuns[b];
    slotRuns[b] = run;
    PositionIncrementAttribute posInc = slotPosIncs[a];
    slotPosIncs[a] = slotPosIncs[b];
    slotPosIncs[b] = posInc;
    AttributeImpl[] impls = slotImpls[a];
    slotImpls[a] = slotImpls[b];
    slotImpls[b] = impls;
  }

  @Override
  public void reset() throws IOException {
    super.reset();
    windowSize = 0;
    next = 0;
    windowSentence = 0;
    carried = false;
    exhausted = false;
    qualifiedPending = false;
    poolChecked = false;
    positions.clear();
  }

  /** Pooled slots are clones of this stream's attributes; a consumer may have added some since. */
  private void dropPoolIfAttributesChanged() {
    int count = 0;
    for (Iterator<AttributeImpl> it = getAttributeImplsIterator(); it.hasNext(); it.next()) {
      count++;
    }
    if (count != implCount) {
      Arrays.fill(slots, null);
      Arrays.fill(slotTerms, null);
      Arrays.fill(slotRuns, null);
      Arrays.fill(slotPosIncs, null);
      Arrays.fill(slotImpls, null);
      implCount = count;
      AttributeImpl[] kept = new AttributeImpl[count];
      int[] positions = new int[count];
      int size = 0;
      Iterator<AttributeImpl> it = getAttributeImplsIterator();
      for (int position = 0; position < count; position++) {
        AttributeImpl impl = it.next();
        if (!setInFull(impl)) {
          kept[size] = impl;
          positions[size++] = position;
        }
      }
      liveImpls = Arrays.copyOf(kept, size);
      implPositions = Arrays.copyOf(positions, size);
    }
  }
}
