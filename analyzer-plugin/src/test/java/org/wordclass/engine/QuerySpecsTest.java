package org.wordclass.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.LowerCaseFilter;
import org.apache.lucene.analysis.standard.StandardTokenizer;
import org.apache.lucene.document.Document;
import org.apache.lucene.document.Field;
import org.apache.lucene.document.StringField;
import org.apache.lucene.document.TextField;
import org.apache.lucene.index.DirectoryReader;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.IndexWriterConfig;
import org.apache.lucene.search.IndexSearcher;
import org.apache.lucene.search.Query;
import org.apache.lucene.search.ScoreDoc;
import org.apache.lucene.store.ByteBuffersDirectory;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wordclass.analysis.WordClassFilterFactory;
import org.wordclass.analysis.WordClassOptions;

/**
 * The two query types, from parameters as an engine parses them, over fields whose filters were
 * made from engine settings: what a user of either engine plugin gets on a shard. The classes
 * noted per sentence are what the bundled model assigns (checked by TestWordClassQueries).
 */
class QuerySpecsTest {
  private static final String[][] NOTES = {
    {"p1", "Riders park their bikes outside the shop"}, // park: VERB
    {"p2", "The shop sits next to the park"}, // park: NOUN
    {"p4", "You can park here"}, // park: VERB, shortest
  };

  @TempDir static Path config;
  private static Map<String, WordClassOptions> fields;
  private static DirectoryReader reader;

  /** One engine-made filter per field, as an engine holds it. */
  private static final class Holder implements WordClassFilterHolder {
    final WordClassFilterFactory factory;

    Holder(String... settings) {
      Map<String, String> flat = new java.util.LinkedHashMap<>();
      for (int i = 0; i < settings.length; i += 2) {
        flat.put(settings[i], settings[i + 1]);
      }
      factory = EngineFilters.create("f", flat, Set.of(), config);
    }

    @Override
    public WordClassFilterFactory wordClassFactory() {
      return factory;
    }
  }

  @BeforeAll
  static void index() throws IOException {
    Map<String, Holder> holders = Map.of(
        "byTag", new Holder("payload", "tag"),
        "byIndex", new Holder("payload", "index"),
        "weighted", new Holder("payload", "weight", "weights.NOUN", "4.0"),
        "plain", new Holder());
    fields = new java.util.HashMap<>();
    holders.forEach((field, holder) -> fields.put(field, IndexedClasses.of(field, List.of("lowercase", holder))));
    Analyzer analyzer = new Analyzer(Analyzer.PER_FIELD_REUSE_STRATEGY) {
      @Override
      public TokenStreamComponents createComponents(String field) {
        StandardTokenizer tokens = new StandardTokenizer();
        return new TokenStreamComponents(tokens, new LowerCaseFilter(holders.get(field).factory.create(tokens)));
      }
    };
    ByteBuffersDirectory dir = new ByteBuffersDirectory();
    try (IndexWriter writer = new IndexWriter(dir, new IndexWriterConfig(analyzer))) {
      for (String[] note : NOTES) {
        Document doc = new Document();
        doc.add(new StringField("id", note[0], Field.Store.YES));
        for (String field : holders.keySet()) {
          doc.add(new TextField(field, note[1], Field.Store.NO));
        }
        writer.addDocument(doc);
      }
    }
    reader = DirectoryReader.open(dir);
  }

  @AfterAll
  static void close() throws IOException {
    reader.close();
  }

  private static List<String> ranking(Query query) throws IOException {
    IndexSearcher searcher = new IndexSearcher(reader);
    List<String> ids = new ArrayList<>();
    for (ScoreDoc hit : searcher.search(query, 10).scoreDocs) {
      ids.add(searcher.storedFields().document(hit.doc).get("id"));
    }
    return ids;
  }

  private static Query restricted(String field, String word, String... classes) {
    return new ClassRestrictedQuerySpec(field, word, List.of(classes)).toQuery(fields.get(field));
  }

  @Test
  void classRestrictedFindsOnlyTheAskedClass() throws IOException {
    for (String field : List.of("byTag", "byIndex")) {
      assertEquals(Set.of("p1", "p4"), new TreeSet<>(ranking(restricted(field, "park", "VERB"))));
      assertEquals(List.of("p2"), ranking(restricted(field, "park", "NOUN")));
      assertEquals(Set.of("p1", "p2", "p4"), new TreeSet<>(ranking(restricted(field, "park", "NOUN", "VERB"))));
    }
  }

  @Test
  void classWeightedRanksTheWeightedClassFirstAndKeepsEveryMatch() throws IOException {
    Query stored = ClassWeightedQuerySpec.of("weighted", "park", null, null).toQuery(fields.get("weighted"));
    List<String> ranked = ranking(stored);
    assertEquals("p2", ranked.get(0));
    assertEquals(Set.of("p1", "p2", "p4"), Set.copyOf(ranked));
    Query chosen = ClassWeightedQuerySpec.of("byTag", "park", Map.of("NOUN", 4, "VERB", "0.5"), null).toQuery(fields.get("byTag"));
    assertEquals("p2", ranking(chosen).get(0));
    Query verbs = ClassWeightedQuerySpec.of("byIndex", "park", Map.of("VERB", 4.0), 0.25f).toQuery(fields.get("byIndex"));
    assertEquals("p4", ranking(verbs).get(0));
  }

  private static void assertRefused(Runnable spec, String... parts) {
    String message = assertThrows(IllegalArgumentException.class, spec::run).getMessage();
    for (String part : parts) {
      assertTrue(message.contains(part), () -> "'" + part + "' missing from: " + message);
    }
  }

  @Test
  void malformedParametersAreNamed() {
    assertRefused(() -> new ClassRestrictedQuerySpec(null, "park", List.of("NOUN")), "'field' is required");
    assertRefused(() -> new ClassRestrictedQuerySpec("byTag", "", List.of("NOUN")), "'word' is required");
    assertRefused(() -> new ClassRestrictedQuerySpec("byTag", "park", List.of()), "'classes' must list");
    assertRefused(() -> ClassWeightedQuerySpec.of("byTag", "park", Map.of("NOUN", "heavy"), null), "'weights.NOUN'", "heavy");
    assertRefused(() -> ClassWeightedQuerySpec.of("byTag", "park", Map.of(), Float.NaN), "'default_weight'", "finite");
  }

  @Test
  void parametersThatDoNotFitTheFieldAreNamed() {
    assertRefused(() -> restricted("byTag", "park", "NOUNS"), "field [byTag]", "'NOUNS'", "VERB");
    assertRefused(() -> restricted("weighted", "park", "NOUN"), "field [weighted]", "payload=weight", "payload=tag");
    assertRefused(() -> ClassWeightedQuerySpec.of("plain", "park", null, null).toQuery(fields.get("plain")),
        "field [plain]", "payload=none");
    assertRefused(() -> ClassWeightedQuerySpec.of("weighted", "park", Map.of("NOUN", 2), null).toQuery(fields.get("weighted")),
        "field [weighted]", "stores its weights");
    assertRefused(() -> ClassWeightedQuerySpec.of("byTag", "park", Map.of("NOUNZ", 2), null).toQuery(fields.get("byTag")),
        "field [byTag]", "'NOUNZ'");
  }

  @Test
  void fieldsWithoutOneWordClassFilterAreNamed() {
    Holder holder = new Holder();
    assertRefused(() -> IndexedClasses.of("title", List.of("lowercase")), "field [title] is not analyzed with a word-class filter");
    assertRefused(() -> IndexedClasses.of("title", List.of(holder, holder)), "field [title] is tagged by more than one");
  }
}
