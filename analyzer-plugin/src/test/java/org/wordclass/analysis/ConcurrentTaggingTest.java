package org.wordclass.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.Tokenizer;
import org.apache.lucene.analysis.standard.StandardTokenizer;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.junit.jupiter.api.Test;
import org.wordclass.model.DefaultModel;

/**
 * Eight threads share one model and one analyzer (each thread gets its own token stream from
 * Lucene's per-thread reuse) and tag the same texts in different orders: every thread gets
 * exactly the tags a single thread gets. The model is immutable, so nothing may leak between
 * threads; this checks the decoder's reused buffers are per stream.
 */
class ConcurrentTaggingTest {
  private static final int THREADS = 8;
  private static final int TEXTS = 300;
  private static final String[] WORDS = ("They book a table for two . I read a good book ! Grelvin stirred the brodlish "
      + "until it thickened , and the club meets every Tuesday ? Priya can fold dumplings quickly").split(" ");

  private static Analyzer analyzer(WordClassOptions options) {
    return new Analyzer() {
      @Override
      protected TokenStreamComponents createComponents(String fieldName) {
        Tokenizer tokenizer = new StandardTokenizer();
        return new TokenStreamComponents(tokenizer, new WordClassFilter(tokenizer, options));
      }
    };
  }

  private static List<String> texts() {
    Random rnd = new Random(77L);
    List<String> texts = new ArrayList<>();
    for (int i = 0; i < TEXTS; i++) {
      StringBuilder s = new StringBuilder();
      for (int w = 1 + rnd.nextInt(200); w > 0; w--) {
        s.append(WORDS[rnd.nextInt(WORDS.length)]).append(' ');
      }
      texts.add(s.toString());
    }
    return texts;
  }

  /** "term/CLASS term/CLASS ..." */
  private static String tags(Analyzer a, String text) {
    StringBuilder out = new StringBuilder();
    try (TokenStream ts = a.tokenStream("f", text)) {
      CharTermAttribute term = ts.addAttribute(CharTermAttribute.class);
      WordClassAttribute cls = ts.addAttribute(WordClassAttribute.class);
      ts.reset();
      while (ts.incrementToken()) {
        out.append(term).append('/').append(cls.getWordClass()).append(' ');
      }
      ts.end();
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return out.toString();
  }

  @Test
  void eightThreadsGetTheTagsOfOne() throws Exception {
    for (int order = 1; order <= 2; order++) {
      WordClassOptions options = WordClassOptions.of(DefaultModel.get()).withOrder(order).withMaxWindow(64);
      List<String> texts = texts();
      List<String> expected = new ArrayList<>();
      try (Analyzer single = analyzer(options)) {
        texts.forEach(t -> expected.add(tags(single, t)));
      }
      try (Analyzer shared = analyzer(options)) {
        assertEachThreadAgrees(shared, texts, expected);
      }
    }
  }

  private static void assertEachThreadAgrees(Analyzer shared, List<String> texts, List<String> expected) throws Exception {
    ExecutorService pool = Executors.newFixedThreadPool(THREADS);
    try {
      List<Future<List<String>>> results = new ArrayList<>();
      for (int t = 0; t < THREADS; t++) {
        long seed = t;
        results.add(pool.submit(() -> tagInRandomOrder(shared, texts, new Random(seed))));
      }
      for (Future<List<String>> result : results) {
        assertEquals(expected, result.get());
      }
    } finally {
      pool.shutdownNow();
    }
  }

  /** Tags every text twice, in a shuffled order, and returns the tags in the texts' order. */
  private static List<String> tagInRandomOrder(Analyzer a, List<String> texts, Random rnd) {
    List<Integer> order = new ArrayList<>();
    for (int i = 0; i < texts.size(); i++) {
      order.add(i);
      order.add(i);
    }
    Collections.shuffle(order, rnd);
    String[] out = new String[texts.size()];
    for (int i : order) {
      String tags = tags(a, texts.get(i));
      if (out[i] != null && !out[i].equals(tags)) {
        throw new AssertionError("text " + i + " tagged differently on the same thread");
      }
      out[i] = tags;
    }
    return List.of(out);
  }
}
