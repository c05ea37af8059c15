package org.wordclass.engine;

import org.wordclass.analysis.WordClassOptions;

/**
 * Finds how a field was tagged, from the token filter factories of its index analyzer, for the
 * queries that read the classes back ({@link ClassRestrictedQuerySpec}, {@link
 * ClassWeightedQuerySpec}). The engine adapter lists the chain's factories; this picks the
 * word-class one.
 */
public final class IndexedClasses {
  private IndexedClasses() {}

  /**
   * The options of the word-class filter among {@code filters}, the token filter factories of
   * {@code field}'s index analyzer in order.
   *
   * @throws IllegalArgumentException if the chain has no word-class filter, or more than one
   */
  public static WordClassOptions of(String field, Iterable<?> filters) {
    WordClassOptions found = null;
    for (Object filter : filters) {
      if (filter instanceof WordClassFilterHolder) {
        if (found != null) {
          throw new IllegalArgumentException("field [" + field + "] is tagged by more than one word-class filter; "
              + "a query cannot tell which one's classes to read");
        }
        found = ((WordClassFilterHolder) filter).wordClassFactory().options();
      }
    }
    if (found == null) {
      throw new IllegalArgumentException("field [" + field + "] is not analyzed with a word-class filter, "
          + "so its terms carry no classes");
    }
    return found;
  }
}
