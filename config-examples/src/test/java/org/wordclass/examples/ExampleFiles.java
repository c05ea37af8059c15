package org.wordclass.examples;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.nio.file.StandardCopyOption;
import java.util.stream.Stream;
import org.wordclass.model.DefaultModel;

/** Where the example files live: this module's own folders, read in place by every test. */
public final class ExampleFiles {
  private ExampleFiles() {}

  /** The module folder; surefire passes it, and a run from the module folder finds it too. */
  public static Path moduleDir() {
    String configured = System.getProperty("wordclass.examples");
    Path dir = configured == null ? Paths.get("").toAbsolutePath() : Paths.get(configured);
    if (!Files.isDirectory(dir.resolve("lucene")) || !Files.isDirectory(dir.resolve("solr"))) {
      throw new IllegalStateException("not the config-examples module folder: " + dir);
    }
    return dir;
  }

  /** An example analyzer chain, {@code lucene/NAME.properties}. */
  public static Path luceneChain(String name) {
    return moduleDir().resolve("lucene").resolve(name + ".properties");
  }

  /** The demo config set folder, holding {@code conf/}. */
  public static Path solrConfigSet() {
    return moduleDir().resolve("solr").resolve("wordclass-demo");
  }

  /** Copies the folder tree {@code from} to {@code to}, which must not exist yet. */
  public static void copyTree(Path from, Path to) throws IOException {
    try (Stream<Path> paths = Files.walk(from)) {
      for (Path source : (Iterable<Path>) paths::iterator) {
        Path target = to.resolve(from.relativize(source).toString());
        if (Files.isDirectory(source)) {
          Files.createDirectories(target);
        } else {
          Files.copy(source, target);
        }
      }
    }
  }

  /**
   * Writes the model bundled in the plugin jar to {@code target}: what a user does with their own
   * model file, done here with the one model every checkout has, so no model is committed twice.
   */
  public static void copyBundledModel(Path target) {
    try (InputStream in = DefaultModel.class.getClassLoader().getResourceAsStream(DefaultModel.RESOURCE)) {
      if (in == null) {
        throw new IllegalStateException("the bundled model is not on the class path");
      }
      Files.createDirectories(target.getParent());
      Files.copy(in, target, StandardCopyOption.REPLACE_EXISTING);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }
}
