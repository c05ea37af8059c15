package org.wordclass.cli;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Path;
import org.wordclass.model.DefaultModel;
import org.wordclass.model.HmmModel;
import org.wordclass.model.ModelFile;
import picocli.CommandLine.Option;

/** The {@code --model} option of commands that use a model, the bundled one by default (a mixin). */
final class ModelOption {
  @Option(names = "--model", paramLabel = "MODEL",
      description = "A model file written by train. Default: the bundled English model (UPOS tags).")
  Path path;

  /** The model; the bundled one is shared with the rest of the process. */
  HmmModel load() throws IOException {
    return path == null ? DefaultModel.get() : ModelFile.read(path);
  }

  /** How messages and reports name the model. */
  String name() {
    return path == null ? "bundled model " + DefaultModel.RESOURCE : path.toString();
  }

  /** The bytes of the model file, for checksums and sizes. */
  byte[] readBytes() throws IOException {
    if (path == null) {
      try (InputStream in = DefaultModel.class.getClassLoader().getResourceAsStream(DefaultModel.RESOURCE)) {
        if (in == null) {
          throw new IOException(name() + ": missing from the class path");
        }
        return in.readAllBytes();
      }
    }
    return ModelFile.readBytes(path);
  }
}
