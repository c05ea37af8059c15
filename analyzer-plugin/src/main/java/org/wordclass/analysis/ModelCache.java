package org.wordclass.analysis;

import java.io.IOException;
import java.io.InputStream;
import java.lang.ref.ReferenceQueue;
import java.lang.ref.WeakReference;
import java.util.HashMap;
import java.util.Map;
import org.apache.lucene.util.ResourceLoader;
import org.wordclass.model.Checksums;
import org.wordclass.model.DefaultModel;
import org.wordclass.model.HmmModel;
import org.wordclass.model.LexiconOverlay;
import org.wordclass.model.ModelFile;
import org.wordclass.model.ModelFormatException;
import org.wordclass.model.UserLexicon;

/**
 * Shares loaded models between all analyzers and threads of a JVM, so that a schema with many
 * tagged fields, or many cores using one model, holds it in memory once.
 *
 * <p>Models are keyed by the SHA-256 of their file's bytes, not by resource name or loader: the
 * same name can mean different files under different configurations, and a configuration reload
 * after the file changed must see the new model even while the old one is still in use. Reading
 * and hashing the bytes costs a few milliseconds per lookup; parsing, which costs far more, is
 * done once per distinct file. Entries hold models weakly, so a model is freed when the last
 * analyzer using it is, and the cache never pins a reloaded configuration's class loader.
 *
 * <p>A model with a user lexicon applied ({@link LexiconOverlay}) is keyed by both files' bytes:
 * every analyzer naming the same model and lexicon shares one derived model, and editing the
 * lexicon gives a new one on reload. Applying a lexicon costs about as much as copying the
 * model's lexicon, once per distinct pair.
 *
 * <p>Thread-safe. Two threads loading the same new file at once may both parse it; one result is
 * kept and returned to both.
 */
public final class ModelCache {
  private static final Map<String, Entry> MODELS = new HashMap<>();
  private static final ReferenceQueue<HmmModel> CLEARED = new ReferenceQueue<>();

  private static final class Entry extends WeakReference<HmmModel> {
    final String key;

    Entry(String key, HmmModel model) {
      super(model, CLEARED);
      this.key = key;
    }
  }

  private ModelCache() {}

  /**
   * The model in resource {@code name} of {@code loader}, shared with every other user of a file
   * with the same bytes.
   *
   * @throws IOException if the resource cannot be read; a {@link
   *     org.wordclass.model.ModelFormatException} naming the resource if it is not a valid model
   */
  public static HmmModel load(ResourceLoader loader, String name) throws IOException {
    return get(readModelBytes(loader, name), name);
  }

  /** The bytes of model resource {@code name}, refusing more than any model holds. */
  public static byte[] readModelBytes(ResourceLoader loader, String name) throws IOException {
    byte[] bytes;
    try (InputStream in = loader.openResource(name)) {
      bytes = in.readNBytes((int) ModelFile.MAX_FILE_BYTES + 1);
    }
    if (bytes.length > ModelFile.MAX_FILE_BYTES) {
      throw new ModelFormatException(name + ": larger than any model (" + ModelFile.MAX_FILE_BYTES + " bytes)");
    }
    return bytes;
  }

  /**
   * The model in {@code modelBytes} (the bundled model when null) with the user lexicon in
   * {@code lexiconBytes} applied, shared with every other user of the same two files. The
   * lexicon is parsed whole, and checked against the model's classes, before the model is built.
   *
   * @throws org.wordclass.model.LexiconFormatException naming {@code lexiconName}, line and reason
   */
  public static HmmModel withLexicon(byte[] modelBytes, String modelName, byte[] lexiconBytes, String lexiconName)
      throws IOException {
    String modelKey = modelBytes == null ? "bundled:" + DefaultModel.RESOURCE : Checksums.sha256(modelBytes);
    String key = modelKey + "+lexicon:" + Checksums.sha256(lexiconBytes);
    HmmModel cached = lookup(key);
    if (cached != null) {
      return cached;
    }
    HmmModel model = modelBytes == null ? DefaultModel.get() : get(modelBytes, modelName);
    UserLexicon lexicon = UserLexicon.parse(lexiconBytes, lexiconName, model.tags());
    return putIfAbsent(key, LexiconOverlay.apply(model, lexicon));
  }

  /** The model held in {@code bytes}, parsed only if no live model has the same bytes. */
  public static HmmModel get(byte[] bytes, String name) throws IOException {
    String key = Checksums.sha256(bytes);
    HmmModel cached = lookup(key);
    if (cached != null) {
      return cached;
    }
    return putIfAbsent(key, ModelFile.read(bytes, name));
  }

  private static synchronized HmmModel lookup(String key) {
    purgeCleared();
    Entry entry = MODELS.get(key);
    return entry == null ? null : entry.get();
  }

  private static synchronized HmmModel putIfAbsent(String key, HmmModel model) {
    HmmModel winner = lookup(key);
    if (winner != null) {
      return winner;
    }
    MODELS.put(key, new Entry(key, model));
    return model;
  }

  /** Removes the entries whose models were collected. */
  private static void purgeCleared() {
    for (Object ref; (ref = CLEARED.poll()) != null; ) {
      Entry entry = (Entry) ref;
      MODELS.remove(entry.key, entry);
    }
  }

  /** Number of live entries; for tests and monitoring. */
  static synchronized int size() {
    purgeCleared();
    return MODELS.size();
  }
}
