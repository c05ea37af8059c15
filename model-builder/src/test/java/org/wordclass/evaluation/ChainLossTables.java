package org.wordclass.evaluation;

import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.wordclass.corpus.AnalysisChain;
import org.wordclass.corpus.AnalyzerAlignment;
import org.wordclass.corpus.Corpus;
import org.wordclass.corpus.Sentence;
import org.wordclass.corpus.TagColumn;
import org.wordclass.decoding.Tagger;
import org.wordclass.model.DefaultModel;
import org.wordclass.model.HmmModel;

/**
 * Where the chain's tokens lose accuracy against the treebank's own tokens: prints, for EWT dev and
 * test and the bundled model, the default chain's accuracy one sentence per field value split by
 * how a token relates to the treebank's words (exactly one word, part of a word, several words),
 * and beside the one-word tokens the accuracy that the same words get when the model decodes the
 * treebank's own tokens, punctuation included. The difference on the same words is what the
 * context the chain drops (punctuation, split contractions) costs; the rest of the gap between the
 * two headline figures is the mix of tokens (punctuation is easy and only the treebank has it;
 * pieces of URLs and addresses are hard and only the chain has them).
 *
 * <p>Run it with {@code java -cp model-builder/target/test-classes:model-builder/target/wordclass.jar
 * org.wordclass.evaluation.ChainLossTables ../shared/corpora}.
 */
public final class ChainLossTables {
  private ChainLossTables() {}

  public static void main(String[] args) {
    Path root = Paths.get(args.length > 0 ? args[0] : "../shared/corpora");
    HmmModel model = DefaultModel.get();
    System.out.println("| EWT | chain tokens | accuracy | one word | the same words, treebank tokens decoded |"
        + " part of a word | several words |");
    System.out.println("| --- | ---: | ---: | ---: | ---: | ---: | ---: |");
    for (String split : List.of("dev", "test")) {
      Corpus corpus = new Corpus(List.of(root.resolve("ud-english-ewt/en_ewt-ud-" + split + ".conllu")), null, TagColumn.UPOS);
      System.out.println(row(split, model, corpus));
    }
  }

  /** Per-case counts of one corpus: tokens and right tags by the chain, and by treebank-token decoding. */
  private static String row(String split, HmmModel model, Corpus corpus) {
    Tagger tagger = new Tagger(model);
    AnalyzerAlignment alignment = new AnalyzerAlignment(AnalysisChain.DEFAULT.build(), false);
    long[] tokens = new long[3];
    long[] right = new long[3];
    long rightFromTreebankTokens = 0;
    for (Sentence sentence : corpus) {
      List<Sentence> gold = alignment.align(List.of(sentence));
      List<Sentence> fromTreebankTokens = alignment.align(List.of(withTags(sentence, List.of(tagger.tagNames(sentence.words())))));
      List<Sentence> wordIndex = alignment.align(List.of(withWordIndices(sentence)));
      for (int p = 0; p < gold.size(); p++) {
        Sentence piece = gold.get(p);
        int[] predicted = tagger.tag(piece.words(), piece.gapList(), false).tags();
        for (int i = 0; i < piece.size(); i++) {
          String form = sentence.words().get(Integer.parseInt(wordIndex.get(p).tags().get(i)));
          String token = piece.words().get(i);
          int c = token.equals(form) ? 0 : form.contains(token) ? 1 : 2;
          tokens[c]++;
          right[c] += model.tags().name(predicted[i]).equals(piece.tags().get(i)) ? 1 : 0;
          if (c == 0 && fromTreebankTokens.get(p).tags().get(i).equals(piece.tags().get(i))) {
            rightFromTreebankTokens++;
          }
        }
      }
    }
    long all = tokens[0] + tokens[1] + tokens[2];
    return String.format(Locale.ROOT, "| %s | %,d | %.4f | %.4f (%,d) | %.4f | %.4f (%,d) | %.4f (%,d) |", split, all,
        (right[0] + right[1] + right[2]) / (double) all, right[0] / (double) tokens[0], tokens[0],
        rightFromTreebankTokens / (double) tokens[0], right[1] / (double) tokens[1], tokens[1],
        right[2] / (double) tokens[2], tokens[2]);
  }

  private static Sentence withTags(Sentence s, List<String> tags) {
    return new Sentence(s.words(), tags, s.text(), s.spaceAfter(), s.file(), s.line(), s.multiwordTokens(),
        s.startsDocument(), null);
  }

  /** The sentence with each word's index in place of its tag, so that aligned tokens say which word gave their tag. */
  private static Sentence withWordIndices(Sentence s) {
    List<String> indices = new ArrayList<>();
    for (int w = 0; w < s.size(); w++) {
      indices.add(Integer.toString(w));
    }
    return withTags(s, indices);
  }
}
