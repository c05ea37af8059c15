package org.wordclass.adaptation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.wordclass.corpus.Corpus;
import org.wordclass.corpus.Sentence;
import org.wordclass.corpus.TagColumn;
import org.wordclass.model.HmmModel;
import org.wordclass.testing.Corpora;
import org.wordclass.training.HmmEstimator;
import org.wordclass.training.TagCounts;
import org.wordclass.training.TrainingOptions;

/**
 * On real text (UD English EWT, gold tokens): a model from the first 500 training sentences,
 * adapted with the safeguards to the words of the next 4,000 sentences, must not tag EWT dev
 * worse than before by more than half a point. Dev is only measured here, not used to stop, so
 * the test can fail when the safeguards do not hold re-estimation back.
 */
class EwtAdaptationTest {

  @Test
  void safeguardedAdaptationOfASmallModelKeepsDevAccuracy() throws IOException {
    Corpus train = new Corpus(List.of(Corpora.ewtTrain()), null, TagColumn.UPOS);
    Corpus dev = new Corpus(List.of(Corpora.ewtDev()), null, TagColumn.UPOS);
    TagCounts counts = new TagCounts();
    int read = 0;
    for (Sentence s : train) {
      if (read++ < 500) {
        counts.add(s.words(), s.tags());
      }
    }
    HmmModel start = new HmmEstimator(TrainingOptions.DEFAULTS).estimate(counts, Map.of());

    Adaptation.Result result = new Adaptation(AdaptationOptions.DEFAULTS.withIterations(2, 0), new Adaptation.Listener() {})
        .adapt(start, new CorpusWordsSource(train, 500, 4000), null);

    double before = Adaptation.accuracy(start, dev);
    double after = Adaptation.accuracy(result.model(), dev);
    System.out.printf(Locale.ROOT, "EWT dev accuracy: %.4f from 500 sentences, %.4f adapted%n", before, after);
    assertEquals(2, result.keptIteration());
    assertTrue(after > before - 0.005, "dev accuracy fell from " + before + " to " + after);
  }
}
