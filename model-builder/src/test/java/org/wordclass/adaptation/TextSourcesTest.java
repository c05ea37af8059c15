package org.wordclass.adaptation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.lucene.analysis.standard.StandardAnalyzer;
import org.apache.lucene.document.Document;
import org.apache.lucene.document.Field;
import org.apache.lucene.document.StringField;
import org.apache.lucene.document.TextField;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.IndexWriterConfig;
import org.apache.lucene.index.Term;
import org.apache.lucene.store.Directory;
import org.apache.lucene.store.FSDirectory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wordclass.corpus.AnalysisChain;
import org.wordclass.model.HmmModel;

class TextSourcesTest {

  private static List<List<String>> read(TextSource source) throws IOException {
    List<List<String>> sentences = new ArrayList<>();
    source.forEachSentence(sentences::add);
    return sentences;
  }

  @Test
  void storedValuesOfAnIndexFieldAreReadAsSentences(@TempDir Path dir) throws IOException {
    Path index = dir.resolve("index");
    try (Directory directory = FSDirectory.open(index);
        IndexWriter writer = new IndexWriter(directory, new IndexWriterConfig(new StandardAnalyzer()))) {
      writer.addDocument(doc("1", "The otter swims. It likes cold rivers!"));
      writer.addDocument(doc("2", "Gone tomorrow."));
      writer.addDocument(doc("3", "Beavers build dams.\n\nThey work at night"));
      Document noBody = new Document();
      noBody.add(new StringField("id", "4", Field.Store.YES));
      writer.addDocument(noBody);
      writer.commit();
      writer.deleteDocuments(new Term("id", "2"));
      writer.commit();
    }
    IndexFieldSource source = new IndexFieldSource(index, "body", AnalysisChain.DEFAULT);

    assertEquals(List.of(
        List.of("The", "otter", "swims"), List.of("It", "likes", "cold", "rivers"),
        List.of("Beavers", "build", "dams"), List.of("They", "work", "at", "night")), read(source));
    assertEquals("3", source.describe().get("adapt.input.documents"));
    assertEquals("2", source.describe().get("adapt.input.documentsWithField"));
    assertEquals("body", source.describe().get("adapt.input.field"));

    HmmModel start = ToyLanguage.train(ToyLanguage.sentences(1, 20, 0.5), 2);
    Adaptation.Result result = new Adaptation(AdaptationOptions.DEFAULTS.withIterations(1, 0), new Adaptation.Listener() {})
        .adapt(start, source, null);
    assertEquals(14, result.iterations().get(1).tokens());
    assertEquals(index.toAbsolutePath().normalize().toString(), result.model().provenance().get("adapt.input.index"));
    assertEquals("1", result.model().provenance().get("adapt.iterations"));
  }

  private static Document doc(String id, String body) {
    Document doc = new Document();
    doc.add(new StringField("id", id, Field.Store.YES));
    doc.add(new TextField("body", body, Field.Store.YES));
    return doc;
  }

  @Test
  void textFilesBreakAtBlankLinesAndSentenceEnds(@TempDir Path dir) throws IOException {
    Path file = dir.resolve("notes.txt");
    Files.writeString(file, "Moles dig tunnels. They rarely\nsurface\n\nno full stop here\nWhy not? Version 2.5 works.\n",
        StandardCharsets.UTF_8);
    TextFileSource source = new TextFileSource(List.of(file), AnalysisChain.of("standard", List.of("lowercase")));

    assertEquals(List.of(
        List.of("moles", "dig", "tunnels"), List.of("they", "rarely", "surface"),
        List.of("no", "full", "stop", "here", "why", "not"), List.of("version", "2.5", "works")), read(source));
    assertTrue(source.describe().get("adapt.input.file.0").startsWith("notes.txt sha256:"));
  }
}
