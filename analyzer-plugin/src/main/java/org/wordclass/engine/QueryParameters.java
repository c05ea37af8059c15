package org.wordclass.engine;

import java.util.List;
import java.util.Locale;
import org.wordclass.analysis.PayloadEncoding;

/**
 * The parameters both query types share, by the names engines parse them under, and the checks
 * of query parameters; each failure names the parameter.
 */
public final class QueryParameters {
  /** Parameter naming the field to search. */
  public static final String FIELD = "field";
  /** Parameter giving the word, as the index holds it. */
  public static final String WORD = "word";

  private QueryParameters() {}

  static String requireText(String value, String parameter) {
    if (value == null || value.isEmpty()) {
      throw new IllegalArgumentException("'" + parameter + "' is required and must not be empty");
    }
    return value;
  }

  static List<String> requireNames(List<String> names, String parameter) {
    if (names == null || names.isEmpty()) {
      throw new IllegalArgumentException("'" + parameter + "' must list at least one word class");
    }
    for (String name : names) {
      requireText(name, parameter);
    }
    return List.copyOf(names);
  }

  /** Lower-case name of an encoding, as the filter's {@code payload} argument spells it. */
  static String argumentName(PayloadEncoding payload) {
    return payload.name().toLowerCase(Locale.ROOT);
  }
}
