package org.wordclass.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import java.util.concurrent.CountDownLatch;
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
import org.wordclass.model.HmmModel;
import org.wordclass.model.ModelFile;

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

  /**
   * The model keeps an unknown word's scores per node of its suffix and beginning tries, filled
   * by the first word to reach a node, and builds its table of lower-case forms on first use:
   * eight threads starting together on a freshly loaded model, on texts of invented words (every
   * one unknown, with many different endings, beginnings and capitals), race to fill them, and
   * must still get the tags a single thread gets from another fresh copy.
   */
  @Test
  void threadsRacingToFillAFreshModelGetTheTagsOfOne() throws Exception {
    List<String> texts = inventedTexts();
    List<String> expected = new ArrayList<>();
    try (Analyzer single = analyzer(WordClassOptions.of(freshBundledModel()))) {
      texts.forEach(t -> expected.add(tags(single, t)));
    }
    for (int round = 0; round < 3; round++) {
      try (Analyzer shared = analyzer(WordClassOptions.of(freshBundledModel()))) {
        assertEachThreadAgrees(shared, texts, expected);
      }
    }
  }

  private static HmmModel freshBundledModel() throws IOException {
    try (InputStream in = DefaultModel.class.getClassLoader().getResourceAsStream(DefaultModel.RESOURCE)) {
      return ModelFile.read(in, DefaultModel.RESOURCE);
    }
  }

  /** Sentences of pronounceable invented words, some capitalised, some known words between them. */
  private static List<String> inventedTexts() {
    Random rnd = new Random(20261202L);
    String[] onsets = {"br", "qu", "st", "gl", "m", "t", "sk", "fr", "pl", "v"};
    String[] vowels = {"a", "e", "i", "o", "u", "ai", "ou"};
    String[] endings = {"ness", "ing", "ed", "ly", "ish", "ment", "s", "er", "ous", "ation", "ize", "", "x"};
    String[] known = {"the", "ferry", "will", "board", "at", "noon", "and", "Customer", "Harbour"};
    List<String> texts = new ArrayList<>();
    for (int i = 0; i < 100; i++) {
      StringBuilder s = new StringBuilder();
      for (int w = 1 + rnd.nextInt(30); w > 0; w--) {
        String word = rnd.nextInt(4) == 0 ? known[rnd.nextInt(known.length)]
            : onsets[rnd.nextInt(onsets.length)] + vowels[rnd.nextInt(vowels.length)]
                + onsets[rnd.nextInt(onsets.length)] + endings[rnd.nextInt(endings.length)];
        s.append(rnd.nextInt(5) == 0 ? Character.toUpperCase(word.charAt(0)) + word.substring(1) : word).append(' ');
      }
      texts.add(s.toString());
    }
    return texts;
  }

  private static void assertEachThreadAgrees(Analyzer shared, List<String> texts, List<String> expected) throws Exception {
    ExecutorService pool = Executors.newFixedThreadPool(THREADS);
    CountDownLatch start = new CountDownLatch(1);
    try {
      List<Future<List<String>>> results = new ArrayList<>();
      for (int t = 0; t < THREADS; t++) {
        long seed = t;
        results.add(pool.submit(() -> {
          start.await();
          return tagInRandomOrder(shared, texts, new Random(seed));
        }));
      }
      start.countDown();
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
