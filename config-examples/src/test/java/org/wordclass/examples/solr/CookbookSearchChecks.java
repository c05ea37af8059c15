package org.wordclass.examples.solr;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.apache.solr.SolrTestCaseJ4;
import org.apache.solr.client.solrj.SolrClient;
import org.apache.solr.client.solrj.SolrRequest;
import org.apache.solr.client.solrj.SolrServerException;
import org.apache.solr.client.solrj.request.GenericSolrRequest;
import org.apache.solr.client.solrj.response.QueryResponse;
import org.apache.solr.common.SolrDocument;
import org.apache.solr.common.SolrException;
import org.apache.solr.common.SolrInputDocument;
import org.apache.solr.common.params.ModifiableSolrParams;
import org.apache.solr.common.util.NamedList;
import org.junit.Test;

/**
 * The demo config set searched as a user would: a community cookbook's notes, searched by the
 * word class of "book" (to book a hall, a recipe book) with standard Solr query syntax only, and
 * the analysis screen showing each token's class and confidence; and the config set's user
 * lexicon correcting the model where the cookbook's words mean something else. The same checks
 * run in one standalone core ({@link CookbookSearchTest}) and across the shards of a SolrCloud
 * collection ({@link CookbookCloudTest}); a subclass says where the notes are indexed.
 */
public abstract class CookbookSearchChecks extends SolrTestCaseJ4 {
  /** Id, title, note; the comment says what the bundled model makes of "book" in it. */
  static final String[][] NOTES = {
    {"k1", "Harvest supper", "We book the village hall for the harvest supper"}, // VERB
    {"k2", "Where to find it", "The recipe book is on the shelf"}, // NOUN
    {"k3", "Bread class", "Please book early"}, // VERB; the shortest note, so plain ranking favours it
    {"k4", "New arrivals", "This book has forty recipes for bread"}, // NOUN
    {"k5", "Tasting table", "You can book a place at the table"}, // VERB
    {"s1", "Sauce club", "They taste the sauce before they serve it"}, // no "book"
    {"c1", "Kitchen rota", "The cook tastes the broth"}, // "cook": VERB, NOUN with the cookbook's lexicon
    {"c2", "Sunday lunch", "Baste the roast every hour"}, // "Baste": PROPN, "roast": ADJ; fixed the same way
  };
  private static final Set<String> BOOK_VERB = Set.of("k1", "k3", "k5");
  private static final Set<String> BOOK_NOUN = Set.of("k2", "k4");

  /** The client that searches the indexed notes (a core's, or a collection's). */
  protected abstract SolrClient client();

  /** Adds the notes to {@code client} and commits. */
  static void indexNotes(SolrClient client) throws Exception {
    for (String[] note : NOTES) {
      SolrInputDocument doc = new SolrInputDocument();
      doc.addField("id", note[0]);
      doc.addField("title", note[1]);
      doc.addField("body", note[2]);
      client.add(doc);
    }
    client.commit();
  }

  /** Runs one search; a subclass may add parameters and check more of the response. */
  protected QueryResponse query(ModifiableSolrParams params) throws Exception {
    return client().query(params);
  }

  // (a) restricted to a class through the class-qualified terms

  @Test
  public void termQueryParserFindsTheVerbsOnly() throws Exception {
    assertEquals(BOOK_VERB, idSet(search("q", "{!term f=body_classed}book_verb")));
    assertEquals(BOOK_NOUN, idSet(search("q", "{!term f=body_classed}book_noun")));
  }

  @Test
  public void fieldValueSyntaxWorksToo() throws Exception {
    // the query analyzer keeps book_verb one token and the stemmer leaves it alone
    assertEquals(BOOK_VERB, idSet(search("q", "body_classed:book_verb")));
    assertEquals(BOOK_NOUN, idSet(search("q", "body_classed:book_noun")));
    // and it combines like any other clause: a noun "book", or "bread" in the title
    assertEquals(Set.of("k2", "k3", "k4"), idSet(search("q", "body_classed:book_noun OR title:bread")));
  }

  @Test
  public void plainFieldStillFindsEveryBook() throws Exception {
    Set<String> all = new TreeSet<>(BOOK_VERB);
    all.addAll(BOOK_NOUN);
    assertEquals(all, idSet(search("q", "body:book")));
  }

  /** A restricted query finds exactly what the tagger decided, as the analysis screen shows it. */
  @Test
  public void classRestrictedHitsFollowTheTagger() throws Exception {
    for (String[] note : NOTES) {
      for (Map<String, Object> token : analyze("body_tagged", note[2])) {
        if (token.get("text").equals("book")) {
          String wordClass = ((String) token.get("type")).toLowerCase(java.util.Locale.ROOT);
          assertTrue(note[0] + " tagged " + wordClass, idSet(search("q", "{!term f=body_classed}book_" + wordClass)).contains(note[0]));
        }
      }
    }
  }

  // (b) class-boosted ranking through weight payloads

  @Test
  public void payloadScoreRanksNounsFirst() throws Exception {
    // plain ranking puts the shortest note first, where "book" is a verb
    assertEquals("k3", search("q", "body:book").get(0).get("id"));
    List<SolrDocument> weighted = search("q", "{!payload_score f=body_weighted func=max}book");
    assertEquals(5, weighted.size());
    assertEquals(BOOK_NOUN, idSet(weighted.subList(0, 2)));
    // without includeSpanScore the score is the payload itself: the class weight as configured
    for (SolrDocument doc : weighted) {
      float expected = BOOK_NOUN.contains(doc.get("id")) ? 3.0f : 1.0f;
      assertEquals((String) doc.get("id"), expected, (Float) doc.get("score"), 0.0f);
    }
  }

  @Test
  public void classWeightAsABoostOnARelevanceQuery() throws Exception {
    // text relevance from edismax, multiplied by the class weight of "book" where it matched
    List<SolrDocument> boosted = search(
        "defType", "edismax", "q", "book", "qf", "body title",
        "boost", "query($classes,1)", "classes", "{!payload_score f=body_weighted func=max v=$q}");
    assertEquals(5, boosted.size());
    assertEquals(BOOK_NOUN, idSet(boosted.subList(0, 2)));
  }

  // (d) restricted to a class through TAG payloads

  @Test
  public void payloadCheckReadsTagPayloads() throws Exception {
    assertEquals(BOOK_VERB, idSet(search("q", "{!payload_check f=body_tagged payloads=VERB}book")));
    assertEquals(BOOK_NOUN, idSet(search("q", "{!payload_check f=body_tagged payloads=NOUN}book")));
    // class names are case-sensitive: payloads hold them as the model spells them
    assertTrue(search("q", "{!payload_check f=body_tagged payloads=noun}book").isEmpty());
  }

  @Test
  public void payloadParsersRefuseAFieldWithoutDeclaredEncoding() throws Exception {
    // body_classed carries no payloads and declares no encoding: Solr says so instead of guessing
    ignoreException("invalid encoder");
    SolrException refused = expectThrows(SolrException.class, () -> search("q", "{!payload_check f=body_classed payloads=VERB}book"));
    assertTrue(refused.getMessage(), refused.getMessage().contains("invalid encoder"));
  }

  // (c) the analysis screen

  @Test
  public void analysisShowsClassAndConfidencePerToken() throws Exception {
    List<Map<String, Object>> tokens = analyze("body_tagged", "Please book early");
    List<String> texts = new ArrayList<>();
    List<String> types = new ArrayList<>();
    for (Map<String, Object> token : tokens) {
      texts.add((String) token.get("text"));
      types.add((String) token.get("type"));
      // WordClassAttribute, shown under its interface name
      assertEquals(token.get("type"), token.get("org.wordclass.analysis.WordClassAttribute#wordClass"));
      double confidence = (Double) token.get("org.wordclass.analysis.WordClassAttribute#confidence");
      assertTrue(confidence > 0 && confidence <= 1);
    }
    assertEquals(List.of("pleas", "book", "earli"), texts); // after the stemmer: the last stage
    assertEquals(List.of("INTJ", "VERB", "ADV"), types);
    // the TAG payload, as the screen prints bytes: "VERB" in UTF-8
    assertEquals("[56 45 52 42]", tokens.get(1).get("org.apache.lucene.analysis.tokenattributes.PayloadAttribute#payload"));
  }

  @Test
  public void analysisShowsQualifiedTermsAtTheSamePosition() throws Exception {
    List<Map<String, Object>> tokens = analyze("body_classed", "We book the hall");
    List<String> book = new ArrayList<>();
    for (Map<String, Object> token : tokens) {
      if (((Integer) token.get("position")) == 2) {
        book.add((String) token.get("text"));
      }
    }
    assertEquals(List.of("book", "book_verb"), book);
  }

  // (e) the config set's user lexicon

  @Test
  public void userLexiconMakesTheCookAPerson() throws Exception {
    // the bundled model's reading, in the field without the lexicon
    assertEquals(Set.of("c1"), idSet(search("q", "body_classed:cook_verb")));
    assertEquals(Set.of("c1"), idSet(search("q", "body_kitchen:cook_noun")));
    assertTrue(search("q", "body_kitchen:cook_verb").isEmpty());
  }

  @Test
  public void userLexiconLeavesTheChoiceBetweenListedClassesToTheContext() throws Exception {
    assertEquals(List.of("PROPN", "ADJ"), typesOf("body_classed", "Baste the roast every hour", "baste", "roast"));
    assertEquals(List.of("VERB", "NOUN"), typesOf("body_kitchen", "Baste the roast every hour", "baste", "roast"));
    assertEquals(List.of("VERB"), typesOf("body_kitchen", "We roast the peppers", "roast"));
    assertEquals(Set.of("c2"), idSet(search("q", "body_kitchen:roast_noun AND body_kitchen:baste_verb")));
  }

  /** The classes of the qualified terms of {@code words} (lowercased), in order. */
  List<String> typesOf(String field, String text, String... words) throws Exception {
    List<String> types = new ArrayList<>();
    for (String word : words) {
      for (Map<String, Object> token : analyze(field, text)) {
        String term = (String) token.get("text");
        if (term.startsWith(word + "_")) {
          types.add((String) token.get("type"));
        }
      }
    }
    return types;
  }

  // helpers

  List<SolrDocument> search(String... nameValues) throws Exception {
    ModifiableSolrParams params = new ModifiableSolrParams();
    for (int i = 0; i < nameValues.length; i += 2) {
      params.set(nameValues[i], nameValues[i + 1]);
    }
    params.set("fl", "id,score");
    return new ArrayList<>(query(params).getResults());
  }

  static Set<String> idSet(List<SolrDocument> docs) {
    Set<String> ids = new TreeSet<>();
    for (SolrDocument doc : docs) {
      ids.add((String) doc.get("id"));
    }
    return ids;
  }

  /** The index-time tokens of {@code text} in {@code field} after the last stage of its analyzer. */
  List<Map<String, Object>> analyze(String field, String text) throws SolrServerException, java.io.IOException {
    return analyze(client(), field, text);
  }

  /** The index-time tokens of {@code text} in {@code field}, as {@code client}'s analysis screen shows them. */
  @SuppressWarnings("unchecked")
  static List<Map<String, Object>> analyze(SolrClient client, String field, String text) throws SolrServerException, java.io.IOException {
    ModifiableSolrParams params = new ModifiableSolrParams();
    params.set("analysis.fieldname", field);
    params.set("analysis.fieldvalue", text);
    NamedList<Object> rsp = client.request(new GenericSolrRequest(SolrRequest.METHOD.GET, "/analysis/field", params));
    NamedList<Object> stages = (NamedList<Object>) rsp.findRecursive("analysis", "field_names", field, "index");
    List<NamedList<Object>> last = (List<NamedList<Object>>) stages.getVal(stages.size() - 1);
    List<Map<String, Object>> tokens = new ArrayList<>();
    for (NamedList<Object> token : last) {
      Map<String, Object> map = new LinkedHashMap<>();
      token.forEach(map::put);
      tokens.add(map);
    }
    return tokens;
  }
}
