package org.wordclass.analysis;

import java.io.IOException;
import java.io.InputStream;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.apache.lucene.analysis.TokenFilterFactory;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.util.ResourceLoader;
import org.apache.lucene.util.ResourceLoaderAware;
import org.wordclass.decoding.SentenceBoundaries;
import org.wordclass.model.DefaultModel;
import org.wordclass.model.HmmModel;
import org.wordclass.model.LexiconFormatException;
import org.wordclass.model.ModelFormatException;
import org.wordclass.model.ShippedModels;
import org.wordclass.model.UserLexicon;

/**
 * Factory for {@link WordClassFilter}, followed by a {@link WordClassSelectFilter} when classes
 * are kept or dropped. SPI name {@value #NAME}:
 *
 * <pre class="prettyprint">
 * &lt;fieldType name="text_classed" class="solr.TextField" positionIncrementGap="100"&gt;
 *   &lt;analyzer&gt;
 *     &lt;tokenizer name="standard"/&gt;
 *     &lt;filter name="wordClass" payload="weight" weights="NOUN:2.0,PROPN:2.0,VERB:1.5"/&gt;
 *     &lt;filter name="lowercase"/&gt;
 *   &lt;/analyzer&gt;
 * &lt;/fieldType&gt;</pre>
 *
 * Arguments, all optional:
 *
 * <ul>
 *   <li>{@code model}: resource name of a model file, read through the resource loader (so a
 *       path in the configuration directory works); default the bundled English UPOS model.
 *       Loaded models are shared through {@link ModelCache}.
 *   <li>{@code language}: ISO 639-1 code of a model shipped in the jar ({@link ShippedModels}:
 *       {@code fr}, {@code de}, ...; {@code en} is the bundled English model; {@code no} is the
 *       Norwegian Bokmål model {@code nb}); not together with {@code model}. An unknown code
 *       fails naming the shipped ones. A shipped model is read only when a factory asks for it.
 *   <li>{@code lexicon}: resource name of a user lexicon (see {@link UserLexicon} and {@code
 *       docs/user-lexicon.md}), read through the resource loader like the model: the words it
 *       lists take only the classes it gives them, every other word is tagged as before. The
 *       model with the lexicon applied is shared through {@link ModelCache} by every analyzer
 *       naming the same model and lexicon files. A malformed lexicon fails {@link #inform},
 *       naming the file, line and reason.
 *   <li>{@code order}: {@code 1} or {@code 2}, the order of the transitions to decode with;
 *       default the order the model was trained for. Order 1 is faster, order 2 more accurate.
 *   <li>{@code confidence}: {@code true} to compute each token's posterior probability into
 *       {@link WordClassAttribute#getConfidence()} (a forward-backward pass: about three times the
 *       decoding cost); default {@code false}.
 *   <li>{@code payload}: {@code none}, {@code tag}, {@code index} or {@code weight}; see {@link
 *       PayloadEncoding}. Default {@code none}.
 *   <li>{@code weights}: class weights for {@code payload="weight"}, as {@code CLASS:weight}
 *       items separated by commas, e.g. {@code NOUN:2.0,PROPN:2.0,VERB:1.5}.
 *   <li>{@code defaultWeight}: weight of the classes {@code weights} does not list; default 1.0.
 *   <li>{@code keepClasses}: comma-separated classes; only their tokens are kept.
 *   <li>{@code dropClasses}: comma-separated classes whose tokens are removed; not together with
 *       {@code keepClasses}. Removed tokens leave position gaps.
 *   <li>{@code qualifiedTerms}: {@code true} to add, at each position, the word joined to its
 *       class ({@code book_VERB}); default {@code false}.
 *   <li>{@code separator}: what joins word and class in qualified terms; default {@code _}.
 *   <li>{@code maxWindow}: the most tokens decoded together (a longer sentence is cut, see
 *       {@link WordClassFilter}); default {@value WordClassOptions#DEFAULT_MAX_WINDOW}.
 *   <li>{@code boundaries}: {@code decoded} to let the decoder find sentence boundaries the
 *       tokenizer did not mark, before capitalised tokens, together with the classes ({@link
 *       SentenceBoundaries#DECODED}); {@code tokenizer} to decode each marked sentence (each
 *       field value, with a tokenizer that marks none) as one sentence, as before this
 *       argument existed. Default {@code decoded} (chosen on EWT dev: docs/accuracy.md).
 * </ul>
 *
 * Malformed or unknown arguments fail when the factory is constructed, naming the argument.
 * Class names are checked against the model's tag set when the model is loaded, in {@link
 * #inform}, and fail naming the argument, the class and the model's classes.
 */
public class WordClassFilterFactory extends TokenFilterFactory implements ResourceLoaderAware {
  /** SPI name. */
  public static final String NAME = "wordClass";

  private static final List<String> BOOLEANS = List.of("true", "false");
  /** Value of {@link #order} when the argument is absent: decode at the order of the model. */
  private static final int MODEL_ORDER = 0;

  private final String modelName;
  private final String language;
  private final String lexiconName;
  private final int order;
  private final boolean confidence;
  private final PayloadEncoding payload;
  private final Map<String, Float> weights;
  private final float defaultWeight;
  private final Set<String> selectedClasses;
  private final boolean keep;
  private final boolean qualifiedTerms;
  private final String separator;
  private final int maxWindow;
  private final SentenceBoundaries boundaries;

  private volatile WordClassOptions options;

  /** Creates the factory from its arguments, consuming them from {@code args}. */
  public WordClassFilterFactory(Map<String, String> args) {
    super(args);
    modelName = get(args, "model");
    language = get(args, "language");
    if (language != null && modelName != null) {
      throw new IllegalArgumentException("'model' and 'language' cannot both be given");
    }
    if (language != null && ShippedModels.resource(language) == null) {
      throw new IllegalArgumentException("'language': no model is shipped for '" + language
          + "'; shipped: " + ShippedModels.describe() + " (or name a model file with 'model')");
    }
    lexiconName = get(args, "lexicon");
    if (lexiconName != null && lexiconName.isBlank()) {
      throw new IllegalArgumentException("'lexicon' must name a resource");
    }
    String orderArg = get(args, "order", List.of("1", "2"));
    order = orderArg == null ? MODEL_ORDER : Integer.parseInt(orderArg);
    confidence = booleanArg(args, "confidence");
    payload = PayloadEncoding.valueOf(
        get(args, "payload", List.of("none", "tag", "index", "weight"), "none", false).toUpperCase(Locale.ROOT));
    boolean weighted = args.containsKey("weights") || args.containsKey("defaultWeight");
    if (weighted && payload != PayloadEncoding.WEIGHT) {
      throw new IllegalArgumentException("'weights' and 'defaultWeight' only apply with payload=\"weight\"");
    }
    weights = parseWeights(get(args, "weights", ""));
    defaultWeight = floatArg(args, "defaultWeight", ClassWeights.DEFAULT_WEIGHT);
    Set<String> keepClasses = classList(args, "keepClasses");
    Set<String> dropClasses = classList(args, "dropClasses");
    if (keepClasses != null && dropClasses != null) {
      throw new IllegalArgumentException("'keepClasses' and 'dropClasses' cannot both be given");
    }
    keep = keepClasses != null;
    selectedClasses = keep ? keepClasses : dropClasses;
    qualifiedTerms = booleanArg(args, "qualifiedTerms");
    separator = get(args, "separator", WordClassOptions.DEFAULT_SEPARATOR);
    if (separator.isEmpty()) {
      throw new IllegalArgumentException("'separator' must not be empty");
    }
    maxWindow = positiveIntArg(args, "maxWindow", WordClassOptions.DEFAULT_MAX_WINDOW);
    boundaries = SentenceBoundaries.parse(get(args, "boundaries", List.of("tokenizer", "decoded"),
        WordClassOptions.DEFAULT_BOUNDARIES.argument(), false), "boundaries");
    if (!args.isEmpty()) {
      throw new IllegalArgumentException("Unknown parameters: " + args);
    }
  }

  /** Default ctor for compatibility with SPI. */
  public WordClassFilterFactory() {
    throw defaultCtorException();
  }

  private boolean booleanArg(Map<String, String> args, String name) {
    return Boolean.parseBoolean(get(args, name, BOOLEANS, "false", false));
  }

  private static float floatArg(Map<String, String> args, String name, float defaultValue) {
    String value = args.remove(name);
    try {
      float parsed = value == null ? defaultValue : Float.parseFloat(value);
      if (Float.isFinite(parsed)) {
        return parsed;
      }
    } catch (NumberFormatException e) {
      // reported below, naming the argument
    }
    throw new IllegalArgumentException("'" + name + "' must be a finite number, not '" + value + "'");
  }

  private static int positiveIntArg(Map<String, String> args, String name, int defaultValue) {
    String value = args.remove(name);
    try {
      int parsed = value == null ? defaultValue : Integer.parseInt(value.trim());
      if (parsed > 0) {
        return parsed;
      }
    } catch (NumberFormatException e) {
      // reported below, naming the argument
    }
    throw new IllegalArgumentException("'" + name + "' must be a positive integer, not '" + value + "'");
  }

  private Set<String> classList(Map<String, String> args, String name) {
    boolean given = args.containsKey(name);
    Set<String> classes = getSet(args, name);
    if (given && classes == null) {
      throw new IllegalArgumentException("'" + name + "' lists no classes");
    }
    return classes;
  }

  /** Parses {@code CLASS:weight} items separated by commas or spaces. */
  static Map<String, Float> parseWeights(String spec) {
    Map<String, Float> parsed = new LinkedHashMap<>();
    for (String item : spec.split("[,\\s]+")) {
      if (item.isEmpty()) {
        continue;
      }
      int colon = item.lastIndexOf(':');
      Float weight = colon > 0 ? parseWeight(item.substring(colon + 1)) : null;
      if (weight == null) {
        throw new IllegalArgumentException("'weights' expects CLASS:weight items separated by commas, such as NOUN:2.0, not '" + item + "'");
      }
      if (parsed.put(item.substring(0, colon), weight) != null) {
        throw new IllegalArgumentException("'weights' gives the class " + item.substring(0, colon) + " twice");
      }
    }
    return parsed;
  }

  private static Float parseWeight(String text) {
    try {
      float weight = Float.parseFloat(text);
      return Float.isFinite(weight) ? weight : null;
    } catch (NumberFormatException e) {
      return null;
    }
  }

  /** Loads the model, applies the lexicon if any, and checks every class name against its tag set. */
  @Override
  public void inform(ResourceLoader loader) throws IOException {
    HmmModel model = lexiconName != null ? withLexicon(loader)
        : modelName != null ? load(loader, modelName)
        : shipped();
    if (selectedClasses != null) {
      WordClasses.mask(model.tags(), selectedClasses, keep ? "keepClasses" : "dropClasses");
    }
    options = WordClassOptions.of(model)
        .withOrder(order == MODEL_ORDER ? model.order() : order)
        .withConfidence(confidence)
        .withPayload(payload)
        .withWeights(ClassWeights.of(model.tags(), weights, defaultWeight, "weights"))
        .withQualifiedTerms(qualifiedTerms)
        .withSeparator(separator)
        .withMaxWindow(maxWindow)
        .withBoundaries(boundaries);
  }

  private static HmmModel load(ResourceLoader loader, String name) throws IOException {
    return read("model", name, () -> ModelCache.load(loader, name));
  }

  /** Both files are read in full before the lexicon is parsed, and parsed before the model is built. */
  private HmmModel withLexicon(ResourceLoader loader) throws IOException {
    byte[] modelBytes = modelName == null ? shippedBytes() : read("model", modelName, () -> ModelCache.readModelBytes(loader, modelName));
    byte[] lexiconBytes = read("lexicon", lexiconName, () -> {
      try (InputStream in = loader.openResource(lexiconName)) {
        return UserLexicon.readBytes(in, lexiconName);
      }
    });
    String source = modelName != null || language == null ? modelName : ShippedModels.resource(language);
    return ModelCache.withLexicon(modelBytes, source, lexiconBytes, lexiconName);
  }

  /** The shipped model asked for by {@code language}, shared through {@link ModelCache}; the bundled one by default. */
  private HmmModel shipped() throws IOException {
    byte[] bytes = shippedBytes();
    return bytes == null ? DefaultModel.get() : ModelCache.get(bytes, ShippedModels.resource(language));
  }

  /** The bytes of the shipped model asked for by {@code language}; null for the bundled English one or none. */
  private byte[] shippedBytes() throws IOException {
    if (language == null || ShippedModels.resource(language).equals(DefaultModel.RESOURCE)) {
      return null;
    }
    return ShippedModels.readBytes(language);
  }

  /** An I/O step on resource {@code name} of argument {@code arg}; a plain read failure names both. */
  private static <T> T read(String arg, String name, IoStep<T> step) throws IOException {
    try {
      return step.run();
    } catch (ModelFormatException | LexiconFormatException e) {
      throw e;
    } catch (IOException e) {
      throw new IOException("'" + arg + "': cannot read the " + arg + " resource " + name + ": " + e.getMessage(), e);
    }
  }

  @FunctionalInterface
  private interface IoStep<T> {
    T run() throws IOException;
  }

  /** The settings and model of the filters made, once {@link #inform} has run. */
  public WordClassOptions options() {
    WordClassOptions current = options;
    if (current == null) {
      throw new IllegalStateException("the " + NAME + " filter factory was not informed with a resource loader");
    }
    return current;
  }

  @Override
  public TokenStream create(TokenStream input) {
    WordClassOptions current = options();
    TokenStream tagged = new WordClassFilter(input, current);
    if (selectedClasses == null) {
      return tagged;
    }
    return new WordClassSelectFilter(tagged, current.model().tags(), selectedClasses, keep);
  }
}
