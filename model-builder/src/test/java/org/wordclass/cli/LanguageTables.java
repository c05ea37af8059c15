package org.wordclass.cli;

import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.Locale;
import java.util.stream.Collectors;
import org.wordclass.evaluation.EvaluationReport;

/**
 * Prints the per-language tables of docs/languages.md from the shipped pack and the treebanks:
 * training data, test accuracy on the treebank's words and through the pack's chain, known and
 * unknown words, the most-frequent-tag baseline on the same tokens, the commonest confusions,
 * model size and the multiword tokens. Run it from the repository root with
 * {@code java -cp model-builder/target/test-classes:model-builder/target/wordclass.jar
 * org.wordclass.cli.LanguageTables ../shared/corpora} (after {@code cd model-builder} paths are
 * relative to the module, as in the tests: run it from {@code model-builder/} with
 * {@code ../../shared/corpora}).
 */
public final class LanguageTables {
  private LanguageTables() {}

  public static void main(String[] args) throws Exception {
    Path corpora = Paths.get(args.length > 0 ? args[0] : "../../shared/corpora");
    PackRecipe recipe = PackMeasure.recipe();
    StringBuilder accuracy = new StringBuilder(
        "| language | trained on | words (tokens through the chain) | test, treebank words: model trained on them | shipped model | test through the chain: shipped model | known | unknown (share) | most-frequent-tag baseline | the same, unseen words by ending | model size |\n"
            + "| --- | --- | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: |\n");
    StringBuilder confusions = new StringBuilder("| language | most frequent confusions on test through the chain (gold → tagged: count) |\n| --- | --- |\n");
    StringBuilder multiword = new StringBuilder(
        "| language | test words | CoNLL-U multiword tokens | chain tokens over several words | of which tagged by a later word (elision) |\n"
            + "| --- | ---: | ---: | ---: | ---: |\n");
    for (PackRecipe.Entry entry : recipe.entries()) {
      PackMeasure.Figures f = PackMeasure.measure(recipe, entry, entry.trainFile(corpora), entry.testFile(corpora));
      EvaluationReport c = f.chain();
      accuracy.append(String.format(Locale.ROOT, "| %s | %s %s | %,d (%,d) | %.4f | %.4f | **%.4f** | %.4f | %.4f (%.1f%%) | %.4f | %.4f | %,d |%n",
          entry.language(), entry.notes().get("treebank"), entry.train().contains("-train.") ? "train" : "dev", f.trainWords(),
          f.trainTokens(), f.goldTrainedGoldTokens().accuracy(), f.goldTokens().accuracy(), c.accuracy(), c.knownAccuracy(), c.unknownAccuracy(),
          100 * c.unknownShare(), f.baseline().accuracy(), f.baselineByEndings().accuracy(), f.modelBytes()));
      confusions.append("| ").append(entry.language()).append(" | ")
          .append(c.topConfusions().stream().limit(4).map(x -> x.gold() + " → " + x.predicted() + ": " + x.count())
              .collect(Collectors.joining(", ")))
          .append(" |\n");
      multiword.append(String.format(Locale.ROOT, "| %s | %,d | %,d (%.1f%%) | %,d (%.1f%% of %,d) | %,d |%n", entry.language(),
          f.testWords(), f.testMultiwordTokens(), 100.0 * f.testMultiwordTokens() / f.testWords(), f.tokensSeveralWords(),
          100.0 * f.tokensSeveralWords() / c.tokens(), c.tokens(), f.tokensTaggedByALaterWord()));
    }
    System.out.println(accuracy);
    System.out.println(confusions);
    System.out.println(multiword);
  }
}
