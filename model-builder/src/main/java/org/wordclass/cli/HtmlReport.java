package org.wordclass.cli;

import org.wordclass.evaluation.Figures;
import org.wordclass.model.AtomicFiles;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Locale;
import org.wordclass.evaluation.EvaluationReport;

/**
 * An evaluation as one self-contained HTML page: summary figures, the per-tag scores and the
 * confusion matrix as a heat map table. Styles are inline in the page and nothing is loaded from
 * elsewhere, so the file can be mailed or archived as it is.
 */
final class HtmlReport {
  private static final String STYLE = """
      body { font-family: sans-serif; margin: 2em; color: #222; }
      h1 { font-size: 1.4em; } h2 { font-size: 1.15em; margin-top: 2em; }
      table { border-collapse: collapse; }
      td, th { padding: 0.25em 0.6em; text-align: right; }
      table.scores td:first-child, table.scores th:first-child { text-align: left; }
      table.scores tr:nth-child(even) { background: #f3f3f3; }
      table.heatmap td { width: 3.2em; height: 2.2em; text-align: center; font-size: 0.85em; border: 1px solid #ddd; }
      table.heatmap th { font-size: 0.85em; }
      table.heatmap th.col { writing-mode: vertical-rl; transform: rotate(180deg); text-align: left; }
      .light { color: #fff; }
      .note { color: #666; font-size: 0.9em; }
      """;

  private HtmlReport() {}

  static void write(Path target, EvaluationReport report, String title) throws IOException {
    String html = render(report, title);
    AtomicFiles.write(target, out -> out.write(html.getBytes(StandardCharsets.UTF_8)));
  }

  static String render(EvaluationReport report, String title) {
    StringBuilder h = new StringBuilder(16_384);
    h.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n<title>")
        .append(escape(title)).append("</title>\n<style>\n").append(STYLE).append("</style>\n</head>\n<body>\n");
    h.append("<h1>").append(escape(title)).append("</h1>\n");
    summary(h, report);
    perTag(h, report);
    heatmap(h, ConfusionHeatmap.of(report.confusionMatrix()));
    h.append("</body>\n</html>\n");
    return h.toString();
  }

  private static void summary(StringBuilder h, EvaluationReport r) {
    h.append("<table class=\"scores summary\">\n");
    row(h, "Tokens", String.format(Locale.ROOT, "%d in %d sentences", r.tokens(), r.sentences()));
    row(h, "Accuracy", percent(r.accuracy()));
    row(h, "Known words", percent(r.knownAccuracy()) + " of " + r.knownTokens());
    row(h, "Unknown words", percent(r.unknownAccuracy()) + " of " + r.unknownTokens()
        + String.format(Locale.ROOT, " (%.1f%% of tokens)", 100 * r.unknownShare()));
    row(h, "Candidate tags per token", Figures.format("%.2f", r.averageCandidatesPerToken()));
    row(h, "Model order", Integer.toString(r.order()));
    h.append("</table>\n");
  }

  private static void row(StringBuilder h, String name, String value) {
    h.append("<tr><th>").append(escape(name)).append("</th><td>").append(escape(value)).append("</td></tr>\n");
  }

  private static void perTag(StringBuilder h, EvaluationReport r) {
    h.append("<h2>Per tag</h2>\n<table class=\"scores per-tag\">\n")
        .append("<tr><th>tag</th>");
    EvaluationReport.TagScore.LABELS.forEach(label -> h.append("<th>").append(escape(label)).append("</th>"));
    h.append("</tr>\n");
    for (EvaluationReport.TagScore t : r.perTag()) {
      h.append(String.format(Locale.ROOT, "<tr><td>%s</td><td>%d</td><td>%d</td><td>%.4f</td><td>%.4f</td><td>%.4f</td></tr>%n",
          escape(t.tag()), t.goldWords(), t.taggedWords(), t.recall(), t.precision(), t.f1()));
    }
    h.append("</table>\n");
  }

  private static void heatmap(StringBuilder h, ConfusionHeatmap map) {
    h.append("<h2>Confusion matrix</h2>\n<p class=\"note\">Rows: gold tags; columns: predicted tags. "
        + "Colour strength shows the share of the row; the diagonal (blue) is correct, red cells are errors.</p>\n");
    h.append("<table class=\"heatmap\">\n<tr><th>gold \\ predicted</th>");
    for (int c = 0; c < map.size(); c++) {
      h.append("<th class=\"col\">").append(escape(map.label(c))).append("</th>");
    }
    h.append("</tr>\n");
    for (int r = 0; r < map.size(); r++) {
      h.append("<tr><th>").append(escape(map.label(r))).append("</th>");
      for (int c = 0; c < map.size(); c++) {
        long n = map.count(r, c);
        h.append(String.format(Locale.ROOT, "<td style=\"background:#%06x\"%s title=\"%s as %s: %.1f%%\">%s</td>",
            map.fillRgb(r, c), map.darkFill(r, c) ? " class=\"light\"" : "", escape(map.label(r)),
            escape(map.label(c)), 100 * map.share(r, c), n == 0 ? "" : Long.toString(n)));
      }
      h.append("</tr>\n");
    }
    h.append("</table>\n");
  }

  private static String percent(double fraction) {
    return Figures.format("%.2f%%", 100 * fraction);
  }

  static String escape(String text) {
    return text.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
  }
}
