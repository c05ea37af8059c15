package org.wordclass.examples.solr;

import org.apache.solr.client.solrj.SolrClient;
import org.junit.AfterClass;
import org.junit.BeforeClass;

/** The cookbook's searches in one standalone core made from the demo config set. */
public class CookbookSearchTest extends CookbookSearchChecks {
  private static DemoSolr solr;

  @BeforeClass
  public static void startSolr() throws Exception {
    solr = DemoSolr.start(createTempDir("solr-home"));
    indexNotes(solr.client);
  }

  @AfterClass
  public static void stopSolr() throws Exception {
    if (solr != null) {
      solr.close();
      solr = null;
    }
  }

  @Override
  protected SolrClient client() {
    return solr.client;
  }
}
