package org.wordclass.engine;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;
import org.apache.lucene.util.ResourceLoader;
import org.wordclass.analysis.SentenceStandardTokenizerFactory;
import org.wordclass.analysis.WordClassFilterFactory;

/**
 * Makes a ready {@link WordClassFilterFactory} from the settings an engine gives a token filter
 * (and a {@link SentenceStandardTokenizerFactory} from a tokenizer's settings):
 * the settings become the factory's arguments ({@link FilterArguments}), the factory checks them
 * (it is the one parser of its arguments, so unknown and new arguments are its business), and is
 * informed through a {@link ConfigDirResourceLoader} on the node's configuration directory, which
 * loads the model and lexicon.
 *
 * <p>Every way this can fail comes out as an {@link IllegalArgumentException} whose message
 * starts with the filter's name and names the argument or file and the reason: a malformed or
 * unknown argument, a model or lexicon file that is missing, outside the configuration
 * directory, a directory, unreadable, corrupt or of the wrong kind, a class the model does not
 * have. Engines answer {@code IllegalArgumentException} during index creation with HTTP 400, so
 * a bad setting is the user's error, never the server's.
 *
 * <p>Cost: the first filter naming a model file parses it (tens of milliseconds for the bundled
 * model); every later one, in any index of the node, reads and hashes the file's bytes and
 * shares the parsed model ({@link org.wordclass.analysis.ModelCache}).
 */
public final class EngineFilters {
  private EngineFilters() {}

  /**
   * The factory for filter {@code filterName} with engine settings {@code settings}, minus the
   * engine's own keys {@code engineKeys}, reading files under {@code configDir}.
   *
   * @throws IllegalArgumentException naming the filter, the argument or file, and the reason
   */
  public static WordClassFilterFactory create(String filterName, Map<String, String> settings, Set<String> engineKeys,
      Path configDir) {
    ResourceLoader loader = new ConfigDirResourceLoader(configDir, EngineFilters.class.getClassLoader());
    return create(filterName, FilterArguments.fromFlatSettings(settings, engineKeys), loader);
  }

  /**
   * The factory for filter {@code filterName} with factory arguments {@code args}, informed by
   * {@code loader}.
   *
   * @throws IllegalArgumentException naming the filter, the argument or file, and the reason
   */
  public static WordClassFilterFactory create(String filterName, Map<String, String> args, ResourceLoader loader) {
    try {
      WordClassFilterFactory factory = new WordClassFilterFactory(new LinkedHashMap<>(args));
      factory.inform(loader);
      return factory;
    } catch (IllegalArgumentException e) {
      throw refused(filterName, e.getMessage(), e);
    } catch (IOException e) {
      throw refused(filterName, e.getMessage(), e);
    } catch (UncheckedIOException e) {
      throw refused(filterName, e.getCause().getMessage(), e);
    }
  }

  /**
   * The {@value SentenceStandardTokenizerFactory#NAME} tokenizer named {@code tokenizerName} with
   * engine settings {@code settings}, minus the engine's own keys {@code engineKeys}. The Lucene
   * factory checks the arguments, so the engines accept exactly what Lucene and Solr accept.
   *
   * @throws IllegalArgumentException naming the tokenizer, the argument and the reason
   */
  public static SentenceStandardTokenizerFactory sentenceTokenizer(String tokenizerName, Map<String, String> settings,
      Set<String> engineKeys) {
    try {
      return new SentenceStandardTokenizerFactory(
          new LinkedHashMap<>(FilterArguments.fromFlatSettings(settings, engineKeys)));
    } catch (IllegalArgumentException e) {
      throw refused(SentenceStandardTokenizerFactory.NAME + " tokenizer", tokenizerName, e.getMessage(), e);
    }
  }

  private static IllegalArgumentException refused(String filterName, String reason, Exception cause) {
    return refused(WordClassFilterFactory.NAME + " filter", filterName, reason, cause);
  }

  private static IllegalArgumentException refused(String kind, String name, String reason, Exception cause) {
    return new IllegalArgumentException("the " + kind + " [" + name + "] cannot be used: " + reason, cause);
  }
}
