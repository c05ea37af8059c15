package org.wordclass.elasticsearch;

import java.util.List;
import java.util.Map;
import java.util.Set;
import org.apache.lucene.analysis.TokenStream;
import org.elasticsearch.common.settings.Settings;
import org.elasticsearch.env.Environment;
import org.elasticsearch.index.analysis.AbstractTokenFilterFactory;
import org.wordclass.analysis.WordClassFilterFactory;
import org.wordclass.engine.EngineFilters;
import org.wordclass.engine.FilterArguments;
import org.wordclass.engine.WordClassFilterHolder;

/**
 * The {@value WordClassFilterFactory#NAME} filter type of an index's analysis settings: the
 * filter's settings become the Lucene factory's arguments, and model and lexicon files are read
 * from the node's configuration directory (see {@link EngineFilters}). Any bad setting fails
 * index creation with an {@link IllegalArgumentException}, which Elasticsearch answers with HTTP
 * 400.
 */
final class WordClassTokenFilterFactory extends AbstractTokenFilterFactory implements WordClassFilterHolder {
  /** Settings Elasticsearch itself reads from a filter definition. */
  static final Set<String> ENGINE_KEYS = Set.of("type");

  private final WordClassFilterFactory factory;

  WordClassTokenFilterFactory(Environment environment, String name, Settings settings) {
    super(name, settings);
    factory = EngineFilters.create(name, flat(settings), ENGINE_KEYS, environment.configFile());
  }

  /**
   * The settings as dotted keys and text values. Elasticsearch keeps a list as one list-valued
   * key, which becomes {@code key.0}, {@code key.1}, ... as the engine layer expects; a list of
   * one item and a plain value mean the same to the factory, so both pass as the plain value.
   */
  static Map<String, String> flat(Settings settings) {
    return FilterArguments.flatten(settings.keySet(), key -> settings.getAsList(key, List.of(), false), key -> null);
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
