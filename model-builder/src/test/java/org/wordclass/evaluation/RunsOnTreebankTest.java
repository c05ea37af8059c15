package org.wordclass.evaluation;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.apache.lucene.analysis.Analyzer;
import org.junit.jupiter.api.Test;
import org.wordclass.corpus.AnalysisChain;
import org.wordclass.corpus.AnalyzerAlignment;
import org.wordclass.corpus.Corpus;
import org.wordclass.corpus.CorpusFormat;
import org.wordclass.corpus.Sentence;
import org.wordclass.corpus.TagColumn;
import org.wordclass.model.DefaultModel;
import org.wordclass.testing.Corpora;

/**
 * Runs of tokens written together (pieces of URLs, e-mail addresses, paths and dates that the
 * standard tokenizer cuts apart) decoded as one word, measured on UD English EWT
 * (../shared/corpora) through the default chain, each sentence as one field value. Floors a
 * little below the figures in docs/accuracy.md, "Runs of tokens written together".
 */
class RunsOnTreebankTest {

  /** Accuracy on the chain's tokens with runs decoded as one word, and with every token alone. */
  private static double[] withAndWithoutRuns(Path file) {
    Evaluation withRuns = new Evaluation(DefaultModel.get());
    Evaluation tokenByToken = new Evaluation(DefaultModel.get());
    try (Analyzer analyzer = AnalysisChain.DEFAULT.build()) {
      AnalyzerAlignment alignment = new AnalyzerAlignment(analyzer, false);
      for (Sentence s : new Corpus(List.of(file), CorpusFormat.CONLLU, TagColumn.UPOS)) {
        for (Sentence aligned : alignment.align(List.of(s))) {
          withRuns.add(aligned);
          tokenByToken.add(new Sentence(aligned.words(), aligned.tags(), aligned.text(), aligned.spaceAfter(),
              aligned.file(), aligned.line(), aligned.multiwordTokens(), aligned.startsDocument()));
        }
      }
    }
    return new double[] {withRuns.accuracy(), tokenByToken.accuracy()};
  }

  @Test
  void runsDecodedAsOneWordOnEwtTest() {
    double[] test = withAndWithoutRuns(Corpora.ewtTest());
    // EWT test, docs/accuracy.md: 0.9313 with runs; 0.9273 for the model before runs
    assertTrue(test[0] >= 0.930, () -> "EWT test with runs " + test[0]);
    // the same tokens and model, each token decoded alone: runs must be worth something
    assertTrue(test[0] - test[1] >= 0.002, () -> "EWT test with runs " + test[0] + ", token by token " + test[1]);
  }

  @Test
  void runsDecodedAsOneWordOnEwtDev() {
    double[] dev = withAndWithoutRuns(Corpora.ewtDev());
    // EWT dev, docs/accuracy.md: 0.9271 with runs; 0.9239 for the model before runs
    assertTrue(dev[0] >= 0.925, () -> "EWT dev with runs " + dev[0]);
    assertTrue(dev[0] - dev[1] >= 0.002, () -> "EWT dev with runs " + dev[0] + ", token by token " + dev[1]);
  }
}
