package org.wordclass.opensearch;

import java.io.IOException;
import java.util.List;
import org.opensearch.core.common.io.stream.StreamInput;
import org.opensearch.core.common.io.stream.StreamOutput;
import org.opensearch.core.xcontent.XContentParser;
import org.wordclass.engine.ClassRestrictedQuerySpec;
import org.wordclass.engine.QueryParameters;

/**
 * The {@value ClassRestrictedQuerySpec#NAME} query: a word where it was tagged as one of some
 * classes, read from the payload ({@link ClassRestrictedQuerySpec}).
 *
 * <pre>{"word_class_term": {"field": "body", "word": "park", "classes": ["NOUN"]}}</pre>
 */
public final class ClassRestrictedQueryBuilder extends WordClassQueryBuilder<ClassRestrictedQueryBuilder, ClassRestrictedQuerySpec> {
  /** The query for {@code spec}. */
  public ClassRestrictedQueryBuilder(ClassRestrictedQuerySpec spec) {
    super(spec);
  }

  private ClassRestrictedQueryBuilder(ClassRestrictedQuerySpec spec, float boost, String queryName) {
    super(spec, boost, queryName);
  }

  /** Reads the query as another node wrote it. */
  public ClassRestrictedQueryBuilder(StreamInput in) throws IOException {
    super(in, spec -> new ClassRestrictedQuerySpec(spec.readString(), spec.readString(), spec.readStringList()));
  }

  @Override
  protected void doWriteTo(StreamOutput out) throws IOException {
    out.writeString(spec.field());
    out.writeString(spec.word());
    out.writeStringCollection(spec.classes());
  }

  /** Parses the JSON body. */
  public static ClassRestrictedQueryBuilder fromXContent(XContentParser parser) throws IOException {
    Body body = readBody(parser, ClassRestrictedQuerySpec.NAME, ClassRestrictedQuerySpec.CLASSES);
    ClassRestrictedQuerySpec spec = body.spec(b -> new ClassRestrictedQuerySpec(
        b.text(QueryParameters.FIELD), b.text(QueryParameters.WORD), classes(b.get(ClassRestrictedQuerySpec.CLASSES, List.class, "a list"))));
    return new ClassRestrictedQueryBuilder(spec, body.boost(), body.queryName());
  }

  private static List<String> classes(List<?> items) {
    if (items == null) {
      return null;
    }
    for (Object item : items) {
      if (!(item instanceof String)) {
        throw new IllegalArgumentException("'" + ClassRestrictedQuerySpec.CLASSES + "' must list class names, not " + item);
      }
    }
    @SuppressWarnings("unchecked")
    List<String> names = (List<String>) items;
    return names;
  }
}
