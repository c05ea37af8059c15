package org.wordclass.adaptation;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import javax.imageio.ImageIO;
import org.wordclass.corpus.Corpus;
import org.wordclass.corpus.Sentence;
import org.wordclass.corpus.TagColumn;
import org.wordclass.model.HmmModel;
import org.wordclass.training.HmmEstimator;
import org.wordclass.training.TagCounts;
import org.wordclass.training.TrainingOptions;

/**
 * The adaptation experiment of docs/adaptation.md on UD English EWT (UPOS, gold tokens):
 * supervised models from the first 500 and 2,000 training sentences and from all of them,
 * re-estimated by Baum-Welch on untagged training text, with and without the safeguards; and a
 * model from a tag dictionary alone. Every model of every iteration is scored on EWT test; EWT
 * dev is the held-out file of the early stop (and is scored too, for the table). Writes the
 * tables to {@code DOCS/adaptation-results.md} and the curves to {@code
 * DOCS/adaptation-curve.png}.
 *
 * <p>Run: {@code java -cp model-builder/target/test-classes:model-builder/target/wordclass.jar
 * org.wordclass.adaptation.AdaptationExperiment [CORPORA [DOCS]]}.
 */
public final class AdaptationExperiment {
  private static final int ITERATIONS = 5;
  private static final int DICTIONARY_ITERATIONS = 10;

  /** One run's per-iteration figures. */
  record Run(String start, String setting, List<double[]> rows, int kept, Adaptation.Stop stop, double seconds) {}

  private final Corpus train;
  private final Corpus dev;
  private final Corpus test;
  private final List<Run> runs = new ArrayList<>();

  private AdaptationExperiment(Path corpora) {
    Path ewt = corpora.resolve("ud-english-ewt");
    train = corpus(ewt.resolve("en_ewt-ud-train.conllu"));
    dev = corpus(ewt.resolve("en_ewt-ud-dev.conllu"));
    test = corpus(ewt.resolve("en_ewt-ud-test.conllu"));
  }

  private static Corpus corpus(Path file) {
    return new Corpus(List.of(file), null, TagColumn.UPOS);
  }

  public static void main(String[] args) throws IOException {
    Path corpora = Paths.get(args.length > 0 ? args[0] : "../shared/corpora");
    Path docs = Paths.get(args.length > 1 ? args[1] : "docs");
    AdaptationExperiment experiment = new AdaptationExperiment(corpora);
    experiment.supervised("500 sentences", 500, 500);
    experiment.supervised("2,000 sentences", 2000, 2000);
    experiment.supervised("all 12,544 sentences", Integer.MAX_VALUE, 0);
    experiment.dictionaryOnly();
    Files.createDirectories(docs);
    experiment.writeTables(docs.resolve("adaptation-results.md"));
    Plot.draw(experiment.runs, docs.resolve("adaptation-curve.png"));
  }

  /** A model from the first {@code tagged} sentences, adapted to the train text from sentence {@code textFrom} on. */
  private void supervised(String name, int tagged, int textFrom) throws IOException {
    HmmModel start = trainOn(tagged);
    TextSource text = new CorpusWordsSource(train, textFrom, Long.MAX_VALUE);
    AdaptationOptions plain = AdaptationOptions.plainBaumWelch(ITERATIONS);
    AdaptationOptions guarded = AdaptationOptions.DEFAULTS.withIterations(ITERATIONS, 1e-4);
    run(name, "plain Baum-Welch (λ=1, ML transitions)", start, text, plain, null);
    if (tagged == 500) {
      run(name, "plain, lexicon constraint off", start, text, plain.withLexiconConstraint(false), null);
    }
    run(name, "safeguards (λ=0.5, constraint, dev early stop), no words added", start, text, guarded.withAddedWords(0), dev);
    run(name, "safeguards + words seen ≥3 times added (defaults)", start, text, guarded, dev);
  }

  private HmmModel trainOn(int sentences) {
    TagCounts counts = new TagCounts();
    int read = 0;
    for (Sentence s : train) {
      if (read++ < sentences) {
        counts.add(s.words(), s.tags());
      }
    }
    return new HmmEstimator(TrainingOptions.DEFAULTS).estimate(counts, Map.of());
  }

  private void dictionaryOnly() throws IOException {
    TagDictionary dictionary = TagDictionary.of(train);
    HmmModel start = dictionary.initialModel(TrainingOptions.DEFAULTS, Map.of());
    TextSource text = new CorpusWordsSource(train, 0, Long.MAX_VALUE);
    run("tag dictionary only", "plain Baum-Welch from uniform", start, text,
        AdaptationOptions.plainBaumWelch(DICTIONARY_ITERATIONS), null);
  }

  private void run(String start, String setting, HmmModel model, TextSource text, AdaptationOptions options,
      Corpus heldOut) throws IOException {
    List<double[]> rows = new ArrayList<>();
    long began = System.nanoTime();
    Adaptation adaptation = new Adaptation(options, new Adaptation.Listener() {
      @Override
      public void iterationFinished(Adaptation.Iteration it, HmmModel estimated) {
        double devAccuracy = Double.isNaN(it.heldOutAccuracy()) ? Adaptation.accuracy(estimated, dev) : it.heldOutAccuracy();
        rows.add(new double[] {it.number(), it.logLikelihood(), devAccuracy, Adaptation.accuracy(estimated, test),
            it.lexiconWords()});
        System.out.printf(Locale.ROOT, "%s / %s: %s, test %.4f%n", start, setting, it, rows.get(rows.size() - 1)[3]);
      }
    });
    Adaptation.Result result = adaptation.adapt(model, text, heldOut);
    runs.add(new Run(start, setting, rows, result.keptIteration(), result.stop(), (System.nanoTime() - began) / 1e9));
  }

  private void writeTables(Path target) throws IOException {
    try (PrintStream out = new PrintStream(Files.newOutputStream(target), true, StandardCharsets.UTF_8)) {
      out.println("<!-- written by org.wordclass.adaptation.AdaptationExperiment; do not edit by hand -->");
      out.println();
      out.println("| start | setting | iteration | log-likelihood | dev accuracy | test accuracy | lexicon words |");
      out.println("| --- | --- | ---: | ---: | ---: | ---: | ---: |");
      for (Run run : runs) {
        for (double[] row : run.rows()) {
          String mark = (int) row[0] == run.kept() ? " (kept)" : "";
          out.printf(Locale.ROOT, "| %s | %s | %d%s | %.5e | %.2f%% | %.2f%% | %d |%n", run.start(), run.setting(),
              (int) row[0], mark, row[1], 100 * row[2], 100 * row[3], (int) row[4]);
        }
      }
      out.println();
      out.println("| start | setting | stop | kept iteration | test accuracy at start | test accuracy kept | seconds |");
      out.println("| --- | --- | --- | ---: | ---: | ---: | ---: |");
      for (Run run : runs) {
        out.printf(Locale.ROOT, "| %s | %s | %s | %d | %.2f%% | %.2f%% | %.0f |%n", run.start(), run.setting(),
            run.stop().name().toLowerCase(Locale.ROOT).replace('_', '-'), run.kept(), 100 * run.rows().get(0)[3],
            100 * run.rows().get(run.kept())[3], run.seconds());
      }
    }
  }

  /** Test accuracy per iteration, one line per run: supervised starts left, the tag dictionary right. */
  static final class Plot {
    private static final int PANEL_W = 620;
    private static final int H = 780;
    private static final Color[] COLORS = {new Color(0x1f77b4), new Color(0xd62728), new Color(0x2ca02c), new Color(0x9467bd)};

    static void draw(List<Run> runs, Path target) throws IOException {
      BufferedImage image = new BufferedImage(2 * PANEL_W, H, BufferedImage.TYPE_INT_RGB);
      Graphics2D g = image.createGraphics();
      g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
      g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
      g.setColor(Color.WHITE);
      g.fillRect(0, 0, 2 * PANEL_W, H);
      List<Run> supervised = runs.stream().filter(r -> !r.start().startsWith("tag dictionary")).toList();
      List<Run> dictionary = runs.stream().filter(r -> r.start().startsWith("tag dictionary")).toList();
      panel(g, 0, supervised, "Supervised start, adapted on untagged EWT train text", ITERATIONS);
      panel(g, PANEL_W, dictionary, "Tag dictionary only, Baum-Welch from uniform", DICTIONARY_ITERATIONS);
      g.dispose();
      ImageIO.write(image, "png", target.toFile());
    }

    private static void panel(Graphics2D g, int x0, List<Run> runs, String title, int maxIteration) {
      int left = x0 + 80;
      int right = x0 + PANEL_W - 20;
      int top = 50;
      int bottom = H - 330;
      double[] range = accuracyRange(runs);
      g.setColor(Color.BLACK);
      g.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 16));
      g.drawString(title, left - 40, 28);
      g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 13));
      g.drawRect(left, top, right - left, bottom - top);
      for (int i = 0; i <= maxIteration; i++) {
        int x = left + (right - left) * i / maxIteration;
        g.drawLine(x, bottom, x, bottom + 5);
        g.drawString(Integer.toString(i), x - 4, bottom + 20);
      }
      g.drawString("iteration (0 = starting model)", (left + right) / 2 - 90, bottom + 40);
      int ticks = (int) Math.round((range[1] - range[0]) * 100);
      for (int i = 0; i <= ticks; i++) {
        double value = range[0] + (range[1] - range[0]) * i / ticks;
        int y = bottom - (int) ((bottom - top) * (double) i / ticks);
        g.setColor(new Color(0xdddddd));
        g.drawLine(left + 1, y, right - 1, y);
        g.setColor(Color.BLACK);
        g.drawString(String.format(Locale.ROOT, "%.0f%%", 100 * value), left - 55, y + 5);
      }
      Graphics2D rotated = (Graphics2D) g.create();
      rotated.rotate(-Math.PI / 2);
      rotated.drawString("EWT test accuracy (UPOS)", -(top + bottom) / 2 - 80, x0 + 18);
      rotated.dispose();
      int legendY = bottom + 65;
      for (int r = 0; r < runs.size(); r++) {
        Run run = runs.get(r);
        g.setColor(COLORS[starts(runs).indexOf(run.start()) % COLORS.length]);
        g.setStroke(stroke(run.setting()));
        int px = -1;
        int py = -1;
        for (double[] row : run.rows()) {
          int x = left + (int) ((right - left) * row[0] / maxIteration);
          int y = bottom - (int) ((bottom - top) * (row[3] - range[0]) / (range[1] - range[0]));
          if (px >= 0) {
            g.drawLine(px, py, x, y);
          }
          g.fillOval(x - 3, y - 3, 7, 7);
          px = x;
          py = y;
        }
        int ly = legendY + 17 * r;
        g.drawLine(x0 + 30, ly - 4, x0 + 70, ly - 4);
        g.setStroke(new BasicStroke(1));
        g.setColor(Color.BLACK);
        g.drawString(run.start() + ": " + run.setting(), x0 + 78, ly);
      }
      g.setStroke(new BasicStroke(1));
    }

    private static List<String> starts(List<Run> runs) {
      return runs.stream().map(Run::start).distinct().toList();
    }

    private static BasicStroke stroke(String setting) {
      if (setting.startsWith("plain, lexicon")) {
        return new BasicStroke(2, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 1, new float[] {2, 4}, 0);
      }
      if (setting.startsWith("plain")) {
        return new BasicStroke(2, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 1, new float[] {8, 5}, 0);
      }
      return setting.contains("+ words") ? new BasicStroke(3.5f) : new BasicStroke(1.5f);
    }

    /** Whole percent bounds around the data, so the ticks fall on round values. */
    private static double[] accuracyRange(List<Run> runs) {
      double min = 1;
      double max = 0;
      for (Run run : runs) {
        for (double[] row : run.rows()) {
          min = Math.min(min, row[3]);
          max = Math.max(max, row[3]);
        }
      }
      return new double[] {Math.floor(min * 100 - 0.5) / 100, Math.ceil(max * 100 + 0.5) / 100};
    }
  }
}
