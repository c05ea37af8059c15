package org.wordclass.analysis;

import java.util.HashMap;
import java.util.Map;
import org.apache.lucene.tests.util.LuceneTestCase;
import org.apache.lucene.tests.util.TestUtil;

public class TestWordClassAttributeImpl extends LuceneTestCase {

  public void testReflectionShowsClassIndexAndConfidence() {
    WordClassAttributeImpl att = new WordClassAttributeImpl();
    att.setWordClass("NOUN", 7, 0.75);
    Map<String, Object> expected = new HashMap<>();
    expected.put(WordClassAttribute.class.getName() + "#wordClass", "NOUN");
    expected.put(WordClassAttribute.class.getName() + "#wordClassIndex", 7);
    expected.put(WordClassAttribute.class.getName() + "#confidence", 0.75);
    TestUtil.assertAttributeReflection(att, expected);
  }

  public void testClearCopyCloneEquals() {
    WordClassAttributeImpl att = new WordClassAttributeImpl();
    assertNull(att.getWordClass());
    assertEquals(WordClassAttribute.NO_CLASS, att.getWordClassIndex());
    assertTrue(Double.isNaN(att.getConfidence()));
    WordClassAttributeImpl empty = att.clone();
    assertEquals(empty, att);
    assertEquals(empty.hashCode(), att.hashCode());

    att.setWordClass("VERB", 15, Double.NaN);
    WordClassAttributeImpl copy = new WordClassAttributeImpl();
    att.copyTo(copy);
    assertEquals(att, copy);
    assertEquals(att.hashCode(), copy.hashCode());
    assertEquals(att, att.clone());
    assertNotEquals(att, empty);

    att.clear();
    assertEquals(empty, att);
  }
}
