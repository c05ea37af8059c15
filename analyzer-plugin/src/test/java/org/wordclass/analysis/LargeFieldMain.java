package org.wordclass.analysis;

import java.io.IOException;
import java.io.Reader;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.util.HashMap;
import java.util.Map;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.Tokenizer;
import org.apache.lucene.analysis.core.WhitespaceTokenizer;
import org.apache.lucene.analysis.standard.StandardTokenizer;
import org.wordclass.model.DefaultModel;

/**
 * Streams a generated field through a tokenizer and {@link WordClassFilter} and prints how many
 * tokens came out, the time and the heap: run in a JVM with a small heap, it shows that memory
 * does not grow with the field. Arguments, as {@code name=value}: {@code tokens} (a number of
 * words) or {@code chars} (a number of characters), {@code window} (the maximum window) and
 * {@code tokenizer} ({@code whitespace}, the default, or {@code standard}).
 */
public final class LargeFieldMain {
  private LargeFieldMain() {}

  public static void main(String[] args) throws IOException {
    Map<String, String> named = new HashMap<>();
    for (String arg : args) {
      named.put(arg.substring(0, arg.indexOf('=')), arg.substring(arg.indexOf('=') + 1));
    }
    long tokens = Long.parseLong(named.getOrDefault("tokens", Long.toString(Long.MAX_VALUE)));
    long chars = Long.parseLong(named.getOrDefault("chars", Long.toString(Long.MAX_VALUE)));
    int maxWindow = Integer.parseInt(named.getOrDefault("window", Integer.toString(WordClassOptions.DEFAULT_MAX_WINDOW)));
    WordClassOptions options = WordClassOptions.of(DefaultModel.get()).withMaxWindow(maxWindow);
    long start = System.nanoTime();
    Tokenizer tokenizer = "standard".equals(named.get("tokenizer")) ? new StandardTokenizer() : new WhitespaceTokenizer();
    GeneratedText text = new GeneratedText(tokens, chars);
    tokenizer.setReader(text);
    long count = 0;
    try (TokenStream stream = new WordClassFilter(tokenizer, options)) {
      stream.reset();
      while (stream.incrementToken()) {
        count++;
      }
      stream.end();
    }
    long millis = (System.nanoTime() - start) / 1_000_000;
    System.out.println("tokens=" + count + " chars=" + text.charsRead + " millis=" + millis + " maxWindow=" + maxWindow
        + " maxHeapMB=" + Runtime.getRuntime().maxMemory() / (1 << 20) + " peakHeapMB=" + peakHeapMegabytes());
  }

  /** Highest heap use seen by the collector's pools, in MiB. */
  private static long peakHeapMegabytes() {
    long peak = 0;
    for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
      if (pool.getType() == MemoryType.HEAP) {
        peak += pool.getPeakUsage().getUsed();
      }
    }
    return peak / (1 << 20);
  }

  /**
   * Space-separated words from invented sentences, made as they are read: exactly {@code tokens}
   * words, or exactly {@code chars} characters (the last word cut), whichever comes first.
   */
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
    private long charsLeft;
    long charsRead;
    private long sentence;
    private int word;
    private String pending = "";
    private int pendingAt;

    GeneratedText(long tokens, long chars) {
      this.remaining = tokens;
      this.charsLeft = chars;
    }

    @Override
    public int read(char[] buf, int off, int len) {
      int written = 0;
      len = (int) Math.min(len, charsLeft);
      while (written < len) {
        if (pendingAt == pending.length() && !nextWord()) {
          break;
        }
        int n = Math.min(len - written, pending.length() - pendingAt);
        pending.getChars(pendingAt, pendingAt + n, buf, off + written);
        pendingAt += n;
        written += n;
      }
      charsLeft -= written;
      charsRead += written;
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
