package org.wordclass.model;

import java.io.IOException;
import java.util.Arrays;
import org.apache.lucene.store.DataInput;
import org.apache.lucene.store.DataOutput;

/**
 * The hidden states of a model and the word class each one stands for. In the plainest model
 * every class is one state. A model may split a class into several states that share its name
 * but not its transitions: by an observed cue (a capitalised word in mid-sentence, Brants 2000)
 * so that, say, nouns written with a capital are followed differently from others. Users only
 * ever see classes; decoders work on states.
 *
 * <p>Immutable.
 */
public final class StateSpace {
  /** Flag of a state entered only by words written with a capital letter in mid-sentence. */
  public static final int CAPITALISED = 1;

  private final int[] tagOfState;
  private final byte[] flags;
  private final int[][] statesOfTag;

  public StateSpace(int tagCount, int[] tagOfState, byte[] flags) {
    if (tagOfState.length == 0 || tagOfState.length != flags.length || tagOfState.length > Short.MAX_VALUE - 1) {
      throw new IllegalArgumentException("a state space needs one flag per state and at most 32766 states");
    }
    this.tagOfState = tagOfState.clone();
    this.flags = flags.clone();
    int[] perTag = new int[tagCount];
    for (int s = 0; s < tagOfState.length; s++) {
      if (tagOfState[s] < 0 || tagOfState[s] >= tagCount) {
        throw new IllegalArgumentException("state " + s + " names tag " + tagOfState[s] + " of " + tagCount);
      }
      perTag[tagOfState[s]]++;
    }
    statesOfTag = new int[tagCount][];
    for (int t = 0; t < tagCount; t++) {
      statesOfTag[t] = new int[perTag[t]];
    }
    int[] filled = new int[tagCount];
    for (int s = 0; s < tagOfState.length; s++) {
      int t = tagOfState[s];
      statesOfTag[t][filled[t]++] = s;
    }
  }

  /** One state per tag, in tag order. */
  public static StateSpace oneStatePerTag(int tagCount) {
    int[] tags = new int[tagCount];
    Arrays.setAll(tags, i -> i);
    return new StateSpace(tagCount, tags, new byte[tagCount]);
  }

  public int size() {
    return tagOfState.length;
  }

  public int tagCount() {
    return statesOfTag.length;
  }

  public int tagOf(int state) {
    return tagOfState[state];
  }

  public int flags(int state) {
    return flags[state];
  }

  /** States of {@code tag}, ascending. */
  public int[] statesOf(int tag) {
    return statesOfTag[tag];
  }

  /** Whether some state carries {@code flag}, that is whether the model uses that cue at all. */
  public boolean uses(int flag) {
    for (byte f : flags) {
      if ((f & flag) != 0) {
        return true;
      }
    }
    return false;
  }

  /** Writes the states in the model file's layout ({@code docs/model-format.md}): their count, then each one's tag and flags. */
  void writeTo(DataOutput out) throws IOException {
    out.writeVInt(tagOfState.length);
    for (int s = 0; s < tagOfState.length; s++) {
      out.writeVInt(tagOfState[s]);
      out.writeByte(flags[s]);
    }
  }

  /**
   * Reads states {@link #writeTo} wrote, checking the declared count against the bytes left
   * before allocating and every tag against {@code tagCount}.
   */
  static StateSpace readFrom(DataInput in, ModelFile.Limits limits, int tagCount) throws IOException {
    int count = limits.count(ModelFile.vInt(in), 2, "states");
    int[] tagOfState = new int[count];
    byte[] flags = new byte[count];
    for (int s = 0; s < count; s++) {
      tagOfState[s] = ModelFile.tagIndex(ModelFile.vInt(in), tagCount);
      flags[s] = in.readByte();
    }
    return new StateSpace(tagCount, tagOfState, flags);
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof StateSpace other && Arrays.equals(tagOfState, other.tagOfState) && Arrays.equals(flags, other.flags);
  }

  @Override
  public int hashCode() {
    return 31 * Arrays.hashCode(tagOfState) + Arrays.hashCode(flags);
  }
}
