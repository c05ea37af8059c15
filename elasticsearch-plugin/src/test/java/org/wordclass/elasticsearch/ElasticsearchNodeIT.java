package org.wordclass.elasticsearch;

import java.nio.file.Path;
import java.util.List;
import org.junit.BeforeClass;
import org.wordclass.nodetesting.NodeProcess;
import org.wordclass.nodetesting.PluginOnNodeTestCase;

/**
 * The built plugin zip on a real Elasticsearch 8.17.4 node (the integ-test distribution from
 * Maven Central, unpacked by the build), installed with {@code bin/elasticsearch-plugin install
 * --batch} and used over REST with the same scenario as the OpenSearch plugin's test.
 *
 * <p>The distribution has security on by default; the test node turns it off
 * ({@code xpack.security.enabled=false}), and the disk-usage threshold too (on a fairly full disk
 * the shards would stay unassigned). {@code GET /} answers 405 on this distribution, so readiness
 * is checked on {@code GET /_nodes}.
 */
public class ElasticsearchNodeIT extends PluginOnNodeTestCase {
  @BeforeClass
  public static void installAndStart() throws Exception {
    startNode(NodeProcess.Engine.ELASTICSEARCH, Path.of(System.getProperty("es.home")), Path.of(System.getProperty("es.plugin.zip")),
        512, List.of("xpack.security.enabled=false", "cluster.routing.allocation.disk.threshold_enabled=false", "xpack.ml.enabled=false"));
  }
}
