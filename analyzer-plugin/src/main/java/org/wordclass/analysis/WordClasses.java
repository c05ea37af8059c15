package org.wordclass.analysis;

import java.util.Collection;
import org.wordclass.model.TagSet;

/**
 * Turns class names given in configuration into tag indexes of a model, failing with a message
 * that names the setting, the unknown class and the classes the model has, so that a typo in a
 * schema is found at load time rather than as an empty result at search time.
 */
public final class WordClasses {
  private WordClasses() {}

  /** Index of {@code name} in {@code tags}. */
  public static int require(TagSet tags, String name, String setting) {
    int index = tags.indexOf(name);
    if (index < 0) {
      throw new IllegalArgumentException(
          "'" + setting + "' names the word class '" + name + "', which the model does not have; its classes are " + tags.names());
    }
    return index;
  }

  /** A mask over the tag set, true for each class in {@code names}. */
  public static boolean[] mask(TagSet tags, Collection<String> names, String setting) {
    boolean[] mask = new boolean[tags.size()];
    for (String name : names) {
      mask[require(tags, name, setting)] = true;
    }
    return mask;
  }
}
