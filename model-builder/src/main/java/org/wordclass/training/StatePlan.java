package org.wordclass.training;

import java.util.Map;
import java.util.TreeSet;
import org.wordclass.model.StateSpace;

/**
 * Which hidden state each counted raw state (a tag with the capitalisation bit) becomes: its
 * tag's state, or, when tags are split by capitalisation, one state per tag and bit that occurs.
 * States are ordered by tag, lower case first, so that the same counts give the same model.
 */
final class StatePlan {
  private final int[] stateOfRaw;
  private final StateSpace space;

  StatePlan(TagCounts counts, int[] finalTag, int tagCount, boolean splitByCapital) {
    TreeSet<Integer> sortedKeys = new TreeSet<>(); // final tag * 2 + bit
    int maxRaw = 0;
    for (Map<Integer, Integer> states : counts.wordStates().values()) {
      for (int raw : states.keySet()) {
        sortedKeys.add(finalKey(raw, finalTag, splitByCapital));
        maxRaw = Math.max(maxRaw, raw);
      }
    }
    int[] indexOfKey = new int[2 * tagCount];
    int[] tagOfState = new int[sortedKeys.size()];
    byte[] flags = new byte[sortedKeys.size()];
    int s = 0;
    for (int key : sortedKeys) {
      indexOfKey[key] = s;
      tagOfState[s] = key >> 1;
      flags[s] = (byte) ((key & 1) != 0 ? StateSpace.CAPITALISED : 0);
      s++;
    }
    stateOfRaw = new int[maxRaw + 1];
    for (int raw = 0; raw <= maxRaw; raw++) {
      stateOfRaw[raw] = indexOfKey[finalKey(raw, finalTag, splitByCapital)];
    }
    space = new StateSpace(tagCount, tagOfState, flags);
  }

  private static int finalKey(int raw, int[] finalTag, boolean splitByCapital) {
    int tag = finalTag[TagCounts.tagOfRawState(raw) + 1];
    return 2 * tag + (splitByCapital && TagCounts.isCapitalised(raw) ? 1 : 0);
  }

  int size() {
    return space.size();
  }

  StateSpace space() {
    return space;
  }

  /** The state of a counted raw state. */
  int stateOf(int raw) {
    return stateOfRaw[raw];
  }

  /** The state of a packed trigram part: 0 is the boundary, otherwise raw state + 1. */
  int stateOfKey(int key) {
    return key == 0 ? space.size() : stateOfRaw[key - 1];
  }
}
