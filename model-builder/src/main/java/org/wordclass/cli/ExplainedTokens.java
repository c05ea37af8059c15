package org.wordclass.cli;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.wordclass.analysis.WordClassExplanationAttribute;
import org.wordclass.decoding.CandidateSource;
import org.wordclass.model.TagSet;

/**
 * What {@code tag} prints for each token, in text and JSON: the token, its offsets, the class the
 * filter wrote and its confidence, and with {@code --explain} or {@code --json} how the token's
 * candidate classes were chosen and the next best classes, all read from the filter's {@link
 * WordClassExplanationAttribute}, so that nothing here decodes again.
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
   * @param start offset of the token's first character in the input, as the chain sets it
   * @param end offset after its last character
   * @param source KNOWN, LOWERCASED_FIRST_WORD, UNKNOWN or USER_LEXICON
   * @param lookedUpAs for LOWERCASED_FIRST_WORD, the lower-case form found in the lexicon
   * @param ending for UNKNOWN, the ending the suffix model matched (may be empty)
   * @param shape for UNKNOWN, the spelling shape whose ending counts scored it
   * @param opensSentence whether the decoder found that the token opens a sentence the tokenizer
   *     did not mark
   */
  record Token(String token, int start, int end, String wordClass, double confidence, String source, String lookedUpAs,
      String ending, Integer endingLength, String shape, boolean opensSentence, List<Alternative> alternatives) {}

  private ExplainedTokens() {}

  static Token of(String token, int start, int end, int classIndex, double confidence, WordClassExplanationAttribute why,
      TagSet tags) {
    String ending = why.getEnding();
    return new Token(token, start, end, tags.name(classIndex), confidence, why.getSource().name(), why.getLookedUpAs(), ending,
        ending == null ? null : ending.length(), why.getShape() == null ? null : why.getShape().name(),
        why.opensSentence(), alternatives(classIndex, why, tags));
  }

  /** The most probable classes other than the chosen one, most probable first. */
  private static List<Alternative> alternatives(int chosen, WordClassExplanationAttribute why, TagSet tags) {
    List<Alternative> all = new ArrayList<>();
    for (int t = 0; t < why.getClassCount(); t++) {
      double p = why.getClassProbability(t);
      if (t != chosen && p >= SHOWN_PROBABILITY) {
        all.add(new Alternative(tags.name(t), p));
      }
    }
    all.sort(Comparator.comparingDouble(Alternative::probability).reversed().thenComparing(Alternative::wordClass));
    return List.copyOf(all.subList(0, Math.min(ALTERNATIVES, all.size())));
  }

  /** {@code token<TAB>start<TAB>end<TAB>class}, then {@code <TAB>confidence} if it was computed. */
  static void appendPlain(StringBuilder line, String token, int start, int end, String wordClass, double confidence) {
    line.append(token).append('\t').append(start).append('\t').append(end).append('\t').append(wordClass);
    if (!Double.isNaN(confidence)) {
      appendProbability(line.append('\t'), confidence);
    }
  }

  /** {@code token<TAB>start<TAB>end<TAB>class<TAB>confidence<TAB>how<TAB>next best}. */
  static void appendExplained(StringBuilder line, Token t) {
    appendPlain(line, t.token(), t.start(), t.end(), t.wordClass(), t.confidence());
    line.append('\t').append(how(t)).append('\t');
    if (t.alternatives().isEmpty()) {
      line.append('-');
    }
    for (int i = 0; i < t.alternatives().size(); i++) {
      Alternative a = t.alternatives().get(i);
      appendProbability(line.append(i == 0 ? "" : ", ").append(a.wordClass()).append(' '), a.probability());
    }
  }

  /**
   * A probability in [0, 1] with four decimals, as {@code %.4f} prints it but without a format
   * parse per call: {@code tag} prints millions of them on a long input.
   */
  static void appendProbability(StringBuilder line, double p) {
    long tenThousandths = Math.round(Math.min(1, Math.max(0, p)) * 10_000);
    line.append(tenThousandths / 10_000).append('.');
    String digits = Long.toString(tenThousandths % 10_000);
    line.append("0000", digits.length(), 4).append(digits);
  }

  private static String how(Token t) {
    return (t.opensSentence() ? "opens a sentence, " : "") + switch (CandidateSource.valueOf(t.source())) {
      case KNOWN -> "known";
      case LOWERCASED_FIRST_WORD -> "known as '" + t.lookedUpAs() + "' (first word, lower-cased)";
      case USER_LEXICON -> "user lexicon";
      case UNKNOWN -> "unknown: " + (t.endingLength() == 0 ? "no ending known" : "ending '" + t.ending() + "'")
          + ", shape " + t.shape();
    };
  }
}
