package org.wordclass.benchmarks;

import java.io.IOException;
import java.util.concurrent.TimeUnit;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.document.Document;
import org.apache.lucene.document.Field;
import org.apache.lucene.document.TextField;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.IndexWriterConfig;
import org.apache.lucene.store.ByteBuffersDirectory;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/**
 * Indexing throughput into a fresh in-memory directory, with and without the word-class filter
 * in the field's chain. One operation indexes every EWT test sentence as a document and closes
 * the writer (so flushing is counted); {@code tokens} is tokens indexed per second.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
public class IndexingBenchmark extends ChainPairBenchmark {
  private long tokensPerPass;

  @Setup
  public void countTokens() {
    tokensPerPass = Ewt.tokenCount(Ewt.testTokens());
  }

  @Benchmark
  public long withFilter(Tokens counter) throws IOException {
    return index(withFilter, counter);
  }

  @Benchmark
  public long withoutFilter(Tokens counter) throws IOException {
    return index(withoutFilter, counter);
  }

  private long index(Analyzer analyzer, Tokens counter) throws IOException {
    try (ByteBuffersDirectory directory = new ByteBuffersDirectory()) {
      try (IndexWriter writer = new IndexWriter(directory, new IndexWriterConfig(analyzer))) {
        Document document = new Document();
        Field body = new TextField("body", "", Field.Store.NO);
        document.add(body);
        for (String text : texts) {
          body.setStringValue(text);
          writer.addDocument(document);
        }
      }
      counter.tokens += tokensPerPass;
      return directory.listAll().length;
    }
  }
}
