package org.wordclass.cli;

import java.nio.file.Path;
import java.util.List;
import org.wordclass.corpus.Corpus;
import org.wordclass.corpus.CorpusFormat;
import org.wordclass.corpus.TagColumn;
import org.wordclass.training.TagCounts;
import picocli.CommandLine.Option;

/** Options naming the tagged corpus files a command reads and how to read them (a mixin). */
final class CorpusOptions {
  @Option(names = "--corpus", required = true, paramLabel = "FILE",
      description = "A tagged corpus file; repeat the option for more files, read in the order given. "
          + "Files ending in .gz are decompressed while reading.")
  List<Path> files;

  @Option(names = "--format", paramLabel = "conllu|plain",
      description = "Format of every corpus file: conllu (CoNLL-U) or plain (token<TAB>tag lines, "
          + "a blank line between sentences). Default: guessed from each file name "
          + "(.conllu, .conllu.gz: CoNLL-U; anything else: plain).")
  CorpusFormat format;

  @Option(names = "--tags", paramLabel = "upos|xpos",
      description = "Tag column: upos (Universal Dependencies tags) or xpos (language-specific tags). "
          + "Default: upos; when evaluating, the column the model was trained on.")
  TagColumn tags;

  /** The tag column asked for, or {@code fallback}. */
  TagColumn tags(TagColumn fallback) {
    return tags != null ? tags : fallback;
  }

  /** The corpus, read with the tag column asked for or {@code fallback}. */
  Corpus open(TagColumn fallback) {
    return new Corpus(files, format, tags(fallback)).limitTags(TagCounts.MAX_TAGS);
  }

  /** The format {@code file} is read in. */
  CorpusFormat formatOf(Path file) {
    return format != null ? format : CorpusFormat.guess(file);
  }
}
