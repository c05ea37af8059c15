package org.wordclass.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/**
 * What every subcommand shares: its output streams (those of the command line, so tests can
 * capture them) and the conventions of its exit code.
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

  /** The command's name as typed, for messages: {@code wordclass train}. */
  String qualifiedName() {
    return spec.qualifiedName();
  }
}
