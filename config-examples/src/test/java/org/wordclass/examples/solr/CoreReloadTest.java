package org.wordclass.examples.solr;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryMXBean;
import java.nio.file.Files;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.solr.SolrTestCaseJ4;
import org.apache.solr.client.solrj.request.CoreAdminRequest;
import org.apache.solr.common.SolrInputDocument;
import org.apache.solr.core.SolrCore;
import org.junit.AfterClass;
import org.junit.BeforeClass;
import org.junit.Test;
import org.wordclass.model.DefaultModel;
import org.wordclass.model.HmmModel;
import org.wordclass.model.ModelFile;

/**
 * Reloading the demo core, as a schema change or a new model file makes an operator do, keeps
 * one copy of each model in memory: the field types that name the same file share it, and a
 * reload reuses it instead of reading another.
 */
public class CoreReloadTest extends SolrTestCaseJ4 {
  private static final int RELOADS = 20;

  private static DemoSolr solr;

  @BeforeClass
  public static void startSolr() throws Exception {
    solr = DemoSolr.start(createTempDir("solr-home"));
    SolrInputDocument doc = new SolrInputDocument();
    doc.addField("id", "r1");
    doc.addField("body", "We book the village hall for the harvest supper");
    solr.client.add(doc);
    solr.client.commit();
  }

  @AfterClass
  public static void stopSolr() throws Exception {
    if (solr != null) {
      solr.close();
      solr = null;
    }
  }

  @Test
  public void fieldTypesNamingOneFileShareOneModel() {
    assertSame(solr.modelOf("text_wordclass_classed"), solr.modelOf("text_wordclass_weighted"));
    // the one with the user lexicon is a model of its own, made from the shared one
    assertNotSame(solr.modelOf("text_wordclass_classed"), solr.modelOf("text_wordclass_kitchen"));
    assertEquals("cookbook.txt", solr.modelOf("text_wordclass_kitchen").provenance().get("lexicon.file"));
    assertSame(DefaultModel.get(), solr.modelOf("text_wordclass"));
  }

  @Test
  public void reloadsReuseTheModelAndDoNotGrowTheHeap() throws Exception {
    HmmModel fromConf = solr.modelOf("text_wordclass_classed");
    HmmModel bundled = solr.modelOf("text_wordclass");
    HmmModel withLexicon = solr.modelOf("text_wordclass_kitchen");
    reload(); // the first reload warms caches and classes that any reload needs once

    long before = usedHeapAfterGc();
    long started = System.nanoTime();
    for (int i = 0; i < RELOADS; i++) {
      long coreStart = coreStartTime();
      reload();
      assertNotEquals("the core was not replaced", coreStart, coreStartTime());
      assertSame("reload " + i + " read the model of conf/ again", fromConf, solr.modelOf("text_wordclass_classed"));
      assertSame(fromConf, solr.modelOf("text_wordclass_weighted"));
      assertSame(bundled, solr.modelOf("text_wordclass"));
      assertSame("reload " + i + " applied the lexicon again", withLexicon, solr.modelOf("text_wordclass_kitchen"));
    }
    long reloadMillis = (System.nanoTime() - started) / 1_000_000;
    long after = usedHeapAfterGc();

    long modelHeap = heapOfOneModel();
    long growth = after - before;
    System.out.printf(Locale.ROOT,
        "wordclass reloads: %d reloads in %d ms; used heap after GC %,d -> %,d bytes (growth %,d); one model parsed takes %,d bytes of heap%n",
        RELOADS, reloadMillis, before, after, growth, modelHeap);
    assertTrue("one model should take some heap: " + modelHeap, modelHeap > 100_000);
    // a copy per reload would grow the heap by RELOADS model copies; allow a quarter of that for Solr's own noise
    assertTrue("heap grew by " + growth + " bytes over " + RELOADS + " reloads", growth < RELOADS * modelHeap / 4);

    // still answering with the reloaded schema
    assertEquals(1, solr.client.query(new org.apache.solr.common.params.MapSolrParams(
        java.util.Map.of("q", "{!term f=body_classed}book_verb"))).getResults().getNumFound());
  }

  private static void reload() throws Exception {
    CoreAdminRequest.reloadCore(DemoSolr.CORE, solr.client);
  }

  private static long coreStartTime() {
    try (SolrCore core = solr.container.getCore(DemoSolr.CORE)) {
      return core.getStartNanoTime();
    }
  }

  /** Heap a freshly parsed copy of the conf/ model holds, measured the same way as the reloads. */
  private static long heapOfOneModel() throws Exception {
    byte[] bytes = Files.readAllBytes(solr.home.resolve(DemoSolr.CORE).resolve("conf").resolve(DemoSolr.MODEL_IN_CONF));
    List<HmmModel> held = new ArrayList<>();
    long before = usedHeapAfterGc();
    held.add(ModelFile.read(bytes, "copy"));
    long after = usedHeapAfterGc();
    assertEquals(1, held.size());
    return after - before;
  }

  private static long usedHeapAfterGc() throws InterruptedException {
    MemoryMXBean memory = ManagementFactory.getMemoryMXBean();
    long used = Long.MAX_VALUE;
    // several rounds: weakly held and finalizable objects need more than one collection
    for (int i = 0; i < 5; i++) {
      System.gc();
      Thread.sleep(50);
      used = Math.min(used, memory.getHeapMemoryUsage().getUsed());
    }
    return used;
  }
}
