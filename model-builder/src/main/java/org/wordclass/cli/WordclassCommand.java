package org.wordclass.cli;

import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ScopeType;
import picocli.CommandLine.Spec;

/**
 * The {@code wordclass} command line: demonstrates class-aware search, trains, evaluates,
 * cross-validates and inspects word-class models and tags text with them. Every subcommand is registered in {@link #subcommands()}, the
 * one place a new one is added.
 */
@Command(
    name = "wordclass",
    mixinStandardHelpOptions = true,
    versionProvider = BuildInfo.class,
    description = "Builds, checks and applies hidden Markov models of word classes (part-of-speech tags).",
    synopsisSubcommandLabel = "COMMAND")
public final class WordclassCommand implements Callable<Integer> {
  /** Declared once here and inherited by every subcommand, so it may follow any of them. */
  @Option(names = "--verbose", scope = ScopeType.INHERIT,
      description = "On failure, print the full stack trace as well as the one-line message.")
  boolean verbose;

  @Spec
  CommandSpec spec;

  /** The subcommands, in the order the help lists them. */
  static List<Object> subcommands() {
    return List.of(
        new DemoCommand(),
        new TrainCommand(),
        new EvaluateCommand(),
        new CrossValidateCommand(),
        new BuildPackCommand(),
        new LearningCurveCommand(),
        new InspectCommand(),
        new TagCommand(),
        new AdaptCommand());
  }

  /** A command line ready to execute, with the error handling and defaults of every subcommand. */
  public static CommandLine newCommandLine() {
    CommandLine cli = new CommandLine(new WordclassCommand());
    for (Object sub : subcommands()) {
      cli.addSubcommand(sub);
    }
    Failures failures = new Failures();
    cli.setCaseInsensitiveEnumValuesAllowed(true)
        .setDefaultValueProvider(new TrainingOptionsMixin.Defaults())
        .setExecutionExceptionHandler(failures)
        .setExitCodeExceptionMapper(failures)
        .setParameterExceptionHandler(failures);
    return cli;
  }

  /** Without a subcommand: show what there is to choose from, as for any incomplete command line. */
  @Override
  public Integer call() {
    spec.commandLine().usage(spec.commandLine().getErr());
    return spec.exitCodeOnInvalidInput();
  }

  public static void main(String[] args) {
    // the PNG report draws with Java2D; no display is needed or wanted
    System.setProperty("java.awt.headless", "true");
    System.exit(newCommandLine().execute(args));
  }
}
