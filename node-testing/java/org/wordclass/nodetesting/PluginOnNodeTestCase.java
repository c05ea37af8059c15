package org.wordclass.nodetesting;

import static org.junit.Assert.assertFalse;
import static org.junit.Assert.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
import org.junit.AfterClass;
import org.junit.Test;

/**
 * What every engine's test of the installed plugin checks on its real node, with {@link
 * RestScenario}. A subclass starts the node in its own {@code @BeforeClass} through {@link
 * #startNode}; the node is stopped and its folder removed after the class, also when a test or
 * the start failed.
 */
public abstract class PluginOnNodeTestCase {
  /** A model file in the node's config directory that the node's user may not read. */
  private static final String LOCKED_MODEL = "wordclass/locked.wcm";

  protected static NodeProcess node;
  private static RestScenario scenario;

  /** Installs the zip on a copy of the distribution, puts {@link ConfigFiles} in its config directory and starts it. */
  protected static void startNode(NodeProcess.Engine engine, Path distribution, Path pluginZip, int heapMb, List<String> settings)
      throws Exception {
    node = NodeProcess.install(engine, distribution, pluginZip);
    try {
      ConfigFiles.install(node.configDir());
      Path locked = Files.writeString(node.configDir().resolve(LOCKED_MODEL), "x");
      Files.setPosixFilePermissions(locked, PosixFilePermissions.fromString("---------"));
      node.start(heapMb, settings);
    } catch (Exception | Error e) {
      stopNode();
      throw e;
    }
    scenario = new RestScenario(node);
  }

  @AfterClass
  public static void stopNode() {
    if (node != null) {
      long pid = node.serverPid();
      node.close();
      node = null;
      assertFalse("the server process " + pid + " has ended", ProcessHandle.of(pid).map(ProcessHandle::isAlive).orElse(false));
    }
  }

  @Test
  public void theInstalledPluginTagsIndexesAndQueries() throws IOException {
    Rest.Response plugins = node.call("GET", "/_cat/plugins?format=json", null);
    assertTrue(plugins.text, plugins.text.contains("\"component\":\"wordclass\""));
    scenario.createAndIndex();
    scenario.analyzeShowsClasses();
    scenario.queriesFindByClass();
    scenario.resultsComeFromEveryShard();
    scenario.badQueriesAreRefused();
    node.call("DELETE", "/" + RestScenario.INDEX, null);
  }

  /** The language pack is in the installed plugin: the French example index needs no file on the node. */
  @Test
  public void theInstalledPluginShipsTheFrenchModel() throws IOException {
    scenario.frenchIndexTagsWithTheFrenchModel();
    node.call("DELETE", "/" + RestScenario.FRENCH_INDEX, null);
  }

  @Test
  public void badSettingsAreRefusedWith400() throws IOException {
    // the locked model belongs to the node's user, who may not read it
    scenario.badSettingsAreRefused(LOCKED_MODEL);
  }
}
