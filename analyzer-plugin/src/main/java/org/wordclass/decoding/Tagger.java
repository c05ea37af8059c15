package org.wordclass.decoding;

import java.util.ArrayList;
import java.util.List;
import org.wordclass.model.HmmModel;

/**
 * Tags whole token sequences given as Strings: the convenient entry point for tools, tests and
 * evaluation. The analysis filter uses {@link Decoder} directly on char buffers instead.
 *
 * <p>Not thread-safe: one per thread.
 */
public final class Tagger {
  /** Tags of one sequence, with the posterior probability of each chosen tag (NaN if not computed). */
  public record Tagging(int[] tags, double[] confidences, boolean[] known) {}

  /**
   * Why one token got its tag.
   *
   * @param tag the tag chosen by Viterbi decoding
   * @param confidence its posterior probability given the whole sentence
   * @param source how the token's candidate tags were chosen
   * @param matchedEndingLength for unknown tokens, the length of the ending the suffix model matched
   * @param tagPosteriors the posterior probability of every tag of the tag set, by tag index
   */
  public record Explanation(String token, int tag, double confidence, CandidateSource source, int matchedEndingLength,
      double[] tagPosteriors) {}

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

  /**
   * Tags {@code tokens} and says, for each, how sure the model is, what else it considered and
   * where the candidates came from. Costs a Viterbi and a forward-backward pass, and allocates
   * a record and a tag-set-sized array per token: for tools, not for indexing.
   */
  public List<Explanation> explain(List<String> tokens) {
    Tagging tagging = tag(tokens, true);
    Lattice lattice = decoder.lattice();
    List<Explanation> out = new ArrayList<>(tokens.size());
    for (int i = 0; i < tokens.size(); i++) {
      double[] posteriors = new double[decoder.model().tags().size()];
      decoder.tagPosteriors(i, posteriors);
      out.add(new Explanation(tokens.get(i), tagging.tags()[i], tagging.confidences()[i], lattice.source(i),
          lattice.matchedEndingLength(i), posteriors));
    }
    return out;
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
