package org.wordclass.elasticsearch;

import java.util.List;
import java.util.Map;
import org.elasticsearch.index.analysis.PreConfiguredTokenizer;
import org.elasticsearch.index.analysis.TokenFilterFactory;
import org.elasticsearch.index.analysis.TokenizerFactory;
import org.elasticsearch.indices.analysis.AnalysisModule.AnalysisProvider;
import org.elasticsearch.plugins.AnalysisPlugin;
import org.elasticsearch.plugins.Plugin;
import org.elasticsearch.plugins.SearchPlugin;
import org.wordclass.analysis.SentenceStandardTokenizer;
import org.wordclass.analysis.SentenceStandardTokenizerFactory;
import org.wordclass.analysis.WordClassFilterFactory;
import org.wordclass.engine.ClassRestrictedQuerySpec;
import org.wordclass.engine.ClassWeightedQuerySpec;
import org.wordclass.engine.EngineFilters;

/**
 * The Elasticsearch plugin: registers the token filter type {@value WordClassFilterFactory#NAME},
 * the tokenizer {@value SentenceStandardTokenizerFactory#NAME} and the queries {@value
 * ClassRestrictedQuerySpec#NAME} and {@value ClassWeightedQuerySpec#NAME}. A thin adapter over {@code org.wordclass.engine}; see
 * docs/elasticsearch.md.
 */
public class WordClassPlugin extends Plugin implements AnalysisPlugin, SearchPlugin {
  @Override
  public Map<String, AnalysisProvider<TokenFilterFactory>> getTokenFilters() {
    return Map.of(WordClassFilterFactory.NAME, AnalysisPlugin.requiresAnalysisSettings(
        (indexSettings, environment, name, settings) -> new WordClassTokenFilterFactory(environment, name, settings)));
  }

  /** The sentence-marking tokenizer defined in index settings, with its one argument, {@code maxTokenLength}. */
  @Override
  public Map<String, AnalysisProvider<TokenizerFactory>> getTokenizers() {
    return Map.of(SentenceStandardTokenizerFactory.NAME, AnalysisPlugin.requiresAnalysisSettings((indexSettings, environment, name, settings) -> {
      SentenceStandardTokenizerFactory tokenizer = EngineFilters.sentenceTokenizer(name,
          WordClassTokenFilterFactory.flat(settings), WordClassTokenFilterFactory.ENGINE_KEYS);
      return TokenizerFactory.newFactory(name, tokenizer::create);
    }));
  }

  /** The sentence-marking tokenizer named directly ({@code "tokenizer": "sentenceStandard"}), with its defaults. */
  @Override
  public List<PreConfiguredTokenizer> getPreConfiguredTokenizers() {
    return List.of(PreConfiguredTokenizer.singleton(SentenceStandardTokenizerFactory.NAME, SentenceStandardTokenizer::new));
  }

  @Override
  public List<QuerySpec<?>> getQueries() {
    return List.of(
        new QuerySpec<>(ClassRestrictedQuerySpec.NAME, ClassRestrictedQueryBuilder::new, ClassRestrictedQueryBuilder::fromXContent),
        new QuerySpec<>(ClassWeightedQuerySpec.NAME, ClassWeightedQueryBuilder::new, ClassWeightedQueryBuilder::fromXContent));
  }
}
