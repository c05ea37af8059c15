package org.wordclass.elasticsearch;

import static org.elasticsearch.xcontent.ConstructingObjectParser.constructorArg;
import static org.elasticsearch.xcontent.ConstructingObjectParser.optionalConstructorArg;

import java.io.IOException;
import java.util.Map;
import java.util.TreeMap;
import org.elasticsearch.common.io.stream.StreamInput;
import org.elasticsearch.common.io.stream.StreamOutput;
import org.elasticsearch.xcontent.ConstructingObjectParser;
import org.elasticsearch.xcontent.ParseField;
import org.elasticsearch.xcontent.XContentParser;
import org.wordclass.engine.ClassWeightedQuerySpec;
import org.wordclass.engine.QueryParameters;

/**
 * The {@value ClassWeightedQuerySpec#NAME} query: a word, each match scored by the weight of the
 * class it was tagged with ({@link ClassWeightedQuerySpec}).
 *
 * <pre>{"class_weighted_term": {"field": "body", "word": "book", "weights": {"VERB": 4.0}}}</pre>
 */
public final class ClassWeightedQueryBuilder extends WordClassQueryBuilder<ClassWeightedQueryBuilder, ClassWeightedQuerySpec> {
  /** Parses the JSON body with Elasticsearch's own parser; the spec checks the values. */
  @SuppressWarnings("unchecked")
  static final ConstructingObjectParser<ClassWeightedQueryBuilder, Void> PARSER = new ConstructingObjectParser<>(
      ClassWeightedQuerySpec.NAME, false,
      a -> new ClassWeightedQueryBuilder(ClassWeightedQuerySpec.of((String) a[0], (String) a[1], (Map<String, ?>) a[2], (Float) a[3])));

  static {
    PARSER.declareString(constructorArg(), new ParseField(QueryParameters.FIELD));
    PARSER.declareString(constructorArg(), new ParseField(QueryParameters.WORD));
    PARSER.declareObject(optionalConstructorArg(), (parser, context) -> parser.map(), new ParseField(ClassWeightedQuerySpec.WEIGHTS));
    PARSER.declareFloat(optionalConstructorArg(), new ParseField(ClassWeightedQuerySpec.DEFAULT_WEIGHT));
    declareStandardFields(PARSER);
  }

  /** Parses the JSON body. */
  public static ClassWeightedQueryBuilder fromXContent(XContentParser parser) {
    return PARSER.apply(parser, null);
  }

  /** The query for {@code spec}. */
  public ClassWeightedQueryBuilder(ClassWeightedQuerySpec spec) {
    super(spec);
  }

  /** Reads the query as another node wrote it. */
  public ClassWeightedQueryBuilder(StreamInput in) throws IOException {
    super(in, spec -> new ClassWeightedQuerySpec(spec.readString(), spec.readString(), spec.readMap(StreamInput::readFloat),
        spec.readOptionalFloat()));
  }

  @Override
  protected void doWriteTo(StreamOutput out) throws IOException {
    out.writeString(spec.field());
    out.writeString(spec.word());
    out.writeMap(new TreeMap<>(spec.weights()), StreamOutput::writeFloat);
    out.writeOptionalFloat(spec.defaultWeight());
  }
}
