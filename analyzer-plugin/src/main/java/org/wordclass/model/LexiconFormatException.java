package org.wordclass.model;

import java.io.IOException;

/**
 * A user lexicon (see {@link UserLexicon}) cannot be used: a line is malformed, names a class the
 * model does not have, or lists a word a second time. The message reads {@code
 * file:line: reason}, or {@code file: reason} when the problem concerns the whole file (line 0),
 * so that an editor or a log reader can jump to it.
 */
public class LexiconFormatException extends IOException {
  private final String file;
  private final int line;
  private final String reason;

  public LexiconFormatException(String file, int line, String reason) {
    super(line > 0 ? file + ":" + line + ": " + reason : file + ": " + reason);
    this.file = file;
    this.line = line;
    this.reason = reason;
  }

  public String file() {
    return file;
  }

  /** The 1-based line, or 0 for the whole file. */
  public int line() {
    return line;
  }

  /** What is wrong, without the file and line. */
  public String reason() {
    return reason;
  }
}
