package org.wordclass.examples.solr;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.apache.solr.client.solrj.SolrClient;
import org.apache.solr.common.SolrInputDocument;
import org.junit.AfterClass;
import org.junit.BeforeClass;
import org.junit.Test;

/**
 * The cookbook's searches in one standalone core made from the demo config set; and, in the same
 * core, the config set's French field ({@code body_fr}, {@code language="fr"}).
 */
public class CookbookSearchTest extends CookbookSearchChecks {
  /**
   * Invented French notes: id and text; the comment gives the class of "porte", a verb in "elle
   * porte" (she carries) and a noun in "la porte" (the door) — French grammar, common practice.
   * That the shipped French model (UD French GSD dev) decides the same was checked by running it;
   * {@link #frenchFieldIsTaggedByTheShippedFrenchModel} shows its classes.
   */
  static final String[][] FRENCH_NOTES = {
    {"f1", "Elle porte le panier au marché"}, // VERB
    {"f2", "La porte de la cuisine reste ouverte"}, // NOUN
    {"f3", "Il porte la soupe à la table"}, // VERB
    {"f4", "Fermez la porte du four"}, // NOUN
    {"f5", "Le chef goûte la sauce avant de servir"}, // no "porte"
  };

  private static DemoSolr solr;

  @BeforeClass
  public static void startSolr() throws Exception {
    solr = DemoSolr.start(createTempDir("solr-home"));
    indexNotes(solr.client);
    for (String[] note : FRENCH_NOTES) {
      SolrInputDocument doc = new SolrInputDocument();
      doc.addField("id", note[0]);
      doc.addField("body_fr", note[1]);
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

  @Override
  protected SolrClient client() {
    return solr.client;
  }

  @Test
  public void frenchClassRestrictedQueryTellsTheVerbFromTheNoun() throws Exception {
    assertEquals(Set.of("f1", "f3"), idSet(search("q", "body_fr:porte_verb")));
    assertEquals(Set.of("f2", "f4"), idSet(search("q", "{!term f=body_fr}porte_noun")));
    assertEquals(Set.of("f1", "f2", "f3", "f4"), idSet(search("q", "body_fr:porte")));
  }

  @Test
  public void frenchFieldIsTaggedByTheShippedFrenchModel() throws Exception {
    List<String> classes = new ArrayList<>();
    for (Map<String, Object> token : analyze("body_fr", "Fermez la porte du four")) {
      if (!((String) token.get("text")).contains("_")) {
        classes.add((String) token.get("type"));
        assertEquals("fr-gsd-upos", token.get("org.wordclass.analysis.WordClassAttribute#model"));
      }
    }
    // "du" = de + le is one token and takes the preposition's class (docs/languages.md)
    assertEquals(List.of("VERB", "DET", "NOUN", "ADP", "NOUN"), classes);
  }
}
