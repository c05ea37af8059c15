package org.wordclass.analysis;

import java.io.IOException;
import java.io.Reader;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.Tokenizer;
import org.apache.lucene.analysis.core.WhitespaceTokenizer;
import org.wordclass.model.DefaultModel;

/**
 * Streams a generated field of many tokens through a tokenizer and {@link WordClassFilter} and
 * prints how many tokens came out: run in a JVM with a small heap, it shows that memory does not
 * grow with the field. Arguments: token count, then optionally the maximum window.
 */
public final class LargeFieldMain {
  private LargeFieldMain() {}

  public static void main(String[] args) throws IOException {
    long tokens = Long.parseLong(args[0]);
    int maxWindow = args.length > 1 ? Integer.parseInt(args[1]) : WordClassOptions.DEFAULT_MAX_WINDOW;
    WordClassOptions options = WordClassOptions.of(DefaultModel.get()).withMaxWindow(maxWindow);
    long start = System.nanoTime();
    Tokenizer tokenizer = new WhitespaceTokenizer();
    tokenizer.setReader(new GeneratedText(tokens));
    long count = 0;
    try (TokenStream stream = new WordClassFilter(tokenizer, options)) {
      stream.reset();
      while (stream.incrementToken()) {
        count++;
      }
      stream.end();
    }
    long millis = (System.nanoTime() - start) / 1_000_000;
    System.out.println("tokens=" + count + " millis=" + millis + " maxWindow=" + maxWindow);
  }

  /** Exactly {@code tokens} space-separated words from invented sentences, made as they are read. */
  static final class GeneratedText extends Reader {
    private static final String[][] SENTENCES = {
      "The club meets every Tuesday in the old bakery .".split(" "),
      "Members bring knives , boards and their favourite recipes .".split(" "),
      "Tonight Priya shows us how to fold dumplings quickly .".split(" "),
      "Nobody expected the soup to taste so smoky !".split(" "),
      "Can you book the hall for the spring market ?".split(" "),
      "Grelvin stirred the brodlish until it thickened .".split(" "),
    };

    private long remaining;
    private long sentence;
    private int word;
    private String pending = "";
    private int pendingAt;

    GeneratedText(long tokens) {
      this.remaining = tokens;
    }

    @Override
    public int read(char[] buf, int off, int len) {
      int written = 0;
      while (written < len) {
        if (pendingAt == pending.length() && !nextWord()) {
          break;
        }
        int n = Math.min(len - written, pending.length() - pendingAt);
        pending.getChars(pendingAt, pendingAt + n, buf, off + written);
        pendingAt += n;
        written += n;
      }
      return written == 0 ? -1 : written;
    }

    private boolean nextWord() {
      if (remaining == 0) {
        return false;
      }
      String[] words = SENTENCES[(int) (sentence * 7 % SENTENCES.length)];
      pending = words[word] + ' ';
      pendingAt = 0;
      remaining--;
      if (++word == words.length) {
        word = 0;
        sentence++;
      }
      return true;
    }

    @Override
    public void close() {}
  }
}
