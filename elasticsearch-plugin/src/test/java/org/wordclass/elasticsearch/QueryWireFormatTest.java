package org.wordclass.elasticsearch;

import static org.junit.Assert.assertEquals;

import java.io.IOException;
import java.util.List;
import java.util.Map;
import org.junit.Test;
import org.elasticsearch.common.io.stream.BytesStreamOutput;
import org.elasticsearch.common.io.stream.StreamInput;
import org.wordclass.engine.ClassRestrictedQuerySpec;
import org.wordclass.engine.ClassWeightedQuerySpec;

/**
 * Both queries survive the trip between nodes: what {@code writeTo} writes (Elasticsearch's common
 * part, boost and name, then ours) the reading constructor reads back to an equal query. A query
 * that came back different would search another word on every shard of another node.
 */
public class QueryWireFormatTest {
  @Test
  public void classRestrictedQueryKeepsWordClassesBoostAndName() throws IOException {
    ClassRestrictedQueryBuilder sent = new ClassRestrictedQueryBuilder(new ClassRestrictedQuerySpec("note", "park", List.of("NOUN", "VERB")));
    sent.boost(2.5f).queryName("parks");
    ClassRestrictedQueryBuilder received = new ClassRestrictedQueryBuilder(wire(sent));
    assertEquals(sent, received);
    assertEquals(2.5f, received.boost(), 0f);
    assertEquals("parks", received.queryName());
    assertEquals(List.of("NOUN", "VERB"), received.spec.classes());
  }

  @Test
  public void classWeightedQueryKeepsWeightsAndDefault() throws IOException {
    ClassWeightedQueryBuilder sent = new ClassWeightedQueryBuilder(ClassWeightedQuerySpec.of("note", "park", Map.of("VERB", 4.0), 0.5f));
    sent.boost(3f);
    ClassWeightedQueryBuilder received = new ClassWeightedQueryBuilder(wire(sent));
    assertEquals(sent, received);
    assertEquals(3f, received.boost(), 0f);
    assertEquals("park", received.spec.word());
  }

  private static StreamInput wire(WordClassQueryBuilder<?, ?> query) throws IOException {
    try (BytesStreamOutput out = new BytesStreamOutput()) {
      query.writeTo(out);
      return out.bytes().streamInput();
    }
  }
}
