package org.wordclass.elasticsearch;

import static org.junit.Assert.assertFalse;
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
 * The built plugin zip on a real Elasticsearch 8.17.4 node (the integ-test distribution from
 * Maven Central, unpacked by the build), installed with {@code bin/elasticsearch-plugin install
 * --batch} and used over REST with the same scenario as the OpenSearch plugin's test.
 *
 * <p>The distribution has security on by default; the test node turns it off
 * ({@code xpack.security.enabled=false}) and the disk-usage threshold too (a fairly full disk
 * would otherwise leave the shards unassigned). {@code GET /} answers 405 on this distribution, so
 * readiness is checked on {@code GET /_nodes}.
 */
public class ElasticsearchNodeIT {
  private static NodeProcess node;
  private static RestScenario scenario;

  @BeforeClass
  public static void installAndStart() throws Exception {
    node = NodeProcess.install(NodeProcess.Engine.ELASTICSEARCH,
        Path.of(System.getProperty("es.home")), Path.of(System.getProperty("es.plugin.zip")));
    try {
      ConfigFiles.install(node.configDir());
      Path locked = Files.writeString(node.configDir().resolve("wordclass/locked.wcm"), "x");
      Files.setPosixFilePermissions(locked, PosixFilePermissions.fromString("---------"));
      node.start(512, List.of("xpack.security.enabled=false", "cluster.routing.allocation.disk.threshold_enabled=false",
          "xpack.ml.enabled=false"));
    } catch (Exception | Error e) {
      stop();
      throw e;
    }
    scenario = new RestScenario(node);
  }

  @AfterClass
  public static void stop() {
    if (node != null) {
      long pid = node.serverPid();
      node.close();
      node = null;
      assertFalse("the server process " + pid + " has ended", ProcessHandle.of(pid).map(ProcessHandle::isAlive).orElse(false));
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
