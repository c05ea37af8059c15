package org.wordclass.model;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;

/**
 * The English model shipped inside the jar: Universal Dependencies part-of-speech tags (UPOS),
 * trained on the UD English Web Treebank (CC BY-SA 4.0; see NOTICE). It is read once per class
 * loader, on first use.
 */
public final class DefaultModel {
  /** Resource name of the bundled model, usable wherever a model resource is asked for. */
  public static final String RESOURCE = "org/wordclass/models/en-ewt-upos.wcm";

  private DefaultModel() {}

  private static final class Holder {
    static final HmmModel MODEL = read();

    private static HmmModel read() {
      try (InputStream in = DefaultModel.class.getClassLoader().getResourceAsStream(RESOURCE)) {
        if (in == null) {
          throw new IllegalStateException("the bundled model " + RESOURCE + " is missing from the class path");
        }
        return ModelFile.read(in, RESOURCE);
      } catch (IOException e) {
        throw new UncheckedIOException(e);
      }
    }
  }

  /** The bundled model, read on first use and shared afterwards. */
  public static HmmModel get() {
    return Holder.MODEL;
  }
}
