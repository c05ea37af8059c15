package org.wordclass.decoding;

import java.util.List;
import org.wordclass.model.HmmModel;

/**
 * Tags whole token sequences given as Strings: the convenient entry point for tools, tests and
 * evaluation. The analysis filter uses {@link Decoder} directly on char buffers instead, and says
 * why each token got its class through {@code WordClassExplanationAttribute}.
 *
 * <p>Not thread-safe: one per thread.
 */
public final class Tagger {
  /** Tags of one sequence, with the posterior probability of each chosen tag (NaN if not computed). */
  public record Tagging(int[] tags, double[] confidences, boolean[] known) {}

  private final Decoder decoder;
  private int[] best = new int[64];

  public Tagger(HmmModel model) {
    this(new Decoder(model));
  }

  public Tagger(Decoder decoder) {
    this.decoder = decoder;
  }

  public Decoder decoder() {
    return decoder;
  }

  /** Tags {@code tokens}; computes confidences only when asked, since they cost time. */
  public Tagging tag(List<String> tokens, boolean withConfidence) {
    Lattice lattice = decoder.lattice();
    lattice.clear();
    for (String token : tokens) {
      lattice.add(token);
    }
    int n = lattice.size();
    best = Decoder.ensureCapacity(best, n);
    decoder.viterbi(best);
    double[] confidences = new double[n];
    boolean[] known = new boolean[n];
    if (withConfidence && n > 0) {
      decoder.forwardBackward();
    }
    for (int i = 0; i < n; i++) {
      confidences[i] = withConfidence ? decoder.tagPosterior(i, best[i]) : Double.NaN;
      known[i] = lattice.isKnown(i);
    }
    return new Tagging(decoder.tagsOf(best), confidences, known);
  }

  /** Tag names of {@code tokens}. */
  public String[] tagNames(List<String> tokens) {
    int[] tags = tag(tokens, false).tags();
    String[] names = new String[tags.length];
    for (int i = 0; i < tags.length; i++) {
      names[i] = decoder.model().tags().name(tags[i]);
    }
    return names;
  }
}
