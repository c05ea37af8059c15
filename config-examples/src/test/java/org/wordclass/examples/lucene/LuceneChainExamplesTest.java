package org.wordclass.examples.lucene;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.payloads.PayloadHelper;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.analysis.tokenattributes.PayloadAttribute;
import org.apache.lucene.tests.analysis.BaseTokenStreamTestCase;
import org.apache.lucene.util.BytesRef;
import org.wordclass.examples.ExampleFiles;
import org.wordclass.model.DefaultModel;
import org.wordclass.model.TagSet;

/**
 * Each example chain of {@code lucene/}, loaded from its file, on one invented sentence of a hiking
 * club: the terms, classes and payloads a user of that chain gets.
 */
public class LuceneChainExamplesTest extends BaseTokenStreamTestCase {
  private static final String SENTENCE = "We hike the ridge trails every spring";
  private static final String[] CLASSES = {"PRON", "VERB", "DET", "NOUN", "NOUN", "DET", "NOUN"};
  /** After lowercase and the Porter stemmer. */
  private static final String[] PORTER = {"we", "hike", "the", "ridg", "trail", "everi", "spring"};

  private static Analyzer chain(String name) throws IOException {
    return ChainFile.load(ExampleFiles.luceneChain(name));
  }

  public void testClassesAsTypes() throws IOException {
    try (Analyzer analyzer = chain("classes-as-types")) {
      assertAnalyzesTo(analyzer, SENTENCE, PORTER, CLASSES);
      assertTrue(payloads(analyzer).stream().allMatch(payload -> payload == null));
    }
  }

  public void testTagPayloads() throws IOException {
    try (Analyzer analyzer = chain("tag-payloads")) {
      assertAnalyzesTo(analyzer, SENTENCE, PORTER, CLASSES);
      List<String> names = new ArrayList<>();
      for (BytesRef payload : payloads(analyzer)) {
        names.add(new String(payload.bytes, payload.offset, payload.length, StandardCharsets.UTF_8));
      }
      assertEquals(List.of(CLASSES), names);
    }
  }

  public void testIndexPayloads() throws IOException {
    TagSet tags = DefaultModel.get().tags();
    try (Analyzer analyzer = chain("index-payloads")) {
      assertAnalyzesTo(analyzer, SENTENCE, PORTER, CLASSES);
      List<String> names = new ArrayList<>();
      for (BytesRef payload : payloads(analyzer)) {
        assertEquals(1, payload.length);
        names.add(tags.name(payload.bytes[payload.offset] & 0xFF));
      }
      assertEquals(List.of(CLASSES), names);
    }
  }

  public void testWeightPayloads() throws IOException {
    try (Analyzer analyzer = chain("weight-payloads")) {
      // the minimal stemmer only folds plurals
      assertAnalyzesTo(analyzer, SENTENCE, new String[] {"we", "hike", "the", "ridge", "trail", "every", "spring"}, CLASSES);
      List<Float> weights = new ArrayList<>();
      for (BytesRef payload : payloads(analyzer)) {
        assertEquals(Float.BYTES, payload.length);
        weights.add(PayloadHelper.decodeFloat(payload.bytes, payload.offset));
      }
      // NOUN and PROPN 3, VERB 1.5, the rest the default weight 1
      assertEquals(List.of(1.0f, 1.5f, 1.0f, 3.0f, 3.0f, 1.0f, 3.0f), weights);
    }
  }

  public void testQualifiedTerms() throws IOException {
    try (Analyzer analyzer = chain("qualified-terms")) {
      assertAnalyzesTo(
          analyzer,
          SENTENCE,
          new String[] {
            "we", "we_pron", "hike", "hike_verb", "the", "the_det", "ridg", "ridge_noun",
            "trail", "trails_noun", "everi", "every_det", "spring", "spring_noun"
          },
          null,
          null,
          new String[] {
            "PRON", "PRON", "VERB", "VERB", "DET", "DET", "NOUN", "NOUN", "NOUN", "NOUN", "DET", "DET", "NOUN", "NOUN"
          },
          new int[] {1, 0, 1, 0, 1, 0, 1, 0, 1, 0, 1, 0, 1, 0});
    }
  }

  public void testUserLexicon() throws IOException {
    try (Analyzer plain = chain("classes-as-types"); Analyzer analyzer = chain("user-lexicon")) {
      String scramble = "Scramble up the scree to the col";
      // the bundled model's reading, before the club's lexicon
      assertAnalyzesTo(plain, scramble, new String[] {"scrambl", "up", "the", "scree", "to", "the", "col"},
          new String[] {"NOUN", "ADP", "DET", "NOUN", "ADP", "DET", "NOUN"});
      assertAnalyzesTo(analyzer, scramble, new String[] {"scramble", "up", "the", "scree", "to", "the", "col"},
          new String[] {"VERB", "ADP", "DET", "NOUN", "ADP", "DET", "NOUN"});
      assertAnalyzesTo(analyzer, "Ford the stream at dawn", new String[] {"ford", "the", "stream", "at", "dawn"},
          new String[] {"VERB", "DET", "NOUN", "ADP", "NOUN"});
      // both classes are listed, so the context still makes this one a noun
      assertAnalyzesTo(analyzer, "The scramble took an hour", new String[] {"the", "scramble", "took", "an", "hour"},
          new String[] {"DET", "NOUN", "VERB", "DET", "NOUN"});
    }
  }

  /** Every example file is loaded by some test above; a new file needs its own test. */
  public void testEveryExampleFileIsCovered() throws IOException {
    List<String> files = new ArrayList<>();
    try (var listing = java.nio.file.Files.list(ExampleFiles.moduleDir().resolve("lucene"))) {
      listing.forEach(path -> files.add(path.getFileName().toString()));
    }
    files.sort(null);
    assertEquals(
        List.of("classes-as-types.properties", "hiking-lexicon.txt", "index-payloads.properties",
            "qualified-terms.properties", "tag-payloads.properties", "user-lexicon.properties",
            "weight-payloads.properties"),
        files);
  }

  private static List<BytesRef> payloads(Analyzer analyzer) throws IOException {
    List<BytesRef> payloads = new ArrayList<>();
    try (TokenStream stream = analyzer.tokenStream("body", SENTENCE)) {
      stream.addAttribute(CharTermAttribute.class);
      PayloadAttribute payload = stream.addAttribute(PayloadAttribute.class);
      stream.reset();
      while (stream.incrementToken()) {
        payloads.add(payload.getPayload() == null ? null : BytesRef.deepCopyOf(payload.getPayload()));
      }
      stream.end();
    }
    return payloads;
  }
}
