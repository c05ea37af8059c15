package org.wordclass.corpus;

import java.nio.file.Path;

/** The tagged-corpus formats the builder reads. */
public enum CorpusFormat {
  /** Universal Dependencies CoNLL-U: ten tab-separated columns per word. */
  CONLLU,
  /** One {@code token<TAB>tag} per line, a blank line between sentences. */
  PLAIN;

  /** CoNLL-U for names ending in {@code .conllu} or {@code .conllu.gz}, plain otherwise. */
  public static CorpusFormat guess(Path path) {
    String name = path.getFileName().toString().toLowerCase(java.util.Locale.ROOT);
    return name.endsWith(".conllu") || name.endsWith(".conllu.gz") || name.endsWith(".conll") ? CONLLU : PLAIN;
  }
}
