package org.wordclass.opensearch;

import java.nio.file.Path;
import java.util.List;
import org.junit.BeforeClass;
import org.wordclass.nodetesting.NodeProcess;
import org.wordclass.nodetesting.PluginOnNodeTestCase;

/**
 * The built plugin zip on the real OpenSearch distribution of its line (the integ-test zip from
 * Maven Central, unpacked by the build): installed with {@code bin/opensearch-plugin install
 * --batch}, the node started as its own process and used over REST on 127.0.0.1, then stopped by
 * its PID and its folder removed ({@link NodeProcess}, shared with the Elasticsearch plugin's test).
 */
public class DistributionEndToEndIT extends PluginOnNodeTestCase {
  @BeforeClass
  public static void installAndStart() throws Exception {
    startNode(NodeProcess.Engine.OPENSEARCH, Path.of(System.getProperty("wordclass.distribution")),
        Path.of(System.getProperty("wordclass.pluginZip")), 384, List.of());
  }
}
