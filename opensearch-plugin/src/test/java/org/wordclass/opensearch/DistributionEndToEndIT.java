package org.wordclass.opensearch;

import static org.junit.Assert.assertEquals;
import static org.junit.Assert.assertTrue;

import java.io.IOException;
import java.net.ServerSocket;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.AfterClass;
import org.junit.BeforeClass;
import org.junit.Test;

/**
 * The built plugin zip on the real OpenSearch distribution of its line (the integ-test zip from
 * Maven Central, unpacked by the build): installed with {@code bin/opensearch-plugin install
 * --batch}, the node started as its own process and used over REST on 127.0.0.1, then stopped by
 * its PID and its folder removed.
 *
 * <p>The node refuses to run as root, and CI runs as root: there the node (and the folder it
 * writes) belong to the unprivileged user {@code nobody}, started through {@code runuser}. The
 * node gets a small heap, and JNA is kept from loading its native library ({@code jna.nosys}).
 */
public class DistributionEndToEndIT {
  private static final HttpClient HTTP = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(5)).build();
  private static final boolean ROOT = "root".equals(System.getProperty("user.name"));
  private static final String USER = "nobody";

  private static Path home;
  private static Process node;
  private static long pid = -1;
  private static int port;
  private static RestScenario scenario;

  @BeforeClass
  public static void installAndStart() throws Exception {
    Path distribution = Path.of(System.getProperty("wordclass.distribution"));
    Path zip = Path.of(System.getProperty("wordclass.pluginZip"));
    home = Files.createTempDirectory(Path.of(System.getProperty("java.io.tmpdir")), "opensearch-e2e-");
    run(List.of("cp", "-a", distribution + "/.", home.toString()));
    Files.setPosixFilePermissions(home, PosixFilePermissions.fromString("rwxr-xr-x"));
    run(List.of(home + "/bin/opensearch-plugin", "install", "--batch", zip.toUri().toString()));
    ConfigFiles.install(home.resolve("config"));
    Path locked = Files.writeString(home.resolve("config/wordclass/locked.wcm"), "x");
    Files.setPosixFilePermissions(locked, PosixFilePermissions.fromString("---------"));
    if (ROOT) {
      run(List.of("chown", "-R", USER, home.toString()));
    }
    port = freePort();
    List<String> command = new ArrayList<>();
    if (ROOT) {
      command.addAll(List.of("runuser", "-u", USER, "--"));
    }
    command.addAll(List.of(home + "/bin/opensearch", "-p", home.resolve("node.pid").toString(),
        "-Ediscovery.type=single-node", "-Enetwork.host=127.0.0.1", "-Ehttp.port=" + port, "-Etransport.port=" + freePort(),
        "-Epath.data=" + home.resolve("data"), "-Epath.logs=" + home.resolve("logs")));
    ProcessBuilder builder = new ProcessBuilder(command).redirectErrorStream(true)
        .redirectOutput(home.resolve("console.log").toFile());
    builder.environment().put("OPENSEARCH_JAVA_HOME", System.getProperty("java.home"));
    builder.environment().put("OPENSEARCH_JAVA_OPTS", "-Xms384m -Xmx384m -Djna.nosys=true");
    node = builder.start();
    awaitStarted();
    scenario = new RestScenario(DistributionEndToEndIT::call);
  }

  private static void awaitStarted() throws Exception {
    long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(180);
    while (System.nanoTime() < deadline) {
      if (!node.isAlive()) {
        throw new AssertionError("the node stopped: " + Files.readString(home.resolve("console.log")));
      }
      try {
        if (call("GET", "/_cluster/health?wait_for_status=yellow&timeout=1s", null).status == 200) {
          pid = Long.parseLong(Files.readString(home.resolve("node.pid")).trim());
          return;
        }
      } catch (IOException notYet) {
        // not listening yet
      }
      Thread.sleep(500);
    }
    throw new AssertionError("the node did not start in 180 s: " + Files.readString(home.resolve("console.log")));
  }

  @AfterClass
  public static void stopAndRemove() throws Exception {
    try {
      if (pid > 0) {
        ProcessHandle.of(pid).ifPresent(ProcessHandle::destroy);
        ProcessHandle.of(pid).ifPresent(p -> p.onExit().orTimeout(60, TimeUnit.SECONDS).join());
      }
      if (node != null) {
        node.destroy();
        node.waitFor(30, TimeUnit.SECONDS);
      }
    } finally {
      if (home != null) {
        try (Stream<Path> files = Files.walk(home)) {
          files.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        }
      }
    }
  }

  static Rest.Response call(String method, String path, String json) throws IOException {
    HttpRequest.Builder request = HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + port + path))
        .timeout(Duration.ofSeconds(60))
        .header("Content-Type", path.contains("_bulk") ? "application/x-ndjson" : "application/json")
        .method(method, json == null ? HttpRequest.BodyPublishers.noBody() : HttpRequest.BodyPublishers.ofString(json));
    try {
      HttpResponse<String> response = HTTP.send(request.build(), HttpResponse.BodyHandlers.ofString());
      return new Rest.Response(response.statusCode(), response.body());
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      throw new IOException(e);
    }
  }

  private static void run(List<String> command) throws IOException, InterruptedException {
    ProcessBuilder builder = new ProcessBuilder(command).redirectErrorStream(true);
    builder.environment().put("OPENSEARCH_JAVA_HOME", System.getProperty("java.home"));
    Process process = builder.start();
    String output = new String(process.getInputStream().readAllBytes());
    assertTrue(command + " did not finish", process.waitFor(300, TimeUnit.SECONDS));
    assertEquals(command + ": " + output, 0, process.exitValue());
  }

  private static int freePort() throws IOException {
    try (ServerSocket socket = new ServerSocket(0)) {
      return socket.getLocalPort();
    }
  }

  @Test
  public void theInstalledPluginTagsIndexesAndQueries() throws IOException {
    Rest.Response plugins = call("GET", "/_cat/plugins?format=json", null);
    assertTrue(plugins.text, plugins.text.contains("\"component\":\"wordclass\""));
    scenario.createAndIndex();
    scenario.analyzeShowsClasses();
    scenario.queriesFindByClass();
    scenario.resultsComeFromEveryShard();
    scenario.badQueriesAreRefused();
    call("DELETE", "/" + RestScenario.INDEX, null);
  }

  @Test
  public void badSettingsAreRefusedWith400() throws IOException {
    // locked.wcm belongs to the node's user, who may not read it
    scenario.badSettingsAreRefused("wordclass/locked.wcm");
  }
}
