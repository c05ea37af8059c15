package org.wordclass.cli;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import org.wordclass.corpus.Corpus;
import org.wordclass.corpus.TagColumn;
import org.wordclass.model.HmmModel;
import org.wordclass.model.ModelFormatException;

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

  /**
   * The tag column to score {@code model} on: {@code asked} (given by {@code option}), or without
   * it the column the model was trained on. A column other than the model's is refused, naming
   * both, since every tag would be compared with a tag of another set (an XPOS model scored on
   * UPOS came out at 0.089 without a word).
   */
  static TagColumn scoringColumn(HmmModel model, String modelName, TagColumn asked, String option) throws ModelFormatException {
    String trained = model.provenance().get(TAG_COLUMN);
    TagColumn own = tagColumn(model, TagColumn.UPOS);
    if (asked != null && trained != null && asked != own) {
      throw new ModelFormatException(modelName + ": was trained on the " + name(own) + " column, but " + option + " "
          + name(asked) + " asks to score it on " + name(asked) + " tags; use " + option + " " + name(own) + " or leave it out");
    }
    return asked != null ? asked : own;
  }

  private static String name(TagColumn column) {
    return column.name().toLowerCase(Locale.ROOT);
  }

  /** The tag column {@code model} was trained on, if it says; else {@code fallback}. */
  static TagColumn tagColumn(HmmModel model, TagColumn fallback) {
    String value = model.provenance().get(TAG_COLUMN);
    return value == null ? fallback : TagColumn.valueOf(value.toUpperCase(Locale.ROOT));
  }
}
