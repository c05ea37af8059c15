package org.wordclass.training;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.wordclass.model.HmmModel;
import org.wordclass.model.LowerCaseFormCue;

/**
 * The factors of the lower-case forms, counted on an invented corpus where every rare
 * capitalised word whose lower-case form is a known noun is a noun ("Table" beside "table"),
 * and the other capitalised words are proper nouns.
 */
class LowerCaseFormsTrainingTest {
  private static TagCounts counts() {
    TagCounts counts = new TagCounts();
    for (int i = 0; i < 3; i++) {
      counts.add(List.of("the", "table", "stands"), List.of("DET", "NOUN", "VERB"));
      counts.add(List.of("the", "chair", "falls"), List.of("DET", "NOUN", "VERB"));
    }
    counts.add(List.of("see", "Table", "Anna"), List.of("VERB", "NOUN", "PROPN"));
    counts.add(List.of("see", "Chair", "Berta"), List.of("VERB", "NOUN", "PROPN"));
    counts.add(List.of("see", "Carla", "Dora"), List.of("VERB", "PROPN", "PROPN"));
    return counts;
  }

  private static HmmModel train(TrainingOptions options) {
    return new HmmEstimator(options.withOpenClassMinShare(0)).estimate(counts(), Map.of());
  }

  @Test
  void capitalisedWordsOfNounFormsLeanToNouns() {
    HmmModel model = train(TrainingOptions.DEFAULTS);
    LowerCaseFormCue cue = model.unknownWords().lowerCaseForms();
    assertNotNull(cue);
    int noun = model.tags().indexOf("NOUN");
    int propn = model.tags().indexOf("PROPN");
    int nounK = model.unknownWords().openIndex(noun);
    int propnK = model.unknownWords().openIndex(propn);
    // rare capitalised words: 2 nouns (both of noun forms), 5 proper nouns (none with a known form)
    assertTrue(cue.factor(noun, nounK) > 1, "nouns gain where the form is a noun: " + cue.factor(noun, nounK));
    assertTrue(cue.factor(noun, propnK) < 1, "proper nouns lose there: " + cue.factor(noun, propnK));
    assertEquals(1.0, cue.factor(model.tags().indexOf("DET"), nounK), 1e-12, "no capitalised word of a DET form: no change");
    assertEquals(noun, cue.forms().tagOfLowerCased("TABLE".toCharArray(), 0, 5));
    assertEquals(model.tags().indexOf("VERB"), cue.forms().tagOfLowerCased("Falls".toCharArray(), 0, 5));
  }

  @Test
  void theOptionSwitchesTheCueOff() {
    assertNull(train(TrainingOptions.DEFAULTS.withLowerCaseForms(false)).unknownWords().lowerCaseForms());
    assertTrue(TrainingOptions.DEFAULTS.lowerCaseForms());
    assertEquals("true", TrainingOptions.DEFAULTS.describe().get("option.lowerCaseForms"));
  }
}
