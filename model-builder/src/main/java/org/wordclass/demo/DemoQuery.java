package org.wordclass.demo;

import java.util.Locale;
import org.wordclass.analysis.WordClasses;
import org.wordclass.model.TagSet;

/**
 * What the demo compares with a plain search for {@code word}: the word restricted to {@code
 * wordClass}, or, without a class, the word with nouns weighted over the other classes.
 *
 * @param word the word as the user wrote it
 * @param wordClass a class of the model's tag set, or null for the noun-boosted search
 */
public record DemoQuery(String word, String wordClass) {
  /** The comparisons the demo shows when none is asked for. */
  public static final String[] SHOWCASE = {"board:VERB", "book:VERB", "return"};

  /** Parses {@code WORD} or {@code WORD:CLASS}; the class must be one of {@code tags} (any case). */
  public static DemoQuery parse(String spec, TagSet tags) {
    int colon = spec.lastIndexOf(':');
    String word = (colon < 0 ? spec : spec.substring(0, colon)).strip();
    if (word.isEmpty()) {
      throw new IllegalArgumentException("'" + spec + "' names no word; write WORD or WORD:CLASS, such as book:VERB");
    }
    if (colon < 0) {
      return new DemoQuery(word, null);
    }
    String wordClass = spec.substring(colon + 1).strip().toUpperCase(Locale.ROOT);
    WordClasses.require(tags, wordClass, "--query");
    return new DemoQuery(word, wordClass);
  }

  public boolean restricted() {
    return wordClass != null;
  }

  @Override
  public String toString() {
    return restricted() ? word + ":" + wordClass : word;
  }
}
