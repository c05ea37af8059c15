package org.wordclass.cli;

import java.io.IOException;
import java.nio.file.Path;
import org.wordclass.model.HmmModel;
import org.wordclass.model.LexiconOverlay;
import org.wordclass.model.UserLexicon;
import picocli.CommandLine.Option;

/** The {@code --lexicon} option: a user lexicon applied on top of a model (a mixin). */
final class LexiconOption {
  @Option(names = "--lexicon", paramLabel = "FILE",
      description = "A user lexicon (UTF-8; see docs/user-lexicon.md): each listed word takes only the "
          + "classes listed for it.")
  Path path;

  /** {@code model}, or a copy of it with the lexicon applied; a bad file fails naming file, line and reason. */
  HmmModel applyTo(HmmModel model) throws IOException {
    return path == null ? model : LexiconOverlay.apply(model, UserLexicon.read(path, model.tags()));
  }
}
