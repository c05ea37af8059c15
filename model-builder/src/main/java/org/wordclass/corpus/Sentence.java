package org.wordclass.corpus;

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
 */
public record Sentence(
    List<String> words, List<String> tags, String text, boolean[] spaceAfter, String file, long line,
    List<MultiwordToken> multiwordTokens, boolean startsDocument) {

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
}
