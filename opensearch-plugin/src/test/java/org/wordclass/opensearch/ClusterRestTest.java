package org.wordclass.opensearch;

import static org.junit.Assert.assertEquals;
import static org.junit.Assert.assertNotEquals;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Collection;
import java.util.List;
import java.util.Map;
import org.opensearch.client.Request;
import org.opensearch.client.Response;
import org.opensearch.client.ResponseException;
import org.opensearch.common.network.NetworkModule;
import org.opensearch.common.settings.Settings;
import org.opensearch.plugins.Plugin;
import org.opensearch.test.OpenSearchIntegTestCase;
import org.wordclass.nodetesting.ConfigFiles;
import org.wordclass.nodetesting.Rest;
import org.wordclass.nodetesting.RestScenario;

/**
 * A cluster of two data nodes in the test JVM, started by OpenSearch's own test framework with
 * the real HTTP and transport layer (netty4), used over REST on 127.0.0.1 through the same
 * {@link RestScenario} as the real distribution: the example index's two shards lie on different
 * nodes, so every query below is answered by both nodes, and the queries travel between them in
 * their wire form.
 *
 * <p>Every node's configuration directory holds {@link ConfigFiles}. Our classes come from the
 * test class path here; {@code DistributionEndToEndIT} loads the built zip instead.
 */
@OpenSearchIntegTestCase.ClusterScope(scope = OpenSearchIntegTestCase.Scope.SUITE, numDataNodes = 2, numClientNodes = 0,
    supportsDedicatedMasters = false, autoManageMasterNodes = true)
public class ClusterRestTest extends OpenSearchIntegTestCase {
  private static Path configDir;

  @Override
  protected Collection<Class<? extends Plugin>> nodePlugins() {
    return List.of(WordClassPlugin.class, NettyTransport.PLUGIN);
  }

  @Override
  protected boolean addMockHttpTransport() {
    return false;
  }

  @Override
  protected Settings nodeSettings(int nodeOrdinal) {
    return Settings.builder()
        .put(super.nodeSettings(nodeOrdinal))
        .put(NetworkModule.HTTP_TYPE_KEY, NettyTransport.HTTP)
        .put(NetworkModule.TRANSPORT_TYPE_KEY, NettyTransport.TRANSPORT)
        .build();
  }

  /** One configuration directory for every node, holding the model, lexicon and broken files. */
  @Override
  protected Path nodeConfigPath(int nodeOrdinal) {
    synchronized (ClusterRestTest.class) {
      if (configDir == null) {
        try {
          // on the default file system, as a node's is: the node mixes the path with its own
          configDir = Files.createDirectories(Path.of(createTempDir().resolve("config").toString()));
          ConfigFiles.install(configDir);
        } catch (IOException e) {
          throw new UncheckedIOException(e);
        }
      }
      return configDir;
    }
  }

  private RestScenario scenario() {
    return new RestScenario(ClusterRestTest::call);
  }

  static Rest.Response call(String method, String path, String json) throws IOException {
    Request request = new Request(method, path);
    if (json != null) {
      request.setJsonEntity(json);
    }
    Response response;
    try {
      response = getRestClient().performRequest(request);
    } catch (ResponseException refused) {
      response = refused.getResponse();
    }
    String text = "";
    if (response.getEntity() != null) {
      try (InputStream body = response.getEntity().getContent()) {
        text = new String(body.readAllBytes(), StandardCharsets.UTF_8);
      }
    }
    return new Rest.Response(response.getStatusLine().getStatusCode(), text);
  }

  public void testTagsIndexesAndQueriesAcrossTwoNodes() throws IOException {
    RestScenario scenario = scenario();
    scenario.createAndIndex();
    ensureGreen(RestScenario.INDEX);

    Rest.Response shards = call("GET", "/_cat/shards/" + RestScenario.INDEX + "?format=json&h=shard,prirep,node", null);
    List<?> rows = (List<?>) new Rest.Response(shards.status, "{\"rows\":" + shards.text + "}").at("rows");
    assertEquals(shards.text, 2, rows.size());
    assertNotEquals("the two shards on different nodes: " + shards.text,
        ((Map<?, ?>) rows.get(0)).get("node"), ((Map<?, ?>) rows.get(1)).get("node"));

    scenario.analyzeShowsClasses();
    scenario.resultsComeFromEveryShard();
    scenario.badQueriesAreRefused();
  }

  public void testBadSettingsAreRefusedWith400() throws IOException {
    // the test JVM may run as root, who reads any file: the unreadable model is the distribution test's
    scenario().badSettingsAreRefused(null);
  }

  public void testFrenchExampleIndexUsesTheShippedFrenchModel() throws IOException {
    scenario().frenchIndexTagsWithTheFrenchModel();
  }
}
