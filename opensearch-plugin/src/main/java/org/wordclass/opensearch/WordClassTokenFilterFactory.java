package org.wordclass.opensearch;

import java.util.List;
import java.util.Map;
import java.util.Set;
import org.apache.lucene.analysis.TokenStream;
import org.opensearch.common.settings.Settings;
import org.opensearch.env.Environment;
import org.opensearch.index.IndexSettings;
import org.opensearch.index.analysis.AbstractTokenFilterFactory;
import org.wordclass.analysis.WordClassFilterFactory;
import org.wordclass.engine.EngineFilters;
import org.wordclass.engine.FilterArguments;
import org.wordclass.engine.WordClassFilterHolder;

/**
 * The {@value WordClassFilterFactory#NAME} filter type of an index's analysis settings: the
 * filter's settings become the Lucene factory's arguments, and model and lexicon files are read
 * from the node's configuration directory (see {@link EngineFilters}). Any bad setting fails
 * index creation with an {@link IllegalArgumentException}, which OpenSearch answers with HTTP 400.
 */
final class WordClassTokenFilterFactory extends AbstractTokenFilterFactory implements WordClassFilterHolder {
  /** Settings OpenSearch itself reads from a filter definition. */
  static final Set<String> ENGINE_KEYS = Set.of("type");

  private final WordClassFilterFactory factory;

  WordClassTokenFilterFactory(IndexSettings indexSettings, Environment environment, String name, Settings settings) {
    super(indexSettings, name, settings);
    factory = EngineFilters.create(name, flat(settings), ENGINE_KEYS, NodeConfig.configDir(environment));
  }

  /**
   * The settings as dotted keys and text values; a list setting, which OpenSearch keeps as one
   * list-valued key, becomes {@code key.0}, {@code key.1}, ... as the engine layer expects.
   */
  static Map<String, String> flat(Settings settings) {
    return FilterArguments.flatten(settings.keySet(), key -> settings.getAsList(key, List.of(), false), settings::get);
  }

  @Override
  public WordClassFilterFactory wordClassFactory() {
    return factory;
  }

  @Override
  public TokenStream create(TokenStream input) {
    return factory.create(input);
  }
}
