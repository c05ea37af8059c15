package org.wordclass.cli;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.TokenFilterFactory;
import org.apache.lucene.util.ClasspathResourceLoader;
import org.wordclass.analysis.WordClassFilterFactory;
import org.wordclass.corpus.AnalyzerAlignment;
import org.wordclass.corpus.Corpus;
import org.wordclass.corpus.Sentence;
import org.wordclass.corpus.TagColumn;
import org.wordclass.evaluation.Evaluation;
import org.wordclass.evaluation.EvaluationReport;
import org.wordclass.evaluation.MostFrequentTagBaseline;
import org.wordclass.model.HmmModel;
import org.wordclass.model.ModelFile;
import org.wordclass.model.ShippedModels;

/**
 * Measures a shipped language model the way a user gets it: loaded by {@code language=} through
 * the filter factory, scored on its treebank's test set on the treebank's own words and on the
 * tokens of the pack's analysis chain, beside the most-frequent-tag baseline counted on the same
 * chain's tokens of the training file. Shared by {@link LanguagePackAccuracyTest} and {@link
 * LanguageTables}.
 */
final class PackMeasure {
  /** The figures of one language. */
  record Figures(
      PackRecipe.Entry entry,
      long trainWords,
      long trainTokens,
      long testWords,
      long testMultiwordTokens,
      EvaluationReport goldTokens,
      EvaluationReport goldTrainedGoldTokens,
      EvaluationReport chain,
      EvaluationReport baseline,
      EvaluationReport baselineByEndings,
      long tokensSeveralWords,
      long tokensTaggedByALaterWord,
      long modelBytes) {}

  private PackMeasure() {}

  /** The recipe in the source tree; tests run in the module folder. */
  static PackRecipe recipe() throws IOException {
    return PackRecipe.read(recipePath());
  }

  static Path recipePath() {
    return Paths.get("..", "models", "pack.properties");
  }

  /** The shipped model for {@code language}, as {@code language=} gives it to a field. */
  static HmmModel byLanguage(String language) throws IOException {
    Map<String, String> args = new HashMap<>();
    args.put("language", language);
    WordClassFilterFactory factory = (WordClassFilterFactory) TokenFilterFactory.forName(WordClassFilterFactory.NAME, args);
    factory.inform(new ClasspathResourceLoader(PackMeasure.class.getClassLoader()));
    return factory.options().model();
  }

  /** The bytes of a shipped model file, from the class path. */
  static byte[] shippedBytes(String file) throws IOException {
    try (InputStream in = PackMeasure.class.getClassLoader().getResourceAsStream(ShippedModels.FOLDER + file)) {
      if (in == null) {
        throw new IOException("not on the class path: " + ShippedModels.FOLDER + file);
      }
      return in.readAllBytes();
    }
  }

  static Figures measure(PackRecipe recipe, PackRecipe.Entry entry, Path train, Path test) throws IOException {
    HmmModel model = byLanguage(entry.language());
    try (Analyzer analyzer = recipe.chain().build()) {
      AnalyzerAlignment trainAlignment = new AnalyzerAlignment(analyzer, false);
      List<Sentence> trainTokens = aligned(corpus(train), trainAlignment);
      AnalyzerAlignment testAlignment = new AnalyzerAlignment(analyzer, false);
      List<Sentence> testTokens = aligned(corpus(test), testAlignment);

      Evaluation gold = new Evaluation(model);
      long[] multiword = new long[1];
      corpus(test).forEach(s -> {
        gold.add(s);
        multiword[0] += s.multiwordTokens().size();
      });
      Evaluation chain = new Evaluation(model);
      testTokens.forEach(chain::add);
      Evaluation baseline = new Evaluation(model);
      MostFrequentTagBaseline mostFrequent = MostFrequentTagBaseline.withoutEndings(model, trainTokens);
      testTokens.forEach(s -> mostFrequent.addTo(baseline, s));
      Evaluation baselineByEndings = new Evaluation(model);
      MostFrequentTagBaseline byEndings = new MostFrequentTagBaseline(model, trainTokens);
      testTokens.forEach(s -> byEndings.addTo(baselineByEndings, s));
      Evaluation goldTrained = new Evaluation(trainedOnTreebankWords(entry, train));
      corpus(test).forEach(goldTrained::add);
      return new Figures(entry, trainAlignment.words(), tokens(trainTokens), testAlignment.words(), multiword[0],
          gold.report(), goldTrained.report(), chain.report(), baseline.report(), baselineByEndings.report(), testAlignment.count(AnalyzerAlignment.Case.SEVERAL_WORDS),
          testAlignment.tokensTaggedByALaterWord(), shippedBytes(entry.model()).length);
    }
  }

  /** The same language trained with the same options on the treebank's own words instead of the chain's tokens. */
  private static HmmModel trainedOnTreebankWords(PackRecipe.Entry entry, Path train) throws IOException {
    Path out = Files.createTempFile("wordclass-" + entry.language(), ".wcm");
    try {
      List<String> args = new ArrayList<>(List.of("train", "--corpus", train.toString(), "--out", out.toString()));
      args.addAll(entry.options());
      Cli.Result r = Cli.run(args.toArray(String[]::new));
      if (r.exitCode() != 0) {
        throw new IllegalStateException(r.toString());
      }
      return ModelFile.read(Files.readAllBytes(out), out.getFileName().toString());
    } finally {
      Files.deleteIfExists(out);
    }
  }

  private static Corpus corpus(Path file) {
    return new Corpus(List.of(file), null, TagColumn.UPOS);
  }

  private static List<Sentence> aligned(Corpus corpus, AnalyzerAlignment alignment) {
    List<Sentence> out = new ArrayList<>();
    corpus.forEach(s -> out.addAll(alignment.align(List.of(s))));
    return out;
  }

  private static long tokens(List<Sentence> sentences) {
    return sentences.stream().mapToLong(Sentence::size).sum();
  }
}
