package org.wordclass.examples.solr;

import java.io.OutputStream;
import java.net.URL;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.TimeUnit;
import java.util.jar.JarEntry;
import java.util.jar.JarOutputStream;
import org.apache.solr.SolrTestCaseJ4;
import org.apache.solr.client.solrj.SolrClient;
import org.apache.solr.client.solrj.request.CollectionAdminRequest;
import org.apache.solr.client.solrj.response.QueryResponse;
import org.apache.solr.cloud.MiniSolrCloudCluster;
import org.apache.solr.common.SolrDocument;
import org.apache.solr.common.cloud.DocCollection;
import org.apache.solr.common.cloud.Slice;
import org.apache.solr.common.cloud.SolrZkClient;
import org.apache.solr.common.params.ModifiableSolrParams;
import org.apache.solr.common.params.ShardParams;
import org.apache.solr.common.util.NamedList;
import org.apache.solr.core.CoreContainer;
import org.apache.solr.core.SolrCore;
import org.apache.solr.embedded.JettySolrRunner;
import org.apache.zookeeper.KeeperException;
import org.junit.AfterClass;
import org.junit.BeforeClass;
import org.junit.Test;
import org.wordclass.analysis.WordClassFilterFactory;
import org.wordclass.examples.ExampleFiles;
import org.wordclass.model.HmmModel;

/**
 * The demo config set in SolrCloud: two Solr nodes and an embedded ZooKeeper, the config set
 * uploaded to ZooKeeper as {@code bin/solr zk upconfig} does, and a collection of two shards, one
 * on each node. Every search of {@link CookbookSearchChecks} runs across both shards. Beside it,
 * the three places a model can live in a cluster: in the plugin jar (the bundled model), in the
 * config set in ZooKeeper (the demo's {@code models/en.wcm}), and in a file on each node's disk,
 * packed in a jar in the node's shared lib folder; and what ZooKeeper does with a file over its
 * size limit.
 */
@SolrTestCaseJ4.SuppressSSL
public class CookbookCloudTest extends CookbookSearchChecks {
  private static final int NODES = 2;
  private static final int SHARDS = 2;
  private static final String CONFIG = "wordclass-demo";
  private static final String COLLECTION = "cookbook";
  /** The demo config set without its model: the schema names one on each node's disk instead. */
  private static final String CONFIG_NODE_DISK = "wordclass-node-disk";
  private static final String COLLECTION_NODE_DISK = "cookbook_node_disk";
  /** Class path name of the model packed in a jar in each node's shared lib folder. */
  private static final String MODEL_ON_NODE_DISK = "wordclass-models/en-node.wcm";
  private static final String LEXICON = "lexicons/cookbook.txt";

  private static MiniSolrCloudCluster cluster;
  private static Path sharedLib;
  private static long bundledModelBytes;

  @BeforeClass
  public static void startCluster() throws Exception {
    long started = System.nanoTime();
    sharedLib = createTempDir("node-lib");
    bundledModelBytes = writeModelJar(sharedLib.resolve("wordclass-models.jar"));
    // every node's solr.xml names the folder, as an operator's would; see docs/solr.md
    String solrXml = MiniSolrCloudCluster.DEFAULT_CLOUD_SOLR_XML;
    assertTrue(solrXml, solrXml.contains("<solr>"));
    solrXml = solrXml.replace("<solr>", "<solr>\n  <str name=\"sharedLib\">" + sharedLib + "</str>");
    cluster = new MiniSolrCloudCluster.Builder(NODES, createTempDir("cluster")).withSolrXml(solrXml).build();
    long clusterMillis = (System.nanoTime() - started) / 1_000_000;

    cluster.uploadConfigSet(demoConfWithModel(), CONFIG);
    cluster.uploadConfigSet(demoConfNamingTheNodesModel(), CONFIG_NODE_DISK);
    createCollections(Map.of(COLLECTION, CONFIG, COLLECTION_NODE_DISK, CONFIG_NODE_DISK));
    indexNotes(cluster.getSolrClient(COLLECTION));
    indexNotes(cluster.getSolrClient(COLLECTION_NODE_DISK));
    System.out.printf(Locale.ROOT, "wordclass cloud: %d nodes and ZooKeeper started in %d ms; two collections of %d shards"
        + " created and indexed in %d ms more%n", NODES, clusterMillis, SHARDS, (System.nanoTime() - started) / 1_000_000 - clusterMillis);
  }

  @AfterClass
  public static void stopCluster() throws Exception {
    if (cluster != null) {
      cluster.shutdown();
      cluster = null;
    }
  }

  @Override
  protected SolrClient client() {
    return cluster.getSolrClient(COLLECTION);
  }

  /** Every search asks each shard to report, and checks that both answered. */
  @Override
  protected QueryResponse query(ModifiableSolrParams params) throws Exception {
    params.set(ShardParams.SHARDS_INFO, true);
    QueryResponse rsp = super.query(params);
    NamedList<?> shards = (NamedList<?>) rsp.getResponse().get(ShardParams.SHARDS_INFO);
    assertEquals("shards answering " + params, SHARDS, shards.size());
    for (Map.Entry<String, ?> shard : shards) {
      assertNull(shard.getKey() + " failed", ((NamedList<?>) shard.getValue()).get("error"));
    }
    return rsp;
  }

  // the collection and its shards

  @Test
  public void eachShardLivesOnItsOwnNodeAndHoldsPartOfTheNotes() throws Exception {
    DocCollection collection = cluster.getZkStateReader().getClusterState().getCollection(COLLECTION);
    assertEquals(SHARDS, collection.getSlices().size());
    Set<String> nodes = new TreeSet<>();
    for (Slice slice : collection.getSlices()) {
      nodes.add(slice.getLeader().getNodeName());
    }
    assertEquals("nodes holding a shard: " + nodes, SHARDS, nodes.size());

    ModifiableSolrParams all = new ModifiableSolrParams();
    all.set("q", "*:*");
    QueryResponse rsp = query(all);
    assertEquals(NOTES.length, rsp.getResults().getNumFound());
    long sum = 0;
    for (Map.Entry<String, ?> shard : (NamedList<?>) rsp.getResponse().get(ShardParams.SHARDS_INFO)) {
      long found = ((Number) ((NamedList<?>) shard.getValue()).get("numFound")).longValue();
      assertTrue(shard.getKey() + " holds " + found + " of " + NOTES.length + " notes", found > 0 && found < NOTES.length);
      sum += found;
    }
    assertEquals(NOTES.length, sum);
  }

  // where the model and lexicon live

  @Test
  public void configSetInZooKeeperHoldsTheModelAndTheLexicon() throws Exception {
    SolrZkClient zk = cluster.getZkClient();
    byte[] model = zk.getData("/configs/" + CONFIG + "/" + DemoSolr.MODEL_IN_CONF, null, null, true);
    assertEquals(bundledModelBytes, model.length);
    byte[] lexicon = zk.getData("/configs/" + CONFIG + "/" + LEXICON, null, null, true);
    assertArrayEquals(Files.readAllBytes(ExampleFiles.solrConfigSet().resolve("conf").resolve(LEXICON)), lexicon);
    // the nodes keep no copy of the config set: their cores read it from ZooKeeper
    for (JettySolrRunner node : cluster.getJettySolrRunners()) {
      for (SolrCore core : node.getCoreContainer().getCores()) {
        assertFalse(core.getName(), Files.exists(core.getInstancePath().resolve("conf")));
      }
    }
  }

  @Test
  public void modelFromEachNodesSharedLibFolder() throws Exception {
    SolrZkClient zk = cluster.getZkClient();
    assertFalse(zk.exists("/configs/" + CONFIG_NODE_DISK + "/" + DemoSolr.MODEL_IN_CONF, true));
    assertFalse(zk.exists("/configs/" + CONFIG_NODE_DISK + "/" + MODEL_ON_NODE_DISK, true));
    for (JettySolrRunner node : cluster.getJettySolrRunners()) {
      CoreContainer container = node.getCoreContainer();
      // where solr.xml's sharedLib put it: the node's shared class loader, as for the plugin jar
      URL found = container.getResourceLoader().getClassLoader().getResource(MODEL_ON_NODE_DISK);
      assertNotNull(found);
      assertTrue(found.toString(), found.toString().startsWith("jar:file:" + sharedLib + "/"));
    }
    // tagged as with the same model from ZooKeeper, lexicon included
    SolrClient onDisk = cluster.getSolrClient(COLLECTION_NODE_DISK);
    assertEquals(Set.of("k1", "k3", "k5"), ids(onDisk, "{!term f=body_classed}book_verb"));
    assertEquals(Set.of("c1"), ids(onDisk, "body_kitchen:cook_noun"));
    // the same bytes under two names: one parsed model
    assertSame(modelsOnNode(cluster.getJettySolrRunner(0), COLLECTION, "text_wordclass_classed").get(0),
        modelsOnNode(cluster.getJettySolrRunner(0), COLLECTION_NODE_DISK, "text_wordclass_classed").get(0));
  }

  /**
   * The plugin jar is not part of a config set. In this test every node runs in the test's JVM,
   * so the filter's classes come from the test class path; on a real node they come from the jar
   * in the folder that sharedLib names, through the same shared loader the model jar used above.
   */
  @Test
  public void pluginClassesAreSharedByEveryCoreOfANode() throws Exception {
    for (JettySolrRunner node : cluster.getJettySolrRunners()) {
      ClassLoader shared = node.getCoreContainer().getResourceLoader().getClassLoader();
      assertSame(WordClassFilterFactory.class, shared.loadClass(WordClassFilterFactory.class.getName()));
      for (SolrCore core : node.getCoreContainer().getCores()) {
        assertSame(WordClassFilterFactory.class,
            core.getResourceLoader().getClassLoader().loadClass(WordClassFilterFactory.class.getName()));
      }
    }
  }

  @Test
  public void lexiconEditedInZooKeeperTakesEffectOnReload() throws Exception {
    SolrClient onDisk = cluster.getSolrClient(COLLECTION_NODE_DISK);
    String text = "The cook tastes the broth";
    assertEquals(List.of("NOUN"), typesOf(onDisk, text));
    String path = "/configs/" + CONFIG_NODE_DISK + "/" + LEXICON;
    String lexicon = new String(cluster.getZkClient().getData(path, null, null, true), StandardCharsets.UTF_8);
    String withoutCook = lexicon.replaceAll("(?m)^cook .*\\n", "");
    assertNotEquals(lexicon, withoutCook);
    cluster.zkSetData(path, withoutCook.getBytes(StandardCharsets.UTF_8), true);
    CollectionAdminRequest.reloadCollection(COLLECTION_NODE_DISK).process(onDisk);
    assertEquals("the bundled model's reading again", List.of("VERB"), typesOf(onDisk, text));
  }

  /** Classes of the qualified terms of "cook" in body_kitchen. */
  private List<String> typesOf(SolrClient client, String text) throws Exception {
    List<String> types = new ArrayList<>();
    for (Map<String, Object> token : analyze(client, "body_kitchen", text)) {
      if (((String) token.get("text")).startsWith("cook_")) {
        types.add((String) token.get("type"));
      }
    }
    return types;
  }

  // reloads

  @Test
  public void collectionReloadKeepsOneModelPerNodeAndTheResults() throws Exception {
    List<List<String>> before = rankedAnswers();
    Map<String, Long> startTimes = coreStartTimes();
    Map<String, List<HmmModel>> models = new HashMap<>();
    for (JettySolrRunner node : cluster.getJettySolrRunners()) {
      List<HmmModel> onNode = modelsOnNode(node, COLLECTION, "text_wordclass_classed", "text_wordclass_weighted");
      assertEquals("distinct models on " + node.getNodeName(), 1, distinct(onNode));
      models.put(node.getNodeName(), onNode);
    }

    CollectionAdminRequest.reloadCollection(COLLECTION).process(client());

    Map<String, Long> reloaded = coreStartTimes();
    assertEquals(startTimes.keySet(), reloaded.keySet());
    for (String core : startTimes.keySet()) {
      assertNotEquals(core + " was not reloaded", startTimes.get(core), reloaded.get(core));
    }
    for (JettySolrRunner node : cluster.getJettySolrRunners()) {
      List<HmmModel> after = modelsOnNode(node, COLLECTION, "text_wordclass_classed", "text_wordclass_weighted");
      assertSame("the reload on " + node.getNodeName() + " parsed the model again",
          models.get(node.getNodeName()).get(0), after.get(0));
      assertEquals(1, distinct(after));
    }
    assertEquals(before, rankedAnswers());
  }

  /** Ids with scores, in rank order, of the restricted and boosted searches. */
  private List<List<String>> rankedAnswers() throws Exception {
    List<List<String>> answers = new ArrayList<>();
    for (String q : List.of("{!term f=body_classed}book_verb", "{!payload_score f=body_weighted func=max}book",
        "{!payload_check f=body_tagged payloads=NOUN}book", "body_kitchen:cook_noun")) {
      List<String> ranked = new ArrayList<>();
      for (SolrDocument doc : search("q", q, "sort", "score desc, id asc")) {
        ranked.add(doc.get("id") + "=" + doc.get("score"));
      }
      answers.add(ranked);
    }
    return answers;
  }

  private static Map<String, Long> coreStartTimes() {
    Map<String, Long> times = new HashMap<>();
    for (JettySolrRunner node : cluster.getJettySolrRunners()) {
      for (String name : node.getCoreContainer().getLoadedCoreNames()) {
        try (SolrCore core = node.getCoreContainer().getCore(name)) {
          if (core.getCoreDescriptor().getCollectionName().equals(COLLECTION)) {
            times.put(name, core.getStartNanoTime());
          }
        }
      }
    }
    return times;
  }

  /** The models of {@code fieldTypes} in every core of {@code collection} on {@code node}. */
  private static List<HmmModel> modelsOnNode(JettySolrRunner node, String collection, String... fieldTypes) {
    List<HmmModel> models = new ArrayList<>();
    CoreContainer container = node.getCoreContainer();
    for (String name : container.getLoadedCoreNames()) {
      try (SolrCore core = container.getCore(name)) {
        if (core.getCoreDescriptor().getCollectionName().equals(collection)) {
          for (String fieldType : fieldTypes) {
            models.add(DemoSolr.modelOf(core, fieldType));
          }
        }
      }
    }
    assertFalse("no core of " + collection + " on " + node.getNodeName(), models.isEmpty());
    return models;
  }

  private static int distinct(List<HmmModel> models) {
    Map<HmmModel, Boolean> seen = new IdentityHashMap<>();
    models.forEach(m -> seen.put(m, true));
    return seen.size();
  }

  // ZooKeeper's size limit

  /**
   * ZooKeeper refuses a request larger than its jute.maxbuffer (1,048,575 bytes unless raised) by
   * closing the connection; the client sees a lost connection and, retrying as Solr's tools do,
   * tries again until its retries run out. With a 2 s session timeout that takes seconds, not the
   * minute a default client spends.
   */
  @Test
  public void zooKeeperRefusesAConfigSetFileOverItsLimit() throws Exception {
    byte[] oneMebibyte = new byte[1 << 20];
    String path = "/configs/too-big/models/big.wcm";
    try (SolrZkClient zk = new SolrZkClient.Builder().withUrl(cluster.getZkServer().getZkAddress())
        .withTimeout(2, TimeUnit.SECONDS).build()) {
      ignoreException("Len error");
      long started = System.nanoTime();
      KeeperException refused = expectThrows(KeeperException.class, () -> zk.makePath(path, oneMebibyte, true));
      long millis = (System.nanoTime() - started) / 1_000_000;
      System.out.printf(Locale.ROOT, "wordclass cloud: a %,d-byte file refused by ZooKeeper after %d ms: %s%n",
          oneMebibyte.length, millis, refused);
      assertEquals(KeeperException.Code.CONNECTIONLOSS, refused.code());
      assertTrue("took " + millis + " ms", millis < 30_000);
      assertFalse(zk.exists(path, true));
      // the nodes' own connections were not affected
      assertEquals(Set.of("k1", "k3", "k5"), idSet(search("q", "{!term f=body_classed}book_verb")));
      // the model bundled in the jar, like the demo's copy in the config set, is under the limit
      zk.makePath("/configs/fits/models/en.wcm", new byte[(int) bundledModelBytes], true);
      assertEquals(bundledModelBytes, zk.getData("/configs/fits/models/en.wcm", null, null, true).length);
    }
  }

  // setup helpers

  /** Creates the collections named by the keys from the config sets named by the values, side by side. */
  private static void createCollections(Map<String, String> configOfCollection) throws Exception {
    for (Map.Entry<String, String> c : configOfCollection.entrySet()) {
      CollectionAdminRequest.createCollection(c.getKey(), c.getValue(), SHARDS, 1).processAsync(cluster.getSolrClient());
    }
    for (String name : configOfCollection.keySet()) {
      cluster.waitForActiveCollection(name, SHARDS, SHARDS);
    }
  }

  /** The demo config set with the user's step done: a model file copied to conf/models/en.wcm. */
  private static Path demoConfWithModel() throws Exception {
    Path configSet = createTempDir("config-set").resolve("wordclass-demo");
    ExampleFiles.copyTree(ExampleFiles.solrConfigSet(), configSet);
    Path conf = configSet.resolve("conf");
    ExampleFiles.copyBundledModel(conf.resolve(DemoSolr.MODEL_IN_CONF));
    return conf;
  }

  /** The demo config set whose schema names the model in each node's shared lib folder. */
  private static Path demoConfNamingTheNodesModel() throws Exception {
    Path configSet = createTempDir("config-set").resolve("wordclass-node-disk");
    ExampleFiles.copyTree(ExampleFiles.solrConfigSet(), configSet);
    Path schema = configSet.resolve("conf").resolve("managed-schema.xml");
    String text = Files.readString(schema, StandardCharsets.UTF_8);
    String named = text.replace("model=\"" + DemoSolr.MODEL_IN_CONF + "\"", "model=\"" + MODEL_ON_NODE_DISK + "\"");
    assertNotEquals(text, named);
    Files.writeString(schema, named, StandardCharsets.UTF_8);
    return configSet.resolve("conf");
  }

  /** Packs a copy of the bundled model in a jar as MODEL_ON_NODE_DISK; returns its size. */
  private static long writeModelJar(Path jar) throws Exception {
    Path model = createTempDir("model").resolve("en.wcm");
    ExampleFiles.copyBundledModel(model);
    try (OutputStream file = Files.newOutputStream(jar); JarOutputStream out = new JarOutputStream(file)) {
      out.putNextEntry(new JarEntry(MODEL_ON_NODE_DISK));
      Files.copy(model, out);
      out.closeEntry();
    }
    return Files.size(model);
  }

  private static Set<String> ids(SolrClient client, String q) throws Exception {
    ModifiableSolrParams params = new ModifiableSolrParams();
    params.set("q", q);
    params.set("fl", "id");
    return idSet(client.query(params).getResults());
  }
}
