package org.wordclass.cli;

import org.wordclass.model.AtomicFiles;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.AffineTransform;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.Locale;
import javax.imageio.ImageIO;

/**
 * Draws a {@link ConfusionHeatmap} as a PNG image with Java2D, without a display. The layout is
 * fixed by the number of tags alone ({@link #width}, {@link #height}); text too long for its
 * place is drawn smaller rather than moving the grid.
 */
final class HeatmapImage {
  static {
    // before any AWT class is touched: no display is needed or wanted
    System.setProperty("java.awt.headless", "true");
  }

  static final int CELL = 46;
  static final int PADDING = 16;
  static final int TITLE_HEIGHT = 34;
  static final int CAPTION = 22;
  static final int LABEL_SPACE = 64;

  private static final Font TITLE_FONT = new Font(Font.SANS_SERIF, Font.BOLD, 16);
  private static final Font LABEL_FONT = new Font(Font.SANS_SERIF, Font.PLAIN, 13);
  private static final Font CAPTION_FONT = new Font(Font.SANS_SERIF, Font.ITALIC, 13);
  private static final Font COUNT_FONT = new Font(Font.SANS_SERIF, Font.PLAIN, 11);

  private HeatmapImage() {}

  static int width(int tags) {
    return PADDING + CAPTION + LABEL_SPACE + tags * CELL + PADDING;
  }

  static int height(int tags) {
    return PADDING + TITLE_HEIGHT + CAPTION + LABEL_SPACE + tags * CELL + PADDING;
  }

  static void write(Path target, ConfusionHeatmap map, String title) throws IOException {
    BufferedImage image = draw(map, title);
    AtomicFiles.write(target, out -> {
      if (!ImageIO.write(image, "png", out)) {
        throw new IOException("this Java runtime cannot write PNG images");
      }
    });
  }

  static BufferedImage draw(ConfusionHeatmap map, String title) {
    int n = map.size();
    BufferedImage image = new BufferedImage(width(n), height(n), BufferedImage.TYPE_INT_RGB);
    Graphics2D g = image.createGraphics();
    try {
      g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
      g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
      g.setColor(Color.WHITE);
      g.fillRect(0, 0, image.getWidth(), image.getHeight());
      int gridX = PADDING + CAPTION + LABEL_SPACE;
      int gridY = PADDING + TITLE_HEIGHT + CAPTION + LABEL_SPACE;
      drawTitleAndCaptions(g, title, gridX, gridY, n);
      drawLabels(g, map, gridX, gridY);
      drawCells(g, map, gridX, gridY);
    } finally {
      g.dispose();
    }
    return image;
  }

  private static void drawTitleAndCaptions(Graphics2D g, String title, int gridX, int gridY, int n) {
    g.setColor(Color.BLACK);
    drawFitted(g, title, TITLE_FONT, PADDING, PADDING + 20, width(n) - 2 * PADDING, false);
    g.setColor(Color.DARK_GRAY);
    drawCentred(g, "predicted tag", gridX + n * CELL / 2, PADDING + TITLE_HEIGHT + 15);
    AffineTransform saved = g.getTransform();
    g.rotate(-Math.PI / 2);
    // after the rotation x runs upwards (negated), so this centres the caption beside the rows
    drawCentred(g, "gold tag", -(gridY + n * CELL / 2), PADDING + 15);
    g.setTransform(saved);
  }

  private static void drawCentred(Graphics2D g, String text, int centreX, int y) {
    g.setFont(CAPTION_FONT);
    g.drawString(text, centreX - g.getFontMetrics().stringWidth(text) / 2, y);
  }

  private static void drawLabels(Graphics2D g, ConfusionHeatmap map, int gridX, int gridY) {
    g.setColor(Color.BLACK);
    for (int i = 0; i < map.size(); i++) {
      int middle = i * CELL + CELL / 2 + 5;
      drawFitted(g, map.label(i), LABEL_FONT, gridX - LABEL_SPACE, gridY + middle, LABEL_SPACE - 6, true);
      AffineTransform saved = g.getTransform();
      g.rotate(-Math.PI / 2);
      drawFitted(g, map.label(i), LABEL_FONT, -gridY + 6, gridX + middle, LABEL_SPACE - 6, false);
      g.setTransform(saved);
    }
  }

  private static void drawCells(Graphics2D g, ConfusionHeatmap map, int gridX, int gridY) {
    for (int r = 0; r < map.size(); r++) {
      for (int c = 0; c < map.size(); c++) {
        int x = gridX + c * CELL;
        int y = gridY + r * CELL;
        g.setColor(new Color(map.fillRgb(r, c)));
        g.fillRect(x, y, CELL, CELL);
        long count = map.count(r, c);
        if (count > 0) {
          g.setColor(map.darkFill(r, c) ? Color.WHITE : Color.BLACK);
          String text = compact(count);
          g.setFont(COUNT_FONT);
          int textWidth = g.getFontMetrics().stringWidth(text);
          drawFitted(g, text, COUNT_FONT, x + Math.max(2, (CELL - textWidth) / 2), y + CELL / 2 + 4, CELL - 4, false);
        }
      }
    }
    g.setColor(new Color(0xDDDDDD));
    g.setStroke(new BasicStroke(1f));
    for (int i = 0; i <= map.size(); i++) {
      g.drawLine(gridX, gridY + i * CELL, gridX + map.size() * CELL, gridY + i * CELL);
      g.drawLine(gridX + i * CELL, gridY, gridX + i * CELL, gridY + map.size() * CELL);
    }
  }

  /** Draws {@code text} with its baseline at y, shrinking the font until it fits {@code maxWidth}. */
  private static void drawFitted(Graphics2D g, String text, Font font, int x, int y, int maxWidth, boolean alignRight) {
    Font f = font;
    FontMetrics metrics = g.getFontMetrics(f);
    while (metrics.stringWidth(text) > maxWidth && f.getSize2D() > 7) {
      f = f.deriveFont(f.getSize2D() - 1);
      metrics = g.getFontMetrics(f);
    }
    g.setFont(f);
    g.drawString(text, alignRight ? x + maxWidth - metrics.stringWidth(text) : x, y);
  }

  /** Counts as short as a cell needs: 12345 stays, 123456 becomes 123k. */
  static String compact(long count) {
    if (count < 100_000) {
      return Long.toString(count);
    }
    if (count < 100_000_000) {
      return String.format(Locale.ROOT, "%dk", count / 1000);
    }
    return String.format(Locale.ROOT, "%dM", count / 1_000_000);
  }
}
