package org.wordclass.cli;

import java.util.ArrayList;
import java.util.List;
import org.wordclass.evaluation.EvaluationReport;

/**
 * A confusion matrix laid out for drawing, shared by the HTML and the PNG report: gold tags in
 * rows, predicted tags in columns, in the same order so that correct taggings lie on the
 * diagonal. Tags that occur neither as gold nor as prediction are left out. Each cell's colour
 * follows its share of its row; the diagonal is blue, errors are red.
 */
final class ConfusionHeatmap {
  private static final int[] CORRECT_RGB = {33, 102, 172};
  private static final int[] ERROR_RGB = {203, 24, 29};

  private final List<String> labels;
  private final long[][] counts;
  private final long[] rowTotals;

  private ConfusionHeatmap(List<String> labels, long[][] counts) {
    this.labels = labels;
    this.counts = counts;
    this.rowTotals = new long[counts.length];
    for (int r = 0; r < counts.length; r++) {
      for (long n : counts[r]) {
        rowTotals[r] += n;
      }
    }
  }

  static ConfusionHeatmap of(EvaluationReport.ConfusionMatrix matrix) {
    long[][] all = matrix.counts();
    List<Integer> kept = new ArrayList<>();
    for (int i = 0; i < all.length; i++) {
      long sum = 0;
      for (int j = 0; j < all.length; j++) {
        sum += all[i][j] + all[j][i];
      }
      if (sum > 0) {
        kept.add(i);
      }
    }
    List<String> labels = new ArrayList<>();
    long[][] counts = new long[kept.size()][kept.size()];
    for (int r = 0; r < kept.size(); r++) {
      labels.add(matrix.labels().get(kept.get(r)));
      for (int c = 0; c < kept.size(); c++) {
        counts[r][c] = all[kept.get(r)][kept.get(c)];
      }
    }
    return new ConfusionHeatmap(List.copyOf(labels), counts);
  }

  int size() {
    return labels.size();
  }

  String label(int index) {
    return labels.get(index);
  }

  long count(int gold, int predicted) {
    return counts[gold][predicted];
  }

  /** Share of the gold tag's tokens that were given the predicted tag. */
  double share(int gold, int predicted) {
    return rowTotals[gold] == 0 ? 0 : (double) counts[gold][predicted] / rowTotals[gold];
  }

  /**
   * Colour strength in 0..1: the square root of the share, so that confusions of a few percent,
   * the ones worth seeing, are not lost next to the diagonal.
   */
  double intensity(int gold, int predicted) {
    return Math.sqrt(share(gold, predicted));
  }

  /** Fill colour of a cell, as 0xRRGGBB: white blended towards blue (diagonal) or red. */
  int fillRgb(int gold, int predicted) {
    int[] full = gold == predicted ? CORRECT_RGB : ERROR_RGB;
    double t = intensity(gold, predicted);
    int rgb = 0;
    for (int channel : full) {
      rgb = (rgb << 8) | (int) Math.round(255 + (channel - 255) * t);
    }
    return rgb;
  }

  /** Whether a cell's text should be light, for contrast on a dark fill. */
  boolean darkFill(int gold, int predicted) {
    return intensity(gold, predicted) > 0.6;
  }
}
