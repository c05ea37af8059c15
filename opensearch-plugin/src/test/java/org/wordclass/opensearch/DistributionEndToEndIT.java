package org.wordclass.opensearch;

import static org.junit.Assert.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
import org.junit.AfterClass;
import org.junit.BeforeClass;
import org.junit.Test;
import org.wordclass.nodetesting.ConfigFiles;
import org.wordclass.nodetesting.NodeProcess;
import org.wordclass.nodetesting.Rest;
import org.wordclass.nodetesting.RestScenario;

/**
 * The built plugin zip on the real OpenSearch distribution of its line (the integ-test zip from
 * Maven Central, unpacked by the build): installed with {@code bin/opensearch-plugin install
 * --batch}, the node started as its own process and used over REST on 127.0.0.1, then stopped by
 * its PID and its folder removed ({@link NodeProcess}, shared with the Elasticsearch plugin's test).
 */
public class DistributionEndToEndIT {
  private static NodeProcess node;
  private static RestScenario scenario;

  @BeforeClass
  public static void installAndStart() throws Exception {
    node = NodeProcess.install(NodeProcess.Engine.OPENSEARCH,
        Path.of(System.getProperty("wordclass.distribution")), Path.of(System.getProperty("wordclass.pluginZip")));
    try {
      ConfigFiles.install(node.configDir());
      Path locked = Files.writeString(node.configDir().resolve("wordclass/locked.wcm"), "x");
      Files.setPosixFilePermissions(locked, PosixFilePermissions.fromString("---------"));
      node.start(384, List.of());
    } catch (Exception | Error e) {
      stop();
      throw e;
    }
    scenario = new RestScenario(node);
  }

  @AfterClass
  public static void stop() {
    if (node != null) {
      node.close();
      node = null;
    }
  }

  @Test
  public void theInstalledPluginTagsIndexesAndQueries() throws IOException {
    Rest.Response plugins = node.call("GET", "/_cat/plugins?format=json", null);
    assertTrue(plugins.text, plugins.text.contains("\"component\":\"wordclass\""));
    scenario.createAndIndex();
    scenario.analyzeShowsClasses();
    scenario.queriesFindByClass();
    scenario.resultsComeFromEveryShard();
    scenario.badQueriesAreRefused();
    node.call("DELETE", "/" + RestScenario.INDEX, null);
  }

  @Test
  public void badSettingsAreRefusedWith400() throws IOException {
    // locked.wcm belongs to the node's user, who may not read it
    scenario.badSettingsAreRefused("wordclass/locked.wcm");
  }
}
