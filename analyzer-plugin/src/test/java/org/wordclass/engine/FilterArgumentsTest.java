package org.wordclass.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;

/** Engine settings, as JSON engines flatten them, become the factory's own argument forms. */
class FilterArgumentsTest {
  private static Map<String, String> flat(String... pairs) {
    Map<String, String> settings = new LinkedHashMap<>();
    for (int i = 0; i < pairs.length; i += 2) {
      settings.put(pairs[i], pairs[i + 1]);
    }
    return settings;
  }

  @Test
  void listsJoinWithCommasInIndexOrder() {
    Map<String, String> settings = flat("type", "wordClass");
    for (int i = 0; i < 12; i++) {
      settings.put("keepClasses." + i, "C" + i);
    }
    assertEquals(Map.of("keepClasses", "C0,C1,C2,C3,C4,C5,C6,C7,C8,C9,C10,C11"),
        FilterArguments.fromFlatSettings(settings, Set.of("type")));
  }

  @Test
  void objectsBecomeClassColonWeightItems() {
    Map<String, String> args = FilterArguments.fromFlatSettings(
        flat("payload", "weight", "weights.VERB", "1.5", "weights.NOUN", "2.0"), Set.of());
    assertEquals(Map.of("payload", "weight", "weights", "NOUN:2.0,VERB:1.5"), args);
  }

  @Test
  void argumentsUnknownHerePassThroughUnchanged() {
    Map<String, String> args = FilterArguments.fromFlatSettings(flat("type", "wordClass", "language", "en", "bogus", "1"),
        Set.of("type"));
    assertEquals(Map.of("language", "en", "bogus", "1"), args);
  }

  @Test
  void aKeyGivenPlainAndAsAListIsRefused() {
    IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
        () -> FilterArguments.fromFlatSettings(flat("keepClasses", "NOUN", "keepClasses.0", "VERB"), Set.of()));
    assertEquals("'keepClasses' is given twice, as a value and as a list or object", e.getMessage());
  }

  @Test
  void listSettingsBecomeIndexedKeysAndPlainValuesStayOneKey() {
    Map<String, List<String>> lists = Map.of(
        "keepClasses", List.of("NOUN", "VERB"), "order", List.of("2"), "separator", List.of());
    Map<String, String> plain = Map.of("order", "2");
    List<String> keys = List.of("keepClasses", "order", "separator");
    // an engine that tells a plain value from a list of one (OpenSearch)
    assertEquals(flat("keepClasses.0", "NOUN", "keepClasses.1", "VERB", "order", "2", "separator", ""),
        FilterArguments.flatten(keys, lists::get, plain::get));
    // a list of one item is a plain value to the factory where the engine cannot tell (Elasticsearch)
    assertEquals(flat("keepClasses.0", "NOUN", "keepClasses.1", "VERB", "order", "2", "separator", ""),
        FilterArguments.flatten(keys, lists::get, key -> null));
    // a one-item list that is not the plain value stays a list
    assertEquals(flat("keepClasses.0", "NOUN"),
        FilterArguments.flatten(List.of("keepClasses"), key -> List.of("NOUN"), key -> "[NOUN]"));
  }
}
