package hopstat.serve;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.net.URI;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;

/**
 * {@code hopstat serve} in a child JVM on the test classpath, so a test can kill it with SIGKILL.
 */
final class ServiceProcess implements AutoCloseable {

  final Process process;
  final URI uri;

  private ServiceProcess(Process process, URI uri) {
    this.process = process;
    this.uri = uri;
  }

  /**
   * Starts {@code hopstat serve --root ROOT --port 0 --threads 1 --linalg java} plus {@code extra}
   * arguments; output goes to files in {@code logs} (tests stay silent). Returns once service.json
   * names the new process.
   */
  static ServiceProcess start(Path root, Path logs, String label, String... extra)
      throws IOException, InterruptedException {
    String classpath =
        System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
    String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
    List<String> cmd =
        new ArrayList<>(
            List.of(
                java,
                "-Xmx512m",
                "-cp",
                classpath,
                "hopstat.cli.HopstatCommand",
                "serve",
                "--root",
                root.toString(),
                "--port",
                "0",
                "--threads",
                "1",
                "--linalg",
                "java"));
    cmd.addAll(List.of(extra));
    Files.createDirectories(logs);
    Process p =
        new ProcessBuilder(cmd)
            .redirectOutput(logs.resolve(label + ".out").toFile())
            .redirectError(logs.resolve(label + ".err").toFile())
            .start();
    Path serviceJson = root.resolve("service.json");
    long end = System.nanoTime() + Duration.ofSeconds(60).toNanos();
    while (true) {
      if (!p.isAlive()) {
        throw new IllegalStateException(
            "service exited with "
                + p.exitValue()
                + ": "
                + Files.readString(logs.resolve(label + ".err")));
      }
      if (Files.exists(serviceJson)) {
        try {
          JsonNode info = ServeFixtures.JSON.readTree(serviceJson.toFile());
          if (info.path("pid").asLong() == p.pid()) {
            return new ServiceProcess(p, URI.create(info.path("url").asText()));
          }
        } catch (IOException partial) {
          // written by temp + rename, but an old file may be replaced while we read: retry
        }
      }
      if (System.nanoTime() > end) {
        p.destroyForcibly();
        throw new IllegalStateException("service did not start within 60 s");
      }
      Thread.sleep(50);
    }
  }

  /** SIGKILL: no shutdown hook, no journal close, no record update. */
  void kill() throws InterruptedException {
    process.destroyForcibly();
    process.waitFor();
  }

  @Override
  public void close() throws InterruptedException {
    if (process.isAlive()) {
      process.destroy(); // SIGTERM: the service's shutdown hook re-queues the running job
      if (!process.waitFor(30, java.util.concurrent.TimeUnit.SECONDS)) {
        kill();
      }
    }
  }
}
