package org.wordclass.cli;

import java.nio.ByteBuffer;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.IdentityHashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.SortedMap;
import org.apache.lucene.codecs.CodecUtil;
import org.apache.lucene.store.ByteBuffersDataInput;
import org.apache.lucene.store.ByteBuffersIndexInput;
import org.apache.lucene.store.IndexInput;
import org.wordclass.model.Checksums;
import org.wordclass.model.HmmModel;
import org.wordclass.model.StateSpace;
import org.wordclass.model.ModelFile;
import org.wordclass.model.AffixTrie;
import org.wordclass.model.TagSet;
import org.wordclass.model.WordShape;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code wordclass inspect}: what a model file holds, how big it is and where it came from. */
@Command(name = "inspect", mixinStandardHelpOptions = true,
    description = "Describes a model: tag set, order, lexicon and unknown-word model sizes, file size and "
        + "checksums, heap size, provenance and the most probable tag transitions.")
final class InspectCommand extends BaseCommand {
  static final int TOP_TRANSITIONS = 15;
  static final String SENTENCE_START = "<s>";
  static final String SENTENCE_END = "</s>";

  @Mixin
  ModelOption model;

  @Option(names = "--json", description = "Print the description as JSON instead of text.")
  boolean json;

  /** A tag-to-tag transition and its probability under the first-order chain. */
  record Transition(String from, String to, double probability) {}

  /** Everything inspect reports, in the shape of its JSON output. */
  record ModelDescription(
      String model,
      long fileBytes,
      String crc32,
      String sha256,
      long heapBytes,
      int order,
      List<String> tags,
      int vocabulary,
      int wordTagPairs,
      Integer lexiconEntries,
      List<String> openTags,
      Map<String, Integer> suffixTrieNodes,
      SortedMap<String, String> provenance,
      List<Transition> strongestTransitions) {}

  @Override
  public Integer call() throws Exception {
    byte[] bytes = model.readBytes();
    HmmModel loaded = ModelFile.read(bytes, model.name());
    ModelDescription d = describe(loaded, bytes);
    out().print(json ? Json.toString(d) : toText(d));
    out().flush();
    warnIfTooBigForConfigStores(model.name(), bytes.length);
    return OK;
  }

  ModelDescription describe(HmmModel m, byte[] bytes) throws Exception {
    List<String> open = new ArrayList<>();
    for (int k = 0; k < m.unknownWords().openTagCount(); k++) {
      open.add(m.tags().name(m.unknownWords().openTag(k)));
    }
    return new ModelDescription(model.name(), bytes.length, crc32(bytes), Checksums.sha256(bytes), m.ramBytesUsed(),
        m.order(), m.tags().names(), m.lexicon().size(), m.lexicon().pairCount(), lexiconEntries(m), open, trieSizes(m),
        m.provenance(), strongestTransitions(m));
  }

  /** Entries of the user lexicon the model was built with ({@code train --lexicon}), or null. */
  private static Integer lexiconEntries(HmmModel m) {
    String entries = m.provenance().get("lexicon.entries");
    return entries == null ? null : Integer.valueOf(entries);
  }

  /** The checksum stored in the file's footer, as the Lucene codec utilities read it. */
  private static String crc32(byte[] bytes) throws Exception {
    try (IndexInput in = new ByteBuffersIndexInput(
        new ByteBuffersDataInput(List.of(ByteBuffer.wrap(bytes))), "model")) {
      return String.format(Locale.ROOT, "%08x", CodecUtil.retrieveChecksum(in));
    }
  }

  /**
   * Nodes of each trie of word endings, keyed by the word shapes that share it ({@code LOWER+ALL_CAPS}),
   * then of the tries of word beginnings where the model has them ({@code beginnings: ...}).
   */
  private static Map<String, Integer> trieSizes(HmmModel m) {
    Map<AffixTrie, String> shapesOfTrie = new IdentityHashMap<>();
    Map<String, Integer> sizes = new LinkedHashMap<>();
    List<AffixTrie> order = new ArrayList<>();
    for (WordShape shape : WordShape.values()) {
      AffixTrie trie = m.unknownWords().endingTrie(shape);
      if (shapesOfTrie.merge(trie, shape.name(), (a, b) -> a + "+" + b).equals(shape.name())) {
        order.add(trie);
      }
    }
    for (AffixTrie trie : order) {
      sizes.put(shapesOfTrie.get(trie), trie.nodeCount());
    }
    AffixTrie[] beginnings = m.unknownWords().beginningTries();
    if (beginnings != null) {
      sizes.put("beginnings: LOWER+HAS_DIGIT+NO_LETTER", beginnings[0].nodeCount());
      sizes.put("beginnings: CAPITALISED+ALL_CAPS", beginnings[1].nodeCount());
    }
    return sizes;
  }

  /** A state's tag, marked {@code ^} for the state of words written with a capital in mid-sentence. */
  private static String stateName(HmmModel m, int state) {
    String tag = m.tags().name(m.states().tagOf(state));
    return (m.states().flags(state) & StateSpace.CAPITALISED) != 0 ? tag + "^" : tag;
  }

  /** The most probable transitions of the first-order chain, the boundary named as start or end. */
  static List<Transition> strongestTransitions(HmmModel m) {
    TagSet tags = m.tags();
    int boundary = m.boundary();
    List<Transition> all = new ArrayList<>();
    for (int from = 0; from <= boundary; from++) {
      for (int to = 0; to <= boundary; to++) {
        if (from == boundary && to == boundary) {
          continue; // an empty sentence says nothing about the tags
        }
        all.add(new Transition(from == boundary ? SENTENCE_START : stateName(m, from),
            to == boundary ? SENTENCE_END : stateName(m, to), Math.exp(m.logBigram(from, to))));
      }
    }
    all.sort(Comparator.comparingDouble(Transition::probability).reversed()
        .thenComparing(Transition::from).thenComparing(Transition::to));
    return List.copyOf(all.subList(0, Math.min(TOP_TRANSITIONS, all.size())));
  }

  static String toText(ModelDescription d) {
    StringBuilder s = new StringBuilder();
    line(s, "model", d.model());
    line(s, "file size", d.fileBytes() + " bytes");
    line(s, "checksum", "CRC-32 " + d.crc32());
    line(s, "SHA-256", d.sha256());
    line(s, "heap size", String.format(Locale.ROOT, "about %s", Progress.megabytes(d.heapBytes())));
    line(s, "order", d.order() + (d.order() == 2 ? " (tag trigrams)" : " (tag bigrams)"));
    line(s, "tags", d.tags().size() + ": " + String.join(" ", d.tags()));
    line(s, "vocabulary", d.vocabulary() + " words, " + d.wordTagPairs() + " word/tag pairs");
    if (d.lexiconEntries() != null) {
      line(s, "user lexicon", d.lexiconEntries() + " entries from " + d.provenance().get("lexicon.file"));
    }
    line(s, "open tags", d.openTags().size() + ": " + String.join(" ", d.openTags()));
    s.append("suffix tries (nodes)\n");
    d.suffixTrieNodes().forEach((shapes, nodes) -> s.append(String.format(Locale.ROOT, "  %-40s %d%n", shapes, nodes)));
    s.append("provenance\n");
    d.provenance().forEach((key, value) -> s.append(String.format(Locale.ROOT, "  %-30s %s%n", key, value)));
    s.append("strongest transitions P(next | previous)\n");
    for (Transition t : d.strongestTransitions()) {
      s.append(String.format(Locale.ROOT, "  %-6s -> %-6s %.4f%n", t.from(), t.to(), t.probability()));
    }
    return s.toString();
  }

  private static void line(StringBuilder s, String name, String value) {
    s.append(String.format(Locale.ROOT, "%-20s %s%n", name, value));
  }
}
