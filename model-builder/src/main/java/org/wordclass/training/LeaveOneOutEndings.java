package org.wordclass.training;

import org.wordclass.model.UnknownWordModel;

/**
 * Scores a rare training word by its ending as if it had not been seen: the unknown-word
 * model's successive abstraction ({@link UnknownWordModel#tagDistribution}) with the word's own
 * counts taken out of every ending on its path first. What {@link SuffixWeightSelection} chooses
 * θ by; training only, so it reads the model through its read-only view and the decoder carries
 * none of it. Costs what scoring an unknown word costs, and allocates nothing.
 */
final class LeaveOneOutEndings {
  private final UnknownWordModel model;
  private final int[] path;
  private final double[] scratch;

  LeaveOneOutEndings(UnknownWordModel model) {
    this.model = model;
    this.path = new int[model.maxEndingLength() + 1];
    this.scratch = new double[model.openTagCount()];
  }

  /**
   * Writes {@code P(openTag(k) | ending, shape)} of the word into {@code out[k]}, with weight
   * {@code weight} and {@code heldOut[k]} occurrences of open tag k taken out of each count.
   */
  void tagDistribution(char[] chars, double weight, long[] heldOut, double[] out) {
    int open = model.openTagCount();
    for (int k = 0; k < open; k++) {
      out[k] = model.baseProbability(k);
    }
    int nodes = model.endingPath(chars, 0, chars.length, path);
    for (int d = 0; d < nodes; d++) {
      model.openCountsAt(chars, 0, chars.length, path[d], scratch);
      for (int k = 0; k < open; k++) {
        scratch[k] = Math.max(0, scratch[k] - heldOut[k]);
      }
      UnknownWordModel.abstractTo(scratch, open, weight, out);
    }
  }
}
