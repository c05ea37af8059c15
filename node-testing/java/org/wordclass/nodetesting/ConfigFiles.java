package org.wordclass.nodetesting;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * The files the tests put in a node's configuration directory, under {@code wordclass/}: the
 * hiking club's lexicon from config-examples (named by index-settings.json), a copy of the
 * bundled model, and a corrupted copy. The model bytes come from the analyzer jar's resource,
 * read through the class path of whoever calls (only the test, never the node under test).
 */
public final class ConfigFiles {
  static final String MODEL_RESOURCE = "org/wordclass/models/en-ewt-upos.wcm";

  private ConfigFiles() {}

  /** The config-examples folder of the checkout. */
  static Path examples() {
    return Path.of(System.getProperty("wordclass.examples", "../../config-examples"));
  }

  /** The index settings users copy: config-examples/opensearch/index-settings.json, as it is. */
  public static String indexSettings() {
    return read(examples().resolve("opensearch/index-settings.json"));
  }

  /** The French example: config-examples/opensearch/index-settings-fr.json, as it is (the shipped French model, no files). */
  public static String frenchIndexSettings() {
    return read(examples().resolve("opensearch/index-settings-fr.json"));
  }

  public static void install(Path configDir) throws IOException {
    Path dir = Files.createDirectories(configDir.resolve("wordclass"));
    Files.copy(examples().resolve("lucene/hiking-lexicon.txt"), dir.resolve("hiking-lexicon.txt"));
    byte[] model = bundledModel();
    Files.write(dir.resolve("en.wcm"), model);
    byte[] corrupt = model.clone();
    corrupt[corrupt.length / 2] ^= 0x55;
    Files.write(dir.resolve("corrupt.wcm"), corrupt);
  }

  static byte[] bundledModel() throws IOException {
    try (InputStream in = ConfigFiles.class.getClassLoader().getResourceAsStream(MODEL_RESOURCE)) {
      if (in == null) {
        throw new IOException(MODEL_RESOURCE + " is not on the test class path");
      }
      return in.readAllBytes();
    }
  }

  private static String read(Path file) {
    try {
      return Files.readString(file);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }
}
