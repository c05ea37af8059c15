package org.wordclass.adaptation;

import java.io.IOException;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Consumer;
import org.apache.lucene.index.DirectoryReader;
import org.apache.lucene.index.LeafReader;
import org.apache.lucene.index.LeafReaderContext;
import org.apache.lucene.index.StoredFields;
import org.apache.lucene.store.Directory;
import org.apache.lucene.store.FSDirectory;
import org.apache.lucene.util.Bits;
import org.wordclass.corpus.AnalysisChain;

/**
 * The stored values of one field of an existing Lucene index, each value read as running text
 * ({@link SentenceTokenizer}) and tokenized by an analysis chain: a model adapted to the text an
 * index really holds. Deleted documents are skipped; the index is opened read-only for each pass
 * and only one document is in memory at a time.
 */
public final class IndexFieldSource implements TextSource {
  private final Path index;
  private final String field;
  private final AnalysisChain chain;
  private final Map<String, String> described = new LinkedHashMap<>();

  public IndexFieldSource(Path index, String field, AnalysisChain chain) {
    this.index = index;
    this.field = field;
    this.chain = chain;
  }

  @Override
  public void forEachSentence(Consumer<List<String>> sink) throws IOException {
    long documents = 0;
    long withField = 0;
    long version;
    try (Directory directory = FSDirectory.open(index);
        DirectoryReader reader = DirectoryReader.open(directory);
        SentenceTokenizer sentences = new SentenceTokenizer(chain, sink)) {
      version = reader.getVersion();
      Set<String> fields = Set.of(field);
      for (LeafReaderContext context : reader.leaves()) {
        LeafReader leaf = context.reader();
        Bits live = leaf.getLiveDocs();
        StoredFields stored = leaf.storedFields();
        for (int doc = 0; doc < leaf.maxDoc(); doc++) {
          if (live != null && !live.get(doc)) {
            continue;
          }
          documents++;
          String[] values = stored.document(doc, fields).getValues(field);
          if (values.length > 0) {
            withField++;
          }
          for (String value : values) {
            sentences.text(value);
          }
        }
      }
    }
    described.clear();
    described.put("adapt.input.analysis", chain.toString());
    described.put("adapt.input.index", index.toAbsolutePath().normalize().toString());
    described.put("adapt.input.indexVersion", Long.toString(version));
    described.put("adapt.input.field", field);
    described.put("adapt.input.documents", Long.toString(documents));
    described.put("adapt.input.documentsWithField", Long.toString(withField));
  }

  @Override
  public Map<String, String> describe() {
    return described;
  }
}
