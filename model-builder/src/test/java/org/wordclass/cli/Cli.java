package org.wordclass.cli;

import java.io.PrintWriter;
import java.io.StringWriter;
import picocli.CommandLine;

/** Runs the command line in this process with captured standard output and error. */
final class Cli {
  /** Exit code and what the command printed. */
  record Result(int exitCode, String out, String err) {
    @Override
    public String toString() {
      return "exit " + exitCode + "\n--- out\n" + out + "--- err\n" + err;
    }
  }

  private Cli() {}

  static Result run(String... args) {
    CommandLine cli = WordclassCommand.newCommandLine();
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    cli.setOut(new PrintWriter(out, true));
    cli.setErr(new PrintWriter(err, true));
    int code = cli.execute(args);
    return new Result(code, out.toString(), err.toString());
  }
}
