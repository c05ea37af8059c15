package org.wordclass.nodetesting;

import static org.junit.Assert.assertEquals;
import static org.junit.Assert.assertTrue;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

/**
 * What a user does with the plugin over REST, checked step by step; run against every kind of
 * node the tests start (a real distribution, a cluster in the test JVM). The index settings are
 * config-examples/opensearch/index-settings.json as users copy it; the node's configuration
 * directory holds {@link ConfigFiles}.
 *
 * <p>The notes and the classes the bundled model gives "park" and "ride" in them are those of
 * the analyzer's TestWordClassQueries (checked there against the model); "Ford the stream" is a
 * verb only through the hiking club's lexicon (checked in TestUserLexiconFactory's example).
 */
public final class RestScenario {
  public static final String INDEX = "trips";

  /** Id, text; the classes in the comments are what the tagger makes of "park" and "ride". */
  static final String[][] NOTES = {
    {"p1", "Riders park their bikes outside the shop"}, // park: VERB
    {"p2", "The shop sits next to the park"}, // park: NOUN
    {"p3", "We ride through the park every Sunday"}, // park: NOUN, ride: VERB
    {"p4", "You can park here"}, // park: VERB; the shortest note, so plain ranking favours it
    {"r1", "I like the long ride to the lake"}, // ride: NOUN
    {"r2", "They ride to the lake"}, // ride: VERB
  };

  private final Rest rest;

  public RestScenario(Rest rest) {
    this.rest = rest;
  }

  private Rest.Response ok(String method, String path, String json) throws IOException {
    Rest.Response response = rest.call(method, path, json);
    assertTrue(method + " " + path + " -> " + response, response.status >= 200 && response.status < 300);
    return response;
  }

  /** Creates the index from the example settings and indexes the notes. */
  public void createAndIndex() throws IOException {
    ok("PUT", "/" + INDEX, ConfigFiles.indexSettings());
    StringBuilder bulk = new StringBuilder();
    for (String[] note : NOTES) {
      bulk.append("{\"index\":{\"_id\":\"").append(note[0]).append("\"}}\n");
      bulk.append("{\"note\":\"").append(note[1]).append("\"}\n");
    }
    Rest.Response indexed = ok("POST", "/" + INDEX + "/_bulk?refresh=true", bulk.toString());
    assertEquals(indexed.text, Boolean.FALSE, indexed.at("errors"));
  }

  /** The terms and types _analyze gives {@code text} through the example's {@code trip_tagged} analyzer. */
  private List<List<String>> analyzed(String text) throws IOException {
    Rest.Response plain = ok("POST", "/" + INDEX + "/_analyze", "{\"analyzer\":\"trip_tagged\",\"text\":\"" + text + "\"}");
    List<String> terms = new ArrayList<>();
    List<String> types = new ArrayList<>();
    for (Object token : (List<?>) plain.at("tokens")) {
      terms.add((String) ((Map<?, ?>) token).get("token"));
      types.add((String) ((Map<?, ?>) token).get("type"));
    }
    return List.of(terms, types);
  }

  /**
   * _analyze shows each token's class as its type, and with explain our attribute with class and
   * confidence; running text of two sentences goes through the sentenceStandard tokenizer.
   */
  public void analyzeShowsClasses() throws IOException {
    // each word, then its qualified term at the same position, lowercased after tagging
    assertEquals(List.of(List.of("ford", "ford_verb", "the", "the_det", "stream", "stream_noun"),
        List.of("VERB", "VERB", "DET", "DET", "NOUN", "NOUN")), analyzed("Ford the stream"));
    // notes p2 and p4 as one field value of two sentences: each "park" keeps the class it has alone
    List<String> terms = analyzed("The shop sits next to the park. You can park here.").get(0);
    assertEquals(terms.toString(), List.of("park_noun", "park_verb"),
        terms.stream().filter(term -> term.startsWith("park_")).toList());

    Rest.Response explained = ok("POST", "/" + INDEX + "/_analyze",
        "{\"analyzer\":\"trip_tagged\",\"text\":\"You can park here\",\"explain\":true,\"attributes\":[\"wordClass\",\"confidence\"]}");
    assertEquals("trip_classes", explained.at("detail", "tokenfilters", 0, "name"));
    Map<?, ?> park = (Map<?, ?>) explained.at("detail", "tokenfilters", 0, "tokens", 4);
    assertEquals(explained.text, "park", park.get("token"));
    assertEquals("VERB", park.get("wordClass"));
    double confidence = ((Number) park.get("confidence")).doubleValue();
    assertTrue("a posterior probability: " + confidence, confidence > 0.5 && confidence <= 1.0);
  }

  /** Index of the French example settings. */
  public static final String FRENCH_INDEX = "recettes";

  /**
   * The French example index (language "fr", the model shipped in the plugin): _analyze shows the
   * French model's classes and name, and a qualified term finds the verb "porte" (she carries)
   * but not the noun (the door) — French grammar, common practice; the classes are those the
   * shipped French model gives these invented sentences, as config-examples' FrenchFieldTest
   * checks them in Solr.
   */
  public void frenchIndexTagsWithTheFrenchModel() throws IOException {
    ok("PUT", "/" + FRENCH_INDEX, ConfigFiles.frenchIndexSettings());
    Rest.Response explained = ok("POST", "/" + FRENCH_INDEX + "/_analyze",
        "{\"analyzer\":\"fr_tagged\",\"text\":\"Fermez la porte du four\",\"explain\":true,\"attributes\":[\"wordClass\",\"model\"]}");
    List<String> classes = new ArrayList<>();
    for (Object token : (List<?>) explained.at("detail", "tokenfilters", 0, "tokens")) {
      Map<?, ?> t = (Map<?, ?>) token;
      if (!((String) t.get("token")).contains("_")) {
        classes.add((String) t.get("wordClass"));
        assertEquals(explained.text, "fr-gsd-upos", t.get("model"));
      }
    }
    // "du" = de + le is one token and takes the preposition's class (docs/languages.md)
    assertEquals(explained.text, List.of("VERB", "DET", "NOUN", "ADP", "NOUN"), classes);

    String bulk = "{\"index\":{\"_id\":\"f1\"}}\n{\"note\":\"Elle porte le panier au marché\"}\n"
        + "{\"index\":{\"_id\":\"f2\"}}\n{\"note\":\"La porte de la cuisine reste ouverte\"}\n";
    Rest.Response indexed = ok("POST", "/" + FRENCH_INDEX + "/_bulk?refresh=true", bulk);
    assertEquals(indexed.text, Boolean.FALSE, indexed.at("errors"));
    Rest.Response found = ok("POST", "/" + FRENCH_INDEX + "/_search", "{\"query\":{\"term\":{\"note\":\"porte_verb\"}}}");
    assertEquals(List.of("f1"), ranking(found));
  }

  /** The ids a query finds, optionally on one shard only. */
  Set<String> ids(String query, String preference) throws IOException {
    String path = "/" + INDEX + "/_search" + (preference == null ? "" : "?preference=" + preference);
    Rest.Response response = ok("POST", path, "{\"size\":20,\"query\":" + query + "}");
    return new TreeSet<>(ranking(response));
  }

  /** Ids by score; with statistics over all shards (dfs), so that the ranking does not depend on how notes are spread. */
  List<String> ranking(String query) throws IOException {
    return ranking(ok("POST", "/" + INDEX + "/_search?search_type=dfs_query_then_fetch", "{\"size\":20,\"query\":" + query + "}"));
  }

  private static List<String> ranking(Rest.Response response) {
    List<String> ids = new ArrayList<>();
    for (Object hit : (List<?>) response.at("hits", "hits")) {
      ids.add((String) ((Map<?, ?>) hit).get("_id"));
    }
    return ids;
  }

  static final String VERB_PARK_TERM = "{\"term\":{\"note\":\"park_verb\"}}";
  static final String NOUN_PARK = "{\"word_class_term\":{\"field\":\"note\",\"word\":\"park\",\"classes\":[\"NOUN\"]}}";
  static final String ANY_RIDE = "{\"word_class_term\":{\"field\":\"note\",\"word\":\"ride\",\"classes\":[\"NOUN\",\"VERB\"]}}";

  /** The qualified-term query and both of our queries find what the tagger's classes say, over all shards. */
  public void queriesFindByClass() throws IOException {
    assertEquals(Set.of("p1", "p4"), ids(VERB_PARK_TERM, null));
    assertEquals(Set.of("p2", "p3"), ids(NOUN_PARK, null));
    assertEquals(Set.of("p3", "r1", "r2"), ids(ANY_RIDE, null));
    assertEquals(Set.of("p1", "p2", "p3", "p4"), ids("{\"match\":{\"note\":\"park\"}}", null));

    List<String> plain = ranking("{\"match\":{\"note.weighted\":\"park\"}}");
    assertEquals("the shortest note wins without weights", "p4", plain.get(0));
    List<String> stored = ranking("{\"class_weighted_term\":{\"field\":\"note.weighted\",\"word\":\"park\"}}");
    assertEquals("nouns weigh 4 in the index: " + stored, Set.of("p2", "p3"), Set.copyOf(stored.subList(0, 2)));
    assertEquals("weighting loses no match", Set.copyOf(plain), Set.copyOf(stored));
    List<String> chosen = ranking(
        "{\"class_weighted_term\":{\"field\":\"note\",\"word\":\"park\",\"weights\":{\"VERB\":4.0},\"default_weight\":0.5}}");
    assertEquals("verbs chosen at query time: " + chosen, Set.of("p1", "p4"), Set.copyOf(chosen.subList(0, 2)));
  }

  /** Each shard holds part of the notes: the queries' results are the union of the shards'. */
  public void resultsComeFromEveryShard() throws IOException {
    Set<String> union = new TreeSet<>();
    for (int shard = 0; shard < 2; shard++) {
      Set<String> onShard = ids("{\"match_all\":{}}", "_shards:" + shard);
      assertTrue("shard " + shard + " holds some notes", !onShard.isEmpty() && onShard.size() < NOTES.length);
      union.addAll(ids(ANY_RIDE, "_shards:" + shard));
    }
    assertEquals(Set.of("p3", "r1", "r2"), union);
  }

  /** Answers 400 with a message that contains every one of {@code parts}. */
  public void assertRefused(String method, String path, String json, String... parts) throws IOException {
    Rest.Response response = rest.call(method, path, json);
    assertEquals(path + " " + json + " -> " + response.text, 400, response.status);
    for (String part : parts) {
      assertTrue("'" + part + "' missing from " + response.text, response.text.contains(part));
    }
  }

  private void assertIndexRefused(String filter, String... parts) throws IOException {
    String settings = "{\"settings\":{\"analysis\":{\"filter\":{\"bad\":" + filter + "},"
        + "\"analyzer\":{\"a\":{\"type\":\"custom\",\"tokenizer\":\"standard\",\"filter\":[\"bad\"]}}}}}";
    assertRefused("PUT", "/refused", settings, parts);
    assertEquals("nothing was created", 404, rest.call("GET", "/refused", null).status);
  }

  /** Every kind of bad filter setting is the user's error: 400, naming the argument or file and the reason. */
  public void badSettingsAreRefused(String unreadableModel) throws IOException {
    String prefix = "the wordClass filter [bad] cannot be used";
    assertIndexRefused("{\"type\":\"wordClass\",\"bogus\":\"1\"}", prefix, "Unknown parameters", "bogus");
    assertIndexRefused("{\"type\":\"wordClass\",\"order\":3}", prefix, "'order'", "[1, 2]");
    assertIndexRefused("{\"type\":\"wordClass\",\"weights\":{\"NOUN\":2}}", prefix, "'weights'", "payload=\\\"weight\\\"");
    assertIndexRefused("{\"type\":\"wordClass\",\"keepClasses\":[\"NOUNS\"]}", prefix, "'keepClasses'", "'NOUNS'");
    assertIndexRefused("{\"type\":\"wordClass\",\"model\":\"wordclass/missing.wcm\"}", prefix, "'model'", "wordclass/missing.wcm", "no such file");
    assertIndexRefused("{\"type\":\"wordClass\",\"lexicon\":\"wordclass/missing.txt\"}", prefix, "'lexicon'", "no such file");
    assertIndexRefused("{\"type\":\"wordClass\",\"model\":\"wordclass\"}", prefix, "'model'", "is a directory");
    assertIndexRefused("{\"type\":\"wordClass\",\"model\":\"../outside.wcm\"}", prefix, "'model'", "leads outside");
    assertIndexRefused("{\"type\":\"wordClass\",\"model\":\"wordclass/corrupt.wcm\"}", prefix, "wordclass/corrupt.wcm", "corrupt");
    assertIndexRefused("{\"type\":\"wordClass\",\"model\":\"wordclass/hiking-lexicon.txt\"}", prefix, "wordclass/hiking-lexicon.txt",
        "not a word-class model file");
    assertIndexRefused("{\"type\":\"wordClass\",\"lexicon\":\"wordclass/en.wcm\"}", prefix, "wordclass/en.wcm");
    if (unreadableModel != null) {
      assertIndexRefused("{\"type\":\"wordClass\",\"model\":\"" + unreadableModel + "\"}", prefix, "'model'", "may not read");
    }
    assertRefused("PUT", "/refused", "{\"settings\":{\"analysis\":{\"tokenizer\":{\"t\":{\"type\":\"sentenceStandard\","
        + "\"maxTokenLength\":0}},\"analyzer\":{\"a\":{\"type\":\"custom\",\"tokenizer\":\"t\"}}}}}",
        "the sentenceStandard tokenizer [t] cannot be used", "maxTokenLength");
    // a model named explicitly works like the bundled one (one shard: a test cluster's template would spread ten)
    ok("PUT", "/named-model", "{\"settings\":{\"index\":{\"number_of_shards\":1,\"number_of_replicas\":0},\"analysis\":{\"filter\":{\"f\":{\"type\":\"wordClass\",\"model\":\"wordclass/en.wcm\"}}}}}");
    ok("DELETE", "/named-model", null);
  }

  /**
   * Bad query parameters are 400 too, naming the parameter. A missing or unknown one is refused by
   * the engine's own parser, in its own words (OpenSearch: ours, "does not take [klasses]";
   * Elasticsearch: its ObjectParser's "Required [classes]", "unknown field [klasses]"), so only
   * the name is checked there.
   */
  public void badQueriesAreRefused() throws IOException {
    String search = "/" + INDEX + "/_search";
    assertRefused("POST", search, "{\"query\":{\"word_class_term\":{\"field\":\"note\",\"word\":\"park\"}}}", "classes");
    assertRefused("POST", search, "{\"query\":{\"word_class_term\":{\"field\":\"note\",\"word\":\"park\",\"classes\":[\"NOUN\"],\"klasses\":1}}}",
        "[klasses]");
    assertRefused("POST", search, "{\"query\":{\"word_class_term\":{\"field\":\"note\",\"word\":\"park\",\"classes\":[\"NOUNS\"]}}}",
        "'NOUNS'");
    assertRefused("POST", search, "{\"query\":{\"word_class_term\":{\"field\":\"note.weighted\",\"word\":\"park\",\"classes\":[\"NOUN\"]}}}",
        "payload=weight");
    assertRefused("POST", search, "{\"query\":{\"class_weighted_term\":{\"field\":\"note\",\"word\":\"park\",\"weights\":{\"NOUN\":\"heavy\"}}}}",
        "'weights.NOUN'");
    assertRefused("POST", search, "{\"query\":{\"class_weighted_term\":{\"field\":\"note.weighted\",\"word\":\"park\",\"weights\":{\"NOUN\":2}}}}",
        "stores its weights");
  }
}
