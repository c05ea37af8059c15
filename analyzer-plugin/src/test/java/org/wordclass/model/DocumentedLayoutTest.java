package org.wordclass.model;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.List;
import java.util.zip.CRC32;
import org.junit.jupiter.api.Test;
import org.wordclass.testing.TestModels;

/**
 * Reads a written model with a parser of its own that follows docs/model-format.md field by
 * field, with java.nio and java.util.zip only (no Lucene): the document must describe exactly
 * what {@link ModelFile} writes, byte order included.
 */
class DocumentedLayoutTest {
  private HmmModel model;
  private byte[] bytes;
  private ByteBuffer in;
  private int version;

  @Test
  void fileFollowsTheDocumentedLayout() {
    follow(TestModels.small(), 3);
  }

  /** A model with folded endings is the one kind written as version 4: the same layout and the alphabet byte. */
  @Test
  void foldedEndingsFollowTheDocumentedLayoutOfVersionFour() {
    HmmModel small = TestModels.small();
    HmmModel folded = new HmmModel(small.order(), small.tags(), small.states(), small.cues(), small.logBigramTable(),
        small.logTrigramTable(), small.lexicon(),
        small.unknownWords().toBuilder().endingAlphabet(EndingAlphabet.TURKISH_VOWEL_HARMONY).build(), small.provenance());
    follow(folded, 4);
  }

  private void follow(HmmModel m, int expectedVersion) {
    model = m;
    bytes = TestModels.bytes(m);
    in = ByteBuffer.wrap(bytes).order(ByteOrder.LITTLE_ENDIAN);
    version = expectedVersion;
    header();
    assertEquals(model.provenance().size(), vint());
    for (var e : model.provenance().entrySet()) {
      assertEquals(List.of(e.getKey(), e.getValue()), List.of(string(), string()));
    }
    assertEquals(model.order(), in.get());
    assertEquals(model.tags().size(), vint());
    for (String name : model.tags().names()) {
      assertEquals(name, string());
    }
    StateSpace states = model.states();
    assertEquals(states.size(), vint());
    for (int s = 0; s < states.size(); s++) {
      assertEquals(states.tagOf(s), vint());
      assertEquals(states.flags(s), in.get());
    }
    // docs/model-format.md, field 8c: bit 0 unknown first words, bit 1 those known only from mid-sentence
    assertEquals((model.cues().lowercaseFirstWord() ? 1 : 0) | (model.cues().lowercaseMidSentenceFirstWord() ? 2 : 0),
        in.get());
    assertEquals(model.cues().unseenContextLogWeight(), in.getDouble());
    assertArrayEquals(model.logBigramTable(), floats(model.logBigramTable().length));
    assertArrayEquals(model.logTrigramTable(), floats(model.logTrigramTable().length));
    lexicon(model.lexicon());
    unknownWords(model.unknownWords());
    footer();
  }

  private void header() {
    byte[] expected = {0x3f, (byte) 0xd7, 0x6c, 0x17, 0x0c, 'W', 'o', 'r', 'd', 'C', 'l', 'a', 's', 's', 'H', 'm', 'm', 0, 0, 0, (byte) version};
    assertArrayEquals(expected, Arrays.copyOf(bytes, 21));
    in.position(21);
  }

  private void lexicon(Lexicon lexicon) {
    assertEquals(lexicon.size(), vint());
    for (Lexicon.Entry e : lexicon.entries()) {
      assertEquals(e.word(), string());
      assertEquals(e.states().length, vint());
      assertEquals(e.hasContexts() ? 1 : 0, in.get());
      for (int k = 0; k < e.states().length; k++) {
        assertEquals(e.states()[k], vint());
        assertEquals(e.logEmissions()[k], Float.intBitsToFloat(in.getInt()));
        if (e.hasContexts()) {
          assertEquals(e.contextStates()[k].length, vint());
          for (int j = 0; j < e.contextStates()[k].length; j++) {
            assertEquals(e.contextStates()[k][j], vint());
            assertEquals(e.contextLogEmissions()[k][j], Float.intBitsToFloat(in.getInt()));
          }
        }
      }
    }
  }

  private void unknownWords(UnknownWordModel u) {
    assertEquals(u.theta(), in.getDouble());
    assertEquals(u.maxEndingLength(), vint());
    assertEquals(u.openTagCount(), vint());
    for (int t : u.openTags()) {
      assertEquals(t, vint());
    }
    assertArrayEquals(u.logPrior(), doubles(model.tags().size()));
    assertArrayEquals(u.logPriorCapitalised(), doubles(model.tags().size()));
    assertArrayEquals(u.baseDistribution(), doubles(u.openTagCount()));
    for (int t : u.trieOfShape()) {
      assertEquals(t, vint());
    }
    assertEquals(u.endingTries().length, vint());
    for (AffixTrie trie : u.endingTries()) {
      trie(trie);
    }
    LowerCaseFormCue cue = u.lowerCaseForms();
    assertEquals(cue == null ? 0 : 1, in.get());
    if (cue != null) {
      assertArrayEquals(cue.logStatePrior(), doubles(model.states().size()));
      assertArrayEquals(cue.factors(), doubles(model.tags().size() * u.openTagCount()));
    }
    assertEquals(u.maxBeginningLength(), vint());
    if (u.maxBeginningLength() > 0) {
      for (AffixTrie trie : u.beginningTries()) {
        trie(trie);
      }
    }
    if (version >= 4) {
      // docs/model-format.md, ending alphabet: the EndingAlphabet ordinal
      assertEquals(u.endingAlphabet().ordinal(), in.get());
    }
  }

  /** Breadth-first nodes: counts, then child characters; edge e leads to node e + 1. */
  private void trie(AffixTrie trie) {
    int nodes = vint();
    assertEquals(trie.nodeCount(), nodes);
    int edges = 0;
    for (int n = 0; n < nodes; n++) {
      int counts = vint();
      for (int i = 0; i < counts; i++) {
        assertEquals(trie.countTag[trie.countStart[n] + i], vint());
        assertEquals(trie.countValue[trie.countStart[n] + i], vint());
      }
      int children = vint();
      for (int i = 0; i < children; i++) {
        char c = (char) vint();
        assertEquals(edges + 1, trie.child(n, c), "node reached by edge " + edges);
        edges++;
      }
    }
    assertEquals(nodes - 1, edges);
  }

  private void footer() {
    assertEquals(bytes.length - 16, in.position(), "the footer follows the last field");
    in.order(ByteOrder.BIG_ENDIAN);
    assertEquals(0xC02893E8, in.getInt());
    assertEquals(0, in.getInt());
    CRC32 crc = new CRC32();
    crc.update(bytes, 0, bytes.length - 8);
    assertEquals(crc.getValue(), in.getLong());
  }

  private int vint() {
    int value = 0;
    for (int shift = 0; ; shift += 7) {
      byte b = in.get();
      value |= (b & 0x7F) << shift;
      if (b >= 0) {
        return value;
      }
    }
  }

  private String string() {
    byte[] utf8 = new byte[vint()];
    in.get(utf8);
    return new String(utf8, StandardCharsets.UTF_8);
  }

  /** float32 values, widened as the model holds them. */
  private double[] floats(int count) {
    double[] out = new double[count];
    for (int i = 0; i < count; i++) {
      out[i] = in.getFloat();
    }
    return out;
  }

  private double[] doubles(int count) {
    double[] out = new double[count];
    for (int i = 0; i < count; i++) {
      out[i] = in.getDouble();
    }
    return out;
  }
}
