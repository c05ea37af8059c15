package org.wordclass.model;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.apache.lucene.store.DataInput;
import org.apache.lucene.store.DataOutput;

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

  /** Writes the tag set in the model file's layout ({@code docs/model-format.md}): its size, then each name. */
  void writeTo(DataOutput out) throws IOException {
    out.writeVInt(names.length);
    for (String name : names) {
      out.writeString(name);
    }
  }

  /**
   * Reads a tag set {@link #writeTo} wrote, checking the declared size against the bytes left
   * before allocating; empty or duplicate names are refused by the constructor.
   */
  static TagSet readFrom(DataInput in, ModelFile.Limits limits) throws IOException {
    int count = limits.count(ModelFile.vInt(in), 1, "tags");
    List<String> names = new ArrayList<>(count);
    for (int i = 0; i < count; i++) {
      names.add(limits.string());
    }
    return new TagSet(names);
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
