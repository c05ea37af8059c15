package org.wordclass.opensearch;

import java.io.IOException;
import java.util.Map;
import java.util.TreeMap;
import org.opensearch.core.common.io.stream.StreamInput;
import org.opensearch.core.common.io.stream.StreamOutput;
import org.opensearch.core.xcontent.XContentParser;
import org.wordclass.engine.ClassWeightedQuerySpec;
import org.wordclass.engine.QueryParameters;

/**
 * The {@value ClassWeightedQuerySpec#NAME} query: a word, each match scored by the weight of the
 * class it was tagged with ({@link ClassWeightedQuerySpec}).
 *
 * <pre>{"class_weighted_term": {"field": "body", "word": "park", "weights": {"NOUN": 4.0}}}</pre>
 */
public final class ClassWeightedQueryBuilder extends WordClassQueryBuilder<ClassWeightedQueryBuilder, ClassWeightedQuerySpec> {
  /** The query for {@code spec}. */
  public ClassWeightedQueryBuilder(ClassWeightedQuerySpec spec) {
    super(spec);
  }

  private ClassWeightedQueryBuilder(ClassWeightedQuerySpec spec, float boost, String queryName) {
    super(spec, boost, queryName);
  }

  /** Reads the query as another node wrote it. */
  public ClassWeightedQueryBuilder(StreamInput in) throws IOException {
    super(in, spec -> new ClassWeightedQuerySpec(spec.readString(), spec.readString(),
        spec.readMap(StreamInput::readString, StreamInput::readFloat), spec.readOptionalFloat()));
  }

  @Override
  protected void doWriteTo(StreamOutput out) throws IOException {
    out.writeString(spec.field());
    out.writeString(spec.word());
    out.writeMap(new TreeMap<>(spec.weights()), StreamOutput::writeString, StreamOutput::writeFloat);
    out.writeOptionalFloat(spec.defaultWeight());
  }

  /** Parses the JSON body. */
  public static ClassWeightedQueryBuilder fromXContent(XContentParser parser) throws IOException {
    Body body = readBody(parser, ClassWeightedQuerySpec.NAME, ClassWeightedQuerySpec.WEIGHTS, ClassWeightedQuerySpec.DEFAULT_WEIGHT);
    ClassWeightedQuerySpec spec = body.spec(b -> {
      Number defaultWeight = b.get(ClassWeightedQuerySpec.DEFAULT_WEIGHT, Number.class, "a number");
      return ClassWeightedQuerySpec.of(b.text(QueryParameters.FIELD), b.text(QueryParameters.WORD),
          weights(b.get(ClassWeightedQuerySpec.WEIGHTS, Map.class, "an object of class names and weights")),
          defaultWeight == null ? null : defaultWeight.floatValue());
    });
    return new ClassWeightedQueryBuilder(spec, body.boost(), body.queryName());
  }

  @SuppressWarnings("unchecked")
  private static Map<String, ?> weights(Map<?, ?> weights) {
    return (Map<String, ?>) weights;
  }
}
