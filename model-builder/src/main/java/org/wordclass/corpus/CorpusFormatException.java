package org.wordclass.corpus;

/**
 * A corpus file cannot be read as the format it claims to be. The message names the file, the
 * line (1-based; 0 when the problem concerns the whole file) and the problem.
 */
public class CorpusFormatException extends RuntimeException {
  private final String file;
  private final long line;

  public CorpusFormatException(String file, long line, String problem) {
    super(line > 0 ? file + ":" + line + ": " + problem : file + ": " + problem);
    this.file = file;
    this.line = line;
  }

  public String file() {
    return file;
  }

  public long line() {
    return line;
  }
}
