package org.wordclass.cli;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import org.wordclass.corpus.Corpus;
import org.wordclass.corpus.TagColumn;
import org.wordclass.model.HmmModel;

/**
 * The provenance entries the command line adds to a model: which files it was trained on (by
 * name and SHA-256, never by path, so a rebuild elsewhere gives the same bytes), in which format,
 * with which tag column, by which builder version.
 */
final class Provenance {
  /** Key of the tag column a model was trained on, {@code upos} or {@code xpos}. */
  static final String TAG_COLUMN = "corpus.tags";

  private Provenance() {}

  /** Entries for a corpus that has been read to the end once. */
  static Map<String, String> of(Corpus corpus, CorpusOptions options) {
    Map<String, String> entries = new TreeMap<>();
    entries.put(TAG_COLUMN, corpus.column().name().toLowerCase(Locale.ROOT));
    entries.put("builder.version", BuildInfo.version());
    List<Path> files = corpus.files();
    for (int i = 0; i < files.size(); i++) {
      String name = files.get(i).getFileName().toString();
      String prefix = "corpus." + (i + 1) + ".";
      entries.put(prefix + "file", name);
      entries.put(prefix + "format", options.formatOf(files.get(i)).name().toLowerCase(Locale.ROOT));
      entries.put(prefix + "sha256", corpus.sha256ByFile().get(name));
    }
    return entries;
  }

  /** The tag column {@code model} was trained on, if it says; else {@code fallback}. */
  static TagColumn tagColumn(HmmModel model, TagColumn fallback) {
    String value = model.provenance().get(TAG_COLUMN);
    return value == null ? fallback : TagColumn.valueOf(value.toUpperCase(Locale.ROOT));
  }
}
