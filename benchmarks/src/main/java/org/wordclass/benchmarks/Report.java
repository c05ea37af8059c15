package org.wordclass.benchmarks;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Paths;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;

/**
 * Turns JMH's JSON results into the Markdown tables of {@code docs/performance.md}: every score
 * with its error, and the ratios the targets are stated in, each between results of the same
 * run. Usage: {@code java -cp benchmarks.jar org.wordclass.benchmarks.Report results.json}.
 */
public final class Report {
  private static final String TOKENS = "tokens";

  private Report() {}

  public static void main(String[] args) throws IOException {
    JsonNode results = new ObjectMapper().readTree(Paths.get(args[0]).toFile());
    Map<String, JsonNode> byName = new LinkedHashMap<>();
    System.out.println("| benchmark | parameters | score | tokens/s |");
    System.out.println("| --- | --- | --- | --- |");
    for (JsonNode r : results) {
      String name = shortName(r) + " " + params(r);
      byName.put(name, r);
      System.out.printf(Locale.ROOT, "| %s | %s | %s | %s |%n", shortName(r), params(r),
          scoreText(r.path("primaryMetric"), r.path("primaryMetric").path("scoreUnit").asText()),
          r.path("secondaryMetrics").has(TOKENS) ? scoreText(r.path("secondaryMetrics").path(TOKENS), "tokens/s") : "");
    }
    System.out.println();
    System.out.println("| ratio | value |");
    System.out.println("| --- | --- |");
    printFilterRatios(byName);
    printTrainingGrowth(byName);
  }

  /** Tokens per second with the filter over without it, for each benchmark that has both. */
  private static void printFilterRatios(Map<String, JsonNode> byName) {
    byName.forEach((name, with) -> {
      JsonNode without = byName.get(name.replace(".withFilter ", ".withoutFilter "));
      if (name.contains(".withFilter ") && without != null) {
        System.out.printf(Locale.ROOT, "| %s with / without filter (tokens/s) | %.3f |%n",
            (name.substring(0, name.indexOf('.')) + " " + params(with)).trim(), tokens(with) / tokens(without));
      }
    });
  }

  /** Training time of each share over that of the smallest, beside the growth of the corpus. */
  private static void printTrainingGrowth(Map<String, JsonNode> byName) {
    JsonNode eighth = byName.get("TrainingBenchmark.train share=8");
    if (eighth == null) {
      return;
    }
    for (int share : new int[] {4, 2, 1}) {
      JsonNode r = byName.get("TrainingBenchmark.train share=" + share);
      if (r != null) {
        System.out.printf(Locale.ROOT, "| training time 1/%d over 1/8 (corpus x%d) | %.2f |%n", share, 8 / share,
            score(r) / score(eighth));
      }
    }
  }

  private static String shortName(JsonNode r) {
    String[] parts = r.path("benchmark").asText().split("\\.");
    return parts[parts.length - 2] + "." + parts[parts.length - 1];
  }

  private static String params(JsonNode r) {
    StringBuilder s = new StringBuilder();
    r.path("params").fields().forEachRemaining(e -> s.append(s.length() == 0 ? "" : " ")
        .append(e.getKey()).append('=').append(e.getValue().asText()));
    return s.toString();
  }

  /** Score and error in {@code unit} (JMH calls every auxiliary rate ops/s). */
  private static String scoreText(JsonNode metric, String unit) {
    double score = metric.path("score").asDouble();
    double error = metric.path("scoreError").asDouble(Double.NaN);
    return Double.isNaN(error)
        ? String.format(Locale.ROOT, "%,.1f %s", score, unit)
        : String.format(Locale.ROOT, "%,.1f ± %,.1f %s", score, error, unit);
  }

  private static double score(JsonNode r) {
    return r.path("primaryMetric").path("score").asDouble();
  }

  private static double tokens(JsonNode r) {
    return r.path("secondaryMetrics").path(TOKENS).path("score").asDouble();
  }
}
