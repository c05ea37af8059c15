package org.wordclass.model;

import java.io.IOException;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.apache.lucene.index.CorruptIndexException;
import org.apache.lucene.store.DataInput;
import org.apache.lucene.store.DataOutput;

/**
 * Tag counts of word affixes, as a trie read from the last character of each added string
 * backwards: the root holds the counts of all strings that were added, the child for 'g' those
 * ending in "g", its child for 'n' those ending in "ng", and so on. The unknown-word model keeps
 * two kinds: tries of word <em>endings</em>, built from the words as written, and tries of word
 * <em>beginnings</em>, built from the words lower-cased and reversed, so that a path from the
 * root spells a beginning read forwards. The trie itself only knows strings read from the end.
 *
 * <p>Stored flat in breadth-first order, so that the children of a node are consecutive and a
 * child is found by a binary search over at most a few dozen characters. The edge with index
 * {@code e} in breadth-first order leads to node {@code e + 1}. Immutable; about 14 bytes per
 * node plus 6 per non-zero count.
 */
public final class AffixTrie {
  final int[] childStart;
  final char[] childChar;
  final int[] countStart;
  final short[] countTag;
  final int[] countValue;
  final int[] total;

  AffixTrie(int[] childStart, char[] childChar, int[] countStart, short[] countTag, int[] countValue) {
    this.childStart = childStart;
    this.childChar = childChar;
    this.countStart = countStart;
    this.countTag = countTag;
    this.countValue = countValue;
    int nodes = childStart.length - 1;
    this.total = new int[nodes];
    for (int n = 0; n < nodes; n++) {
      long sum = 0;
      for (int i = countStart[n]; i < countStart[n + 1]; i++) {
        sum += countValue[i];
      }
      total[n] = (int) Math.min(Integer.MAX_VALUE, sum);
    }
  }

  public int nodeCount() {
    return total.length;
  }

  /** The child of {@code node} reached by {@code c}, or -1. */
  public int child(int node, char c) {
    int index = Arrays.binarySearch(childChar, childStart[node], childStart[node + 1], c);
    return index < 0 ? -1 : index + 1;
  }

  /** Number of words counted at {@code node}. */
  public int total(int node) {
    return total[node];
  }

  /**
   * Writes the trie in the model file's layout ({@code docs/model-format.md}): per node in
   * breadth-first order, its counts (tag, value) and the characters of its children.
   */
  void writeTo(DataOutput out) throws IOException {
    int nodes = nodeCount();
    out.writeVInt(nodes);
    for (int n = 0; n < nodes; n++) {
      out.writeVInt(countStart[n + 1] - countStart[n]);
      for (int i = countStart[n]; i < countStart[n + 1]; i++) {
        out.writeVInt(countTag[i]);
        out.writeVInt(countValue[i]);
      }
      out.writeVInt(childStart[n + 1] - childStart[n]);
      for (int i = childStart[n]; i < childStart[n + 1]; i++) {
        out.writeVInt(childChar[i]);
      }
    }
  }

  /**
   * Reads a trie {@link #writeTo} wrote, checking every declared size against the bytes left
   * before allocating, every tag against {@code tagCount}, children in ascending order and one
   * edge per node but the root.
   *
   * @throws CorruptIndexException or {@link ModelFormatException} for a damaged or foreign file
   */
  static AffixTrie readFrom(DataInput in, ModelFile.Limits limits, int tagCount) throws IOException {
    int nodes = limits.count(ModelFile.vInt(in), 2, "trie nodes");
    if (nodes < 1) {
      throw new CorruptIndexException("a trie needs a root", "model");
    }
    int[] childStart = new int[nodes + 1];
    int[] countStart = new int[nodes + 1];
    IntList countTags = new IntList();
    IntList countValues = new IntList();
    IntList chars = new IntList();
    for (int n = 0; n < nodes; n++) {
      countStart[n] = countTags.size;
      int counts = limits.count(ModelFile.vInt(in), 2, "counts of a trie node");
      for (int i = 0; i < counts; i++) {
        countTags.add(ModelFile.tagIndex(ModelFile.vInt(in), tagCount));
        countValues.add(ModelFile.vInt(in));
      }
      childStart[n] = chars.size;
      int children = limits.count(ModelFile.vInt(in), 1, "children of a trie node");
      int previous = -1;
      for (int i = 0; i < children; i++) {
        int c = ModelFile.vInt(in);
        if (c <= previous || c > Character.MAX_VALUE) {
          throw new CorruptIndexException("trie characters out of order", "model");
        }
        chars.add(c);
        previous = c;
      }
    }
    countStart[nodes] = countTags.size;
    childStart[nodes] = chars.size;
    if (chars.size != nodes - 1) {
      throw new CorruptIndexException("trie with " + nodes + " nodes has " + chars.size + " edges", "model");
    }
    char[] childChar = new char[chars.size];
    for (int i = 0; i < childChar.length; i++) {
      childChar[i] = (char) chars.values[i];
    }
    short[] tagsOut = new short[countTags.size];
    for (int i = 0; i < tagsOut.length; i++) {
      tagsOut[i] = (short) countTags.values[i];
    }
    return new AffixTrie(childStart, childChar, countStart, tagsOut, Arrays.copyOf(countValues.values, countValues.size));
  }

  /** Growable int array, so reading a trie does not box every number. */
  private static final class IntList {
    int[] values = new int[64];
    int size;

    void add(int v) {
      if (size == values.length) {
        values = Arrays.copyOf(values, size * 2);
      }
      values[size++] = v;
    }
  }

  /** Mutable trie used while counting; {@link #build()} freezes it. */
  public static final class Builder {
    private static final class Node {
      final TreeMap<Character, Node> children = new TreeMap<>();
      final TreeMap<Integer, Integer> counts = new TreeMap<>();
    }

    private final Node root = new Node();

    /**
     * Counts {@code count} occurrences of {@code word} with {@code tag}, for its last {@code
     * maxLength} characters at most (the word's ending; its beginning if {@code word} is reversed).
     */
    public void add(String word, int tag, int count, int maxLength) {
      Node node = root;
      node.counts.merge(tag, count, Integer::sum);
      for (int i = 1; i <= Math.min(maxLength, word.length()); i++) {
        node = node.children.computeIfAbsent(word.charAt(word.length() - i), c -> new Node());
        node.counts.merge(tag, count, Integer::sum);
      }
    }

    public AffixTrie build() {
      List<Node> order = new ArrayList<>();
      ArrayDeque<Node> queue = new ArrayDeque<>();
      queue.add(root);
      while (!queue.isEmpty()) {
        Node node = queue.poll();
        order.add(node);
        queue.addAll(node.children.values());
      }
      int nodes = order.size();
      int[] childStart = new int[nodes + 1];
      int[] countStart = new int[nodes + 1];
      List<Character> chars = new ArrayList<>();
      List<int[]> counts = new ArrayList<>();
      for (int n = 0; n < nodes; n++) {
        Node node = order.get(n);
        childStart[n] = chars.size();
        chars.addAll(node.children.keySet());
        countStart[n] = counts.size();
        for (Map.Entry<Integer, Integer> e : node.counts.entrySet()) {
          counts.add(new int[] {e.getKey(), e.getValue()});
        }
      }
      childStart[nodes] = chars.size();
      countStart[nodes] = counts.size();
      char[] childChar = new char[chars.size()];
      for (int i = 0; i < childChar.length; i++) {
        childChar[i] = chars.get(i);
      }
      short[] countTag = new short[counts.size()];
      int[] countValue = new int[counts.size()];
      for (int i = 0; i < countTag.length; i++) {
        countTag[i] = (short) counts.get(i)[0];
        countValue[i] = counts.get(i)[1];
      }
      return new AffixTrie(childStart, childChar, countStart, countTag, countValue);
    }
  }
}
