package org.wordclass.opensearch;

import java.util.List;
import java.util.Map;
import org.opensearch.index.analysis.TokenFilterFactory;
import org.opensearch.indices.analysis.AnalysisModule.AnalysisProvider;
import org.opensearch.plugins.AnalysisPlugin;
import org.opensearch.plugins.Plugin;
import org.opensearch.plugins.SearchPlugin;
import org.wordclass.analysis.WordClassFilterFactory;
import org.wordclass.engine.ClassRestrictedQuerySpec;
import org.wordclass.engine.ClassWeightedQuerySpec;

/**
 * The OpenSearch plugin: registers the token filter type {@value WordClassFilterFactory#NAME}
 * and the queries {@value ClassRestrictedQuerySpec#NAME} and {@value
 * ClassWeightedQuerySpec#NAME}. A thin adapter over {@code org.wordclass.engine}; see
 * docs/opensearch.md.
 */
public class WordClassPlugin extends Plugin implements AnalysisPlugin, SearchPlugin {
  @Override
  public Map<String, AnalysisProvider<TokenFilterFactory>> getTokenFilters() {
    return Map.of(WordClassFilterFactory.NAME, AnalysisPlugin.requiresAnalysisSettings(WordClassTokenFilterFactory::new));
  }

  @Override
  public List<QuerySpec<?>> getQueries() {
    return List.of(
        new QuerySpec<>(ClassRestrictedQuerySpec.NAME, ClassRestrictedQueryBuilder::new, ClassRestrictedQueryBuilder::fromXContent),
        new QuerySpec<>(ClassWeightedQuerySpec.NAME, ClassWeightedQueryBuilder::new, ClassWeightedQueryBuilder::fromXContent));
  }
}
