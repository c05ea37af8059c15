package org.wordclass.evaluation;

import com.fasterxml.jackson.annotation.JsonInclude;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The result of an evaluation, shaped for JSON output (Jackson serialises the record
 * components): the top level holds {@code accuracy}, {@code knownAccuracy}, {@code
 * unknownAccuracy} (fractions in 0..1) and {@code tokens}. When the tokens came from an
 * analysis chain, {@code goldTokens} holds the report on the treebank's own tokens and {@code
 * alignment} how the two were matched; both are absent otherwise.
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record EvaluationReport(
    double accuracy,
    double knownAccuracy,
    double unknownAccuracy,
    long tokens,
    long knownTokens,
    long unknownTokens,
    long sentences,
    double unknownShare,
    double averageCandidatesPerToken,
    double tokensPerSecond,
    int order,
    List<TagScore> perTag,
    List<Confusion> topConfusions,
    ConfusionMatrix confusionMatrix,
    String tokenSource,
    EvaluationReport goldTokens,
    Map<String, Long> alignment) {

  /** Where the scored tokens came from when they are the gold tokens themselves. */
  public static final String GOLD_TOKENS = "gold tokens";

  /**
   * How one tag fared: {@code goldWords} carry it in the gold corpus, {@code taggedWords} were
   * given it by the model; {@code recall} is the share of the gold words that were given it,
   * {@code precision} the share of the tagged words that carry it in the gold, {@code f1} their
   * harmonic mean. The same names head the text, JSON and HTML reports.
   */
  public record TagScore(String tag, long goldWords, long taggedWords, double recall, double precision, double f1) {
    /** The header of the per-tag table in the text and HTML reports, in component order after the tag. */
    public static final List<String> LABELS = List.of("gold words", "tagged words", "recall", "precision", "F1");
  }

  /** Gold tag taken for another, and how often. */
  public record Confusion(String gold, String predicted, long count) {}

  /** Rows are gold tags, columns predicted tags, in the order of {@code labels}. */
  public record ConfusionMatrix(List<String> labels, long[][] counts) {}

  static EvaluationReport of(Evaluation e) {
    List<String> labels = e.labels();
    long[][] m = e.confusion();
    int n = labels.size();
    List<TagScore> perTag = new ArrayList<>();
    List<Confusion> confusions = new ArrayList<>();
    for (int t = 0; t < n; t++) {
      long tp = m[t][t];
      long goldTotal = 0;
      long predictedTotal = 0;
      for (int o = 0; o < n; o++) {
        goldTotal += m[t][o];
        predictedTotal += m[o][t];
        if (o != t && m[t][o] > 0) {
          confusions.add(new Confusion(labels.get(t), labels.get(o), m[t][o]));
        }
      }
      double precision = predictedTotal == 0 ? 0 : (double) tp / predictedTotal;
      double recall = goldTotal == 0 ? 0 : (double) tp / goldTotal;
      double f1 = precision + recall == 0 ? 0 : 2 * precision * recall / (precision + recall);
      if (goldTotal > 0 || predictedTotal > 0) {
        perTag.add(new TagScore(labels.get(t), goldTotal, predictedTotal, recall, precision, f1));
      }
    }
    confusions.sort(Comparator.comparingLong(Confusion::count).reversed()
        .thenComparing(Confusion::gold).thenComparing(Confusion::predicted));
    long[][] copy = new long[n][];
    for (int i = 0; i < n; i++) {
      copy[i] = m[i].clone();
    }
    long unknown = e.tokens() - e.knownTokens();
    return new EvaluationReport(
        e.accuracy(), e.knownAccuracy(), e.unknownAccuracy(), e.tokens(), e.knownTokens(), unknown,
        e.sentences(), e.tokens() == 0 ? 0 : (double) unknown / e.tokens(), e.averageCandidates(),
        e.tokensPerSecond(), e.model().order(), perTag,
        List.copyOf(confusions.subList(0, Math.min(20, confusions.size()))),
        new ConfusionMatrix(List.copyOf(labels), copy), GOLD_TOKENS, null, null);
  }

  /**
   * This report, of tokens emitted by an analysis chain, with the report on the gold tokens of
   * the same sentences beside it and the counts of how the two were aligned.
   */
  public EvaluationReport throughAnalyzer(String chain, EvaluationReport gold, Map<String, Long> alignmentCounts) {
    return new EvaluationReport(accuracy, knownAccuracy, unknownAccuracy, tokens, knownTokens, unknownTokens,
        sentences, unknownShare, averageCandidatesPerToken, tokensPerSecond, order, perTag, topConfusions,
        confusionMatrix, "analyzer tokens: " + chain, gold, alignmentCounts);
  }

  /** A plain-text summary for the terminal. */
  public String toText() {
    StringBuilder s = new StringBuilder();
    if (goldTokens != null) {
      s.append(String.format(Locale.ROOT, "tokens from      %s%n", tokenSource));
      s.append(String.format(Locale.ROOT, "gold-token accuracy %.4f (%d tokens); on analyzer tokens:%n",
          goldTokens.accuracy(), goldTokens.tokens()));
      alignment.forEach((k, v) -> s.append(String.format(Locale.ROOT, "  %-22s %d%n", k, v)));
    }
    s.append(String.format(Locale.ROOT, "tokens           %d in %d sentences%n", tokens, sentences));
    s.append(String.format(Locale.ROOT, "accuracy         %s%n", Figures.format("%.4f", accuracy)));
    s.append(String.format(Locale.ROOT, "known words      %s  (%d tokens)%n", Figures.format("%.4f", knownAccuracy), knownTokens));
    s.append(String.format(Locale.ROOT, "unknown words    %s  (%d tokens, %.1f%%)%n", Figures.format("%.4f", unknownAccuracy),
        unknownTokens, 100 * unknownShare));
    s.append(String.format(Locale.ROOT, "candidates/token %s%n", Figures.format("%.2f", averageCandidatesPerToken)));
    s.append(String.format(Locale.ROOT, "%nper tag         %12s %12s %9s %9s %7s%n", TagScore.LABELS.toArray()));
    for (TagScore t : perTag) {
      s.append(String.format(Locale.ROOT, "  %-14s %12d %12d %9.4f %9.4f %7.4f%n", t.tag(), t.goldWords(), t.taggedWords(),
          t.recall(), t.precision(), t.f1()));
    }
    s.append(String.format(Locale.ROOT, "%nmost frequent confusions (gold -> tagged)%n"));
    for (Confusion c : topConfusions.subList(0, Math.min(10, topConfusions.size()))) {
      s.append(String.format(Locale.ROOT, "  %-8s -> %-8s %6d%n", c.gold(), c.predicted(), c.count()));
    }
    return s.toString();
  }
}
