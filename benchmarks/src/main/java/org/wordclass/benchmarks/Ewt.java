package org.wordclass.benchmarks;

import java.io.IOException;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.apache.lucene.analysis.standard.StandardTokenizer;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.wordclass.corpus.Corpus;
import org.wordclass.corpus.CorpusFormat;
import org.wordclass.corpus.Sentence;
import org.wordclass.corpus.TagColumn;

/**
 * The benchmark inputs, all from the UD English Web Treebank in the shared corpora folder: the raw
 * test sentences (what an index would see) and the tagged training sentences. The treebank is
 * read, never copied; without it every benchmark stops with a message naming the path it tried.
 */
public final class Ewt {
  static final String TEST = "en_ewt-ud-test.conllu";
  static final String TRAIN = "en_ewt-ud-train.conllu";
  private static final String FOLDER = "ud-english-ewt";
  private static final String TEXT_PREFIX = "# text =";

  private Ewt() {}

  /**
   * The treebank file: under the system property {@code wordclass.corpora} if set, else under
   * {@code shared/corpora} in the nearest folder, going up from the working directory and then
   * from this jar, that has one (the checkout sits beside {@code shared/}).
   */
  static Path file(String name) {
    String configured = System.getProperty("wordclass.corpora");
    Path relative = Paths.get(FOLDER, name);
    Path path = configured != null && !configured.isBlank()
        ? Paths.get(configured).resolve(relative)
        : searchUpwards(relative, Paths.get("").toAbsolutePath(), codeLocation());
    if (!Files.isRegularFile(path)) {
      throw new IllegalStateException("benchmark input " + path + " not found: the benchmarks need the UD English EWT "
          + "treebank in ../shared/corpora (or set -Dwordclass.corpora=FOLDER)");
    }
    return path;
  }

  /** The first {@code shared/corpora/relative} found above any of {@code starts}, else where the first would be. */
  private static Path searchUpwards(Path relative, Path... starts) {
    for (Path start : starts) {
      for (Path dir = start; dir != null; dir = dir.getParent()) {
        Path candidate = dir.resolve("shared").resolve("corpora").resolve(relative);
        if (Files.isRegularFile(candidate)) {
          return candidate;
        }
      }
    }
    return starts[0].resolveSibling("shared").resolve("corpora").resolve(relative);
  }

  private static Path codeLocation() {
    try {
      return Paths.get(Ewt.class.getProtectionDomain().getCodeSource().getLocation().toURI()).toAbsolutePath();
    } catch (URISyntaxException | RuntimeException e) {
      return Paths.get("").toAbsolutePath();
    }
  }

  /** The {@code # text =} lines of the test set: one raw sentence each. */
  public static List<String> testTexts() {
    try {
      List<String> texts = new ArrayList<>();
      for (String line : Files.readAllLines(file(TEST), StandardCharsets.UTF_8)) {
        if (line.startsWith(TEXT_PREFIX)) {
          texts.add(line.substring(TEXT_PREFIX.length()).strip());
        }
      }
      return texts;
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  /** The test sentences as Lucene's standard tokenizer cuts them: the tokens the filter decodes. */
  public static List<char[][]> testTokens() {
    List<char[][]> sentences = new ArrayList<>();
    try (StandardTokenizer tokenizer = new StandardTokenizer()) {
      CharTermAttribute term = tokenizer.addAttribute(CharTermAttribute.class);
      for (String text : testTexts()) {
        tokenizer.setReader(new StringReader(text));
        tokenizer.reset();
        List<char[]> tokens = new ArrayList<>();
        while (tokenizer.incrementToken()) {
          tokens.add(Arrays.copyOf(term.buffer(), term.length()));
        }
        tokenizer.end();
        tokenizer.close();
        if (!tokens.isEmpty()) {
          sentences.add(tokens.toArray(new char[0][]));
        }
      }
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return sentences;
  }

  /** Total number of tokens in {@code sentences}. */
  public static long tokenCount(List<char[][]> sentences) {
    return sentences.stream().mapToLong(s -> s.length).sum();
  }

  /** The tagged training sentences (gold words and UPOS tags), in file order. */
  public static List<Sentence> trainSentences() {
    List<Sentence> sentences = new ArrayList<>();
    new Corpus(List.of(file(TRAIN)), CorpusFormat.CONLLU, TagColumn.UPOS).forEachSentence(sentences::add);
    return sentences;
  }
}
