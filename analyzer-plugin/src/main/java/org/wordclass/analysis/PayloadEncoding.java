package org.wordclass.analysis;

import java.nio.charset.StandardCharsets;
import org.apache.lucene.analysis.payloads.PayloadHelper;
import org.apache.lucene.util.BytesRef;
import org.wordclass.model.TagSet;

/**
 * How {@link WordClassFilter} writes a token's word class into its payload. Index and query side
 * both derive the bytes of a class from {@link #encode}, so they cannot disagree.
 */
public enum PayloadEncoding {
  /** The payload is left as the upstream filters set it. */
  NONE,
  /** The class name as UTF-8, e.g. {@code NOUN}; readable, a few bytes per position. */
  TAG,
  /** The class index in the model's tag set as one byte; compact, but tied to that tag set. */
  INDEX,
  /**
   * The class weight as a 4-byte float ({@link PayloadHelper#encodeFloat(float)}), for boosting
   * matches by class at query time without knowing the classes there.
   */
  WEIGHT;

  /** Payload of the class at index {@code tag}; null for {@link #NONE}. */
  public BytesRef encode(TagSet tags, int tag, ClassWeights weights) {
    switch (this) {
      case TAG:
        return new BytesRef(tags.name(tag).getBytes(StandardCharsets.UTF_8));
      case INDEX:
        if (tags.size() > 256) {
          throw new IllegalArgumentException("INDEX payloads hold one byte; the tag set has " + tags.size() + " classes");
        }
        return new BytesRef(new byte[] {(byte) tag});
      case WEIGHT:
        return new BytesRef(PayloadHelper.encodeFloat(weights.weight(tag)));
      default:
        return null;
    }
  }

  /** Payloads of every class, indexed by tag; entries are null for {@link #NONE}. */
  public BytesRef[] encodeAll(TagSet tags, ClassWeights weights) {
    BytesRef[] table = new BytesRef[tags.size()];
    for (int tag = 0; tag < table.length; tag++) {
      table[tag] = encode(tags, tag, weights);
    }
    return table;
  }
}
