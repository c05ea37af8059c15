package org.wordclass.adaptation;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.wordclass.corpus.Sentence;
import org.wordclass.model.HmmModel;
import org.wordclass.training.HmmEstimator;
import org.wordclass.training.TagCounts;
import org.wordclass.training.TrainingOptions;

/**
 * An invented little language with ambiguous words, generated from a tiny grammar, for tests
 * that need tagged and untagged text with a known answer.
 */
final class ToyLanguage {
  private static final Map<String, String[]> WORDS = Map.of(
      "DET", new String[] {"the", "a", "this"},
      "NOUN", new String[] {"dog", "cat", "walk", "run", "light", "park", "book"},
      "VERB", new String[] {"walk", "run", "sees", "likes", "book", "light"},
      "ADJ", new String[] {"light", "small", "red"},
      "PRON", new String[] {"we", "they", "this"},
      "ADV", new String[] {"fast", "today"});

  private ToyLanguage() {}

  /** {@code count} tagged sentences; {@code pronounShare} of them start with a pronoun. */
  static List<Sentence> sentences(long seed, int count, double pronounShare) {
    Random random = new Random(seed);
    List<Sentence> out = new ArrayList<>();
    for (int s = 0; s < count; s++) {
      List<String> tags = new ArrayList<>();
      if (random.nextDouble() < pronounShare) {
        tags.add("PRON");
      } else {
        nounPhrase(random, tags);
      }
      tags.add("VERB");
      if (random.nextBoolean()) {
        nounPhrase(random, tags);
      }
      if (random.nextInt(3) == 0) {
        tags.add("ADV");
      }
      List<String> words = new ArrayList<>();
      for (String tag : tags) {
        String[] choices = WORDS.get(tag);
        words.add(choices[random.nextInt(choices.length)]);
      }
      out.add(new Sentence(words, tags, null, new boolean[words.size()], "toy", s, List.of()));
    }
    return out;
  }

  private static void nounPhrase(Random random, List<String> tags) {
    tags.add("DET");
    if (random.nextInt(3) == 0) {
      tags.add("ADJ");
    }
    tags.add("NOUN");
  }

  /** Sentences written as {@code word/TAG word/TAG ...}, each repeated {@code times}. */
  static List<Sentence> tagged(int times, String... sentences) {
    List<Sentence> out = new ArrayList<>();
    for (String text : sentences) {
      List<String> words = new ArrayList<>();
      List<String> tags = new ArrayList<>();
      for (String pair : text.split(" ")) {
        words.add(pair.substring(0, pair.indexOf('/')));
        tags.add(pair.substring(pair.indexOf('/') + 1));
      }
      for (int i = 0; i < times; i++) {
        out.add(new Sentence(words, tags, null, new boolean[words.size()], "toy", out.size(), List.of()));
      }
    }
    return out;
  }

  /** A supervised model of {@code sentences}. */
  static HmmModel train(List<Sentence> sentences, int order) {
    TagCounts counts = new TagCounts();
    sentences.forEach(s -> counts.add(s.words(), s.tags()));
    return new HmmEstimator(TrainingOptions.DEFAULTS.withOrder(order)).estimate(counts, Map.of());
  }

  /** The words of the sentences as untagged text. */
  static TextSource text(List<Sentence> sentences) {
    return text(sentences, List.of());
  }

  /** The words of both lists of sentences, one after the other, as untagged text. */
  static TextSource text(List<Sentence> sentences, List<Sentence> more) {
    return new TextSource() {
      @Override
      public void forEachSentence(java.util.function.Consumer<List<String>> sink) {
        sentences.forEach(s -> sink.accept(s.words()));
        more.forEach(s -> sink.accept(s.words()));
      }

      @Override
      public Map<String, String> describe() {
        return Map.of("adapt.input", "toy text");
      }
    };
  }

  /** Writes the sentences in the plain {@code token<TAB>tag} format. */
  static Path write(List<Sentence> sentences, Path file) throws IOException {
    StringBuilder text = new StringBuilder();
    for (Sentence s : sentences) {
      for (int i = 0; i < s.size(); i++) {
        text.append(s.words().get(i)).append('\t').append(s.tags().get(i)).append('\n');
      }
      text.append('\n');
    }
    Files.writeString(file, text, StandardCharsets.UTF_8);
    return file;
  }
}
