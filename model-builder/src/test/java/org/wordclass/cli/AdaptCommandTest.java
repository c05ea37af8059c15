package org.wordclass.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.apache.lucene.analysis.standard.StandardAnalyzer;
import org.apache.lucene.document.Document;
import org.apache.lucene.document.Field;
import org.apache.lucene.document.TextField;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.IndexWriterConfig;
import org.apache.lucene.store.FSDirectory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wordclass.model.ModelFile;

/** {@code adapt} from text files and from an index field, on notices of an invented ferry office. */
class AdaptCommandTest {
  private static final String NOTICES = """
      The morning ferry leaves at seven and returns before noon.
      Passengers with bicycles board first on the lower deck.
      The evening ferry is cancelled when the wind is strong.

      Tickets for the island crossing are sold at the harbour office.
      The harbour office opens early on market days.
      Ferries to the island stop running after the last crossing.
      """;

  @TempDir
  Path dir;

  @Test
  void adaptsTheBundledModelToTextFilesAndRecordsHow() throws Exception {
    Path text = Files.writeString(dir.resolve("notices.txt"), NOTICES.repeat(3), StandardCharsets.UTF_8);
    Path out = dir.resolve("ferry.wcm");
    Cli.Result r = Cli.run("adapt", "--text", text.toString(), "--out", out.toString(), "--iterations", "2",
        "--threads", "1");
    assertEquals(0, r.exitCode(), r::toString);
    assertTrue(r.err().contains("adapt: iteration 0"), r::toString);
    Map<String, String> provenance = ModelFile.read(out).provenance();
    assertTrue(provenance.keySet().stream().anyMatch(k -> k.startsWith("adapt.")), provenance::toString);
    assertEquals(0, Cli.run("tag", "--model", out.toString(), "The ferry leaves early").exitCode());
  }

  @Test
  void readsTheStoredTextOfAnIndexField() throws Exception {
    Path index = dir.resolve("index");
    try (FSDirectory directory = FSDirectory.open(index);
        IndexWriter writer = new IndexWriter(directory, new IndexWriterConfig(new StandardAnalyzer()))) {
      for (String line : NOTICES.split("\n")) {
        Document doc = new Document();
        doc.add(new TextField("body", line, Field.Store.YES));
        writer.addDocument(doc);
      }
    }
    Path out = dir.resolve("from-index.wcm");
    Cli.Result r = Cli.run("adapt", "--index", index.toString(), "--field", "body", "--out", out.toString(),
        "--iterations", "1", "--threads", "1");
    assertEquals(0, r.exitCode(), r::toString);
    assertTrue(Files.exists(out));
  }

  @Test
  void refusesBadOptionsWithoutWritingAModel() throws Exception {
    Path text = Files.writeString(dir.resolve("notices.txt"), NOTICES, StandardCharsets.UTF_8);
    Path out = dir.resolve("never.wcm");
    Cli.Result r = Cli.run("adapt", "--text", text.toString(), "--out", out.toString(), "--new-weight", "1.5");
    assertEquals(2, r.exitCode(), r::toString);
    assertTrue(r.err().contains("weight of the new estimate must be in [0, 1]"), r::toString);
    assertFalse(Files.exists(out));
  }
}
