package org.wordclass.testing;

import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;

/**
 * Locates the open treebanks in {@code ../shared/corpora} (Universal Dependencies releases, see
 * the README there) for tests that check the project against them. On a machine without them
 * such tests are skipped with a message saying why; CI's {@code .ci/run} refuses to start
 * without the folder, so there they always run.
 */
public final class Corpora {
  private Corpora() {}

  /** The corpora folder: system property {@code wordclass.corpora}, else {@code ../shared/corpora}. */
  public static Path root() {
    String configured = System.getProperty("wordclass.corpora");
    return configured != null && !configured.isBlank() ? Paths.get(configured) : Paths.get("..", "shared", "corpora");
  }

  /** A file below the corpora folder; skips the calling test if it is not there. */
  public static Path require(String relative) {
    Path path = root().resolve(relative);
    assumeTrue(Files.isRegularFile(path),
        "skipped: " + path + " not found; these checks need the treebanks in ../shared/corpora");
    return path;
  }

  public static Path ewtTrain() {
    return require("ud-english-ewt/en_ewt-ud-train.conllu");
  }

  public static Path ewtDev() {
    return require("ud-english-ewt/en_ewt-ud-dev.conllu");
  }

  public static Path ewtTest() {
    return require("ud-english-ewt/en_ewt-ud-test.conllu");
  }
}
