package org.wordclass.nodetesting;

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
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

/**
 * A real search-engine node from its unpacked distribution, for the tests that install our plugin
 * zip on it: the distribution is copied to a fresh temporary folder, the zip installed there with
 * the distribution's own installer ({@code bin/<engine>-plugin install --batch}), the node started
 * as its own process bound to 127.0.0.1 on free ports, and at the end stopped by the PID it wrote
 * and its folder removed.
 *
 * <p>Both engines refuse to run as root, and CI runs as root: there the folder is handed to the
 * unprivileged user {@code nobody} and the node started through {@code runuser}. The launcher
 * script starts a separate server process; {@link #close()} stops that one by its PID, then checks
 * that it and the launcher have ended. Starting a node takes most of a test's time: a few tens of
 * seconds on two cores, more under load (hence the generous start timeout).
 */
public final class NodeProcess implements AutoCloseable, Rest {
  /** What differs between the engines' distributions. */
  public enum Engine {
    OPENSEARCH("opensearch", "OPENSEARCH", "/_cluster/health?wait_for_status=yellow&timeout=1s"),
    ELASTICSEARCH("elasticsearch", "ES", "/_nodes");

    final String command;
    final String envPrefix;
    final String readiness;

    Engine(String command, String envPrefix, String readiness) {
      this.command = command;
      this.envPrefix = envPrefix;
      this.readiness = readiness;
    }
  }

  private static final HttpClient HTTP = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(5)).build();
  private static final boolean ROOT = "root".equals(System.getProperty("user.name"));
  private static final String USER = "nobody";
  private static final long START_SECONDS = 120;

  private final Engine engine;
  private final Path home;
  private Process launcher;
  private long serverPid = -1;
  private int port;

  private NodeProcess(Engine engine, Path home) {
    this.engine = engine;
    this.home = home;
  }

  /** A fresh copy of {@code distribution} with {@code pluginZip} installed; not started yet. */
  public static NodeProcess install(Engine engine, Path distribution, Path pluginZip) throws IOException, InterruptedException {
    Path home = Files.createTempDirectory(Path.of(System.getProperty("java.io.tmpdir")), engine.command + "-node-");
    NodeProcess node = new NodeProcess(engine, home);
    try {
      node.run(List.of("cp", "-a", distribution + "/.", home.toString()));
      Files.setPosixFilePermissions(home, PosixFilePermissions.fromString("rwxr-xr-x"));
      node.run(List.of(home + "/bin/" + engine.command + "-plugin", "install", "--batch", pluginZip.toUri().toString()));
      return node;
    } catch (IOException | InterruptedException | RuntimeException | Error e) {
      node.close();
      throw e;
    }
  }

  /** The node's configuration directory, where the tests put model and lexicon files before {@link #start}. */
  public Path configDir() {
    return home.resolve("config");
  }

  /**
   * Starts the node with {@code heapMb} of heap and the given settings ({@code -Ekey=value}) on
   * top of single-node discovery, 127.0.0.1, free ports and data and logs in its folder; returns
   * once the node answers REST.
   */
  public void start(int heapMb, List<String> settings) throws IOException, InterruptedException {
    if (ROOT) {
      run(List.of("chown", "-R", USER, home.toString()));
    }
    port = freePort();
    List<String> command = new ArrayList<>();
    if (ROOT) {
      command.addAll(List.of("runuser", "-u", USER, "--"));
    }
    command.addAll(List.of(home + "/bin/" + engine.command, "-p", pidFile().toString(),
        "-Ediscovery.type=single-node", "-Enetwork.host=127.0.0.1", "-Ehttp.port=" + port, "-Etransport.port=" + freePort(),
        "-Epath.data=" + home.resolve("data"), "-Epath.logs=" + home.resolve("logs")));
    for (String setting : settings) {
      command.add("-E" + setting);
    }
    ProcessBuilder builder = environment(new ProcessBuilder(command)).redirectErrorStream(true)
        .redirectOutput(console().toFile());
    builder.environment().put(engine.envPrefix + "_JAVA_OPTS", "-Xms" + heapMb + "m -Xmx" + heapMb + "m -Djna.nosys=true");
    launcher = builder.start();
    awaitStarted();
  }

  private void awaitStarted() throws IOException, InterruptedException {
    long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(START_SECONDS);
    while (System.nanoTime() < deadline) {
      if (!launcher.isAlive()) {
        throw new AssertionError("the node stopped: " + consoleText());
      }
      try {
        if (call("GET", engine.readiness, null).status == 200 && Files.exists(pidFile())) {
          serverPid = Long.parseLong(Files.readString(pidFile()).trim());
          return;
        }
      } catch (IOException notYet) {
        // not listening yet
      }
      Thread.sleep(500);
    }
    throw new AssertionError("the node did not start in " + START_SECONDS + " s: " + consoleText());
  }

  /** The server process's id, as the node wrote it; -1 before it has started. */
  public long serverPid() {
    return serverPid;
  }

  @Override
  public Response call(String method, String path, String json) throws IOException {
    HttpRequest.Builder request = HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + port + path))
        .timeout(Duration.ofSeconds(60))
        .header("Content-Type", path.contains("_bulk") ? "application/x-ndjson" : "application/json")
        .method(method, json == null ? HttpRequest.BodyPublishers.noBody() : HttpRequest.BodyPublishers.ofString(json));
    try {
      HttpResponse<String> response = HTTP.send(request.build(), HttpResponse.BodyHandlers.ofString());
      return new Response(response.statusCode(), response.body());
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      throw new IOException(e);
    }
  }

  /**
   * Stops the server by its PID (SIGTERM, as a service manager would), waits for it and the
   * launcher to end, and removes the node's folder, whatever happened before. Fails if a process
   * outlives the wait (it is then killed).
   */
  @Override
  public void close() {
    List<String> survivors = new ArrayList<>();
    try {
      // taken first: once the server has gone, the launcher's children are no longer its descendants
      List<ProcessHandle> started = new ArrayList<>();
      if (launcher != null) {
        started.addAll(launcher.descendants().toList());
        started.add(launcher.toHandle());
      }
      if (serverPid > 0) {
        stop(ProcessHandle.of(serverPid), "server " + serverPid, survivors);
      }
      for (ProcessHandle process : started) {
        stop(Optional.of(process), "launched " + process.pid() + " " + process.info().command().orElse(""), survivors);
      }
    } finally {
      delete(home);
    }
    assertTrue("still running after 60 s, killed: " + survivors, survivors.isEmpty());
  }

  private static void stop(Optional<ProcessHandle> process, String name, List<String> survivors) {
    if (process.isEmpty() || !process.get().isAlive()) {
      return;
    }
    process.get().destroy();
    try {
      process.get().onExit().get(60, TimeUnit.SECONDS);
    } catch (Exception stillThere) {
      process.get().destroyForcibly();
      survivors.add(name);
    }
  }

  private static void delete(Path dir) {
    if (dir == null || !Files.exists(dir)) {
      return;
    }
    try (Stream<Path> files = Files.walk(dir)) {
      files.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
    } catch (IOException e) {
      throw new AssertionError("could not remove " + dir, e);
    }
  }

  private Path pidFile() {
    return home.resolve("node.pid");
  }

  private Path console() {
    return home.resolve("console.log");
  }

  private String consoleText() throws IOException {
    return Files.exists(console()) ? Files.readString(console()) : "(no output)";
  }

  private ProcessBuilder environment(ProcessBuilder builder) {
    builder.environment().put(engine.envPrefix + "_JAVA_HOME", System.getProperty("java.home"));
    return builder;
  }

  private void run(List<String> command) throws IOException, InterruptedException {
    Process process = environment(new ProcessBuilder(command)).redirectErrorStream(true).start();
    String output = new String(process.getInputStream().readAllBytes());
    assertTrue(command + " did not finish", process.waitFor(300, TimeUnit.SECONDS));
    assertEquals(command + ": " + output, 0, process.exitValue());
  }

  private static int freePort() throws IOException {
    try (ServerSocket socket = new ServerSocket(0)) {
      return socket.getLocalPort();
    }
  }
}
