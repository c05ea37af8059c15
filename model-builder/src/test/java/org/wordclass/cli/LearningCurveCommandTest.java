package org.wordclass.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.awt.image.BufferedImage;
import java.nio.file.Path;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wordclass.testing.Corpora;

/** {@code learning-curve} on UD English EWT (../shared/corpora): more tagged data, better accuracy. */
class LearningCurveCommandTest {
  @TempDir
  Path dir;

  @Test
  void accuracyGrowsWithTheTrainingSetAndIsDrawn() throws Exception {
    Path json = dir.resolve("curve.json");
    Path png = dir.resolve("curve.png");
    Cli.Result r = Cli.run("learning-curve", "--corpus", Corpora.ewtDev().toString(),
        "--eval", Corpora.ewtTest().toString(), "--sizes", "100,400,1600", "--report", json.toString(),
        "--png", png.toString());
    assertEquals(0, r.exitCode(), r::toString);
    JsonNode points = new ObjectMapper().readTree(json.toFile()).get("points");
    assertEquals(3, points.size(), r::toString);
    double previous = 0;
    for (JsonNode p : points) {
      double accuracy = p.get("accuracy").asDouble();
      assertTrue(accuracy > previous, "accuracy should grow with the data: " + r.out());
      previous = accuracy;
    }
    BufferedImage image = ImageIO.read(png.toFile());
    assertTrue(image.getWidth() >= 600 && image.getHeight() >= 400);
  }
}
