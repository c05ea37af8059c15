package org.wordclass.evaluation;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.wordclass.corpus.Sentence;
import org.wordclass.decoding.SentenceBoundaries;
import org.wordclass.decoding.Tagger;
import org.wordclass.model.HmmModel;

/**
 * Scores a model against gold-tagged sentences: token accuracy, accuracy on words the model
 * knows and on words it does not, a confusion matrix, and the average number of candidate tags
 * per token (the work the lexicon constraint leaves to the decoder).
 *
 * <p>Not thread-safe; feed it sentences with {@link #add}, then read {@link #report()}.
 */
public final class Evaluation {
  private final HmmModel model;
  private final Tagger tagger;
  private final List<String> labels = new ArrayList<>();
  private final Map<String, Integer> labelIndex = new LinkedHashMap<>();
  private long[][] confusion;
  private long sentences;
  private long tokens;
  private long correct;
  private long knownTokens;
  private long knownCorrect;
  private long firstCorrect;
  private long candidates;
  private long nanos;

  /** Scores each sentence decoded as one. */
  public Evaluation(HmmModel model) {
    this(model, SentenceBoundaries.TOKENIZER);
  }

  /** Scores each sentence decoded with {@code boundaries}: as one, or with the boundaries the model finds inside it. */
  public Evaluation(HmmModel model, SentenceBoundaries boundaries) {
    this.model = model;
    this.tagger = new Tagger(model, boundaries);
    for (String tag : model.tags().names()) {
      label(tag);
    }
    confusion = new long[labels.size()][labels.size()];
  }

  private int label(String tag) {
    Integer index = labelIndex.get(tag);
    if (index == null) {
      index = labels.size();
      labels.add(tag);
      labelIndex.put(tag, index);
      if (confusion != null) {
        long[][] grown = new long[labels.size()][labels.size()];
        for (int i = 0; i < confusion.length; i++) {
          System.arraycopy(confusion[i], 0, grown[i], 0, confusion[i].length);
        }
        confusion = grown;
      }
    }
    return index;
  }

  /**
   * Tags {@code sentence} with the model (a run of tokens written together as one word, see {@link
   * Sentence#gaps}) and counts the result against its gold tags, token by token.
   */
  public void add(Sentence sentence) {
    long start = System.nanoTime();
    Tagger.Tagging tagging = tagger.tag(sentence.words(), sentence.gapList(), false);
    nanos += System.nanoTime() - start;
    candidates += tagger.decoder().lattice().totalCandidates();
    add(sentence.tags(), tagging.tags(), tagging.known());
  }

  /** Counts predicted tags (model tag indexes) against gold tag names. */
  public void add(List<String> gold, int[] predicted, boolean[] known) {
    sentences++;
    for (int i = 0; i < gold.size(); i++) {
      int g = label(gold.get(i));
      int p = predicted[i];
      confusion[g][p]++;
      tokens++;
      boolean right = g == p;
      if (right) {
        correct++;
        if (i == 0) {
          firstCorrect++;
        }
      }
      if (known[i]) {
        knownTokens++;
        if (right) {
          knownCorrect++;
        }
      }
    }
  }

  public long tokens() {
    return tokens;
  }

  public double accuracy() {
    return ratio(correct, tokens);
  }

  public double knownAccuracy() {
    return ratio(knownCorrect, knownTokens);
  }

  /** Accuracy on the first token of each sentence, where a capital letter says least. */
  public double firstWordAccuracy() {
    return ratio(firstCorrect, sentences);
  }

  public double unknownAccuracy() {
    return ratio(correct - knownCorrect, tokens - knownTokens);
  }

  private static double ratio(long a, long b) {
    return b == 0 ? Double.NaN : (double) a / b;
  }

  /** The figures, ready to print or write as JSON and HTML. */
  public EvaluationReport report() {
    return EvaluationReport.of(this);
  }

  List<String> labels() {
    return labels;
  }

  long[][] confusion() {
    return confusion;
  }

  long sentences() {
    return sentences;
  }

  long knownTokens() {
    return knownTokens;
  }

  long correct() {
    return correct;
  }

  long knownCorrect() {
    return knownCorrect;
  }

  double averageCandidates() {
    return tokens == 0 ? Double.NaN : (double) candidates / tokens;
  }

  double tokensPerSecond() {
    return nanos == 0 ? Double.NaN : tokens * 1e9 / nanos;
  }

  HmmModel model() {
    return model;
  }
}
