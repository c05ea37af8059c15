package org.wordclass.examples.lucene;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import java.util.Properties;
import org.apache.lucene.analysis.custom.CustomAnalyzer;

/**
 * Reads an example analyzer chain from {@code lucene/*.properties} into a {@link CustomAnalyzer}
 * by SPI names, the way a program would build it from its own configuration:
 *
 * <pre>
 * tokenizer = standard
 * filter.1 = wordClass
 * filter.1.payload = tag
 * filter.2 = lowercase
 * </pre>
 *
 * Filters run in the order of their numbers, which must count up from 1 without gaps; {@code
 * tokenizer.ARG} and {@code filter.N.ARG} set arguments. Resource arguments, such as a model
 * file, are read relative to the file's folder. Any other key is an error.
 */
final class ChainFile {
  private ChainFile() {}

  static CustomAnalyzer load(Path file) throws IOException {
    Properties chain = new Properties();
    try (Reader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
      chain.load(in);
    }
    Map<String, String> keys = new HashMap<>();
    chain.stringPropertyNames().forEach(key -> keys.put(key, chain.getProperty(key).trim()));

    CustomAnalyzer.Builder builder = CustomAnalyzer.builder(file.toAbsolutePath().getParent());
    String tokenizer = keys.remove("tokenizer");
    if (tokenizer == null) {
      throw new IllegalArgumentException(file + ": no tokenizer");
    }
    builder.withTokenizer(tokenizer, argsWithPrefix(keys, "tokenizer."));
    for (int n = 1; keys.containsKey("filter." + n); n++) {
      String name = keys.remove("filter." + n);
      builder.addTokenFilter(name, argsWithPrefix(keys, "filter." + n + "."));
    }
    if (!keys.isEmpty()) {
      throw new IllegalArgumentException(file + ": keys out of place or misnumbered: " + keys.keySet());
    }
    return builder.build();
  }

  /** Removes the keys starting with {@code prefix} and returns them without it. */
  private static Map<String, String> argsWithPrefix(Map<String, String> keys, String prefix) {
    Map<String, String> args = new HashMap<>();
    keys.keySet().removeIf(key -> {
      if (key.startsWith(prefix)) {
        args.put(key.substring(prefix.length()), keys.get(key));
        return true;
      }
      return false;
    });
    return args;
  }
}
