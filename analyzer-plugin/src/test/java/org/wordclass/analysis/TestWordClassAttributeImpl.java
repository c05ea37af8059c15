package org.wordclass.analysis;

import java.util.HashMap;
import java.util.Map;
import org.apache.lucene.tests.util.LuceneTestCase;
import org.apache.lucene.tests.util.TestUtil;

public class TestWordClassAttributeImpl extends LuceneTestCase {

  public void testReflectionShowsClassIndexConfidenceAndModel() {
    WordClassAttributeImpl att = new WordClassAttributeImpl();
    att.setWordClass("NOUN", 7, 0.75);
    att.setModelName("fr-gsd-upos");
    Map<String, Object> expected = new HashMap<>();
    expected.put(WordClassAttribute.class.getName() + "#wordClass", "NOUN");
    expected.put(WordClassAttribute.class.getName() + "#wordClassIndex", 7);
    expected.put(WordClassAttribute.class.getName() + "#confidence", 0.75);
    expected.put(WordClassAttribute.class.getName() + "#model", "fr-gsd-upos");
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
    att.setModelName("de-gsd-upos");
    WordClassAttributeImpl copy = new WordClassAttributeImpl();
    att.copyTo(copy);
    assertEquals(att, copy);
    assertEquals(att.hashCode(), copy.hashCode());
    assertEquals(att, att.clone());
    assertNotEquals(att, empty);
    WordClassAttributeImpl otherModel = att.clone();
    otherModel.setModelName("sv-talbanken-upos");
    assertNotEquals(att, otherModel);

    att.clear();
    assertEquals(empty, att);
  }
}
