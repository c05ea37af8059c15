package org.wordclass.corpus;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * One tagged sentence of a corpus.
 *
 * @param words the gold tokens (CoNLL-U syntactic words)
 * @param tags one tag per word
 * @param text the raw sentence text ({@code # text =} in CoNLL-U), or null if the file has none
 * @param spaceAfter per word, whether a space follows it in the raw text ({@code SpaceAfter=No}
 *     clears it; for a multiword token it is read from the token's range line)
 * @param file name of the file the sentence came from
 * @param line line number of the sentence's first line in that file
 * @param multiwordTokens surface tokens that stand for several words (CoNLL-U ranges such as
 *     {@code 3-4 don't}), in order; empty when there are none or the format has none
 * @param startsDocument whether the sentence is the first of a document: of its file, or after a
 *     CoNLL-U {@code # newdoc} comment
 * @param gaps for tokens an analysis chain emitted, per token the characters between it and the
 *     token before when the two are written together as one run (pieces of a URL, an e-mail
 *     address, a date; see {@code WrittenTogetherAttribute}), else null; the array itself is null
 *     when the sentence has no run, as for every sentence read from a corpus
 */
public record Sentence(
    List<String> words, List<String> tags, String text, boolean[] spaceAfter, String file, long line,
    List<MultiwordToken> multiwordTokens, boolean startsDocument, String[] gaps) {

  /** A sentence without runs of tokens written together. */
  public Sentence(List<String> words, List<String> tags, String text, boolean[] spaceAfter, String file, long line,
      List<MultiwordToken> multiwordTokens, boolean startsDocument) {
    this(words, tags, text, spaceAfter, file, line, multiwordTokens, startsDocument, null);
  }

  /** A sentence that does not start a document. */
  public Sentence(List<String> words, List<String> tags, String text, boolean[] spaceAfter, String file, long line,
      List<MultiwordToken> multiwordTokens) {
    this(words, tags, text, spaceAfter, file, line, multiwordTokens, false);
  }

  /** A surface token covering words {@code first..last} (0-based, inclusive). */
  public record MultiwordToken(int first, int last, String form) {}

  /** The words of {@code first..last} as one surface token, or null if they are not one. */
  public MultiwordToken multiwordTokenStartingAt(int word) {
    for (MultiwordToken token : multiwordTokens) {
      if (token.first() == word) {
        return token;
      }
    }
    return null;
  }

  public int size() {
    return words.size();
  }

  /**
   * Whether running text puts a space after this sentence, before the next one: unless its last
   * word has {@code SpaceAfter=No}.
   */
  public boolean spaceAfterLast() {
    return spaceAfter.length == 0 || spaceAfter[spaceAfter.length - 1];
  }

  /** Per token its gap before (see {@link #gaps}), as a list; null when the sentence has no run. */
  public List<String> gapList() {
    return gaps == null ? null : Arrays.asList(gaps);
  }

  /**
   * The sentence as the decoder sees it: each run of tokens written together one word, its text
   * as written (tokens and gaps) and the tag of its first token, which for the pieces of one
   * treebank word is that word's tag. This sentence itself when it has no run.
   */
  public Sentence runsJoined() {
    if (gaps == null) {
      return this;
    }
    List<String> joinedWords = new ArrayList<>();
    List<String> joinedTags = new ArrayList<>();
    for (int t = 0; t < words.size(); t++) {
      if (t > 0 && gaps[t] != null && !gaps[t].isEmpty()) {
        int last = joinedWords.size() - 1;
        joinedWords.set(last, joinedWords.get(last) + gaps[t] + words.get(t));
      } else {
        joinedWords.add(words.get(t));
        joinedTags.add(tags.get(t));
      }
    }
    boolean[] spaces = new boolean[joinedWords.size()];
    Arrays.fill(spaces, true);
    return new Sentence(List.copyOf(joinedWords), List.copyOf(joinedTags), text, spaces, file, line, multiwordTokens,
        startsDocument);
  }
}
