package org.wordclass.analysis;

import java.util.Collection;
import org.apache.lucene.analysis.FilteringTokenFilter;
import org.apache.lucene.analysis.TokenStream;
import org.wordclass.model.TagSet;

/**
 * Keeps only, or drops, the tokens of given word classes, as decoded by a {@link WordClassFilter}
 * placed before it: for example to index only nouns and proper nouns in a field for facets or
 * keywords. Removed tokens leave position gaps exactly as with Lucene's other filtering filters,
 * so phrase and span queries still see true distances. Tokens without a class are dropped when
 * keeping and kept when dropping.
 *
 * <p>A separate filter rather than an option of the tagger so that the tagger always decodes with
 * the whole sentence as context, dropped words included. Cost: one array lookup per token.
 */
public final class WordClassSelectFilter extends FilteringTokenFilter {
  private final WordClassAttribute classAtt = addAttribute(WordClassAttribute.class);
  private final boolean[] listed;
  private final boolean keep;

  /**
   * @param classes the classes to keep or drop; each must be in {@code tags}
   * @param keep true to keep only the listed classes, false to drop them
   */
  public WordClassSelectFilter(TokenStream input, TagSet tags, Collection<String> classes, boolean keep) {
    super(input);
    this.listed = WordClasses.mask(tags, classes, keep ? "keepClasses" : "dropClasses");
    this.keep = keep;
  }

  @Override
  protected boolean accept() {
    int tag = classAtt.getWordClassIndex();
    boolean isListed = tag >= 0 && tag < listed.length && listed[tag];
    return isListed == keep;
  }
}
