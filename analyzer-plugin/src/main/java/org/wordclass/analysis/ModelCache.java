package org.wordclass.analysis;

import java.io.IOException;
import java.io.InputStream;
import java.lang.ref.ReferenceQueue;
import java.lang.ref.WeakReference;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HashMap;
import java.util.HexFormat;
import java.util.Map;
import org.apache.lucene.util.ResourceLoader;
import org.wordclass.model.HmmModel;
import org.wordclass.model.ModelFile;
import org.wordclass.model.ModelFormatException;

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
    byte[] bytes;
    try (InputStream in = loader.openResource(name)) {
      bytes = in.readNBytes((int) ModelFile.MAX_FILE_BYTES + 1);
    }
    if (bytes.length > ModelFile.MAX_FILE_BYTES) {
      throw new ModelFormatException(name + ": larger than any model (" + ModelFile.MAX_FILE_BYTES + " bytes)");
    }
    return get(bytes, name);
  }

  /** The model held in {@code bytes}, parsed only if no live model has the same bytes. */
  public static HmmModel get(byte[] bytes, String name) throws IOException {
    String key = sha256(bytes);
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

  private static String sha256(byte[] bytes) {
    try {
      return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
    } catch (NoSuchAlgorithmException e) {
      throw new AssertionError("every JVM has SHA-256", e);
    }
  }
}
