package org.wordclass.engine;

import java.util.Map;
import org.apache.lucene.search.Query;
import org.wordclass.analysis.WordClassOptions;

/**
 * One of our query types with its checked parameters, as every engine adapter needs it: the name
 * it is registered under, the field it searches, its parameters as they are written back to the
 * engine's JSON, and its Lucene query over the field's analysis.
 */
public interface QuerySpec {
  /** The name engines register the query type under. */
  String name();

  /** The field searched. */
  String field();

  /** The parameters in the order they are written, with values a JSON writer takes (text, numbers, lists, maps). */
  Map<String, Object> parameters();

  /**
   * The Lucene query over a field indexed with {@code indexed} (see {@link IndexedClasses}).
   *
   * @throws IllegalArgumentException naming the field and the reason, if it cannot be searched so
   */
  Query toQuery(WordClassOptions indexed);
}
