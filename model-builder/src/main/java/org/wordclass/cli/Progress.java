package org.wordclass.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.function.Consumer;
import org.wordclass.corpus.Corpus;
import org.wordclass.corpus.Sentence;

/**
 * Shows on standard error how far a run through corpus files has got, measured in bytes read
 * against the files' sizes, over one or more passes. On a terminal it redraws a single line (a
 * bar, the percentage and sentences per second) a few times a second; otherwise, as when output
 * goes to a log, it writes one line at the start and one at the end and nothing in between.
 */
final class Progress {
  private static final long REDRAW_NANOS = 200_000_000L;
  private static final int BAR_WIDTH = 30;

  private final String task;
  private final PrintWriter err;
  private final boolean live;
  private final long totalBytes;
  private final long startNanos = System.nanoTime();
  private long bytesOfFinishedPasses;
  private long sentences;
  private long lastDrawNanos;
  private int lastLineLength;

  private Progress(String task, PrintWriter err, boolean live, long totalBytes) {
    this.task = task;
    this.err = err;
    this.live = live;
    this.totalBytes = Math.max(1, totalBytes);
  }

  /**
   * Starts showing progress of {@code passes} passes over {@code corpus}; fails at once, naming
   * the file, if one of its files is missing.
   */
  static Progress start(String task, Corpus corpus, int passes, PrintWriter err) throws IOException {
    long bytes = 0;
    for (Path file : corpus.files()) {
      bytes += Files.size(file);
    }
    Progress progress = new Progress(task, err, System.console() != null, bytes * passes);
    if (!progress.live) {
      err.printf(Locale.ROOT, "%s: reading %d file(s) of %s%s%n", task, corpus.files().size(), megabytes(bytes),
          passes > 1 ? " in " + passes + " passes" : "");
      err.flush();
    }
    return progress;
  }

  /** Reads one pass over {@code corpus}, handing each sentence to {@code action}. */
  void read(Corpus corpus, Consumer<Sentence> action) {
    for (Sentence sentence : corpus) {
      action.accept(sentence);
      sentences++;
      if (live) {
        maybeRedraw(bytesOfFinishedPasses + corpus.bytesRead());
      }
    }
    bytesOfFinishedPasses += corpus.bytesRead();
  }

  /** Ends the display, with the number of sentences and the time taken. */
  void finish() {
    if (live) {
      draw(totalBytes);
      err.println();
    } else {
      err.printf(Locale.ROOT, "%s: done in %.1f s (%d sentences read)%n", task, seconds(), sentences);
    }
    err.flush();
  }

  /** Seconds since the start. */
  double seconds() {
    return (System.nanoTime() - startNanos) / 1e9;
  }

  private void maybeRedraw(long bytes) {
    long now = System.nanoTime();
    if (now - lastDrawNanos >= REDRAW_NANOS) {
      lastDrawNanos = now;
      draw(bytes);
    }
  }

  private void draw(long bytes) {
    double done = Math.min(1.0, (double) bytes / totalBytes);
    int filled = (int) Math.round(done * BAR_WIDTH);
    double elapsed = seconds();
    String line = String.format(Locale.ROOT, "%s [%s%s] %3.0f%%  %d sentences  %.0f sentences/s",
        task, "#".repeat(filled), ".".repeat(BAR_WIDTH - filled), 100 * done, sentences,
        elapsed > 0 ? sentences / elapsed : 0.0);
    // pad with spaces so a shorter line wipes out the end of the longer one before it
    err.print("\r" + line + " ".repeat(Math.max(0, lastLineLength - line.length())));
    err.flush();
    lastLineLength = line.length();
  }

  static String megabytes(long bytes) {
    return String.format(Locale.ROOT, "%.1f MB", bytes / 1e6);
  }
}
