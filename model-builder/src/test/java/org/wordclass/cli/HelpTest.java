package org.wordclass.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import picocli.CommandLine;

/** Every command answers {@code --help}, and the version comes from the build. */
class HelpTest {
  @Test
  void everyCommandHasHelp() {
    var subcommands = WordclassCommand.newCommandLine().getSubcommands();
    assertFalse(subcommands.isEmpty());
    for (String name : subcommands.keySet()) {
      Cli.Result r = Cli.run(name, "--help");
      assertEquals(0, r.exitCode(), r::toString);
      assertTrue(r.out().startsWith("Usage: wordclass " + name), r::toString);
    }
    Cli.Result top = Cli.run("--help");
    assertEquals(0, top.exitCode(), top::toString);
    assertTrue(top.out().contains("cross-validate"), top::toString);
  }

  @Test
  void trainingDefaultsAreShownFromTheCore() {
    Cli.Result r = Cli.run("train", "--help");
    String expected = "Default: " + org.wordclass.training.TrainingOptions.DEFAULTS.maxSuffixLength() + ".";
    assertTrue(r.out().replaceAll("\\s+", " ").contains("counts. " + expected), r::toString);
  }

  @Test
  void versionIsTheProjectVersion() {
    Cli.Result r = Cli.run("--version");
    assertEquals(0, r.exitCode());
    assertTrue(r.out().startsWith("wordclass "), r::toString);
    assertFalse(r.out().contains("${"), "the version resource must be filtered: " + r);
  }

  @Test
  void unknownCommandIsAUsageError() {
    Cli.Result r = Cli.run("frobnicate");
    assertEquals(CommandLine.ExitCode.USAGE, r.exitCode(), r::toString);
  }
}
