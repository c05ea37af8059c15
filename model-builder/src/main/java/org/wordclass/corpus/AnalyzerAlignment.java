package org.wordclass.corpus;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.analysis.tokenattributes.OffsetAttribute;

/**
 * Runs a sentence's raw text through a Lucene analysis chain and gives each emitted token the
 * gold tag of the words it covers, matched by character offsets:
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
  private final Map<String, Long> skipped = new LinkedHashMap<>();

  public AnalyzerAlignment(Analyzer analyzer, boolean skipBadSentences) {
    this.analyzer = analyzer;
    this.skipBadSentences = skipBadSentences;
  }

  /**
   * The analyzer's tokens of {@code sentence} with their aligned gold tags, as a sentence of its
   * own; null if the sentence was skipped (only when skipping is allowed) or yields no token.
   */
  public Sentence align(Sentence sentence) {
    int[] offsets;
    try {
      offsets = WordOffsets.locate(sentence);
    } catch (CorpusFormatException e) {
      if (!skipBadSentences) {
        throw e;
      }
      skipped.merge(e.getMessage().contains("no '# text") ? "no text line" : "text does not match forms", 1L, Long::sum);
      return null;
    }
    sentences++;
    words += sentence.size();
    boolean[] covered = new boolean[sentence.size()];
    List<String> tokens = new ArrayList<>();
    List<String> tags = new ArrayList<>();
    try (TokenStream stream = analyzer.tokenStream("text", sentence.text())) {
      CharTermAttribute term = stream.addAttribute(CharTermAttribute.class);
      OffsetAttribute offset = stream.addAttribute(OffsetAttribute.class);
      stream.reset();
      while (stream.incrementToken()) {
        int first = -1;
        int host = -1;
        int count = 0;
        for (int w = 0; w < sentence.size(); w++) {
          if (offsets[2 * w] < offset.endOffset() && offsets[2 * w + 1] > offset.startOffset()) {
            if (first < 0) {
              first = w;
            }
            if (host < 0 && !leansOnNext(sentence, w)) {
              host = w;
            }
            count++;
            covered[w] = true;
          }
        }
        Case c = count == 0 ? Case.NO_WORD
            : count > 1 ? Case.SEVERAL_WORDS
            : offsets[2 * first] == offset.startOffset() && offsets[2 * first + 1] == offset.endOffset() ? Case.ONE_WORD
            : Case.PART_OF_A_WORD;
        caseCounts[c.ordinal()]++;
        if (c == Case.SEVERAL_WORDS && host > first) {
          tokensTaggedByALaterWord++;
        }
        if (c != Case.NO_WORD) {
          tokens.add(term.toString());
          tags.add(sentence.tags().get(c == Case.SEVERAL_WORDS && host >= 0 ? host : first));
        }
      }
      stream.end();
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    for (boolean b : covered) {
      if (!b) {
        wordsWithoutToken++;
      }
    }
    if (tokens.isEmpty()) {
      return null;
    }
    boolean[] spaces = new boolean[tokens.size()];
    Arrays.fill(spaces, true);
    return new Sentence(tokens, tags, sentence.text(), spaces, sentence.file(), sentence.line(), List.of());
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
