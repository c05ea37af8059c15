package org.wordclass.analysis;

import java.util.Objects;
import org.apache.lucene.util.AttributeImpl;
import org.apache.lucene.util.AttributeReflector;

/** Default implementation of {@link WordClassAttribute}; four fields, no allocation to set. */
public class WordClassAttributeImpl extends AttributeImpl implements WordClassAttribute {
  private String name;
  private int index = NO_CLASS;
  private double confidence = Double.NaN;
  private String modelName;

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
  public String getModelName() {
    return modelName;
  }

  @Override
  public void setModelName(String modelName) {
    this.modelName = modelName;
  }

  @Override
  public void clear() {
    setWordClass(null, NO_CLASS, Double.NaN);
    modelName = null;
  }

  @Override
  public void copyTo(AttributeImpl target) {
    WordClassAttribute other = (WordClassAttribute) target;
    other.setWordClass(name, index, confidence);
    other.setModelName(modelName);
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
    reflector.reflect(WordClassAttribute.class, "model", modelName);
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
        && Objects.equals(modelName, that.modelName)
        && Double.doubleToLongBits(confidence) == Double.doubleToLongBits(that.confidence);
  }

  @Override
  public int hashCode() {
    return ((31 * Objects.hashCode(name) + index) * 31 + Double.hashCode(confidence)) * 31 + Objects.hashCode(modelName);
  }
}
