package org.wordclass.engine;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Settings from the network may only read files under the node's configuration directory. */
class ConfigDirResourceLoaderTest {
  @TempDir Path root;

  private ConfigDirResourceLoader loaderWith(String name, String text) throws IOException {
    Path config = Files.createDirectories(root.resolve("config"));
    Path file = config.resolve(name);
    Files.createDirectories(file.getParent());
    Files.writeString(file, text);
    return new ConfigDirResourceLoader(config, getClass().getClassLoader());
  }

  private static String failure(ConfigDirResourceLoader loader, String name) {
    return assertThrows(IOException.class, () -> loader.openResource(name).close()).getMessage();
  }

  @Test
  void readsAFileInASubfolder() throws IOException {
    ConfigDirResourceLoader loader = loaderWith("wordclass/kitchen.txt", "cook NOUN\n");
    try (InputStream in = loader.openResource("wordclass/kitchen.txt")) {
      assertArrayEquals("cook NOUN\n".getBytes(), in.readAllBytes());
    }
  }

  @Test
  void refusesNamesLeadingOutside() throws IOException {
    Files.writeString(root.resolve("secret.txt"), "x");
    ConfigDirResourceLoader loader = loaderWith("a.txt", "a");
    for (String name : new String[] {"../secret.txt", "wordclass/../../secret.txt", root.resolve("secret.txt").toString(), "."}) {
      String message = failure(loader, name);
      assertTrue(message.contains("leads outside the configuration directory"), message);
    }
  }

  @Test
  void refusesALinkLeadingOutside() throws IOException {
    Path secret = Files.writeString(root.resolve("secret.txt"), "x");
    ConfigDirResourceLoader loader = loaderWith("a.txt", "a");
    Files.createSymbolicLink(loader.configDir().resolve("link.txt"), secret);
    String message = failure(loader, "link.txt");
    assertTrue(message.contains("leads outside the configuration directory") && message.contains("link"), message);
  }

  @Test
  void namesMissingFilesAndDirectories() throws IOException {
    ConfigDirResourceLoader loader = loaderWith("wordclass/a.txt", "a");
    String missing = failure(loader, "wordclass/b.wcm");
    assertTrue(missing.startsWith("wordclass/b.wcm: no such file in the configuration directory"), missing);
    String directory = failure(loader, "wordclass");
    assertTrue(directory.equals("wordclass: is a directory, not a file"), directory);
  }
}
