package org.wordclass.examples.solr;

import java.util.ArrayList;
import java.util.List;
import org.apache.solr.SolrTestCaseJ4;
import org.apache.solr.client.solrj.SolrRequest;
import org.apache.solr.client.solrj.request.GenericSolrRequest;
import org.apache.solr.client.solrj.response.QueryResponse;
import org.apache.solr.common.SolrDocument;
import org.apache.solr.common.SolrInputDocument;
import org.apache.solr.common.params.ModifiableSolrParams;
import org.apache.solr.common.util.NamedList;
import org.junit.AfterClass;
import org.junit.BeforeClass;
import org.junit.Test;

public class CookbookSearchTest extends SolrTestCaseJ4 {
  private static DemoSolr solr;

  @BeforeClass
  public static void startSolr() throws Exception {
    solr = DemoSolr.start(createTempDir("solr-home"));
    String[][] notes = {
      {"k1", "Harvest supper", "We book the village hall for the harvest supper"},
      {"k2", "Where to find it", "The recipe book is on the shelf"},
      {"k3", "Bread class", "Please book early"},
      {"k4", "New arrivals", "This book has forty recipes for bread"},
      {"k5", "Tasting table", "You can book a place at the table"},
    };
    for (String[] note : notes) {
      SolrInputDocument doc = new SolrInputDocument();
      doc.addField("id", note[0]);
      doc.addField("title", note[1]);
      doc.addField("body", note[2]);
      solr.client.add(doc);
    }
    solr.client.commit();
  }

  @AfterClass
  public static void stopSolr() throws Exception {
    if (solr != null) {
      solr.close();
      solr = null;
    }
  }

  private static List<String> ids(String q) throws Exception {
    ModifiableSolrParams params = new ModifiableSolrParams();
    params.set("q", q);
    params.set("fl", "id,score");
    QueryResponse rsp = solr.client.query(params);
    List<String> out = new ArrayList<>();
    for (SolrDocument d : rsp.getResults()) out.add(d.get("id") + "=" + d.get("score"));
    return out;
  }

  @Test
  public void probe() throws Exception {
    for (String q : new String[] {"{!term f=body_classed}book_verb", "body_classed:book_verb", "{!term f=body_classed}book_noun",
        "{!payload_score f=body_weighted func=max}book", "body:book", "{!payload_check f=body_tagged payloads=\"VERB\"}book",
        "{!payload_check f=body_tagged payloads=\"NOUN\"}book"}) {
      System.out.println(q + " -> " + ids(q));
    }
    ModifiableSolrParams params = new ModifiableSolrParams();
    params.set("analysis.fieldname", "body_tagged");
    params.set("analysis.fieldvalue", "Please book early");
    NamedList<Object> rsp = solr.client.request(new GenericSolrRequest(SolrRequest.METHOD.GET, "/analysis/field", params));
    System.out.println(rsp);
  }
}
