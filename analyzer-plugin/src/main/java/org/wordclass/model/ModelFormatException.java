package org.wordclass.model;

import java.io.IOException;

/**
 * A model file could not be used: it is corrupt, truncated, of a foreign format, of a newer
 * format version than this code reads, or its contents are inconsistent. The message names the
 * file and the problem.
 */
public class ModelFormatException extends IOException {
  public ModelFormatException(String message) {
    super(message);
  }

  public ModelFormatException(String message, Throwable cause) {
    super(message, cause);
  }
}
