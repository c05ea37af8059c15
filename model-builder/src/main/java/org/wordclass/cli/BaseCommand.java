package org.wordclass.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/**
 * What every subcommand shares: its output streams, which are those of the command line so that
 * tests can capture them. Failures are thrown, and {@link Failures} turns them into exit codes.
 */
abstract class BaseCommand implements Callable<Integer> {
  static final int OK = 0;

  @Spec
  CommandSpec spec;

  PrintWriter out() {
    return spec.commandLine().getOut();
  }

  PrintWriter err() {
    return spec.commandLine().getErr();
  }
}
