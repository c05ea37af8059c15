package org.wordclass.analysis;

import java.util.Objects;
import org.apache.lucene.util.AttributeImpl;
import org.apache.lucene.util.AttributeReflector;

/** Default implementation of {@link WordClassAttribute}; three fields, no allocation to set. */
public class WordClassAttributeImpl extends AttributeImpl implements WordClassAttribute {
  private String name;
  private int index = NO_CLASS;
  private double confidence = Double.NaN;

  @Override
  public String getWordClass() {
    return name;
  }

  @Override
  public int getWordClassIndex() {
    return index;
  }

  @Override
  public double getConfidence() {
    return confidence;
  }

  @Override
  public void setWordClass(String name, int index, double confidence) {
    this.name = name;
    this.index = index;
    this.confidence = confidence;
  }

  @Override
  public void clear() {
    setWordClass(null, NO_CLASS, Double.NaN);
  }

  @Override
  public void copyTo(AttributeImpl target) {
    ((WordClassAttribute) target).setWordClass(name, index, confidence);
  }

  @Override
  public WordClassAttributeImpl clone() {
    return (WordClassAttributeImpl) super.clone();
  }

  @Override
  public void reflectWith(AttributeReflector reflector) {
    reflector.reflect(WordClassAttribute.class, "wordClass", name);
    reflector.reflect(WordClassAttribute.class, "wordClassIndex", index);
    reflector.reflect(WordClassAttribute.class, "confidence", confidence);
  }

  @Override
  public boolean equals(Object other) {
    if (this == other) {
      return true;
    }
    if (!(other instanceof WordClassAttributeImpl)) {
      return false;
    }
    WordClassAttributeImpl that = (WordClassAttributeImpl) other;
    // compare bits so that NaN equals NaN, as a clone must equal its original
    return index == that.index
        && Objects.equals(name, that.name)
        && Double.doubleToLongBits(confidence) == Double.doubleToLongBits(that.confidence);
  }

  @Override
  public int hashCode() {
    return (31 * Objects.hashCode(name) + index) * 31 + Double.hashCode(confidence);
  }
}
