package org.wordclass.training;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;
import org.wordclass.model.HmmModel;
import org.wordclass.model.Lexicon;

/**
 * The lexicon's minimum tag share: a frequent word loses a tag it carried only by a slip of the
 * annotator, a rare word keeps all of its tags, and 0 keeps everything. Invented data: a
 * harbour's notices, where "the" is once mis-tagged as a proper noun in 1,000 uses.
 */
class MinTagShareTest {
  private static HmmModel train(double share) {
    TrainingOptions options = TrainingOptions.DEFAULTS.withMinTagShare(share);
    TagCounts counts = TagCounts.forOptions(options);
    for (int i = 0; i < 1_000; i++) {
      counts.add(List.of("the", "ferry", "sails"), List.of(i == 0 ? "PROPN" : "DET", "NOUN", "VERB"));
    }
    counts.add(List.of("moor", "the", "moor"), List.of("VERB", "DET", "NOUN"));
    return new HmmEstimator(options).estimate(counts, Map.of());
  }

  private static Set<String> tagsOf(HmmModel model, String word) {
    Lexicon lexicon = model.lexicon();
    int id = lexicon.lookup(word);
    Set<String> tags = new TreeSet<>();
    for (int k = 0; k < lexicon.stateCount(id); k++) {
      tags.add(model.tags().name(model.states().tagOf(lexicon.state(id, k))));
    }
    return tags;
  }

  @Test
  void aSlipInAFrequentWordIsLeftOut() {
    HmmModel model = train(0.002);
    assertEquals(Set.of("DET"), tagsOf(model, "the"));
    assertEquals(Set.of("NOUN", "VERB"), tagsOf(model, "moor"), "a word seen twice keeps both of its tags");
    assertEquals("0.002", model.provenance().get("option.minTagShare"));
  }

  @Test
  void zeroKeepsEveryPair() {
    assertEquals(Set.of("DET", "PROPN"), tagsOf(train(0), "the"));
  }

  @Test
  void aShareOfOneOrMoreIsRefused() {
    assertThrows(IllegalArgumentException.class, () -> TrainingOptions.DEFAULTS.withMinTagShare(1));
    assertThrows(IllegalArgumentException.class, () -> TrainingOptions.DEFAULTS.withMinTagShare(-0.1));
  }
}
