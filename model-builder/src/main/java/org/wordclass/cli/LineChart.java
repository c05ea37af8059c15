package org.wordclass.cli;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import javax.imageio.ImageIO;
import org.wordclass.model.AtomicFiles;

/**
 * A line chart of accuracies (as percentages) against a count, drawn as a PNG with Java2D and no
 * display: learning curves, accuracy per iteration. The x axis can be logarithmic, which suits
 * training-set sizes that double.
 */
public final class LineChart {
  static {
    // before any AWT class is touched: no display is needed or wanted
    System.setProperty("java.awt.headless", "true");
  }

  /** One line: a name for the legend and its points {x, y}, y a fraction in 0..1. */
  public record Series(String name, List<double[]> points) {}

  private static final int WIDTH = 900;
  private static final int HEIGHT = 600;
  private static final int LEFT = 90;
  private static final int RIGHT = 30;
  private static final int TOP = 50;
  private static final int LEGEND_LINE = 18;
  private static final Color[] COLORS = {
    new Color(0x1f77b4), new Color(0xd62728), new Color(0x2ca02c), new Color(0x9467bd),
    new Color(0xff7f0e), new Color(0x8c564b), new Color(0x17becf), new Color(0x7f7f7f)};

  private final String title;
  private final String xLabel;
  private final String yLabel;
  private final boolean logX;

  public LineChart(String title, String xLabel, String yLabel, boolean logX) {
    this.title = title;
    this.xLabel = xLabel;
    this.yLabel = yLabel;
    this.logX = logX;
  }

  /** Draws {@code series} and writes the PNG atomically. */
  public void write(List<Series> series, Path target) throws IOException {
    BufferedImage image = draw(series);
    AtomicFiles.write(target, out -> {
      if (!ImageIO.write(image, "png", out)) {
        throw new IOException("this Java runtime cannot write PNG images");
      }
    });
  }

  BufferedImage draw(List<Series> series) {
    int bottom = HEIGHT - 70 - LEGEND_LINE * series.size();
    BufferedImage image = new BufferedImage(WIDTH, HEIGHT, BufferedImage.TYPE_INT_RGB);
    Graphics2D g = image.createGraphics();
    g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
    g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
    g.setColor(Color.WHITE);
    g.fillRect(0, 0, WIDTH, HEIGHT);
    Frame frame = new Frame(series, bottom);
    axes(g, frame);
    for (int s = 0; s < series.size(); s++) {
      line(g, frame, series.get(s), COLORS[s % COLORS.length]);
      legend(g, series.get(s).name(), COLORS[s % COLORS.length], bottom + 50 + LEGEND_LINE * s);
    }
    g.dispose();
    return image;
  }

  /** Data bounds and the mapping of data to pixels. */
  private final class Frame {
    final double minX;
    final double maxX;
    final double minY;
    final double maxY;
    final int bottom;
    final List<Double> xTicks;

    Frame(List<Series> series, int bottom) {
      double x0 = Double.POSITIVE_INFINITY;
      double x1 = Double.NEGATIVE_INFINITY;
      double y0 = 1;
      double y1 = 0;
      java.util.TreeSet<Double> xs = new java.util.TreeSet<>();
      for (Series s : series) {
        for (double[] p : s.points()) {
          x0 = Math.min(x0, p[0]);
          x1 = Math.max(x1, p[0]);
          y0 = Math.min(y0, p[1]);
          y1 = Math.max(y1, p[1]);
          xs.add(p[0]);
        }
      }
      this.minX = x0;
      this.maxX = x1 > x0 ? x1 : x0 + 1;
      // whole percents around the data, so the grid falls on round values
      this.minY = Math.floor(y0 * 100 - 0.5) / 100;
      this.maxY = Math.ceil(y1 * 100 + 0.5) / 100;
      this.bottom = bottom;
      this.xTicks = List.copyOf(xs);
    }

    int x(double value) {
      double t = logX ? (Math.log(value) - Math.log(minX)) / (Math.log(maxX) - Math.log(minX)) : (value - minX) / (maxX - minX);
      return LEFT + (int) Math.round(t * (WIDTH - LEFT - RIGHT));
    }

    int y(double value) {
      return bottom - (int) Math.round((value - minY) / (maxY - minY) * (bottom - TOP));
    }
  }

  private void axes(Graphics2D g, Frame f) {
    g.setColor(Color.BLACK);
    g.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 16));
    g.drawString(title, LEFT, 28);
    g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 12));
    int percentSteps = (int) Math.round((f.maxY - f.minY) * 100);
    int every = Math.max(1, percentSteps / 12);
    for (int i = 0; i <= percentSteps; i += every) {
      double value = f.minY + i / 100.0;
      int y = f.y(value);
      g.setColor(new Color(0xdddddd));
      g.drawLine(LEFT + 1, y, WIDTH - RIGHT - 1, y);
      g.setColor(Color.BLACK);
      g.drawString(String.format(Locale.ROOT, "%.0f%%", 100 * value), LEFT - 40, y + 4);
    }
    for (double x : f.xTicks) {
      int px = f.x(x);
      g.drawLine(px, f.bottom, px, f.bottom + 5);
      String label = x == Math.rint(x) ? String.format(Locale.ROOT, "%,d", (long) x) : String.format(Locale.ROOT, "%.2f", x);
      g.drawString(label, px - g.getFontMetrics().stringWidth(label) / 2, f.bottom + 19);
    }
    g.drawRect(LEFT, TOP, WIDTH - LEFT - RIGHT, f.bottom - TOP);
    g.drawString(xLabel + (logX ? " (log scale)" : ""), (WIDTH - g.getFontMetrics().stringWidth(xLabel)) / 2, f.bottom + 38);
    Graphics2D rotated = (Graphics2D) g.create();
    rotated.rotate(-Math.PI / 2);
    rotated.drawString(yLabel, -(TOP + f.bottom) / 2 - g.getFontMetrics().stringWidth(yLabel) / 2, 22);
    rotated.dispose();
  }

  private static void line(Graphics2D g, Frame f, Series s, Color color) {
    g.setColor(color);
    g.setStroke(new BasicStroke(2));
    int px = Integer.MIN_VALUE;
    int py = 0;
    for (double[] p : s.points()) {
      int x = f.x(p[0]);
      int y = f.y(p[1]);
      if (px != Integer.MIN_VALUE) {
        g.drawLine(px, py, x, y);
      }
      g.fillOval(x - 3, y - 3, 7, 7);
      px = x;
      py = y;
    }
    g.setStroke(new BasicStroke(1));
  }

  private static void legend(Graphics2D g, String name, Color color, int y) {
    g.setColor(color);
    g.setStroke(new BasicStroke(2));
    g.drawLine(LEFT, y - 4, LEFT + 40, y - 4);
    g.setStroke(new BasicStroke(1));
    g.setColor(Color.BLACK);
    g.drawString(name, LEFT + 50, y);
  }
}
