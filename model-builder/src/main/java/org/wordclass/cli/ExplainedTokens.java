package org.wordclass.cli;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.wordclass.decoding.CandidateSource;
import org.wordclass.decoding.Tagger;
import org.wordclass.model.TagSet;
import org.wordclass.model.WordShape;

/**
 * What {@code tag --explain} and {@code tag --json} print for each token: the chosen class, its
 * confidence, the next best classes and how the token's candidate classes were chosen.
 */
final class ExplainedTokens {
  /** Next best classes shown per token. */
  static final int ALTERNATIVES = 3;
  /** Classes less probable than this are not worth showing as alternatives. */
  static final double SHOWN_PROBABILITY = 0.00005;

  /** A class the model considered, with its posterior probability. */
  record Alternative(String wordClass, double probability) {}

  /**
   * One token, in the shape of the JSON output; fields that do not apply are null.
   *
   * @param source KNOWN, LOWERCASED_FIRST_WORD, UNKNOWN or USER_LEXICON
   * @param lookedUpAs for LOWERCASED_FIRST_WORD, the lower-case form found in the lexicon
   * @param ending for UNKNOWN, the ending the suffix model matched (may be empty)
   * @param shape for UNKNOWN, the spelling shape whose ending counts scored it
   */
  record Token(String token, String wordClass, double confidence, String source, String lookedUpAs, String ending,
      Integer endingLength, String shape, List<Alternative> alternatives) {}

  /** One line of input. */
  record Sentence(List<Token> tokens) {}

  /** The whole JSON output. */
  record Report(String model, String lexicon, List<Sentence> sentences) {}

  private ExplainedTokens() {}

  static Token of(Tagger.Explanation e, TagSet tags) {
    boolean unknown = e.source() == CandidateSource.UNKNOWN;
    String token = e.token();
    return new Token(token, tags.name(e.tag()), e.confidence(), e.source().name(),
        e.source() == CandidateSource.LOWERCASED_FIRST_WORD ? token.toLowerCase(Locale.ROOT) : null,
        unknown ? token.substring(token.length() - e.matchedEndingLength()) : null,
        unknown ? e.matchedEndingLength() : null,
        unknown ? WordShape.classify(token.toCharArray(), 0, token.length()).name() : null,
        alternatives(e, tags));
  }

  /** The most probable classes other than the chosen one, most probable first. */
  private static List<Alternative> alternatives(Tagger.Explanation e, TagSet tags) {
    List<Alternative> all = new ArrayList<>();
    for (int t = 0; t < tags.size(); t++) {
      if (t != e.tag() && e.tagPosteriors()[t] >= SHOWN_PROBABILITY) {
        all.add(new Alternative(tags.name(t), e.tagPosteriors()[t]));
      }
    }
    all.sort(Comparator.comparingDouble(Alternative::probability).reversed().thenComparing(Alternative::wordClass));
    return List.copyOf(all.subList(0, Math.min(ALTERNATIVES, all.size())));
  }

  /** {@code token<TAB>class<TAB>confidence<TAB>how<TAB>next best}. */
  static String text(Token t) {
    StringBuilder next = new StringBuilder();
    for (Alternative a : t.alternatives()) {
      next.append(next.length() == 0 ? "" : ", ").append(String.format(Locale.ROOT, "%s %.4f", a.wordClass(), a.probability()));
    }
    return String.format(Locale.ROOT, "%s\t%s\t%.4f\t%s\t%s", t.token(), t.wordClass(), t.confidence(), how(t),
        next.length() == 0 ? "-" : next);
  }

  private static String how(Token t) {
    return switch (CandidateSource.valueOf(t.source())) {
      case KNOWN -> "known";
      case LOWERCASED_FIRST_WORD -> "known as '" + t.lookedUpAs() + "' (first word, lower-cased)";
      case USER_LEXICON -> "user lexicon";
      case UNKNOWN -> "unknown: " + (t.endingLength() == 0 ? "no ending known" : "ending '" + t.ending() + "'")
          + ", shape " + t.shape();
    };
  }
}
