package org.wordclass.evaluation;

import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Consumer;
import org.wordclass.corpus.AnalysisChain;
import org.wordclass.corpus.AnalyzerAlignment;
import org.wordclass.corpus.Corpus;
import org.wordclass.corpus.Sentence;
import org.wordclass.corpus.TagColumn;
import org.wordclass.model.DefaultModel;
import org.wordclass.model.HmmModel;
import org.wordclass.training.HmmEstimator;
import org.wordclass.training.TagCounts;
import org.wordclass.training.TrainingOptions;

/**
 * Computes the tables of docs/accuracy.md from the treebanks in ../shared/corpora and prints them
 * as Markdown: the ablation of every training option (EWT dev and test, German and Swedish), the
 * tokens of analysis chains against gold tokens, and the bundled model's per-class error rates on
 * the default chain's tokens. Run it with
 * {@code java -cp model-builder/target/test-classes:model-builder/target/wordclass.jar
 * org.wordclass.evaluation.AccuracyTables ../shared/corpora}.
 */
public final class AccuracyTables {
  private final Path root;

  private AccuracyTables(Path root) {
    this.root = root;
  }

  public static void main(String[] args) {
    AccuracyTables tables = new AccuracyTables(Paths.get(args.length > 0 ? args[0] : "../shared/corpora"));
    tables.ablation();
    tables.analyzerTokens();
    tables.bundledModelPerClass();
  }

  private Path ewt(String split) {
    return root.resolve("ud-english-ewt/en_ewt-ud-" + split + ".conllu");
  }

  private Corpus corpus(Path file, TagColumn column) {
    return new Corpus(List.of(file), null, column);
  }

  private static HmmModel train(Corpus corpus, TrainingOptions options, AnalyzerAlignment alignment) {
    TagCounts counts = new TagCounts();
    corpus.forEach(through(alignment, s -> counts.add(s.words(), s.tags())));
    return new HmmEstimator(options).estimate(counts, Map.of());
  }

  private static Consumer<Sentence> through(AnalyzerAlignment alignment, Consumer<Sentence> action) {
    return alignment == null ? action : s -> {
      Sentence aligned = alignment.align(s);
      if (aligned != null) {
        action.accept(aligned);
      }
    };
  }

  private static EvaluationReport score(HmmModel model, Corpus corpus, AnalyzerAlignment alignment) {
    Evaluation evaluation = new Evaluation(model);
    corpus.forEach(through(alignment, evaluation::add));
    return evaluation.report();
  }

  private void ablation() {
    Map<String, TrainingOptions> variants = new LinkedHashMap<>();
    TrainingOptions classic = TrainingOptions.CLASSIC;
    variants.put("classic, first order", classic.withOrder(1));
    variants.put("classic, second order (Brants 2000)", classic);
    variants.put("+ lower-case lookup of first words", classic.withCues(false, false, true));
    variants.put("+ capitalisation states", classic.withCues(true, false, false));
    variants.put("+ context emissions", classic.withCues(false, true, false));
    // every addition before the lexicon's minimum tag share is measured without it
    TrainingOptions allCues = TrainingOptions.DEFAULTS.withMinTagShare(0);
    TrainingOptions stateOfLowerCase = allCues.withLowerCaseForms(false).withMaxPrefixLength(0);
    TrainingOptions allThree = stateOfLowerCase.withUnknownWordPrior(TrainingOptions.UnknownWordPrior.TAG);
    variants.put("all three (unknown words divided by the tag prior)", allThree);
    variants.put("all three, first order", allThree.withOrder(1));
    variants.put("all three + suffix counts per shape class", allThree.withShapeClasses(true));
    variants.put("all three + state prior of lower-case unknown words", stateOfLowerCase);
    variants.put("all three + state prior of every unknown word",
        stateOfLowerCase.withUnknownWordPrior(TrainingOptions.UnknownWordPrior.STATE));
    variants.put("all three + tag prior over rare words",
        stateOfLowerCase.withUnknownWordPrior(TrainingOptions.UnknownWordPrior.RARE_TAG));
    variants.put("all three + state prior over rare words",
        stateOfLowerCase.withUnknownWordPrior(TrainingOptions.UnknownWordPrior.RARE_STATE));
    variants.put("all three + lower-case forms of capitalised unknown words", allThree.withLowerCaseForms(true));
    variants.put("all three + state prior of lower-case words + lower-case forms", allCues.withMaxPrefixLength(0));
    variants.put("all three + word beginnings", allThree.withMaxPrefixLength(4));
    variants.put("all three + state prior of lower-case words + lower-case forms + word beginnings", allCues);
    variants.put("the same + minimum tag share 0.002 in the lexicon (default)", TrainingOptions.DEFAULTS);
    variants.put("default, first order", TrainingOptions.DEFAULTS.withOrder(1));
    Corpus train = corpus(ewt("train"), TagColumn.UPOS);
    Corpus dev = corpus(ewt("dev"), TagColumn.UPOS);
    Corpus test = corpus(ewt("test"), TagColumn.UPOS);
    Corpus deTrain = corpus(root.resolve("ud-german-gsd/de_gsd-ud-dev.conllu"), TagColumn.UPOS);
    Corpus deTest = corpus(root.resolve("ud-german-gsd/de_gsd-ud-test.conllu"), TagColumn.UPOS);
    Corpus svTrain = corpus(root.resolve("ud-swedish-talbanken/sv_talbanken-ud-dev.conllu"), TagColumn.UPOS);
    Corpus svTest = corpus(root.resolve("ud-swedish-talbanken/sv_talbanken-ud-test.conllu"), TagColumn.UPOS);
    System.out.println("| variant | EWT dev | EWT test | test known | test unknown | candidates/token | tokens/s (rough) | German test | Swedish test |");
    System.out.println("| --- | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: |");
    HmmModel defaultModel = null;
    for (Map.Entry<String, TrainingOptions> v : variants.entrySet()) {
      HmmModel model = train(train, v.getValue(), null);
      if (v.getValue().equals(TrainingOptions.DEFAULTS)) {
        defaultModel = model;
      }
      EvaluationReport d = score(model, dev, null);
      score(model, test, null); // a first pass warms the decoder up, so the second one's speed means something
      EvaluationReport t = score(model, test, null);
      EvaluationReport de = score(train(deTrain, v.getValue(), null), deTest, null);
      EvaluationReport sv = score(train(svTrain, v.getValue(), null), svTest, null);
      System.out.printf(Locale.ROOT, "| %s | %.4f | %.4f | %.4f | %.4f | %.2f | %,.0f | %.4f | %.4f |%n", v.getKey(),
          d.accuracy(), t.accuracy(), t.knownAccuracy(), t.unknownAccuracy(), t.averageCandidatesPerToken(),
          t.tokensPerSecond(), de.accuracy(), sv.accuracy());
    }
    Evaluation baseline = new Evaluation(defaultModel);
    MostFrequentTagBaseline mostFrequent = new MostFrequentTagBaseline(defaultModel, train);
    test.forEach(s -> mostFrequent.addTo(baseline, s));
    System.out.printf(Locale.ROOT, "%nmost-frequent-tag baseline on EWT test: %.4f (known %.4f, unknown %.4f)%n",
        baseline.accuracy(), baseline.knownAccuracy(), baseline.unknownAccuracy());
    for (TrainingOptions o : List.of(TrainingOptions.CLASSIC, TrainingOptions.DEFAULTS)) {
      EvaluationReport x = score(train(corpus(ewt("train"), TagColumn.XPOS), o, null), corpus(ewt("test"), TagColumn.XPOS), null);
      System.out.printf(Locale.ROOT, "XPOS %s: EWT test %.4f (known %.4f, unknown %.4f)%n",
          o == TrainingOptions.CLASSIC ? "classic" : "default", x.accuracy(), x.knownAccuracy(), x.unknownAccuracy());
    }
  }

  private void analyzerTokens() {
    Map<String, AnalysisChain> chains = new LinkedHashMap<>();
    chains.put("gold tokens (treebank words)", null);
    chains.put("standard tokenizer", AnalysisChain.of("standard", List.of()));
    chains.put("standard tokenizer, lowercase before the filter", AnalysisChain.of("standard", List.of("lowercase")));
    chains.put("whitespace tokenizer", AnalysisChain.of("whitespace", List.of()));
    chains.put("whitespace tokenizer, lowercase before the filter", AnalysisChain.of("whitespace", List.of("lowercase")));
    Corpus train = corpus(ewt("train"), TagColumn.UPOS);
    Corpus test = corpus(ewt("test"), TagColumn.UPOS);
    HmmModel onGold = train(train, TrainingOptions.DEFAULTS, null);
    System.out.println();
    System.out.println("| tokens scored (EWT test) | tokens | model trained on gold tokens | model trained through the same chain |");
    System.out.println("| --- | ---: | ---: | ---: |");
    for (Map.Entry<String, AnalysisChain> c : chains.entrySet()) {
      AnalysisChain chain = c.getValue();
      EvaluationReport gold = score(onGold, test, alignment(chain));
      String through = chain == null ? "same" : String.format(Locale.ROOT, "%.4f",
          score(train(train, TrainingOptions.DEFAULTS, alignment(chain)), test, alignment(chain)).accuracy());
      System.out.printf(Locale.ROOT, "| %s | %d | %.4f | %s |%n", c.getKey(), gold.tokens(), gold.accuracy(), through);
    }
  }

  private static AnalyzerAlignment alignment(AnalysisChain chain) {
    return chain == null ? null : new AnalyzerAlignment(chain.build(), true);
  }

  private void bundledModelPerClass() {
    AnalyzerAlignment alignment = alignment(AnalysisChain.DEFAULT);
    EvaluationReport r = score(DefaultModel.get(), corpus(ewt("test"), TagColumn.UPOS), alignment);
    System.out.printf(Locale.ROOT, "%nbundled model, default chain, EWT test: accuracy %.4f on %d tokens%n", r.accuracy(), r.tokens());
    System.out.println("| class | tokens | precision | recall | a class-restricted query misses (1 - recall) | wrong hits (1 - precision) |");
    System.out.println("| --- | ---: | ---: | ---: | ---: | ---: |");
    for (EvaluationReport.TagScore t : r.perTag()) {
      System.out.printf(Locale.ROOT, "| %s | %d | %.3f | %.3f | %.1f%% | %.1f%% |%n", t.tag(), t.goldWords(), t.precision(),
          t.recall(), 100 * (1 - t.recall()), 100 * (1 - t.precision()));
    }
  }
}
