package org.wordclass.query;

import java.util.HashMap;
import java.util.Map;
import org.apache.lucene.analysis.payloads.PayloadHelper;
import org.apache.lucene.queries.payloads.PayloadDecoder;
import org.apache.lucene.util.BytesRef;
import org.wordclass.analysis.ClassWeights;
import org.wordclass.analysis.PayloadEncoding;

/**
 * Turns the word-class payload of a matched token into a score factor, for {@link
 * org.apache.lucene.queries.payloads.PayloadScoreQuery}: the weight stored in a {@link
 * PayloadEncoding#WEIGHT} payload, or the weight a table gives the class named by a {@link
 * PayloadEncoding#TAG} or {@link PayloadEncoding#INDEX} payload. The latter lets each query
 * choose its own weights over one index. Tokens without a class payload get the default weight.
 *
 * <p>Lucene's {@link PayloadDecoder#FLOAT_DECODER} is not used for weights: in Lucene 9 it reads
 * the first payload byte as a number, not the four bytes {@link PayloadHelper#encodeFloat} writes.
 *
 * <p>Immutable and thread-safe; no allocation per payload.
 */
public final class ClassWeightPayloadDecoder implements PayloadDecoder {
  private final PayloadEncoding encoding;
  private final ClassWeights weights;
  private final Map<BytesRef, Integer> tagByPayload = new HashMap<>();

  /** Decodes payloads written with {@code encoding}; {@code weights} gives class weights. */
  public ClassWeightPayloadDecoder(PayloadEncoding encoding, ClassWeights weights) {
    if (encoding == PayloadEncoding.NONE) {
      throw new IllegalArgumentException("an index without class payloads has no class weights to decode");
    }
    this.encoding = encoding;
    this.weights = weights;
    BytesRef[] payloads = encoding.encodeAll(weights.tags(), weights);
    for (int tag = 0; tag < payloads.length; tag++) {
      tagByPayload.put(payloads[tag], tag);
    }
  }

  /**
   * Decodes the weights stored in {@link PayloadEncoding#WEIGHT} payloads, as the index was built;
   * {@code weights} only supplies the default for tokens without a payload.
   */
  public static ClassWeightPayloadDecoder storedWeights(ClassWeights weights) {
    return new ClassWeightPayloadDecoder(PayloadEncoding.WEIGHT, weights);
  }

  @Override
  public float computePayloadFactor(BytesRef payload) {
    if (payload == null || payload.length == 0) {
      return weights.defaultWeight();
    }
    switch (encoding) {
      case WEIGHT:
        return payload.length == Float.BYTES ? PayloadHelper.decodeFloat(payload.bytes, payload.offset) : weights.defaultWeight();
      case INDEX:
        int tag = payload.bytes[payload.offset] & 0xFF;
        return payload.length == 1 && tag < weights.tags().size() ? weights.weight(tag) : weights.defaultWeight();
      default:
        Integer named = tagByPayload.get(payload);
        return weights.weight(named == null ? -1 : named);
    }
  }
}
