package org.wordclass.cli;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.zip.GZIPOutputStream;

/**
 * Small tagged corpora made up for the tests: sentences drawn from a handful of invented
 * sentence patterns and word lists, written as CoNLL-U or as plain token/tag lines. The same
 * seed gives the same corpus. Like real text, it has a long tail of rare words: nouns,
 * adjectives, verbs and names are sometimes coined from syllables, with endings typical of their
 * class. With {@code novelWords}, some words also come from lists that the training corpora never
 * use, so the unknown-word model is exercised.
 */
final class InventedCorpus {
  /** A word with its UPOS and XPOS tag. */
  record Word(String form, String upos, String xpos) {}

  private static final String[][] WORDS = {
      // category, UPOS, XPOS, familiar words | novel words
      {"det", "DET", "DT", "the a every this that", "each"},
      {"adj", "ADJ", "JJ", "quiet amber brisk hollow gentle crooked velvet narrow sleepy rusty",
          "glossy tepid"},
      {"noun", "NOUN", "NN", "lantern meadow kettle otter harbour violin pebble orchard ferry blanket tailor comet",
          "thimble walrus saucer gazebo"},
      {"name", "PROPN", "NNP", "Maribel Tocanto Ellery Quorra Vandermeer", "Oskarine Pellwick"},
      {"past", "VERB", "VBD", "polished carried painted watched borrowed mended chased folded", "sketched"},
      {"went", "VERB", "VBD", "slept wandered laughed shivered", "dozed"},
      {"base", "VERB", "VB", "polish carry paint watch borrow mend", "sketch"},
      {"aux", "AUX", "MD", "will can might", ""},
      {"adp", "ADP", "IN", "near under beside across into", ""},
      {"pron", "PRON", "PRP", "she he they we it", ""},
      {"conj", "CCONJ", "CC", "and but", ""},
      {"adv", "ADV", "RB", "slowly quietly never often soon", "warily"},
      {"num", "NUM", "CD", "two three seven 12 40", "19"},
      {"intj", "INTJ", "UH", "oh wow", ""},
      {"stop", "PUNCT", ".", ". !", ""},
      {"comma", "PUNCT", ",", ",", ""},
  };

  private static final String[] PATTERNS = {
      "det adj noun past det noun stop",
      "name past det noun adp det adj noun stop",
      "pron aux adv base det noun stop",
      "det noun conj det noun went adp det noun stop",
      "num adj noun went adv stop",
      "intj comma pron past name stop",
      "name conj name went comma but pron aux base det noun stop",
  };

  private static final String[] SYLLABLES = {"ba", "lo", "mir", "tesh", "quo", "ven", "dra", "pil", "sor", "nek", "fa", "gru"};
  private static final String[][] COINED_ENDINGS = {
      {"noun", "er ment ness ling"}, {"adj", "ous ful ish y"}, {"past", "ed"}, {"name", "a o ine"}};

  private InventedCorpus() {}

  static List<List<Word>> sentences(int count, long seed, boolean novelWords) {
    Random random = new Random(seed);
    List<List<Word>> sentences = new ArrayList<>();
    for (int s = 0; s < count; s++) {
      List<Word> sentence = new ArrayList<>();
      for (String slot : PATTERNS[random.nextInt(PATTERNS.length)].split(" ")) {
        sentence.add(pick(slot, random, novelWords));
      }
      sentences.add(sentence);
    }
    return sentences;
  }

  private static Word pick(String slot, Random random, boolean novelWords) {
    if (slot.equals("but")) {
      return new Word("but", "CCONJ", "CC");
    }
    for (String[] coined : COINED_ENDINGS) {
      if (coined[0].equals(slot) && random.nextInt(6) == 0) {
        return coin(slot, coined[1].split(" "), random);
      }
    }
    for (String[] row : WORDS) {
      if (row[0].equals(slot)) {
        boolean novel = novelWords && !row[4].isEmpty() && random.nextInt(4) == 0;
        String[] forms = (novel ? row[4] : row[3]).split(" ");
        return new Word(forms[random.nextInt(forms.length)], row[1], row[2]);
      }
    }
    throw new IllegalArgumentException(slot);
  }

  private static Word coin(String slot, String[] endings, Random random) {
    String word = SYLLABLES[random.nextInt(SYLLABLES.length)] + SYLLABLES[random.nextInt(SYLLABLES.length)]
        + endings[random.nextInt(endings.length)];
    for (String[] row : WORDS) {
      if (row[0].equals(slot)) {
        String form = slot.equals("name") ? Character.toUpperCase(word.charAt(0)) + word.substring(1) : word;
        return new Word(form, row[1], row[2]);
      }
    }
    throw new IllegalArgumentException(slot);
  }

  static String conllu(List<List<Word>> sentences) {
    StringBuilder s = new StringBuilder();
    int id = 1;
    for (List<Word> sentence : sentences) {
      s.append("# sent_id = invented-").append(id++).append('\n');
      s.append("# text = ").append(String.join(" ", sentence.stream().map(Word::form).toList())).append('\n');
      for (int i = 0; i < sentence.size(); i++) {
        Word w = sentence.get(i);
        s.append(i + 1).append('\t').append(w.form()).append('\t').append(w.form().toLowerCase())
            .append('\t').append(w.upos()).append('\t').append(w.xpos()).append("\t_\t_\t_\t_\t_\n");
      }
      s.append('\n');
    }
    return s.toString();
  }

  static String plain(List<List<Word>> sentences) {
    StringBuilder s = new StringBuilder();
    for (List<Word> sentence : sentences) {
      for (Word w : sentence) {
        s.append(w.form()).append('\t').append(w.upos()).append('\n');
      }
      s.append('\n');
    }
    return s.toString();
  }

  /** Writes {@code text} as UTF-8, gzip-compressed when the name ends in {@code .gz}. */
  static Path write(Path file, String text) throws IOException {
    return write(file, text.getBytes(StandardCharsets.UTF_8));
  }

  static Path write(Path file, byte[] bytes) throws IOException {
    if (file.getFileName().toString().endsWith(".gz")) {
      try (OutputStream out = new GZIPOutputStream(Files.newOutputStream(file))) {
        out.write(bytes);
      }
    } else {
      Files.write(file, bytes);
    }
    return file;
  }
}
