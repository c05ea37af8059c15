package org.wordclass.corpus;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.zip.GZIPOutputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wordclass.model.HmmModel;
import org.wordclass.model.ModelFile;
import org.wordclass.testing.FuzzRun;
import org.wordclass.testing.Mutator;
import org.wordclass.testing.TestModels;
import org.wordclass.training.HmmEstimator;
import org.wordclass.training.TagCounts;
import org.wordclass.training.TrainingOptions;

/**
 * Fuzzes the corpus readers for a bounded time (see {@link FuzzRun}) with mutants of small valid
 * CoNLL-U and plain files, read as either format, with either tag column, plain or gzipped. Each
 * must be refused with a {@link CorpusFormatException} (or, for a file that cannot be read at
 * all, an {@link UncheckedIOException}), or be read whole; a corpus that is read whole must then
 * train a model that survives writing and reading. Anything else fails, naming seed and execution.
 */
class CorpusReaderFuzzTest {
  private static final String CONLLU = "\uFEFF# newdoc id = d1\n# sent_id = 1\n# text = Mira's otter slept.\n"
      + "1-2\tMira's\t_\t_\t_\t_\t_\t_\t_\t_\n"
      + "1\tMira\tMira\tPROPN\tNNP\t_\t3\tnmod\t_\t_\n"
      + "2\t's\t's\tPART\tPOS\t_\t1\tcase\t_\t_\n"
      + "3\totter\totter\tNOUN\tNN\t_\t4\tnsubj\t_\t_\n"
      + "3.1\tnapped\tnap\tVERB\tVBD\t_\t_\t_\t4:conj\t_\n"
      + "4\tslept\tsleep\tVERB\tVBD\t_\t0\troot\t_\tSpaceAfter=No\n"
      + "5\t.\t.\tPUNCT\t.\t_\t4\tpunct\t_\t_\r\n\r\n"
      + "# text = Two kettles !\n1\tTwo\ttwo\tNUM\tCD\t_\t_\t_\t_\t_\n2\tkettles\tkettle\tNOUN\tNNS\t_\t_\t_\t_\t_\n"
      + "3\t!\t!\tPUNCT\t.\t_\t_\t_\t_\t_\n\n";
  private static final String PLAIN = "the\tDET\nold ferry\tNOUN\nsank\tVERB\n.\tPUNCT\n\nOh\tINTJ\n,\tPUNCT\nwow\tINTJ\n\n";
  private static final List<String> DICTIONARY = List.of("\t", "\n", "\n\n", "\r\n", "# text = ", "#", "_", "-", "1-2", "2-1",
      "5.1", "0", "99999999999", "2147483648", "NOUN", "VERB", "PUNCT", "NN", "SpaceAfter=No", "\uFEFF", "\t_\t_\t_\t_\t_",
      "\u00e9", "\uD83D\uDE00", " ");
  private static final String[] NAMES = {"f.conllu", "f.txt", "f.conllu.gz", "f.txt.gz"};

  @TempDir Path dir;

  @Test
  void mutantsAreRefusedOrRead() throws IOException {
    FuzzRun run = new FuzzRun("corpus readers");
    Random rnd = run.random();
    Mutator mutator = new Mutator(rnd, List.of(utf8(CONLLU), utf8(PLAIN)), DICTIONARY.stream().map(CorpusReaderFuzzTest::utf8).toList());
    long read = 0;
    long refused = 0;
    while (run.next()) {
      Path file = write(mutator, rnd);
      TagColumn column = rnd.nextBoolean() ? TagColumn.UPOS : TagColumn.XPOS;
      if (readAndTrain(file, column, run)) {
        read++;
      } else {
        refused++;
      }
    }
    System.out.println(run.summary() + "; " + refused + " refused, " + read + " read and trained on");
    assertTrue(refused > 0 && read > 0, run.summary());
  }

  /** A mutant under a random name; gzipped names get the mutant compressed, or a mutated compression. */
  private Path write(Mutator mutator, Random rnd) throws IOException {
    String name = NAMES[rnd.nextInt(NAMES.length)];
    byte[] bytes = mutator.next();
    if (name.endsWith(".gz")) {
      bytes = gzip(bytes);
      if (rnd.nextInt(4) == 0) {
        bytes = mutator.mutate(bytes);
      }
    }
    return Files.write(dir.resolve(name), bytes);
  }

  private static boolean readAndTrain(Path file, TagColumn column, FuzzRun run) {
    TagCounts counts = new TagCounts();
    try {
      new Corpus(List.of(file), null, column).forEachSentence(s -> counts.add(s.words(), s.tags()));
    } catch (CorpusFormatException | UncheckedIOException e) {
      return false;
    } catch (Throwable t) {
      throw new AssertionError(run.where() + " (" + file.getFileName() + ", " + column + "): reading threw " + t, t);
    }
    try {
      HmmModel model = new HmmEstimator(TrainingOptions.DEFAULTS).estimate(counts, Map.of());
      ModelFile.read(TestModels.bytes(model), "trained.wcm");
    } catch (Throwable t) {
      throw new AssertionError(run.where() + " (" + file.getFileName() + ", " + column + "): a corpus read whole failed to train: " + t, t);
    }
    return true;
  }

  private static byte[] gzip(byte[] bytes) throws IOException {
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    try (GZIPOutputStream gz = new GZIPOutputStream(out)) {
      gz.write(bytes);
    }
    return out.toByteArray();
  }

  private static byte[] utf8(String text) {
    return text.getBytes(StandardCharsets.UTF_8);
  }
}
