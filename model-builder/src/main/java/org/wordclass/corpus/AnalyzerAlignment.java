package org.wordclass.corpus;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.analysis.tokenattributes.OffsetAttribute;
import org.apache.lucene.analysis.tokenattributes.PositionIncrementAttribute;
import org.apache.lucene.analysis.tokenattributes.SentenceAttribute;
import org.wordclass.analysis.WordClassOptions;
import org.wordclass.analysis.WrittenTogetherAttribute;

/**
 * Runs raw text (a sentence, or a whole document as one field value) through a Lucene analysis
 * chain and gives each emitted token the gold tag of the words it covers, matched by character
 * offsets:
 *
 * <ul>
 *   <li><b>one word</b>: the token covers exactly one word, whole: that word's tag;
 *   <li><b>part of a word</b>: the token covers only part of one word (the chain split it): that
 *       word's tag;
 *   <li><b>several words</b>: the token covers two or more words (a contraction kept whole,
 *       {@code don't} = {@code do} + {@code n't}; a word with its clitic, {@code John's}; a
 *       CoNLL-U multiword token such as French {@code du} = {@code de} + {@code le}): the tag
 *       of the <em>first</em> word, which in English is the host ({@code do}, {@code John},
 *       {@code I} of {@code I'm}) and in the Romance and Germanic contractions the preposition
 *       ({@code de} of {@code du}, {@code zu} of {@code zum}). A first word that ends in an
 *       apostrophe is an elided article or pronoun leaning on the next word (French and
 *       Italian {@code l'homme}, {@code dell'anno}, {@code qu'il}): it is passed over, and the
 *       token takes the tag of the first word after it that is not elided;
 *   <li><b>no word</b>: the token covers no word (only possible when a filter invents text):
 *       left out, counted.
 * </ul>
 *
 * Tokens that continue a run written together ({@link WrittenTogetherAttribute}) carry their gap
 * in {@link Sentence#gaps}, so that training can learn each run as one observation ({@link
 * Sentence#runsJoined}) and evaluation decode it as the filter does while scoring every token.
 * Gold words that no token covers (punctuation a tokenizer drops) are counted too. A sentence
 * without raw text, or whose text does not match its forms, is an error naming file and line,
 * or is skipped and counted when skipping is allowed.
 *
 * <p>Not thread-safe; the analyzer's reuse strategy makes repeated calls cheap.
 */
public final class AnalyzerAlignment {
  /** How tokens related to gold words. */
  public enum Case { ONE_WORD, PART_OF_A_WORD, SEVERAL_WORDS, NO_WORD }

  private final Analyzer analyzer;
  private final boolean skipBadSentences;
  private final long[] caseCounts = new long[Case.values().length];
  private long wordsWithoutToken;
  private long tokensTaggedByALaterWord;
  private long words;
  private long sentences;
  private long fieldValues;
  private long tokenSentences;
  private final Map<String, Long> skipped = new LinkedHashMap<>();

  public AnalyzerAlignment(Analyzer analyzer, boolean skipBadSentences) {
    this.analyzer = analyzer;
    this.skipBadSentences = skipBadSentences;
  }

  /**
   * The analyzer's tokens of one field value, the raw text of {@code sentences} (one sentence, or
   * the sentences of a document) joined as running text: one space between two sentences, none
   * where the last word of the first has {@code SpaceAfter=No}. The tokens come back with their
   * aligned gold tags, cut into sentences where the filter would decode them apart: where the
   * chain's {@link SentenceAttribute} changes (set by sentence-aware tokenizers such as {@code
   * sentenceStandard}) and after every {@value WordClassOptions#DEFAULT_MAX_WINDOW} tokens (the
   * filter's default window). Sentences that are skipped (only when skipping is allowed) are left
   * out of the text; the result is empty when no token remains.
   */
  public List<Sentence> align(List<Sentence> sentences) {
    FieldValue field = new FieldValue();
    for (Sentence sentence : sentences) {
      int[] offsets;
      try {
        offsets = WordOffsets.locate(sentence);
      } catch (CorpusFormatException e) {
        if (!skipBadSentences) {
          throw e;
        }
        skipped.merge(e.getMessage().contains("no '# text") ? "no text line" : "text does not match forms", 1L, Long::sum);
        continue;
      }
      this.sentences++;
      words += sentence.size();
      field.append(sentence, offsets);
    }
    if (field.wordCount == 0) {
      return List.of();
    }
    fieldValues++;
    List<Sentence> out = new ArrayList<>();
    boolean[] covered = new boolean[field.wordCount];
    try (TokenStream stream = analyzer.tokenStream("text", field.text.toString())) {
      CharTermAttribute term = stream.addAttribute(CharTermAttribute.class);
      OffsetAttribute offset = stream.addAttribute(OffsetAttribute.class);
      SentenceAttribute sentenceAtt = stream.addAttribute(SentenceAttribute.class);
      PositionIncrementAttribute posInc = stream.addAttribute(PositionIncrementAttribute.class);
      WrittenTogetherAttribute runAtt = stream.hasAttribute(WrittenTogetherAttribute.class)
          ? stream.getAttribute(WrittenTogetherAttribute.class) : null;
      stream.reset();
      Piece piece = new Piece();
      int pieceSentence = 0;
      while (stream.incrementToken()) {
        int sentence = sentenceAtt.getSentenceIndex();
        if (piece.emitted > 0 && (sentence != pieceSentence || piece.emitted == WordClassOptions.DEFAULT_MAX_WINDOW)) {
          piece.flushInto(out, field);
          piece = new Piece();
        }
        pieceSentence = sentence;
        piece.emitted++;
        int start = offset.startOffset();
        int end = offset.endOffset();
        int first = field.firstWordEndingAfter(start);
        int host = -1;
        int count = 0;
        for (int w = first; w < field.wordCount && field.start(w) < end; w++) {
          if (field.end(w) > start) {
            if (host < 0 && !field.leansOnNext.get(w)) {
              host = w;
            }
            count++;
            covered[w] = true;
          }
        }
        Case c = count == 0 ? Case.NO_WORD
            : count > 1 ? Case.SEVERAL_WORDS
            : field.start(first) == start && field.end(first) == end ? Case.ONE_WORD
            : Case.PART_OF_A_WORD;
        caseCounts[c.ordinal()]++;
        if (c == Case.SEVERAL_WORDS && host > first) {
          tokensTaggedByALaterWord++;
        }
        if (c != Case.NO_WORD) {
          // as the filter has it: a token removed in between ends the run
          String gap = runAtt != null && runAtt.continuesRun() && posInc.getPositionIncrement() == 1 ? new String(runAtt.gapBuffer(), 0, runAtt.gapLength()) : null;
          piece.add(term.toString(), gap, first, c == Case.SEVERAL_WORDS && host >= 0 ? host : first, start, end, field);
        }
      }
      stream.end();
      piece.flushInto(out, field);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    for (boolean b : covered) {
      if (!b) {
        wordsWithoutToken++;
      }
    }
    tokenSentences += out.size();
    return out;
  }

  /** What one field value holds: each sentence on its own, or each document's sentences together. */
  public enum Unit { SENTENCE, DOCUMENT }

  /**
   * A consumer of a corpus's sentences, in order, that hands {@code action} the aligned tokens of
   * each field value: every sentence, or every document (sentences from one that {@link
   * Sentence#startsDocument starts a document} to the next). Call {@link Feed#finish} after the
   * last sentence.
   */
  public Feed feed(Unit unit, Consumer<Sentence> action) {
    return new Feed(unit, action);
  }

  /** See {@link #feed}. */
  public final class Feed implements Consumer<Sentence> {
    private final Unit unit;
    private final Consumer<Sentence> action;
    private final List<Sentence> pending = new ArrayList<>();

    private Feed(Unit unit, Consumer<Sentence> action) {
      this.unit = unit;
      this.action = action;
    }

    @Override
    public void accept(Sentence sentence) {
      if (unit == Unit.SENTENCE || sentence.startsDocument()) {
        finish();
      }
      pending.add(sentence);
      if (unit == Unit.SENTENCE) {
        finish();
      }
    }

    /** Aligns and hands on what is still pending: the last document. */
    public void finish() {
      if (!pending.isEmpty()) {
        List<Sentence> value = List.copyOf(pending);
        pending.clear();
        align(value).forEach(action);
      }
    }
  }

  /** The joined text of a field value and the offsets, tags and origin of its gold words. */
  private static final class FieldValue {
    final StringBuilder text = new StringBuilder();
    int[] offsets = new int[64];
    final List<String> tags = new ArrayList<>();
    final List<Sentence> origin = new ArrayList<>();
    /** Per word: whether it is elided and so passes its token's tag to the word after it. */
    final List<Boolean> leansOnNext = new ArrayList<>();
    int wordCount;
    private boolean spaceBefore;

    void append(Sentence sentence, int[] wordOffsets) {
      if (text.length() > 0 && spaceBefore) {
        text.append(' ');
      }
      int base = text.length();
      text.append(sentence.text());
      if (offsets.length < 2 * (wordCount + sentence.size())) {
        offsets = Arrays.copyOf(offsets, Math.max(2 * offsets.length, 2 * (wordCount + sentence.size())));
      }
      for (int w = 0; w < sentence.size(); w++) {
        offsets[2 * (wordCount + w)] = base + wordOffsets[2 * w];
        offsets[2 * (wordCount + w) + 1] = base + wordOffsets[2 * w + 1];
        tags.add(sentence.tags().get(w));
        origin.add(sentence);
        leansOnNext.add(AnalyzerAlignment.leansOnNext(sentence, w));
      }
      wordCount += sentence.size();
      spaceBefore = sentence.spaceAfterLast();
    }

    int start(int word) {
      return offsets[2 * word];
    }

    int end(int word) {
      return offsets[2 * word + 1];
    }

    /** The first word that ends after {@code offset} (ends never decrease from word to word). */
    int firstWordEndingAfter(int offset) {
      int lo = 0;
      int hi = wordCount;
      while (lo < hi) {
        int mid = (lo + hi) >>> 1;
        if (end(mid) <= offset) {
          lo = mid + 1;
        } else {
          hi = mid;
        }
      }
      return lo;
    }
  }

  /** The aligned tokens of one decoding unit. */
  private static final class Piece {
    final List<String> tokens = new ArrayList<>();
    final List<String> tags = new ArrayList<>();
    final List<String> gaps = new ArrayList<>();
    boolean hasRun;
    int emitted;
    int firstWord = -1;
    int start = -1;
    int end;

    void add(String token, String gap, int word, int taggedBy, int tokenStart, int tokenEnd, FieldValue field) {
      // a run cut by the window starts afresh, as in the filter
      String kept = tokens.isEmpty() ? null : gap;
      gaps.add(kept);
      hasRun |= kept != null;
      tokens.add(token);
      tags.add(field.tags.get(taggedBy));
      if (firstWord < 0) {
        firstWord = word;
        start = tokenStart;
      }
      end = Math.max(end, tokenEnd);
    }

    void flushInto(List<Sentence> out, FieldValue field) {
      if (tokens.isEmpty()) {
        return;
      }
      boolean[] spaces = new boolean[tokens.size()];
      Arrays.fill(spaces, true);
      Sentence origin = field.origin.get(firstWord);
      String text = field.text.substring(Math.min(start, end), end);
      out.add(new Sentence(List.copyOf(tokens), List.copyOf(tags), text, spaces, origin.file(), origin.line(), List.of(),
          out.isEmpty(), hasRun ? gaps.toArray(String[]::new) : null));
    }
  }

  /**
   * Whether word {@code w} is elided, or part of an elided multiword token ({@code dell'} = {@code
   * di} + {@code l'}), and so leans on the word after it.
   */
  private static boolean leansOnNext(Sentence sentence, int w) {
    if (elided(sentence.words().get(w))) {
      return true;
    }
    for (Sentence.MultiwordToken token : sentence.multiwordTokens()) {
      if (token.first() <= w && w <= token.last()) {
        return elided(token.form());
      }
    }
    return false;
  }

  /** Whether {@code word} is an elided form, written with a final apostrophe ({@code l'}, {@code dell'}). */
  static boolean elided(String word) {
    int n = word.length();
    return n > 1 && (word.charAt(n - 1) == '\'' || word.charAt(n - 1) == '\u2019');
  }

  /** Tokens per alignment case so far. */
  public long count(Case c) {
    return caseCounts[c.ordinal()];
  }

  /** Tokens over several words whose first word was elided, so that a later word gave the tag. */
  public long tokensTaggedByALaterWord() {
    return tokensTaggedByALaterWord;
  }

  /** Gold words that no token covered. */
  public long wordsWithoutToken() {
    return wordsWithoutToken;
  }

  /** Gold words of the aligned sentences. */
  public long words() {
    return words;
  }

  /** Sentences aligned (not skipped). */
  public long sentences() {
    return sentences;
  }

  /** Sentences skipped, by reason. */
  public Map<String, Long> skipped() {
    return skipped;
  }

  /** A few lines for the terminal and for reports. */
  public Map<String, Long> summary() {
    Map<String, Long> m = new LinkedHashMap<>();
    m.put("sentences", sentences);
    m.put("fieldValues", fieldValues);
    m.put("decodedSentences", tokenSentences);
    m.put("goldWords", words);
    m.put("tokensOneWord", count(Case.ONE_WORD));
    m.put("tokensPartOfAWord", count(Case.PART_OF_A_WORD));
    m.put("tokensSeveralWords", count(Case.SEVERAL_WORDS));
    m.put("tokensNoWord", count(Case.NO_WORD));
    m.put("goldWordsWithoutToken", wordsWithoutToken);
    m.put("sentencesSkipped", skipped.values().stream().mapToLong(Long::longValue).sum());
    return m;
  }
}
