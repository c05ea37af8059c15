package org.wordclass.opensearch;

import java.nio.file.Path;
import org.opensearch.env.Environment;

/**
 * The one place where the OpenSearch 3.x API differs from the other line for this plugin: how a
 * node's configuration directory is named ({@code Environment.configDir()} in 3.x).
 */
final class NodeConfig {
  private NodeConfig() {}

  /** The node's configuration directory, where analysis files are kept. */
  static Path configDir(Environment environment) {
    return environment.configDir();
  }
}
