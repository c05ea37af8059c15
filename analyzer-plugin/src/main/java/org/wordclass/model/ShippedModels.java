package org.wordclass.model;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.Collections;
import java.util.Properties;
import java.util.SortedMap;
import java.util.TreeMap;

/**
 * The models shipped inside the jar, one per language, by ISO 639-1 code: English ({@code en},
 * the {@link DefaultModel}) and the pack listed in {@value #INDEX}, which the model builder's
 * {@code build-pack} command writes beside the models. An entry of the index names either a
 * model file in the same folder ({@code fr=fr-gsd-upos.wcm}) or another code it stands for
 * ({@code no=nb}: Norwegian, for the Bokmål model). The index is read once per class loader
 * (a few hundred bytes); a model is read only when asked for.
 */
public final class ShippedModels {
  /** Folder of the shipped models on the class path. */
  public static final String FOLDER = "org/wordclass/models/";

  /** Resource listing the language pack. */
  public static final String INDEX = FOLDER + "languages.properties";

  /** Code of the bundled English model. */
  public static final String DEFAULT_LANGUAGE = "en";

  private static final String MODEL_SUFFIX = ".wcm";

  private ShippedModels() {}

  private static final class Holder {
    static final SortedMap<String, String> RESOURCES = read();

    private static SortedMap<String, String> read() {
      Properties index = new Properties();
      try (InputStream in = ShippedModels.class.getClassLoader().getResourceAsStream(INDEX)) {
        if (in != null) {
          index.load(new InputStreamReader(in, StandardCharsets.UTF_8));
        }
      } catch (IOException e) {
        throw new UncheckedIOException(e);
      }
      SortedMap<String, String> resources = new TreeMap<>();
      resources.put(DEFAULT_LANGUAGE, DefaultModel.RESOURCE);
      for (String code : index.stringPropertyNames()) {
        String target = index.getProperty(code).strip();
        String file = target.endsWith(MODEL_SUFFIX) ? target : index.getProperty(target, "").strip();
        if (!file.endsWith(MODEL_SUFFIX)) {
          throw new IllegalStateException(INDEX + ": '" + code + "' names neither a model file nor a listed code");
        }
        resources.put(code, FOLDER + file);
      }
      return Collections.unmodifiableSortedMap(resources);
    }
  }

  /** Every code a model can be asked for by, with the class-path resource of its model. */
  public static SortedMap<String, String> resources() {
    return Holder.RESOURCES;
  }

  /** The class-path resource of the model for {@code language}, or null if none is shipped. */
  public static String resource(String language) {
    return Holder.RESOURCES.get(language);
  }

  /** The codes, for messages: {@code cs, de, en, ...}. */
  public static String describe() {
    return String.join(", ", Holder.RESOURCES.keySet());
  }

  /** The bytes of the model for {@code language}, which must be shipped. */
  public static byte[] readBytes(String language) throws IOException {
    String resource = resource(language);
    if (resource == null) {
      throw new IllegalArgumentException("no model is shipped for the language '" + language + "'");
    }
    try (InputStream in = ShippedModels.class.getClassLoader().getResourceAsStream(resource)) {
      if (in == null) {
        throw new IllegalStateException("the shipped model " + resource + " is missing from the class path");
      }
      return in.readNBytes((int) ModelFile.MAX_FILE_BYTES + 1);
    }
  }
}
