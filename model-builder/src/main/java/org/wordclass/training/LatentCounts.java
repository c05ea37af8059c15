package org.wordclass.training;

import java.util.Arrays;
import java.util.List;
import java.util.Random;
import java.util.TreeMap;
import org.apache.lucene.util.ArrayUtil;
import org.wordclass.adaptation.ExpectedTransitions;
import org.wordclass.decoding.Decoder;
import org.wordclass.decoding.Lattice;
import org.wordclass.model.StateSpace;

/**
 * Expected counts over latent sub-states from a tagged corpus: how often each word is emitted by
 * each state, and how often each state follows each one (order 1) or each pair (order 2), with
 * the sentence boundary as the extra state {@code space.size()}. Split and merge act on these
 * counts, and the next model is estimated from them, so that every model of split-merge training
 * comes out of one estimator ({@link LatentStates#estimate}).
 *
 * <p>Words are numbered as in the lexicon of every model of one training run: the vocabulary of
 * the tagged corpus, in the same order throughout.
 */
final class LatentCounts {
  final StateSpace space;
  /** The state of the supervised model each state descends from. */
  final int[] family;
  /** 2 for counts of state pairs, 3 for triples. */
  final int arity;
  /** Per word: the states it may take, ascending. */
  final int[][] wordStates;
  /** Per word: expected counts beside {@link #wordStates}. */
  final double[][] emissions;
  /** Expected transition counts, indexed like {@code HmmModel.bigramIndex} or {@code trigramIndex}. */
  final double[] transitions;
  double logLikelihood;

  LatentCounts(StateSpace space, int[] family, int arity, int[][] wordStates) {
    this.space = space;
    this.family = family;
    this.arity = arity;
    this.wordStates = wordStates;
    this.emissions = new double[wordStates.length][];
    for (int w = 0; w < wordStates.length; w++) {
      emissions[w] = new double[wordStates[w].length];
    }
    int n = space.size() + 1;
    this.transitions = new double[tableCells(n, arity)];
  }

  /** Cells of a transition table over {@code n} states (boundary included) of {@code arity} 2 or 3, refused beyond an array. */
  static int tableCells(int n, int arity) {
    long cells = arity == 3 ? (long) n * n * n : (long) n * n;
    if (cells > ArrayUtil.MAX_ARRAY_LENGTH) {
      throw new IllegalArgumentException((n - 1) + " latent states are more than a transition table can hold; "
          + "train fewer latent rounds");
    }
    return (int) cells;
  }

  /** Empty counts over the same states and words. */
  LatentCounts emptyLike() {
    return new LatentCounts(space, family, arity, wordStates);
  }

  /**
   * Adds the expectations of one tagged sentence under the decoder's model: forward-backward over
   * the lattice restricted to the sub-states of each token's gold tag.
   */
  void add(Decoder decoder, List<String> words, int[] tags) {
    Lattice lattice = decoder.lattice();
    lattice.clear();
    for (int i = 0; i < tags.length; i++) {
      lattice.add(words.get(i), tags[i]);
    }
    double sentenceLogLikelihood = decoder.forwardBackward();
    if (!(sentenceLogLikelihood > Double.NEGATIVE_INFINITY)) {
      throw new IllegalStateException("the model gives a training sentence probability zero: " + words);
    }
    logLikelihood += sentenceLogLikelihood;
    ExpectedTransitions.add(decoder, transitions);
    for (int i = 0; i < lattice.size(); i++) {
      int w = lattice.wordId(i);
      for (int k = 0; k < lattice.candidateCount(i); k++) {
        emissions[w][Arrays.binarySearch(wordStates[w], lattice.candidateState(i, k))] += decoder.posterior(i, k);
      }
    }
  }

  /** Expected count of each state, over all words. */
  double[] stateTotals() {
    double[] totals = new double[space.size()];
    for (int w = 0; w < wordStates.length; w++) {
      for (int k = 0; k < wordStates[w].length; k++) {
        totals[wordStates[w][k]] += emissions[w][k];
      }
    }
    return totals;
  }

  /**
   * Every state split in two, state s into 2s and 2s + 1, each half taking half of every count
   * with a small random change of up to {@code noise} of it, so that EM can pull the halves apart.
   */
  LatentCounts split(Random random, double noise) {
    int states = space.size();
    int[] tagOf = new int[2 * states];
    byte[] flags = new byte[2 * states];
    int[] families = new int[2 * states];
    int[][] targets = new int[states + 1][];
    for (int s = 0; s < states; s++) {
      for (int half = 0; half < 2; half++) {
        tagOf[2 * s + half] = space.tagOf(s);
        flags[2 * s + half] = (byte) space.flags(s);
        families[2 * s + half] = family[s];
      }
      targets[s] = new int[] {2 * s, 2 * s + 1};
    }
    targets[states] = new int[] {2 * states};
    return remap(new StateSpace(space.tagCount(), tagOf, flags), families, targets, random, noise);
  }

  /**
   * Merges state 2p + 1 back into 2p for every p with {@code merge[p]}; the states are numbered
   * anew in the same order. Counts of merged states add up, which is the merged estimate.
   */
  LatentCounts merge(boolean[] merge) {
    int states = space.size();
    int[][] targets = new int[states + 1][];
    int next = 0;
    for (int s = 0; s < states; s++) {
      boolean joinsPrevious = s % 2 == 1 && merge[s / 2];
      targets[s] = new int[] {joinsPrevious ? next - 1 : next++};
    }
    targets[states] = new int[] {next};
    int[] tagOf = new int[next];
    byte[] flags = new byte[next];
    int[] families = new int[next];
    for (int s = 0; s < states; s++) {
      int t = targets[s][0];
      tagOf[t] = space.tagOf(s);
      flags[t] = (byte) space.flags(s);
      families[t] = family[s];
    }
    return remap(new StateSpace(space.tagCount(), tagOf, flags), families, targets, null, 0);
  }

  /** These counts over {@code newSpace}: each old state's counts shared out among its targets. */
  private LatentCounts remap(StateSpace newSpace, int[] newFamily, int[][] targets, Random random, double noise) {
    int[][] newWordStates = new int[wordStates.length][];
    double[][] newEmissions = new double[wordStates.length][];
    for (int w = 0; w < wordStates.length; w++) {
      TreeMap<Integer, Double> shared = new TreeMap<>();
      for (int k = 0; k < wordStates[w].length; k++) {
        int[] to = targets[wordStates[w][k]];
        for (int t : to) {
          shared.merge(t, jitter(emissions[w][k] / to.length, random, noise), Double::sum);
        }
      }
      newWordStates[w] = shared.keySet().stream().mapToInt(Integer::intValue).toArray();
      newEmissions[w] = shared.values().stream().mapToDouble(Double::doubleValue).toArray();
    }
    LatentCounts out = new LatentCounts(newSpace, newFamily, arity, newWordStates);
    for (int w = 0; w < wordStates.length; w++) {
      out.emissions[w] = newEmissions[w];
    }
    remapTransitions(out, targets, random, noise);
    return out;
  }

  private void remapTransitions(LatentCounts out, int[][] targets, Random random, double noise) {
    int n = space.size() + 1;
    int newN = out.space.size() + 1;
    int[] digits = new int[arity];
    for (int index = 0; index < transitions.length; index++) {
      double count = transitions[index];
      if (count == 0) {
        continue;
      }
      int combinations = 1;
      for (int d = arity - 1, rest = index; d >= 0; d--, rest /= n) {
        digits[d] = rest % n;
        combinations *= targets[digits[d]].length;
      }
      for (int c = 0; c < combinations; c++) {
        int target = 0;
        for (int d = 0, rest = c; d < arity; d++) {
          int[] to = targets[digits[d]];
          target = target * newN + to[rest % to.length];
          rest /= to.length;
        }
        out.transitions[target] += jitter(count / combinations, random, noise);
      }
    }
  }

  private static double jitter(double value, Random random, double noise) {
    return random == null ? value : value * (1 + noise * (2 * random.nextDouble() - 1));
  }

  /** Number of word/state pairs, for reports. */
  int pairCount() {
    return Arrays.stream(wordStates).mapToInt(s -> s.length).sum();
  }
}
