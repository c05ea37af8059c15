package org.wordclass.analysis;

import java.util.Arrays;
import org.apache.lucene.util.AttributeImpl;
import org.apache.lucene.util.AttributeReflector;

/** Default implementation of {@link WrittenTogetherAttribute}: a reusable char buffer and a length. */
public class WrittenTogetherAttributeImpl extends AttributeImpl implements WrittenTogetherAttribute {
  private char[] gap = new char[4];
  private int length;

  @Override
  public boolean continuesRun() {
    return length > 0;
  }

  @Override
  public char[] gapBuffer() {
    return gap;
  }

  @Override
  public int gapLength() {
    return length;
  }

  @Override
  public void setGap(char[] buffer, int offset, int length) {
    if (length > gap.length) {
      gap = new char[Math.max(length, 2 * gap.length)];
    }
    System.arraycopy(buffer, offset, gap, 0, length);
    this.length = length;
  }

  @Override
  public void clear() {
    length = 0;
  }

  @Override
  public void copyTo(AttributeImpl target) {
    ((WrittenTogetherAttribute) target).setGap(gap, 0, length);
  }

  @Override
  public WrittenTogetherAttributeImpl clone() {
    WrittenTogetherAttributeImpl copy = (WrittenTogetherAttributeImpl) super.clone();
    // the clone must not share the buffer, or setting one would change the other
    copy.gap = gap.clone();
    return copy;
  }

  @Override
  public void reflectWith(AttributeReflector reflector) {
    reflector.reflect(WrittenTogetherAttribute.class, "gap", new String(gap, 0, length));
  }

  @Override
  public boolean equals(Object other) {
    if (this == other) {
      return true;
    }
    if (!(other instanceof WrittenTogetherAttributeImpl that)) {
      return false;
    }
    return Arrays.equals(gap, 0, length, that.gap, 0, that.length);
  }

  @Override
  public int hashCode() {
    int h = length;
    for (int i = 0; i < length; i++) {
      h = 31 * h + gap[i];
    }
    return h;
  }
}
