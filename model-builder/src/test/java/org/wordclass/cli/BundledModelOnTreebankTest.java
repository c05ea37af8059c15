package org.wordclass.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wordclass.testing.Corpora;

/** The bundled model, evaluated through the command line on the English treebank's dev set. */
class BundledModelOnTreebankTest {
  @TempDir
  Path dir;

  @Test
  void evaluateOfTheBundledModelIsAccurate() throws Exception {
    Path dev = Corpora.ewtDev();
    Path json = dir.resolve("dev.json");
    Cli.Result r = Cli.run("evaluate", "--corpus", dev.toString(), "--report", json.toString());
    assertEquals(0, r.exitCode(), r::toString);
    double accuracy = new ObjectMapper().readTree(json.toFile()).get("accuracy").asDouble();
    assertTrue(accuracy > 0.85, r::toString);
  }
}
