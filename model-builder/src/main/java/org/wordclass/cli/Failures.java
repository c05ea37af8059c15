package org.wordclass.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.NoSuchFileException;
import org.wordclass.corpus.CorpusFormatException;
import picocli.CommandLine;
import picocli.CommandLine.IExecutionExceptionHandler;
import picocli.CommandLine.IExitCodeExceptionMapper;
import picocli.CommandLine.IParameterExceptionHandler;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.ParseResult;

/**
 * Turns what went wrong into one line on standard error and an exit code, through picocli's
 * hooks: bad input (a malformed corpus or model, a missing or unreadable file) exits with {@link
 * #INPUT_ERROR}, a mistake on the command line with picocli's usage code, anything else with
 * picocli's software-error code. The stack trace is shown only with {@code --verbose}, because
 * for input errors it says nothing the message does not.
 */
final class Failures implements IExecutionExceptionHandler, IExitCodeExceptionMapper, IParameterExceptionHandler {
  /** Exit code when an input file cannot be used. */
  static final int INPUT_ERROR = 2;

  @Override
  public int handleExecutionException(Exception ex, CommandLine cmd, ParseResult parsed) {
    Throwable cause = unwrap(ex);
    PrintWriter err = cmd.getErr();
    err.println(cmd.getCommandSpec().qualifiedName() + ": " + message(cause));
    if (verbose(parsed)) {
      cause.printStackTrace(err);
    } else if (!isInputError(cause)) {
      err.println("(this looks like a bug; run again with --verbose for the stack trace)");
    }
    err.flush();
    return cmd.getExitCodeExceptionMapper().getExitCode(ex);
  }

  @Override
  public int getExitCode(Throwable ex) {
    return isInputError(unwrap(ex)) ? INPUT_ERROR : CommandLine.ExitCode.SOFTWARE;
  }

  @Override
  public int handleParseException(ParameterException ex, String[] args) {
    CommandLine cmd = ex.getCommandLine();
    String name = cmd.getCommandSpec().qualifiedName();
    cmd.getErr().println(name + ": " + ex.getMessage() + " (see '" + name + " --help')");
    cmd.getErr().flush();
    return cmd.getCommandSpec().exitCodeOnInvalidInput();
  }

  private static boolean verbose(ParseResult parsed) {
    for (ParseResult p = parsed; p != null; p = p.subcommand()) {
      if (p.hasMatchedOption("--verbose")) {
        return true;
      }
    }
    return false;
  }

  /** Corpus iteration cannot throw checked exceptions, so it wraps them; the cause is the news. */
  private static Throwable unwrap(Throwable ex) {
    return ex instanceof UncheckedIOException && ex.getCause() != null ? ex.getCause() : ex;
  }

  private static boolean isInputError(Throwable ex) {
    return ex instanceof CorpusFormatException || ex instanceof IOException;
  }

  /** A message that names the file and the problem; the exception's own text where it already does. */
  static String message(Throwable ex) {
    if (ex instanceof NoSuchFileException e) {
      return e.getFile() + ": no such file";
    }
    if (ex instanceof AccessDeniedException e) {
      return e.getFile() + ": permission denied";
    }
    if (ex instanceof FileSystemException e) {
      return e.getFile() + ": " + (e.getReason() != null ? e.getReason() : e.getClass().getSimpleName());
    }
    if (isInputError(ex)) {
      return ex.getMessage();
    }
    return "internal error: " + ex;
  }
}
