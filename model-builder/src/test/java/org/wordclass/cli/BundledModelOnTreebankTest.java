package org.wordclass.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wordclass.testing.Corpora;

/**
 * The bundled model, evaluated through the command line on the English treebank's test set
 * (UD English EWT, ../shared/corpora) the way a search engineer gets it: the raw sentences run
 * through the default chain (the sentenceStandard tokenizer: Lucene's standard tokenizer's tokens, sentence by sentence), the emitted tokens scored against the
 * gold tags they cover.
 */
class BundledModelOnTreebankTest {
  @TempDir
  Path dir;

  @Test
  void bundledModelTagsTheDefaultChainsTokensAccurately() throws Exception {
    Path test = Corpora.ewtTest();
    Path json = dir.resolve("test.json");
    Cli.Result r = Cli.run("evaluate", "--corpus", test.toString(), "--through-analyzer", "--report", json.toString());
    assertEquals(0, r.exitCode(), r::toString);
    JsonNode report = new ObjectMapper().readTree(json.toFile());
    assertTrue(report.get("accuracy").asDouble() >= 0.90, r::toString);
    assertTrue(report.get("tokenSource").asText().contains("sentenceStandard"), r::toString);
    assertTrue(report.get("goldTokens").get("tokens").asLong() > report.get("tokens").asLong(),
        "the standard tokenizer drops punctuation, so it emits fewer tokens than the treebank has words");
  }
}
