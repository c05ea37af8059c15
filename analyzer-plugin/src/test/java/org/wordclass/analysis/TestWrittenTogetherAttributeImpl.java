package org.wordclass.analysis;

import java.util.Map;
import org.apache.lucene.tests.util.LuceneTestCase;
import org.apache.lucene.tests.util.TestUtil;

/** The run mark's attribute contract, as Lucene's own attributes keep it (common practice). */
public class TestWrittenTogetherAttributeImpl extends LuceneTestCase {

  public void testReflectionShowsTheGap() {
    WrittenTogetherAttributeImpl att = new WrittenTogetherAttributeImpl();
    att.setGap("x://y".toCharArray(), 1, 3);
    TestUtil.assertAttributeReflection(att, Map.of(WrittenTogetherAttribute.class.getName() + "#gap", "://"));
    att.clear();
    TestUtil.assertAttributeReflection(att, Map.of(WrittenTogetherAttribute.class.getName() + "#gap", ""));
  }

  public void testClearCopyCloneEquals() {
    WrittenTogetherAttributeImpl att = new WrittenTogetherAttributeImpl();
    assertFalse(att.continuesRun());
    assertEquals(0, att.gapLength());
    WrittenTogetherAttributeImpl empty = att.clone();
    assertEquals(empty, att);
    assertEquals(empty.hashCode(), att.hashCode());

    // longer than the first buffer, so that it grows
    char[] gap = "/@:._=&?".toCharArray();
    att.setGap(gap, 0, gap.length);
    assertTrue(att.continuesRun());
    assertEquals("/@:._=&?", new String(att.gapBuffer(), 0, att.gapLength()));
    WrittenTogetherAttributeImpl copy = new WrittenTogetherAttributeImpl();
    att.copyTo(copy);
    assertEquals(att, copy);
    assertEquals(att.hashCode(), copy.hashCode());
    assertNotEquals(att, empty);

    WrittenTogetherAttributeImpl clone = att.clone();
    assertEquals(att, clone);
    clone.setGap(new char[] {'@'}, 0, 1);
    assertEquals("a clone has a buffer of its own", "/@:._=&?", new String(att.gapBuffer(), 0, att.gapLength()));
    assertNotEquals(att, clone);

    att.clear();
    assertFalse(att.continuesRun());
    assertEquals(empty, att);
  }
}
