package org.wordclass.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The ordered set of word classes a model can assign, such as the 17 Universal Dependencies
 * UPOS tags or the Penn Treebank tags. A tag is identified by its index in this set; the index
 * {@link #size()} is reserved by models for the sentence boundary.
 *
 * <p>Immutable and safe to share between threads. Lookups by name cost one hash probe.
 */
public final class TagSet {
  private final String[] names;
  private final Map<String, Integer> indexByName;

  public TagSet(List<String> names) {
    if (names.isEmpty()) {
      throw new IllegalArgumentException("a tag set needs at least one tag");
    }
    if (names.size() > Short.MAX_VALUE) {
      throw new IllegalArgumentException("too many tags: " + names.size());
    }
    this.names = names.toArray(new String[0]);
    Map<String, Integer> index = new HashMap<>();
    for (int i = 0; i < this.names.length; i++) {
      String name = this.names[i];
      if (name == null || name.isEmpty()) {
        throw new IllegalArgumentException("empty tag name at index " + i);
      }
      if (index.put(name, i) != null) {
        throw new IllegalArgumentException("duplicate tag name: " + name);
      }
    }
    this.indexByName = Collections.unmodifiableMap(index);
  }

  /** Number of tags, not counting the sentence boundary. */
  public int size() {
    return names.length;
  }

  /** Name of the tag at {@code index}. */
  public String name(int index) {
    return names[index];
  }

  /** Index of the tag called {@code name}, or -1 if the set has no such tag. */
  public int indexOf(String name) {
    Integer index = indexByName.get(name);
    return index == null ? -1 : index;
  }

  public List<String> names() {
    return Collections.unmodifiableList(Arrays.asList(names));
  }

  @Override
  public boolean equals(Object other) {
    return other instanceof TagSet && Arrays.equals(names, ((TagSet) other).names);
  }

  @Override
  public int hashCode() {
    return Arrays.hashCode(names);
  }

  @Override
  public String toString() {
    return String.join(" ", names);
  }
}
