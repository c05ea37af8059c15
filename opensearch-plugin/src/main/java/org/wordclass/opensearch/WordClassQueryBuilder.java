package org.wordclass.opensearch;

import java.io.IOException;
import org.opensearch.core.xcontent.XContentBuilder;
import org.opensearch.core.xcontent.ToXContent;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.search.MatchNoDocsQuery;
import org.apache.lucene.search.Query;
import org.opensearch.core.common.ParsingException;
import org.opensearch.core.common.io.stream.StreamInput;
import org.opensearch.core.xcontent.XContentLocation;
import org.opensearch.core.xcontent.XContentParser;
import org.opensearch.index.analysis.CustomAnalyzer;
import org.opensearch.index.analysis.NamedAnalyzer;
import org.opensearch.index.mapper.MappedFieldType;
import org.opensearch.index.query.AbstractQueryBuilder;
import org.opensearch.index.query.QueryShardContext;
import org.wordclass.analysis.WordClassOptions;
import org.wordclass.engine.IndexedClasses;
import org.wordclass.engine.QuerySpec;
import org.wordclass.engine.QueryParameters;

/**
 * What both word-class query builders share: the parameters held as an engine-neutral spec
 * record (which checks them), parsing of the JSON body, and finding on each shard the model and
 * payload encoding of the field from its index analyzer. A field the shard's index does not map
 * matches nothing, as a term query on it would.
 *
 * @param <QB> the concrete builder
 * @param <S> the spec record
 */
abstract class WordClassQueryBuilder<QB extends WordClassQueryBuilder<QB, S>, S extends QuerySpec>
    extends AbstractQueryBuilder<QB> {
  /** Parameters every query takes besides its own, handled by {@link AbstractQueryBuilder}. */
  private static final Set<String> STANDARD = Set.of(BOOST_FIELD.getPreferredName(), NAME_FIELD.getPreferredName());

  final S spec;

  WordClassQueryBuilder(S spec) {
    this.spec = spec;
  }

  WordClassQueryBuilder(S spec, float boost, String queryName) {
    this(spec);
    boost(boost);
    queryName(queryName);
  }

  /**
   * Reads the query as another node wrote it: boost and name first ({@link
   * AbstractQueryBuilder#writeTo} writes them before {@link #doWriteTo}), then the spec.
   */
  WordClassQueryBuilder(StreamInput in, SpecReader<S> reader) throws IOException {
    super(in);
    this.spec = reader.read(in);
  }

  /** The field the spec searches. */
  String field() {
    return spec.field();
  }

  /** The Lucene query of the spec over a field indexed with {@code indexed}. */
  Query toLucene(WordClassOptions indexed) {
    return spec.toQuery(indexed);
  }

  @Override
  public String getWriteableName() {
    return spec.name();
  }

  @Override
  protected void doXContent(XContentBuilder builder, ToXContent.Params params) throws IOException {
    builder.startObject(spec.name());
    for (Map.Entry<String, Object> parameter : spec.parameters().entrySet()) {
      builder.field(parameter.getKey(), parameter.getValue());
    }
    printBoostAndQueryName(builder);
    builder.endObject();
  }

  @Override
  protected Query doToQuery(QueryShardContext context) throws IOException {
    MappedFieldType fieldType = context.fieldMapper(field());
    if (fieldType == null) {
      return new MatchNoDocsQuery("field [" + field() + "] is not mapped");
    }
    return toLucene(IndexedClasses.of(field(), filtersOf(fieldType.indexAnalyzer())));
  }

  private static List<?> filtersOf(NamedAnalyzer named) {
    Analyzer analyzer = named == null ? null : named.analyzer();
    return analyzer instanceof CustomAnalyzer ? List.of(((CustomAnalyzer) analyzer).tokenFilters()) : List.of();
  }

  @Override
  protected boolean doEquals(QB other) {
    return spec.equals(other.spec);
  }

  @Override
  protected int doHashCode() {
    return spec.hashCode();
  }

  /**
   * The JSON body of query {@code name}, refusing parameters other than {@code own}, {@value
   * QueryParameters#FIELD}, {@value QueryParameters#WORD}, {@code boost} and {@code _name}.
   */
  static Body readBody(XContentParser parser, String name, String... own) throws IOException {
    XContentLocation location = parser.getTokenLocation();
    Map<String, Object> values = parser.map();
    Set<String> known = new TreeSet<>(STANDARD);
    known.addAll(List.of(QueryParameters.FIELD, QueryParameters.WORD));
    known.addAll(List.of(own));
    for (String key : values.keySet()) {
      if (!known.contains(key)) {
        throw new ParsingException(location, "[" + name + "] does not take [" + key + "]; it takes " + known);
      }
    }
    return new Body(name, location, values);
  }

  /** A parsed JSON body, read by parameter with type checks naming the parameter. */
  static final class Body {
    private final String name;
    private final XContentLocation location;
    private final Map<String, Object> values;

    Body(String name, XContentLocation location, Map<String, Object> values) {
      this.name = name;
      this.location = location;
      this.values = values;
    }

    <T> T get(String parameter, Class<T> type, String expected) {
      Object value = values.get(parameter);
      if (value != null && !type.isInstance(value)) {
        throw new ParsingException(location, "[" + name + "] '" + parameter + "' must be " + expected + ", not " + value);
      }
      return type.cast(value);
    }

    String text(String parameter) {
      return get(parameter, String.class, "text");
    }

    float boost() {
      Number boost = get(BOOST_FIELD.getPreferredName(), Number.class, "a number");
      return boost == null ? DEFAULT_BOOST : boost.floatValue();
    }

    String queryName() {
      return text(NAME_FIELD.getPreferredName());
    }

    /** The spec made by {@code make}, its check failures reported at the body's location. */
    <S> S spec(SpecMaker<S> make) {
      try {
        return make.make(this);
      } catch (IllegalArgumentException e) {
        throw new ParsingException(location, "[" + name + "] " + e.getMessage(), e);
      }
    }
  }

  @FunctionalInterface
  interface SpecMaker<S> {
    S make(Body body);
  }

  /** Reads a spec as {@link #doWriteTo} wrote it. */
  @FunctionalInterface
  interface SpecReader<S> {
    S read(StreamInput in) throws IOException;
  }
}
