package hopstat.cluster;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;

/** Runs commands as child processes of this JVM (no shell), with a time limit. */
public final class SystemCommandRunner implements CommandRunner {

  /** Slurm's client commands answer within seconds; a hung controller must not hang hopstat. */
  public static final Duration DEFAULT_TIMEOUT = Duration.ofMinutes(2);

  private final Duration timeout;

  public SystemCommandRunner() {
    this(DEFAULT_TIMEOUT);
  }

  public SystemCommandRunner(Duration timeout) {
    this.timeout = timeout;
  }

  @Override
  public CommandOutput run(List<String> argv) throws IOException, InterruptedException {
    Process process;
    try {
      process =
          new ProcessBuilder(argv)
              .redirectInput(ProcessBuilder.Redirect.from(new java.io.File("/dev/null")))
              .start();
    } catch (IOException e) {
      throw new ClusterException(
          "cannot run `"
              + argv.get(0)
              + "` ("
              + e.getMessage()
              + "); is this a Slurm login node with the Slurm commands on PATH?");
    }
    // Both streams are drained concurrently so a chatty command cannot block on a full pipe.
    CompletableFuture<String> out =
        CompletableFuture.supplyAsync(() -> drain(process.getInputStream()));
    CompletableFuture<String> err =
        CompletableFuture.supplyAsync(() -> drain(process.getErrorStream()));
    if (!process.waitFor(timeout.toMillis(), TimeUnit.MILLISECONDS)) {
      process.destroyForcibly();
      throw new ClusterException(
          "`" + String.join(" ", argv) + "` did not answer within " + timeout.toSeconds() + " s");
    }
    try {
      return new CommandOutput(process.exitValue(), out.get(), err.get());
    } catch (ExecutionException e) {
      throw new IOException("reading the output of " + argv.get(0) + " failed", e.getCause());
    }
  }

  private static String drain(InputStream in) {
    try (in) {
      return new String(in.readAllBytes(), StandardCharsets.UTF_8);
    } catch (IOException e) {
      throw new java.io.UncheckedIOException(e);
    }
  }
}
