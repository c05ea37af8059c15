package org.wordclass.training;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.wordclass.corpus.Corpus;
import org.wordclass.corpus.Sentence;
import org.wordclass.corpus.TagColumn;
import org.wordclass.decoding.Decoder;
import org.wordclass.decoding.Lattice;
import org.wordclass.model.HmmModel;
import org.wordclass.model.ModelFile;

/**
 * The latent sub-state measurements of docs/latent-states.md: trains a model per setting on a
 * tagged corpus and scores it on another with Viterbi over states and with per-tag posterior
 * (max-marginal) decoding, and times Viterbi decoding alone on one thread.
 *
 * <p>Run: {@code java -Xmx8g -cp model-builder/target/test-classes:model-builder/target/wordclass.jar
 * org.wordclass.training.LatentExperiment TRAIN.conllu SCORED.conllu SETTING...}, a setting being
 * {@code order:rounds[:nocap][:ctx]} ({@code nocap}: no capitalisation states; {@code ctx}: keep
 * context emissions, meaningful with 0 rounds only).
 */
public final class LatentExperiment {
  private static final double TIMING_SECONDS = 3;

  private LatentExperiment() {}

  public static void main(String[] args) throws IOException {
    List<Sentence> train = read(Paths.get(args[0]));
    List<Sentence> scored = read(Paths.get(args[1]));
    System.out.println("| setting | states | train s | file bytes | all | known | unknown | posterior all | tokens/s |");
    System.out.println("|---|---|---|---|---|---|---|---|---|");
    for (int i = 2; i < args.length; i++) {
      run(args[i], train, scored);
    }
  }

  private static List<Sentence> read(Path file) {
    List<Sentence> out = new ArrayList<>();
    for (Sentence s : new Corpus(List.of(file), null, TagColumn.UPOS)) {
      out.add(s);
    }
    return out;
  }

  static TrainingOptions options(String setting) {
    String[] parts = setting.split(":");
    boolean cap = !setting.contains("nocap");
    boolean ctx = setting.contains("ctx");
    return TrainingOptions.DEFAULTS.withOrder(Integer.parseInt(parts[0])).withLatentRounds(Integer.parseInt(parts[1]))
        .withCues(cap, ctx, true);
  }

  private static void run(String setting, List<Sentence> train, List<Sentence> scored) throws IOException {
    TrainingOptions options = options(setting);
    long start = System.nanoTime();
    TagCounts counts = TagCounts.forOptions(options);
    train.forEach(s -> counts.add(s.words(), s.tags()));
    HmmModel model = new HmmEstimator(options).estimate(counts, Map.of());
    double seconds = (System.nanoTime() - start) / 1e9;
    Path file = Files.createTempFile("latent", ".wcm");
    ModelFile.write(model, file);
    long bytes = Files.size(file);
    Files.delete(file);
    double[] viterbi = score(model, scored, false);
    double[] posterior = score(model, scored, true);
    System.out.printf(Locale.ROOT, "| %s | %d | %.0f | %d | %.4f | %.4f | %.4f | %.4f | %.2f M |%n", setting,
        model.states().size(), seconds, bytes, viterbi[0], viterbi[1], viterbi[2], posterior[0],
        tokensPerSecond(model, scored) / 1e6);
  }

  /** {all, known, unknown} accuracy with Viterbi over states, or with the most probable tag per token. */
  static double[] score(HmmModel model, List<Sentence> sentences, boolean byPosterior) {
    Decoder decoder = new Decoder(model);
    Lattice lattice = decoder.lattice();
    long[] right = new long[2];
    long[] total = new long[2];
    int[] best = new int[64];
    for (Sentence s : sentences) {
      lattice.clear();
      s.words().forEach(lattice::add);
      best = Decoder.ensureCapacity(best, lattice.size());
      if (byPosterior) {
        decoder.forwardBackward();
        bestByPosterior(decoder, best);
      } else {
        decoder.viterbi(best);
      }
      for (int i = 0; i < lattice.size(); i++) {
        int known = lattice.isKnown(i) ? 0 : 1;
        total[known]++;
        if (model.tags().name(lattice.candidateTag(i, best[i])).equals(s.tags().get(i))) {
          right[known]++;
        }
      }
    }
    return new double[] {(double) (right[0] + right[1]) / (total[0] + total[1]), (double) right[0] / total[0],
        (double) right[1] / total[1]};
  }

  /** Per token, a candidate of the tag whose states have the largest summed posterior. */
  private static void bestByPosterior(Decoder decoder, int[] best) {
    Lattice lattice = decoder.lattice();
    for (int i = 0; i < lattice.size(); i++) {
      double top = -1;
      for (int k = 0; k < lattice.candidateCount(i); k++) {
        double p = decoder.tagPosterior(i, k);
        if (p > top) {
          top = p;
          best[i] = k;
        }
      }
    }
  }

  /** Viterbi decoding alone, tokens per second on this thread, after a warm-up pass. */
  static double tokensPerSecond(HmmModel model, List<Sentence> sentences) {
    List<char[][]> tokens = new ArrayList<>();
    for (Sentence s : sentences) {
      tokens.add(s.words().stream().map(String::toCharArray).toArray(char[][]::new));
    }
    Decoder decoder = new Decoder(model);
    int[] best = new int[1024];
    decodeAll(decoder, tokens, best);
    long count = 0;
    long start = System.nanoTime();
    while (System.nanoTime() - start < TIMING_SECONDS * 1e9) {
      count += decodeAll(decoder, tokens, best);
    }
    return count * 1e9 / (System.nanoTime() - start);
  }

  private static long decodeAll(Decoder decoder, List<char[][]> sentences, int[] best) {
    Lattice lattice = decoder.lattice();
    long count = 0;
    for (char[][] sentence : sentences) {
      lattice.clear();
      for (char[] token : sentence) {
        lattice.add(token, 0, token.length);
      }
      decoder.viterbi(best);
      count += sentence.length;
    }
    return count;
  }
}
