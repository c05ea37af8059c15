package org.wordclass.adaptation;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.BlockingQueue;
import java.util.function.LongConsumer;
import org.wordclass.decoding.Decoder;
import org.wordclass.model.HmmModel;

/**
 * One pass of the expectation step over the text, on several threads. The calling thread reads
 * and tokenizes the text and deals it out in batches, batch {@code i} to worker {@code i mod
 * threads}; each worker has its own {@link Decoder} and {@link ExpectedCounts}, and the counts
 * are merged in worker order at the end. Dealing by position rather than to whichever worker is
 * free makes the result independent of timing, so a run is reproducible for a given thread
 * count. Bounded queues keep at most a few batches per worker in memory.
 */
final class ExpectationPass {
  private static final List<List<String>> END = List.of();
  /** How often, in sentences, progress is reported. */
  static final long PROGRESS_EVERY = 10_000;

  private final HmmModel model;
  private final int order;
  private final boolean collectUnknownWords;
  private final int threads;
  private final int batchSentences;

  ExpectationPass(HmmModel model, int order, boolean collectUnknownWords, int threads, int batchSentences) {
    this.model = model;
    this.order = order;
    this.collectUnknownWords = collectUnknownWords;
    this.threads = threads;
    this.batchSentences = batchSentences;
  }

  /** Reads the whole text once; {@code progress} gets the number of sentences read so far. */
  ExpectedCounts run(TextSource text, LongConsumer progress) throws IOException {
    if (threads == 1) {
      ExpectedCounts counts = newCounts();
      Decoder decoder = new Decoder(model, order);
      long[] read = new long[1];
      text.forEachSentence(tokens -> {
        counts.add(decoder, tokens);
        report(++read[0], progress);
      });
      return counts;
    }
    return runParallel(text, progress);
  }

  private ExpectedCounts newCounts() {
    return new ExpectedCounts(model, order, collectUnknownWords);
  }

  private static void report(long read, LongConsumer progress) {
    if (read % PROGRESS_EVERY == 0) {
      progress.accept(read);
    }
  }

  private ExpectedCounts runParallel(TextSource text, LongConsumer progress) throws IOException {
    List<Worker> workers = new ArrayList<>();
    for (int i = 0; i < threads; i++) {
      Worker worker = new Worker(newCounts());
      workers.add(worker);
      worker.start();
    }
    long[] read = new long[1];
    List<List<String>>[] batch = newBatch();
    try {
      text.forEachSentence(tokens -> {
        batch[0].add(tokens);
        report(++read[0], progress);
        if (batch[0].size() == batchSentences) {
          deal(workers, read[0] / batchSentences - 1, batch[0]);
          batch[0] = new ArrayList<>(batchSentences);
        }
      });
      deal(workers, read[0] / batchSentences, batch[0]);
    } finally {
      for (Worker worker : workers) {
        put(worker, END);
      }
      for (Worker worker : workers) {
        join(worker);
      }
    }
    ExpectedCounts total = workers.get(0).counts;
    for (Worker worker : workers) {
      if (worker.failure != null) {
        throw new IllegalStateException("expectation step failed on a worker thread", worker.failure);
      }
      if (worker != workers.get(0)) {
        total.merge(worker.counts);
      }
    }
    return total;
  }

  @SuppressWarnings("unchecked")
  private List<List<String>>[] newBatch() {
    return new List[] {new ArrayList<>(batchSentences)};
  }

  private static void deal(List<Worker> workers, long batchNumber, List<List<String>> batch) {
    if (!batch.isEmpty()) {
      put(workers.get((int) (batchNumber % workers.size())), batch);
    }
  }

  private static void put(Worker worker, List<List<String>> batch) {
    try {
      worker.queue.put(batch);
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      throw new IllegalStateException("interrupted while reading the text", e);
    }
  }

  private static void join(Worker worker) {
    try {
      worker.join();
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      throw new IllegalStateException("interrupted while waiting for the expectation step", e);
    }
  }

  /** Counts its share of the batches; after a failure it keeps draining so the reader never blocks. */
  private final class Worker extends Thread {
    final BlockingQueue<List<List<String>>> queue = new ArrayBlockingQueue<>(4);
    final ExpectedCounts counts;
    volatile Throwable failure;

    Worker(ExpectedCounts counts) {
      super("wordclass-adapt-worker");
      setDaemon(true);
      this.counts = counts;
    }

    @Override
    public void run() {
      Decoder decoder = new Decoder(model, order);
      try {
        for (List<List<String>> batch = queue.take(); batch != END; batch = queue.take()) {
          if (failure == null) {
            count(decoder, batch);
          }
        }
      } catch (InterruptedException e) {
        failure = e;
      }
    }

    private void count(Decoder decoder, List<List<String>> batch) {
      try {
        for (List<String> tokens : batch) {
          counts.add(decoder, tokens);
        }
      } catch (RuntimeException | Error e) {
        failure = e;
      }
    }
  }
}
