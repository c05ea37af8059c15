package org.wordclass.decoding;

import java.util.List;
import org.wordclass.model.HmmModel;
import org.wordclass.model.Lexicon;
import org.wordclass.model.UnknownWordModel;

/**
 * Brute-force enumeration (definition of the HMM joint probability): every tag sequence allowed
 * by the lexicon constraint is scored as the sum of its transition and emission log-probabilities,
 * with the boundary state before the first and after the last token. Candidates are read from the
 * model directly, not from {@link Lattice}, so the decoder's bookkeeping is checked too.
 */
final class BruteForce {
  final HmmModel model;
  final int order;
  final int[][] tags;
  final double[][] logEmissions;
  /** Log joint probability of every path, in odometer order (last position fastest). */
  final double[] pathScores;

  BruteForce(HmmModel model, int order, List<String> tokens) {
    this.model = model;
    this.order = order;
    int n = tokens.size();
    tags = new int[n][];
    logEmissions = new double[n][];
    for (int i = 0; i < n; i++) {
      candidates(tokens.get(i), i);
    }
    int paths = 1;
    for (int[] t : tags) {
      paths *= t.length;
    }
    pathScores = new double[paths];
    for (int p = 0; p < paths; p++) {
      pathScores[p] = logJoint(choice(p));
    }
  }

  private void candidates(String token, int i) {
    Lexicon lexicon = model.lexicon();
    int word = lexicon.lookup(token);
    if (word >= 0) {
      int n = lexicon.stateCount(word);
      tags[i] = new int[n];
      logEmissions[i] = new double[n];
      for (int k = 0; k < n; k++) {
        tags[i][k] = lexicon.state(word, k);
        logEmissions[i][k] = lexicon.logEmission(word, k);
      }
    } else {
      UnknownWordModel unknown = model.unknownWords();
      int n = unknown.openTagCount();
      tags[i] = new int[n];
      logEmissions[i] = new double[n];
      unknown.logEmissions(token.toCharArray(), 0, token.length(), new double[n], logEmissions[i]);
      for (int k = 0; k < n; k++) {
        tags[i][k] = unknown.openTag(k);
      }
    }
  }

  /** Candidate index per position of path number {@code p}. */
  int[] choice(int p) {
    int[] c = new int[tags.length];
    for (int i = tags.length - 1; i >= 0; i--) {
      c[i] = p % tags[i].length;
      p /= tags[i].length;
    }
    return c;
  }

  /** log P(tags, words) of the path choosing candidate {@code c[i]} at each position. */
  double logJoint(int[] c) {
    int b = model.boundary();
    int first = b;
    int previous = b;
    double sum = 0;
    for (int i = 0; i < c.length; i++) {
      int t = tags[i][c[i]];
      sum += transition(first, previous, t) + logEmissions[i][c[i]];
      first = previous;
      previous = t;
    }
    return sum + transition(first, previous, b);
  }

  private double transition(int first, int previous, int next) {
    return order == 2 ? model.logTrigram(first, previous, next) : model.logBigram(previous, next);
  }

  double best() {
    double top = Double.NEGATIVE_INFINITY;
    for (double s : pathScores) {
      top = Math.max(top, s);
    }
    return top;
  }

  /** log of the sum over all paths of their joint probabilities. */
  double logSum() {
    double top = best();
    if (top == Double.NEGATIVE_INFINITY) {
      return top;
    }
    double sum = 0;
    for (double s : pathScores) {
      sum += Math.exp(s - top);
    }
    return top + Math.log(sum);
  }

  /** P(tag at position i = tag | words): the summed probability of the paths through it. */
  double marginal(int position, int tag) {
    double top = best();
    double through = 0;
    double all = 0;
    for (int p = 0; p < pathScores.length; p++) {
      double w = Math.exp(pathScores[p] - top);
      all += w;
      if (tags[position][choice(p)[position]] == tag) {
        through += w;
      }
    }
    return through / all;
  }
}
