package org.wordclass.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Properties;
import picocli.CommandLine.IVersionProvider;

/**
 * Facts fixed when the builder was built, read from a resource that Maven fills in. The version
 * goes into the provenance of every model, so it must not vary between runs of one build.
 */
public final class BuildInfo implements IVersionProvider {
  private static final String RESOURCE = "build.properties";

  /** The project version, such as {@code 0.1.0}. */
  public static String version() {
    Properties properties = new Properties();
    try (InputStream in = BuildInfo.class.getResourceAsStream(RESOURCE)) {
      if (in == null) {
        throw new IllegalStateException("the resource " + RESOURCE + " is missing from the class path");
      }
      properties.load(in);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return properties.getProperty("version");
  }

  @Override
  public String[] getVersion() {
    return new String[] {"wordclass " + version()};
  }
}
