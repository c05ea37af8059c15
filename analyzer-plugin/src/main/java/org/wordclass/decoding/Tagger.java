package org.wordclass.decoding;

import java.util.List;
import org.wordclass.model.HmmModel;

/**
 * Tags whole token sequences given as Strings: the convenient entry point for tools, tests and
 * evaluation. The analysis filter uses {@link Decoder} directly on char buffers instead, and says
 * why each token got its class through {@code WordClassExplanationAttribute}. Both decode through
 * the same {@link Decoder}, sentence boundaries inside a sequence included ({@link
 * SentenceBoundaries}).
 *
 * <p>Not thread-safe: one per thread.
 */
public final class Tagger {
  /**
   * Tags of one sequence, with the posterior probability of each chosen tag (NaN if not computed),
   * whether each token was known in the reading chosen, and whether it was found to open a
   * sentence (never for the first token, nor with {@link SentenceBoundaries#TOKENIZER}).
   */
  public record Tagging(int[] tags, double[] confidences, boolean[] known, boolean[] opensSentence) {}

  private final Decoder decoder;
  private final RunPositions positions;
  private int[] best = new int[64];

  /** A tagger of each sequence as one sentence. */
  public Tagger(HmmModel model) {
    this(model, SentenceBoundaries.TOKENIZER);
  }

  public Tagger(HmmModel model, SentenceBoundaries boundaries) {
    this(new Decoder(model, model.order(), boundaries));
  }

  public Tagger(Decoder decoder) {
    this.decoder = decoder;
    this.positions = new RunPositions(decoder.lattice());
  }

  public Decoder decoder() {
    return decoder;
  }

  /** Tags {@code tokens}; computes confidences only when asked, since they cost time. */
  public Tagging tag(List<String> tokens, boolean withConfidence) {
    return tag(tokens, null, withConfidence);
  }

  /**
   * Tags {@code tokens}, each run of tokens written together as one word ({@link RunPositions}):
   * {@code gaps}, if not null, holds per token the characters between it and the previous token
   * when the two are written together, else null or empty. The result has one entry per token,
   * those of a run all the same.
   */
  public Tagging tag(List<String> tokens, List<String> gaps, boolean withConfidence) {
    positions.clear();
    for (int t = 0; t < tokens.size(); t++) {
      char[] token = tokens.get(t).toCharArray();
      String gap = gaps == null ? null : gaps.get(t);
      if (gap == null || gap.isEmpty()) {
        positions.add(token, 0, token.length);
      } else {
        positions.add(token, 0, token.length, gap.toCharArray(), 0, gap.length());
      }
    }
    positions.finish();
    Lattice lattice = decoder.lattice();
    int n = lattice.size();
    best = Decoder.ensureCapacity(best, n);
    decoder.viterbi(best);
    if (withConfidence && n > 0) {
      decoder.forwardBackward();
    }
    int[] tags = decoder.tagsOf(best);
    int count = positions.tokens();
    int[] tokenTags = new int[count];
    double[] confidences = new double[count];
    boolean[] known = new boolean[count];
    boolean[] opens = new boolean[count];
    for (int t = 0; t < count; t++) {
      int i = positions.positionOf(t);
      tokenTags[t] = tags[i];
      confidences[t] = withConfidence ? decoder.tagPosterior(i, best[i]) : Double.NaN;
      known[t] = lattice.isKnown(i, best[i]);
      opens[t] = lattice.opensSentence(i, best[i]) && (t == 0 || positions.positionOf(t - 1) != i);
    }
    return new Tagging(tokenTags, confidences, known, opens);
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
