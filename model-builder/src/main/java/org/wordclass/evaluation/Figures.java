package org.wordclass.evaluation;

import java.util.Locale;

/**
 * Figures for people to read: one that is not defined (NaN, such as the accuracy on unknown
 * words when there were none) is printed as {@code none}, never as {@code NaN}, as the JSON
 * reports write it as {@code null}.
 */
public final class Figures {
  /** What an undefined figure reads as. */
  public static final String NONE = "none";

  private Figures() {}

  /** {@code value} in {@code format} (such as {@code %.4f}), or {@link #NONE}. */
  public static String format(String format, double value) {
    return Double.isNaN(value) ? NONE : String.format(Locale.ROOT, format, value);
  }
}
