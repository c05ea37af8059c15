package org.wordclass.elasticsearch;

import java.io.IOException;
import org.elasticsearch.common.io.stream.StreamInput;
import org.elasticsearch.xcontent.XContentBuilder;
import org.elasticsearch.xcontent.ToXContent;
import java.util.Map;
import java.util.List;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.search.MatchNoDocsQuery;
import org.apache.lucene.search.Query;
import org.elasticsearch.TransportVersion;
import org.elasticsearch.TransportVersions;
import org.elasticsearch.index.analysis.CustomAnalyzer;
import org.elasticsearch.index.analysis.NamedAnalyzer;
import org.elasticsearch.index.query.AbstractQueryBuilder;
import org.elasticsearch.index.query.QueryShardException;
import org.elasticsearch.index.query.SearchExecutionContext;
import org.wordclass.analysis.WordClassOptions;
import org.wordclass.engine.IndexedClasses;
import org.wordclass.engine.QuerySpec;

/**
 * What both word-class query builders share: the parameters held as an engine-neutral spec
 * record (which checks them), and finding on each shard the model and payload encoding of the
 * field from its index analyzer. A field the shard's index does not map matches nothing, as a
 * term query on it would; a field the spec cannot be used on fails the shard with a {@link
 * QueryShardException} (HTTP 400) naming the field and the reason.
 *
 * @param <QB> the concrete builder
 * @param <S> the spec record
 */
abstract class WordClassQueryBuilder<QB extends WordClassQueryBuilder<QB, S>, S extends QuerySpec>
    extends AbstractQueryBuilder<QB> {
  final S spec;

  WordClassQueryBuilder(S spec) {
    this.spec = spec;
  }

  /**
   * Reads the query as another node wrote it: boost and name first ({@link
   * AbstractQueryBuilder#writeTo} writes them before {@link #doWriteTo}), then the spec.
   */
  WordClassQueryBuilder(StreamInput in, SpecReader<S> reader) throws IOException {
    super(in);
    this.spec = reader.read(in);
  }

  /** Reads a spec as {@link #doWriteTo} wrote it. */
  @FunctionalInterface
  interface SpecReader<S> {
    S read(StreamInput in) throws IOException;
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
    boostAndQueryNameToXContent(builder);
    builder.endObject();
  }

  @Override
  protected Query doToQuery(SearchExecutionContext context) throws IOException {
    if (context.getFieldType(field()) == null) {
      return new MatchNoDocsQuery("field [" + field() + "] is not mapped");
    }
    try {
      NamedAnalyzer analyzer = context.getMappingLookup().indexAnalyzer(field(), unmapped -> null);
      return toLucene(IndexedClasses.of(field(), filtersOf(analyzer)));
    } catch (IllegalArgumentException e) {
      throw new QueryShardException(context, e.getMessage(), e);
    }
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

  /** Our wire format has not changed since the first release, which needs Elasticsearch 8. */
  @Override
  public TransportVersion getMinimalSupportedVersion() {
    return TransportVersions.V_8_0_0;
  }
}
