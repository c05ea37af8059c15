package org.wordclass.engine;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.LinkOption;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Objects;
import org.apache.lucene.util.ClasspathResourceLoader;
import org.apache.lucene.util.ResourceLoader;

/**
 * Serves the files an engine's analysis settings name from the node's configuration directory,
 * where engines keep their own analysis files (synonyms, stop words), and classes from the
 * plugin's class loader.
 *
 * <p>A name is a path relative to the directory. Names that lead outside it, whether by an
 * absolute path, by {@code ..} or through a symbolic link, are refused: index settings come over
 * the network from anyone allowed to create an index, and must not read arbitrary files of the
 * node. A name that is a directory or other non-regular file is refused too, so the failure says
 * what is wrong rather than surfacing as an obscure read error.
 *
 * <p>Each failure is an {@link IOException} whose message names the file and the reason;
 * callers add which argument named it. Cost: one path resolution and a real-path check per open.
 */
public final class ConfigDirResourceLoader implements ResourceLoader {
  private final Path configDir;
  private final ResourceLoader classes;

  /** Files under {@code configDir}; classes from {@code classLoader}. */
  public ConfigDirResourceLoader(Path configDir, ClassLoader classLoader) {
    this.configDir = configDir.toAbsolutePath().normalize();
    this.classes = new ClasspathResourceLoader(Objects.requireNonNull(classLoader, "classLoader"));
  }

  /** The directory names are resolved against. */
  public Path configDir() {
    return configDir;
  }

  @Override
  public InputStream openResource(String name) throws IOException {
    return Files.newInputStream(resolve(name));
  }

  /** The regular file {@code name} names under the configuration directory. */
  public Path resolve(String name) throws IOException {
    Path file = lexicallyInside(name);
    if (!Files.exists(file)) {
      throw new NoSuchFileException(name, null, "no such file in the configuration directory " + configDir);
    }
    Path real = file.toRealPath();
    if (!real.startsWith(configDir.toRealPath())) {
      throw new IOException(name + ": leads outside the configuration directory " + configDir + " (through a link)");
    }
    if (!Files.isRegularFile(real, LinkOption.NOFOLLOW_LINKS)) {
      throw new IOException(name + ": is " + (Files.isDirectory(real) ? "a directory" : "not a regular file") + ", not a file");
    }
    if (!Files.isReadable(real)) {
      throw new IOException(name + ": the node may not read this file in " + configDir);
    }
    return real;
  }

  private Path lexicallyInside(String name) throws IOException {
    if (name == null || name.isBlank()) {
      throw new IOException("an empty name does not name a file");
    }
    Path relative;
    try {
      relative = Path.of(name);
    } catch (InvalidPathException e) {
      throw new IOException(name + ": not a valid file name (" + e.getReason() + ")", e);
    }
    Path file = configDir.resolve(relative).normalize();
    if (relative.isAbsolute() || !file.startsWith(configDir) || file.equals(configDir)) {
      throw new IOException(name + ": leads outside the configuration directory " + configDir
          + "; name a file relative to it");
    }
    return file;
  }

  @Override
  public <T> Class<? extends T> findClass(String cname, Class<T> expectedType) {
    return classes.findClass(cname, expectedType);
  }
}
