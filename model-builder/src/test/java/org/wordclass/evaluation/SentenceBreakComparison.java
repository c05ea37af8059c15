package org.wordclass.evaluation;

import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.function.IntSupplier;
import org.wordclass.corpus.Corpus;
import org.wordclass.corpus.Sentence;
import org.wordclass.corpus.TagColumn;

/**
 * Measures how many sentence starts inside EWT documents two sentence segmenters find in running
 * text: the JDK's {@link java.text.BreakIterator}, which the {@code sentenceStandard} tokenizer
 * uses, and ICU4J's (the rules Lucene's ICU module would bring). Each document's sentences are
 * joined as {@code evaluate --documents} joins them (one space, none after {@code SpaceAfter=No});
 * a break counts as found when it falls exactly on a treebank sentence's first character.
 *
 * <p>Run it with {@code java -cp model-builder/target/test-classes:model-builder/target/wordclass.jar:$ICU4J_JAR
 * org.wordclass.evaluation.SentenceBreakComparison ../shared/corpora} (ICU4J is a test dependency of
 * the model builder, in the local Maven repository after the build).
 */
public final class SentenceBreakComparison {
  private SentenceBreakComparison() {}

  public static void main(String[] args) {
    Path root = Paths.get(args.length > 0 ? args[0] : "../shared/corpora");
    System.out.println("| EWT | sentence starts inside documents | JDK: found | JDK: breaks | ICU4J: found | ICU4J: breaks |");
    System.out.println("| --- | ---: | ---: | ---: | ---: | ---: |");
    for (String split : List.of("dev", "test")) {
      Corpus corpus = new Corpus(List.of(root.resolve("ud-english-ewt/en_ewt-ud-" + split + ".conllu")), null, TagColumn.UPOS);
      long starts = 0;
      long[] jdk = new long[2];
      long[] icu = new long[2];
      for (List<Sentence> document : documents(corpus)) {
        Set<Integer> inner = new HashSet<>();
        String text = joined(document, inner);
        starts += inner.size();
        java.text.BreakIterator j = java.text.BreakIterator.getSentenceInstance(Locale.ROOT);
        j.setText(text);
        count(j::next, text.length(), inner, jdk);
        com.ibm.icu.text.BreakIterator i = com.ibm.icu.text.BreakIterator.getSentenceInstance(com.ibm.icu.util.ULocale.ROOT);
        i.setText(text);
        count(i::next, text.length(), inner, icu);
      }
      System.out.printf(Locale.ROOT, "| %s | %,d | %,d | %,d | %,d | %,d |%n", split, starts, jdk[0], jdk[1], icu[0], icu[1]);
    }
  }

  private static List<List<Sentence>> documents(Corpus corpus) {
    List<List<Sentence>> documents = new ArrayList<>();
    for (Sentence s : corpus) {
      if (documents.isEmpty() || s.startsDocument()) {
        documents.add(new ArrayList<>());
      }
      documents.get(documents.size() - 1).add(s);
    }
    return documents;
  }

  /** The document as one field value; the offsets where its second and later sentences start go to {@code inner}. */
  private static String joined(List<Sentence> document, Set<Integer> inner) {
    StringBuilder text = new StringBuilder();
    boolean space = true;
    for (Sentence s : document) {
      if (text.length() > 0) {
        if (space) {
          text.append(' ');
        }
        inner.add(text.length());
      }
      text.append(s.text());
      space = s.spaceAfterLast();
    }
    return text.toString();
  }

  /** Adds the breaks before the end that fall on a sentence start, and all such breaks, to {@code counts}. */
  private static void count(IntSupplier next, int length, Set<Integer> inner, long[] counts) {
    for (int b = next.getAsInt(); b >= 0 && b < length; b = next.getAsInt()) {
      counts[1]++;
      if (inner.contains(b)) {
        counts[0]++;
      }
    }
  }
}
