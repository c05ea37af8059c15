package org.wordclass.engine;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.function.Function;

/**
 * Turns the settings an engine gives a token filter into the argument map of {@link
 * org.wordclass.analysis.WordClassFilterFactory}.
 *
 * <p>Engines that take JSON settings flatten them to dotted keys: a list {@code "keepClasses":
 * ["NOUN", "VERB"]} arrives as {@code keepClasses.0=NOUN, keepClasses.1=VERB}, an object {@code
 * "weights": {"NOUN": 2.0}} as {@code weights.NOUN=2.0}. This class joins them back into the
 * factory's own forms: list items with commas ({@code NOUN,VERB}), object entries as {@code
 * key:value} items ({@code NOUN:2.0}), in index or key order. Plain keys pass unchanged.
 *
 * <p>Nothing here knows which arguments exist: every key except the engine's own (such as {@code
 * type}) is handed to the factory, which is the one place that accepts, checks and refuses
 * arguments, so a new factory argument needs no change here.
 */
public final class FilterArguments {
  private FilterArguments() {}

  /**
   * An engine's settings as dotted keys and text values, as {@link #fromFlatSettings} takes them.
   * Engines keep a list as one list-valued key: {@code items} gives a key's values as a list (one
   * item for a plain value), {@code plain} its plain value, or null where the engine cannot tell a
   * plain value from a list of one. A list becomes {@code key.0}, {@code key.1}, ...; a plain value,
   * or a list of one item where the engine cannot tell them apart, stays one key.
   */
  public static Map<String, String> flatten(Iterable<String> keys, Function<String, List<String>> items,
      Function<String, String> plain) {
    Map<String, String> flat = new LinkedHashMap<>();
    for (String key : keys) {
      List<String> values = items.apply(key);
      String value = plain.apply(key);
      if (values.isEmpty()) {
        flat.put(key, "");
      } else if (values.size() == 1 && (value == null || values.get(0).equals(value.trim()))) {
        flat.put(key, value == null ? values.get(0) : value);
      } else {
        for (int i = 0; i < values.size(); i++) {
          flat.put(key + "." + i, values.get(i));
        }
      }
    }
    return flat;
  }

  /**
   * The factory arguments in {@code settings}, leaving out {@code engineKeys}.
   *
   * @throws IllegalArgumentException if a key is given both plain and as a list or object
   */
  public static Map<String, String> fromFlatSettings(Map<String, String> settings, Set<String> engineKeys) {
    Map<String, String> args = new LinkedHashMap<>();
    Map<String, Map<String, String>> nested = new LinkedHashMap<>();
    for (Map.Entry<String, String> setting : settings.entrySet()) {
      String key = setting.getKey();
      if (engineKeys.contains(key)) {
        continue;
      }
      int dot = key.indexOf('.');
      if (dot > 0 && dot < key.length() - 1) {
        nested.computeIfAbsent(key.substring(0, dot), k -> new TreeMap<>(FilterArguments::compareItems))
            .put(key.substring(dot + 1), setting.getValue());
      } else {
        args.put(key, setting.getValue());
      }
    }
    for (Map.Entry<String, Map<String, String>> entry : nested.entrySet()) {
      if (args.containsKey(entry.getKey())) {
        throw new IllegalArgumentException("'" + entry.getKey() + "' is given twice, as a value and as a list or object");
      }
      args.put(entry.getKey(), join(entry.getValue()));
    }
    return args;
  }

  /** List items ({@code 0, 1, ...}) joined by commas; object entries as {@code key:value} items. */
  private static String join(Map<String, String> items) {
    List<String> parts = new ArrayList<>();
    for (Map.Entry<String, String> item : items.entrySet()) {
      parts.add(isIndex(item.getKey()) ? item.getValue() : item.getKey() + ":" + item.getValue());
    }
    return String.join(",", parts);
  }

  /** Numeric list indexes in numeric order (so 10 follows 9), before any object key. */
  private static int compareItems(String a, String b) {
    boolean aIndex = isIndex(a);
    boolean bIndex = isIndex(b);
    if (aIndex && bIndex) {
      return a.length() != b.length() ? Integer.compare(a.length(), b.length()) : a.compareTo(b);
    }
    return aIndex != bIndex ? (aIndex ? -1 : 1) : a.compareTo(b);
  }

  private static boolean isIndex(String key) {
    return !key.isEmpty() && key.chars().allMatch(c -> c >= '0' && c <= '9');
  }
}
