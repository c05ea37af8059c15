package org.wordclass.query;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.custom.CustomAnalyzer;
import org.apache.lucene.analysis.miscellaneous.PerFieldAnalyzerWrapper;
import org.apache.lucene.document.Document;
import org.apache.lucene.document.Field;
import org.apache.lucene.document.StringField;
import org.apache.lucene.document.TextField;
import org.apache.lucene.index.DirectoryReader;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.IndexWriterConfig;
import org.apache.lucene.index.Term;
import org.apache.lucene.queries.spans.SpanTermQuery;
import org.apache.lucene.search.IndexSearcher;
import org.apache.lucene.search.Query;
import org.apache.lucene.search.ScoreDoc;
import org.apache.lucene.search.TermQuery;
import org.apache.lucene.store.ByteBuffersDirectory;
import org.apache.lucene.store.Directory;
import org.apache.lucene.tests.util.LuceneTestCase;
import org.wordclass.analysis.ClassWeights;
import org.wordclass.analysis.PayloadEncoding;
import org.wordclass.model.DefaultModel;
import org.wordclass.model.TagSet;

/**
 * End to end: a bike shop's notes indexed with and without the word-class filter, searched with
 * class-restricted and class-weighted queries.
 */
public class TestWordClassQueries extends LuceneTestCase {
  /** Id, text, and what the bundled model makes of "park" or "ride" in it. */
  private static final String[][] NOTES = {
    {"p1", "Riders park their bikes outside the shop"}, // park: VERB
    {"p2", "The shop sits next to the park"}, // park: NOUN
    {"p3", "We ride through the park every Sunday"}, // park: NOUN, ride: VERB
    {"p4", "You can park here"}, // park: VERB; the shortest note, so plain ranking favours it
    {"r1", "I like the long ride to the lake"}, // ride: NOUN
    {"r2", "They ride to the lake"}, // ride: VERB
  };

  private static final Map<String, Float> WEIGHTS = Map.of("NOUN", 4.0f, "PROPN", 4.0f);

  private Directory tagged;
  private Directory plain;
  private IndexSearcher taggedSearcher;
  private IndexSearcher plainSearcher;
  private TagSet tags;

  @Override
  public void setUp() throws Exception {
    super.setUp();
    tags = DefaultModel.get().tags();
    tagged = index(taggedAnalyzer());
    plain = index(chain());
    taggedSearcher = new IndexSearcher(DirectoryReader.open(tagged));
    plainSearcher = new IndexSearcher(DirectoryReader.open(plain));
  }

  @Override
  public void tearDown() throws Exception {
    taggedSearcher.getIndexReader().close();
    plainSearcher.getIndexReader().close();
    tagged.close();
    plain.close();
    super.tearDown();
  }

  /** Fields: {@code body} with TAG payloads and qualified terms, {@code byIndex} with INDEX, {@code weighted} with WEIGHT. */
  private static Analyzer taggedAnalyzer() throws IOException {
    return new PerFieldAnalyzerWrapper(
        chain("payload", "tag", "qualifiedTerms", "true"),
        Map.of(
            "byIndex", chain("payload", "index"),
            "weighted", chain("payload", "weight", "weights", "NOUN:4.0,PROPN:4.0")));
  }

  /** Standard tokens, tagged with {@code wordClassArgs} unless empty, then lowercased. */
  private static Analyzer chain(String... wordClassArgs) throws IOException {
    CustomAnalyzer.Builder builder = CustomAnalyzer.builder().withTokenizer("standard");
    if (wordClassArgs.length > 0) {
      builder.addTokenFilter("wordClass", wordClassArgs);
    }
    return builder.addTokenFilter("lowercase").build();
  }

  private static Directory index(Analyzer analyzer) throws IOException {
    Directory dir = new ByteBuffersDirectory();
    try (IndexWriter writer = new IndexWriter(dir, new IndexWriterConfig(analyzer))) {
      for (String[] note : NOTES) {
        Document doc = new Document();
        doc.add(new StringField("id", note[0], Field.Store.YES));
        for (String field : List.of("body", "byIndex", "weighted")) {
          doc.add(new TextField(field, note[1], Field.Store.NO));
        }
        writer.addDocument(doc);
      }
    }
    analyzer.close();
    return dir;
  }

  public void testPayloadRestriction() throws IOException {
    assertEquals(Set.of("p1", "p2", "p3", "p4"), ids(plainSearcher, new TermQuery(new Term("body", "park"))));
    Query nounPark = WordClassQueries.byPayload("body", "park", PayloadEncoding.TAG, tags, "NOUN");
    assertEquals(Set.of("p2", "p3"), ids(taggedSearcher, nounPark));
    assertEquals("without class payloads nothing can match", Set.of(), ids(plainSearcher, nounPark));
    Query verbPark = WordClassQueries.byPayload("byIndex", "park", PayloadEncoding.INDEX, tags, "VERB");
    assertEquals(Set.of("p1", "p4"), ids(taggedSearcher, verbPark));
    Query eitherRide = WordClassQueries.byPayload("body", "ride", PayloadEncoding.TAG, tags, "NOUN", "VERB");
    assertEquals(Set.of("p3", "r1", "r2"), ids(taggedSearcher, eitherRide));
  }

  public void testQualifiedTermRestriction() throws IOException {
    // the analyzer lowercases after tagging, so qualified terms are lowercase too
    assertEquals(Set.of("p1", "p4"), ids(taggedSearcher, WordClassQueries.byQualifiedTerm("body", "park", "_", "verb")));
    assertEquals(Set.of("r1"), ids(taggedSearcher, WordClassQueries.byQualifiedTerm("body", "ride", "_", "noun")));
    assertEquals(Set.of("p3", "r1", "r2"), ids(taggedSearcher, WordClassQueries.byQualifiedTerm("body", "ride", "_", "noun", "verb")));
    assertEquals(Set.of(), ids(plainSearcher, WordClassQueries.byQualifiedTerm("body", "park", "_", "verb")));
    // the qualified terms do not disturb plain searches of the same field
    assertEquals(Set.of("p1", "p2", "p3", "p4"), ids(taggedSearcher, new TermQuery(new Term("body", "park"))));
  }

  public void testClassWeightingRanksNounsFirstWithoutLosingMatches() throws IOException {
    List<String> plainRanking = ranking(plainSearcher, new TermQuery(new Term("weighted", "park")));
    assertEquals("the shortest note wins without weights", "p4", plainRanking.get(0));

    ClassWeights weights = ClassWeights.of(tags, WEIGHTS, 1.0f, "weights");
    List<String> stored = ranking(
        taggedSearcher, WordClassQueries.classWeighted("weighted", "park", ClassWeightPayloadDecoder.storedWeights(weights)));
    assertEquals(Set.of("p2", "p3"), Set.copyOf(stored.subList(0, 2)));
    assertEquals(Set.copyOf(plainRanking), Set.copyOf(stored));

    List<String> fromTags = ranking(
        taggedSearcher, WordClassQueries.classWeighted("body", "park", new ClassWeightPayloadDecoder(PayloadEncoding.TAG, weights)));
    List<String> fromIndexes = ranking(
        taggedSearcher, WordClassQueries.classWeighted("byIndex", "park", new ClassWeightPayloadDecoder(PayloadEncoding.INDEX, weights)));
    assertEquals(Set.of("p2", "p3"), Set.copyOf(fromTags.subList(0, 2)));
    assertEquals(Set.of("p2", "p3"), Set.copyOf(fromIndexes.subList(0, 2)));

    List<String> unweighted = ranking(
        plainSearcher, WordClassQueries.classWeighted("weighted", "park", ClassWeightPayloadDecoder.storedWeights(weights)));
    assertEquals("no payloads: every match weighs the same", ranking(plainSearcher, new SpanTermQuery(new Term("weighted", "park"))), unweighted);
  }

  public void testDecoderReadsEachEncoding() {
    ClassWeights weights = ClassWeights.of(tags, WEIGHTS, 0.5f, "weights");
    int noun = tags.indexOf("NOUN");
    int verb = tags.indexOf("VERB");
    for (PayloadEncoding encoding : List.of(PayloadEncoding.TAG, PayloadEncoding.INDEX, PayloadEncoding.WEIGHT)) {
      ClassWeightPayloadDecoder decoder = new ClassWeightPayloadDecoder(encoding, weights);
      assertEquals(encoding.name(), 4.0f, decoder.computePayloadFactor(encoding.encode(tags, noun, weights)), 0f);
      assertEquals(encoding.name(), 0.5f, decoder.computePayloadFactor(encoding.encode(tags, verb, weights)), 0f);
      assertEquals(encoding.name(), 0.5f, decoder.computePayloadFactor(null), 0f);
    }
    expectThrows(IllegalArgumentException.class, () -> new ClassWeightPayloadDecoder(PayloadEncoding.NONE, weights));
    expectThrows(IllegalArgumentException.class, () -> WordClassQueries.byPayload("body", "park", PayloadEncoding.WEIGHT, tags, "NOUN"));
    expectThrows(IllegalArgumentException.class, () -> WordClassQueries.byPayload("body", "park", PayloadEncoding.TAG, tags, "NOUNS"));
  }

  private static Set<String> ids(IndexSearcher searcher, Query query) throws IOException {
    return new TreeSet<>(ranking(searcher, query));
  }

  private static List<String> ranking(IndexSearcher searcher, Query query) throws IOException {
    List<String> ids = new ArrayList<>();
    for (ScoreDoc hit : searcher.search(query, NOTES.length).scoreDocs) {
      ids.add(searcher.storedFields().document(hit.doc).get("id"));
    }
    return ids;
  }
}
