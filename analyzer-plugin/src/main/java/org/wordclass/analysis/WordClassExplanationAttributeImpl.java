package org.wordclass.analysis;

import java.util.Arrays;
import java.util.Objects;
import org.apache.lucene.util.AttributeImpl;
import org.apache.lucene.util.AttributeReflector;
import org.wordclass.decoding.CandidateSource;
import org.wordclass.model.WordShape;

/**
 * Default implementation of {@link WordClassExplanationAttribute}: four references, a flag and an array of
 * class probabilities that is reused from token to token (copies and clones copy it).
 */
public class WordClassExplanationAttributeImpl extends AttributeImpl implements WordClassExplanationAttribute {
  private static final double[] NONE = new double[0];

  private CandidateSource source;
  private String lookedUpAs;
  private String ending;
  private WordShape shape;
  private boolean opensSentence;
  private double[] probabilities = NONE;
  private int classCount;

  @Override
  public CandidateSource getSource() {
    return source;
  }

  @Override
  public String getLookedUpAs() {
    return lookedUpAs;
  }

  @Override
  public String getEnding() {
    return ending;
  }

  @Override
  public WordShape getShape() {
    return shape;
  }

  @Override
  public boolean opensSentence() {
    return opensSentence;
  }

  @Override
  public void setOpensSentence(boolean opensSentence) {
    this.opensSentence = opensSentence;
  }

  @Override
  public int getClassCount() {
    return classCount;
  }

  @Override
  public double getClassProbability(int classIndex) {
    Objects.checkIndex(classIndex, classCount);
    return probabilities[classIndex];
  }

  @Override
  public void setSource(CandidateSource source, String lookedUpAs, String ending, WordShape shape) {
    this.source = source;
    this.lookedUpAs = lookedUpAs;
    this.ending = ending;
    this.shape = shape;
  }

  @Override
  public double[] classProbabilities(int classCount) {
    if (probabilities.length < classCount) {
      probabilities = new double[classCount];
    }
    this.classCount = classCount;
    return probabilities;
  }

  @Override
  public void clear() {
    setSource(null, null, null, null);
    opensSentence = false;
    classCount = 0;
  }

  @Override
  public void copyTo(AttributeImpl target) {
    WordClassExplanationAttribute other = (WordClassExplanationAttribute) target;
    other.setSource(source, lookedUpAs, ending, shape);
    other.setOpensSentence(opensSentence);
    System.arraycopy(probabilities, 0, other.classProbabilities(classCount), 0, classCount);
  }

  @Override
  public WordClassExplanationAttributeImpl clone() {
    WordClassExplanationAttributeImpl copy = (WordClassExplanationAttributeImpl) super.clone();
    copy.probabilities = classCount == 0 ? NONE : Arrays.copyOf(probabilities, classCount);
    return copy;
  }

  @Override
  public void reflectWith(AttributeReflector reflector) {
    reflector.reflect(WordClassExplanationAttribute.class, "source", source);
    reflector.reflect(WordClassExplanationAttribute.class, "lookedUpAs", lookedUpAs);
    reflector.reflect(WordClassExplanationAttribute.class, "ending", ending);
    reflector.reflect(WordClassExplanationAttribute.class, "shape", shape);
    reflector.reflect(WordClassExplanationAttribute.class, "opensSentence", opensSentence);
    reflector.reflect(WordClassExplanationAttribute.class, "classProbabilities", Arrays.copyOf(probabilities, classCount));
  }

  @Override
  public boolean equals(Object other) {
    if (this == other) {
      return true;
    }
    if (!(other instanceof WordClassExplanationAttributeImpl that)) {
      return false;
    }
    return source == that.source
        && shape == that.shape
        && opensSentence == that.opensSentence
        && Objects.equals(lookedUpAs, that.lookedUpAs)
        && Objects.equals(ending, that.ending)
        && Arrays.equals(probabilities, 0, classCount, that.probabilities, 0, that.classCount);
  }

  @Override
  public int hashCode() {
    int h = Objects.hash(source, lookedUpAs, ending, shape, opensSentence);
    for (int i = 0; i < classCount; i++) {
      h = 31 * h + Double.hashCode(probabilities[i]);
    }
    return h;
  }
}
