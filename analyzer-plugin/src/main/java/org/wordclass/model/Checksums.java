package org.wordclass.model;

import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/** SHA-256 of file contents, the identity under which models and lexicons are cached and recorded. */
public final class Checksums {
  private Checksums() {}

  /** Lower-case hex SHA-256 of {@code bytes}. */
  public static String sha256(byte[] bytes) {
    try {
      return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
    } catch (NoSuchAlgorithmException e) {
      throw new AssertionError("every JVM has SHA-256", e);
    }
  }
}
