package org.wordclass.model;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.api.Test;

/**
 * Lookups in the lexicon's hash table, from Strings and from slices of char buffers, checked
 * against the definition (a word is found exactly when it was given) and, for many words, against
 * java.util.HashSet.
 */
class LexiconTest {
  private static Lexicon.Entry entry(String word, int... tags) {
    float[] emissions = new float[tags.length];
    for (int k = 0; k < tags.length; k++) {
      emissions[k] = -1.5f - k;
    }
    return new Lexicon.Entry(word, tags, emissions);
  }

  private static final Lexicon SMALL = new Lexicon(List.of(entry("run", 1, 2), entry("the", 0), entry("Zürich", 1), entry("a", 0)));

  @Test
  void findsWordsInsideALargerBufferAtAnyOffset() {
    char[] buf = "xxrunZürichthe".toCharArray();
    assertEquals(0, SMALL.lookup(buf, 2, 3));
    assertEquals(2, SMALL.lookup(buf, 5, 6));
    assertEquals(1, SMALL.lookup(buf, 11, 3));
    assertEquals(-1, SMALL.lookup(buf, 1, 3), "'xru'");
    assertEquals(-1, SMALL.lookup(buf, 2, 4), "'runZ'");
  }

  @Test
  void missingWordsAreNotFound() {
    for (String word : new String[] {"", "ru", "runs", "Run", "The", "zurich", "aa", "b"}) {
      assertEquals(-1, SMALL.lookup(word), word);
    }
  }

  @Test
  void emptyLexiconFindsNothing() {
    Lexicon empty = new Lexicon(List.of());
    assertEquals(0, empty.size());
    assertEquals(-1, empty.lookup("run"));
    assertEquals(-1, empty.lookup(""));
  }

  @Test
  void theSameTableFindsTheLowerCaseFormOfAToken() {
    char[] buf = "xxRUN THE ZÜRICH".toCharArray();
    assertEquals(SMALL.lookup("run"), SMALL.lookupLowerCased(buf, 2, 3));
    assertEquals(SMALL.lookup("the"), SMALL.lookupLowerCased(buf, 6, 3));
    // the lower-case form of ZÜRICH is zürich, which the lexicon does not hold: Zürich is not it
    assertEquals(-1, SMALL.lookupLowerCased(buf, 10, 6));
    assertTrue(SMALL.isLowerCase(SMALL.lookup("run")));
    assertFalse(SMALL.isLowerCase(SMALL.lookup("Zürich")));
  }

  @Test
  void tagsAndEmissionsAreKeptPerWord() {
    int run = SMALL.lookup("run");
    assertEquals(2, SMALL.stateCount(run));
    assertEquals(2, SMALL.state(run, 1));
    assertEquals(-2.5f, SMALL.logEmission(run, 1));
    assertEquals(5, SMALL.pairCount());
    assertEquals("Zürich", SMALL.word(SMALL.lookup("Zürich")));
  }

  @Test
  void duplicateWordsAreRejected() {
    IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
        () -> new Lexicon(List.of(entry("run", 1), entry("walk", 2), entry("run", 2))));
    assertTrue(e.getMessage().contains("duplicate word in lexicon: run"), e.getMessage());
  }

  @Test
  void entriesNeedOneEmissionPerTag() {
    assertThrows(IllegalArgumentException.class, () -> new Lexicon.Entry("x", new int[0], new float[0]));
    assertThrows(IllegalArgumentException.class, () -> new Lexicon.Entry("x", new int[] {1, 2}, new float[] {0f}));
  }

  /**
   * Words with equal 31-polynomial hashes ("Aa" and "BB" collide, and so does every word built of
   * those two blocks; common practice in hash-table tests) land on the same slot and must be told
   * apart by their characters.
   */
  @Test
  void collidingWordsAreToldApart() {
    List<String> colliding = List.of("AaAa", "AaBB", "BBAa");
    assertEquals("AaAa".hashCode(), "BBBB".hashCode());
    List<Lexicon.Entry> entries = new ArrayList<>();
    for (String w : colliding) {
      entries.add(entry(w, 0));
    }
    Lexicon lexicon = new Lexicon(entries);
    for (int i = 0; i < colliding.size(); i++) {
      assertEquals(i, lexicon.lookup(colliding.get(i)), colliding.get(i));
    }
    assertEquals(-1, lexicon.lookup("BBBB"), "collides with all three but is not in the lexicon");
  }

  @Test
  void manyWordsAreAllFoundAndOthersNot() {
    Random rnd = new Random(123L);
    Set<String> seen = new HashSet<>();
    List<Lexicon.Entry> entries = new ArrayList<>();
    while (entries.size() < 20_000) {
      String w = randomWord(rnd);
      if (seen.add(w)) {
        entries.add(entry(w, rnd.nextInt(5)));
      }
    }
    Lexicon lexicon = new Lexicon(entries);
    for (int i = 0; i < entries.size(); i++) {
      assertEquals(i, lexicon.lookup(entries.get(i).word()));
    }
    for (int i = 0; i < 20_000; i++) {
      String w = randomWord(rnd);
      assertEquals(seen.contains(w) ? lexicon.lookup(w) : -1, lexicon.lookup(w), w);
      assertEquals(seen.contains(w), lexicon.lookup(w) >= 0, w);
    }
  }

  private static String randomWord(Random rnd) {
    char[] c = new char[1 + rnd.nextInt(6)];
    for (int i = 0; i < c.length; i++) {
      c[i] = (char) ('a' + rnd.nextInt(8));
    }
    return new String(c);
  }

  @Test
  void entriesComeBackInIdOrder() {
    List<Lexicon.Entry> back = SMALL.entries();
    assertEquals(List.of("run", "the", "Zürich", "a"), back.stream().map(Lexicon.Entry::word).toList());
    assertArrayEquals(new int[] {1, 2}, back.get(0).states());
    assertArrayEquals(new float[] {-1.5f, -2.5f}, back.get(0).logEmissions());
  }
}
