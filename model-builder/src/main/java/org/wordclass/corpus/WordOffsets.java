package org.wordclass.corpus;

/**
 * Rebuilds the character offsets of a sentence's words in its raw text ({@code # text =}),
 * from the forms and the surface tokens, skipping the white space between them. Words of a
 * multiword token ({@code don't} = {@code do} + {@code n't}) get consecutive parts of the token
 * when their forms spell it out, and the whole token otherwise (as for {@code du} = {@code de}
 * + {@code le}).
 */
public final class WordOffsets {
  private WordOffsets() {}

  /**
   * Offsets of every word: start of word i at {@code [2i]}, end at {@code [2i+1]}.
   *
   * @throws CorpusFormatException if the sentence has no text or the text does not match its forms
   */
  public static int[] locate(Sentence sentence) {
    String text = sentence.text();
    if (text == null) {
      throw new CorpusFormatException(sentence.file(), sentence.line(), "sentence has no '# text =' line");
    }
    int n = sentence.size();
    int[] offsets = new int[2 * n];
    int pos = 0;
    int word = 0;
    while (word < n) {
      Sentence.MultiwordToken token = sentence.multiwordTokenStartingAt(word);
      String surface = token != null ? token.form() : sentence.words().get(word);
      while (pos < text.length() && isSpace(text.charAt(pos))) {
        pos++;
      }
      if (!text.startsWith(surface, pos)) {
        throw new CorpusFormatException(sentence.file(), sentence.line(),
            "text does not match its forms: expected '" + surface + "' at character " + pos + " of '" + text + "'");
      }
      int last = token != null ? Math.min(token.last(), n - 1) : word;
      assign(sentence, word, last, pos, surface, offsets);
      pos += surface.length();
      word = last + 1;
    }
    return offsets;
  }

  /** White space between words, including the no-break space that CoNLL-U records as {@code SpacesAfter=\u00A0}. */
  private static boolean isSpace(char c) {
    return Character.isWhitespace(c) || Character.isSpaceChar(c);
  }

  private static void assign(Sentence sentence, int first, int last, int start, String surface, int[] offsets) {
    StringBuilder spelled = new StringBuilder();
    for (int w = first; w <= last; w++) {
      spelled.append(sentence.words().get(w));
    }
    boolean spellsOut = spelled.toString().equalsIgnoreCase(surface);
    int pos = start;
    for (int w = first; w <= last; w++) {
      if (spellsOut) {
        offsets[2 * w] = pos;
        pos += sentence.words().get(w).length();
        offsets[2 * w + 1] = pos;
      } else {
        offsets[2 * w] = start;
        offsets[2 * w + 1] = start + surface.length();
      }
    }
  }
}
