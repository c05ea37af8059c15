package org.wordclass.examples.lucene;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
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
import org.apache.lucene.search.IndexSearcher;
import org.apache.lucene.search.Query;
import org.apache.lucene.search.ScoreDoc;
import org.apache.lucene.store.ByteBuffersDirectory;
import org.apache.lucene.store.Directory;
import org.apache.lucene.tests.util.LuceneTestCase;
import org.wordclass.analysis.ClassWeights;
import org.wordclass.analysis.PayloadEncoding;
import org.wordclass.analysis.WordClassFilterFactory;
import org.wordclass.examples.ExampleFiles;
import org.wordclass.model.DefaultModel;
import org.wordclass.model.HmmModel;
import org.wordclass.model.TagSet;
import org.wordclass.query.ClassWeightPayloadDecoder;
import org.wordclass.query.WordClassQueries;

/**
 * The code snippets of docs/lucene.md, compiled and run so that they stay true. Each test holds one
 * snippet between the {@code // doc:} markers, as the page shows it.
 */
public class LuceneSnippetsTest extends LuceneTestCase {
  /** A hiking club's trip notes; the comment says what the bundled model makes of "hike". */
  private static final String[][] TRIPS = {
    {"t1", "We hike the ridge trails every spring"}, // VERB
    {"t2", "The hike to the lake takes three hours"}, // NOUN
    {"t3", "They hike on Sundays"}, // VERB; the shortest, so plain ranking favours it
  };

  private Directory dir;
  private DirectoryReader reader;
  private IndexSearcher searcher;

  @Override
  public void setUp() throws Exception {
    super.setUp();
    dir = new ByteBuffersDirectory();
    try (IndexWriter writer = new IndexWriter(dir, new IndexWriterConfig(fields()))) {
      for (String[] trip : TRIPS) {
        Document doc = new Document();
        doc.add(new StringField("id", trip[0], Field.Store.YES));
        for (String field : List.of("tagged", "classed", "weighted")) {
          doc.add(new TextField(field, trip[1], Field.Store.NO));
        }
        writer.addDocument(doc);
      }
    }
    reader = DirectoryReader.open(dir);
    searcher = new IndexSearcher(reader);
  }

  @Override
  public void tearDown() throws Exception {
    reader.close();
    dir.close();
    super.tearDown();
  }

  private static Analyzer fields() throws IOException {
    // doc: per-field
    Analyzer tagged = CustomAnalyzer.builder()
        .withTokenizer("sentenceStandard")
        .addTokenFilter("wordClass", "payload", "tag")
        .addTokenFilter("lowercase")
        .addTokenFilter("porterStem")
        .build();
    Analyzer classed = CustomAnalyzer.builder()
        .withTokenizer("sentenceStandard")
        .addTokenFilter("wordClass", "qualifiedTerms", "true")
        .addTokenFilter("lowercase")
        .addTokenFilter("porterStem")
        .build();
    Analyzer weighted = CustomAnalyzer.builder()
        .withTokenizer("sentenceStandard")
        .addTokenFilter("wordClass", "payload", "weight", "weights", "NOUN:3.0,PROPN:3.0")
        .addTokenFilter("lowercase")
        .addTokenFilter("porterStem")
        .build();
    Analyzer analyzer = new PerFieldAnalyzerWrapper(tagged, Map.of("classed", classed, "weighted", weighted));
    // doc: end
    return analyzer;
  }

  public void testByQualifiedTerm() throws IOException {
    // doc: byQualifiedTerm
    // the class is lowercased too, since the lowercase filter runs after the word-class filter
    Query verbs = WordClassQueries.byQualifiedTerm("classed", "hike", "_", "verb");
    // doc: end
    assertEquals(List.of("t1", "t3"), sorted(ids(verbs)));
  }

  public void testByPayload() throws IOException {
    // doc: byPayload
    TagSet tags = DefaultModel.get().tags();
    Query nouns = WordClassQueries.byPayload("tagged", "hike", PayloadEncoding.TAG, tags, "NOUN");
    // doc: end
    assertEquals(List.of("t2"), ids(nouns));
  }

  public void testClassWeighted() throws IOException {
    // doc: classWeighted
    TagSet tags = DefaultModel.get().tags();
    Query ranked = WordClassQueries.classWeighted(
        "weighted", "hike", ClassWeightPayloadDecoder.storedWeights(ClassWeights.uniform(tags)));
    // doc: end
    List<String> hits = ids(ranked);
    assertEquals(3, hits.size());
    assertEquals("the noun occurrence ranks first, ahead of the shorter notes", "t2", hits.get(0));
  }

  public void testQueryTimeWeights() throws IOException {
    // doc: queryTimeWeights
    // weights chosen per query over TAG payloads: here verbs count, nouns do not
    TagSet tags = DefaultModel.get().tags();
    ClassWeights verbsFirst = ClassWeights.of(tags, Map.of("VERB", 5.0f), 1.0f, "weights");
    Query ranked = WordClassQueries.classWeighted(
        "tagged", "hike", new ClassWeightPayloadDecoder(PayloadEncoding.TAG, verbsFirst));
    // doc: end
    List<String> hits = ids(ranked);
    assertEquals(List.of("t1", "t3"), sorted(hits.subList(0, 2)));
    assertEquals("t2", hits.get(2));
  }

  public void testModelFromAFolder() throws IOException {
    Path conf = createTempDir("conf");
    ExampleFiles.copyBundledModel(conf.resolve("wordclass").resolve("my-domain.wcm"));
    // doc: modelFromAFolder
    // "model" is read relative to the folder given to the builder
    CustomAnalyzer analyzer = CustomAnalyzer.builder(conf)
        .withTokenizer("sentenceStandard")
        .addTokenFilter("wordClass", "model", "wordclass/my-domain.wcm")
        .addTokenFilter("lowercase")
        .build();
    // doc: end
    HmmModel loaded = ((WordClassFilterFactory) analyzer.getTokenFilterFactories().get(0)).options().model();
    assertNotSame("a file is read through the model cache, not taken from the jar", DefaultModel.get(), loaded);
    assertEquals(DefaultModel.get().tags(), loaded.tags());
    CustomAnalyzer again = CustomAnalyzer.builder(conf)
        .withTokenizer("sentenceStandard")
        .addTokenFilter("wordClass", "model", "wordclass/my-domain.wcm")
        .build();
    assertSame("a second analyzer on the same file shares the model",
        loaded, ((WordClassFilterFactory) again.getTokenFilterFactories().get(0)).options().model());
    analyzer.close();
    again.close();
  }

  private List<String> ids(Query query) throws IOException {
    List<String> ids = new ArrayList<>();
    for (ScoreDoc hit : searcher.search(query, 10).scoreDocs) {
      ids.add(searcher.storedFields().document(hit.doc).get("id"));
    }
    return ids;
  }

  private static List<String> sorted(List<String> ids) {
    List<String> copy = new ArrayList<>(ids);
    copy.sort(null);
    return copy;
  }
}
