package org.wordclass.elasticsearch;

import static org.elasticsearch.xcontent.ConstructingObjectParser.constructorArg;

import java.io.IOException;
import java.util.List;
import org.elasticsearch.common.io.stream.StreamInput;
import org.elasticsearch.common.io.stream.StreamOutput;
import org.elasticsearch.xcontent.ConstructingObjectParser;
import org.elasticsearch.xcontent.ParseField;
import org.elasticsearch.xcontent.XContentParser;
import org.wordclass.engine.ClassRestrictedQuerySpec;
import org.wordclass.engine.QueryParameters;

/**
 * The {@value ClassRestrictedQuerySpec#NAME} query: a word where it was tagged as one of some
 * classes, read from the payload ({@link ClassRestrictedQuerySpec}).
 *
 * <pre>{"word_class_term": {"field": "body", "word": "book", "classes": ["VERB"]}}</pre>
 */
public final class ClassRestrictedQueryBuilder extends WordClassQueryBuilder<ClassRestrictedQueryBuilder, ClassRestrictedQuerySpec> {
  /**
   * Parses the JSON body with Elasticsearch's own parser, which refuses unknown parameters and
   * wrong types naming them; the spec checks the values.
   */
  @SuppressWarnings("unchecked")
  static final ConstructingObjectParser<ClassRestrictedQueryBuilder, Void> PARSER = new ConstructingObjectParser<>(
      ClassRestrictedQuerySpec.NAME, false,
      a -> new ClassRestrictedQueryBuilder(new ClassRestrictedQuerySpec((String) a[0], (String) a[1], (List<String>) a[2])));

  static {
    PARSER.declareString(constructorArg(), new ParseField(QueryParameters.FIELD));
    PARSER.declareString(constructorArg(), new ParseField(QueryParameters.WORD));
    PARSER.declareStringArray(constructorArg(), new ParseField(ClassRestrictedQuerySpec.CLASSES));
    declareStandardFields(PARSER);
  }

  /** Parses the JSON body. */
  public static ClassRestrictedQueryBuilder fromXContent(XContentParser parser) {
    return PARSER.apply(parser, null);
  }

  /** The query for {@code spec}. */
  public ClassRestrictedQueryBuilder(ClassRestrictedQuerySpec spec) {
    super(spec);
  }

  /** Reads the query as another node wrote it. */
  public ClassRestrictedQueryBuilder(StreamInput in) throws IOException {
    super(in, spec -> new ClassRestrictedQuerySpec(spec.readString(), spec.readString(), spec.readStringCollectionAsList()));
  }

  @Override
  protected void doWriteTo(StreamOutput out) throws IOException {
    out.writeString(spec.field());
    out.writeString(spec.word());
    out.writeStringCollection(spec.classes());
  }
}
