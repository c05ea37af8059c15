package org.wordclass.evaluation;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import org.apache.lucene.analysis.Analyzer;
import org.wordclass.corpus.AnalysisChain;
import org.wordclass.corpus.AnalyzerAlignment;
import org.wordclass.corpus.Corpus;
import org.wordclass.corpus.CorpusFormat;
import org.wordclass.corpus.Sentence;
import org.wordclass.corpus.TagColumn;
import org.wordclass.decoding.SentenceBoundaries;
import org.wordclass.decoding.Tagger;
import org.wordclass.model.DefaultModel;
import org.wordclass.model.HmmModel;
import org.wordclass.model.Spelling;

/**
 * The "where it fires" measurements of docs/accuracy.md ("Sentence boundaries the tokenizer
 * misses"): each {@code # newdoc} document through the default chain as one field value, its
 * pieces decoded with and without decoded boundaries by the bundled model, and the treebank's
 * sentence starts laid over the tokens (from the same chain run one sentence at a time; documents
 * whose tokens differ between the two runs are left out). Prints first-word accuracy, accuracy on
 * the starts inside a piece, and the boundaries added with their precision and recall; with a
 * second argument {@code diff}, every piece whose tags differ, boundaries marked.
 *
 * <p>Run: {@code java -cp model-builder/target/test-classes:model-builder/target/wordclass.jar
 * org.wordclass.evaluation.BoundaryPlacement FILE.conllu [diff]}.
 */
public final class BoundaryPlacement {
  private BoundaryPlacement() {}

  public static void main(String[] args) throws Exception {
    HmmModel model = DefaultModel.get();
    List<Sentence> gold = new ArrayList<>();
    Map<Long, Integer> documentOf = new HashMap<>();
    for (Sentence s : new Corpus(List.of(Path.of(args[0])), CorpusFormat.CONLLU, TagColumn.UPOS)) {
      int document = gold.isEmpty() ? 0 : documentOf.get(gold.get(gold.size() - 1).line()) + (s.startsDocument() ? 1 : 0);
      documentOf.put(s.line(), document);
      gold.add(s);
    }
    Map<Integer, List<String>> sentenceTokens = new TreeMap<>();
    Map<Integer, List<Boolean>> starts = new TreeMap<>();
    Map<Integer, List<Sentence>> pieces = new TreeMap<>();
    try (Analyzer bySentence = AnalysisChain.DEFAULT.build(); Analyzer byDocument = AnalysisChain.DEFAULT.build()) {
      AnalyzerAlignment.Feed sentences = new AnalyzerAlignment(bySentence, false).feed(AnalyzerAlignment.Unit.SENTENCE, p -> {
        int d = documentOf.get(p.line());
        for (int i = 0; i < p.size(); i++) {
          sentenceTokens.computeIfAbsent(d, k -> new ArrayList<>()).add(p.words().get(i));
          // the first piece of each treebank sentence starts it
          starts.computeIfAbsent(d, k -> new ArrayList<>()).add(i == 0 && p.startsDocument());
        }
      });
      AnalyzerAlignment.Feed documents = new AnalyzerAlignment(byDocument, false).feed(AnalyzerAlignment.Unit.DOCUMENT,
          p -> pieces.computeIfAbsent(documentOf.get(p.line()), k -> new ArrayList<>()).add(p));
      gold.forEach(sentences);
      sentences.finish();
      gold.forEach(documents);
      documents.finish();
    }
    Tagger tokenizer = new Tagger(model, SentenceBoundaries.TOKENIZER);
    Tagger decoded = new Tagger(model, SentenceBoundaries.DECODED);
    boolean diff = args.length > 1;
    long[] n = new long[12];
    final int tokens = 0, offRight = 1, onRight = 2, realStarts = 3, startOffRight = 4, startOnRight = 5, inside = 6,
        insideCapitalised = 7, insideOffRight = 8, insideOnRight = 9, added = 10, addedAtStart = 11;
    long skipped = 0;
    long candidates = 0;
    for (Map.Entry<Integer, List<Sentence>> document : pieces.entrySet()) {
      List<String> flat = new ArrayList<>();
      document.getValue().forEach(p -> flat.addAll(p.words()));
      if (!flat.equals(sentenceTokens.get(document.getKey()))) {
        skipped++;
        continue;
      }
      List<Boolean> isStart = starts.get(document.getKey());
      int first = 0;
      for (Sentence p : document.getValue()) {
        Tagger.Tagging off = tokenizer.tag(p.words(), p.gapList(), false);
        Tagger.Tagging on = decoded.tag(p.words(), p.gapList(), false);
        StringBuilder shown = new StringBuilder();
        boolean differs = false;
        for (int i = 0; i < p.size(); i++) {
          String word = p.words().get(i);
          boolean start = isStart.get(first + i);
          boolean capitalised = Spelling.startsWithCapital(word.toCharArray(), 0, word.length());
          String offTag = model.tags().name(off.tags()[i]);
          String onTag = model.tags().name(on.tags()[i]);
          boolean x = offTag.equals(p.tags().get(i));
          boolean y = onTag.equals(p.tags().get(i));
          n[tokens]++;
          n[offRight] += x ? 1 : 0;
          n[onRight] += y ? 1 : 0;
          candidates += i > 0 && capitalised ? 1 : 0;
          if (start) {
            n[realStarts]++;
            n[startOffRight] += x ? 1 : 0;
            n[startOnRight] += y ? 1 : 0;
          }
          if (start && i > 0) {
            n[inside]++;
            n[insideCapitalised] += capitalised ? 1 : 0;
            n[insideOffRight] += x ? 1 : 0;
            n[insideOnRight] += y ? 1 : 0;
          }
          if (on.opensSentence()[i]) {
            n[added]++;
            n[addedAtStart] += start ? 1 : 0;
          }
          shown.append(start && i > 0 ? "|| " : "").append(on.opensSentence()[i] ? "<<S>> " : "").append(word);
          if (!offTag.equals(onTag)) {
            differs = true;
            shown.append('/').append(p.tags().get(i)).append(':').append(offTag).append("->").append(onTag);
          }
          shown.append(' ');
        }
        if (diff && differs) {
          System.out.println(shown.toString().trim());
        }
        first += p.size();
      }
    }
    System.out.printf(Locale.ROOT, "documents %d (left out %d), tokens %d: tokenizer %.4f, decoded %.4f%n",
        pieces.size(), skipped, n[tokens], ratio(n[offRight], n[tokens]), ratio(n[onRight], n[tokens]));
    System.out.printf(Locale.ROOT, "treebank sentence starts %d: first words tokenizer %.4f, decoded %.4f%n",
        n[realStarts], ratio(n[startOffRight], n[realStarts]), ratio(n[startOnRight], n[realStarts]));
    System.out.printf(Locale.ROOT, "starts inside a piece %d (capitalised %d): tokenizer %.4f, decoded %.4f%n",
        n[inside], n[insideCapitalised], ratio(n[insideOffRight], n[inside]), ratio(n[insideOnRight], n[inside]));
    System.out.printf(Locale.ROOT, "capitalised tokens after the first of a piece: %d%n", candidates);
    System.out.printf(Locale.ROOT, "boundaries added %d, at a treebank start %d: precision %.3f, recall %.3f (of the capitalised %.3f)%n",
        n[added], n[addedAtStart], ratio(n[addedAtStart], n[added]), ratio(n[addedAtStart], n[inside]),
        ratio(n[addedAtStart], n[insideCapitalised]));
  }

  private static double ratio(long a, long b) {
    return b == 0 ? Double.NaN : (double) a / b;
  }
}
