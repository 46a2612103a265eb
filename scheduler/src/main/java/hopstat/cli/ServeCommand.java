package hopstat.cli;

import hopstat.serve.BatchService;
import hopstat.serve.ServiceSpec;
import hopstat.task.InvalidInputException;
import java.io.IOException;
import java.net.InetAddress;
import java.net.UnknownHostException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;

/** {@code hopstat serve --root DIR}: the batch service (queue, inbox, HTTP API, dashboard). */
@Command(
    name = "serve",
    mixinStandardHelpOptions = true,
    description =
        "Run the batch service on a root directory: a durable priority queue of jobs run one at a time"
            + " on this machine, fed by DIR/inbox/ (drop NAME.json or NAME@PRIORITY.json, written elsewhere and renamed in) and a loopback HTTP API,"
            + " with a live dashboard at its address. Survives restarts and kills: queued jobs stay queued, the running one resumes from its journal."
            + " Stop with Ctrl-C (the running job is re-queued).")
final class ServeCommand implements Callable<Integer> {

  /** Default TCP port. */
  static final int DEFAULT_PORT = 8421;

  @ParentCommand HopstatCommand root;

  @Option(
      names = "--root",
      required = true,
      paramLabel = "DIR",
      description = "Service root: jobs/, inbox/, rejected/, service.lock.")
  Path rootDir;

  @Option(
      names = "--port",
      paramLabel = "P",
      defaultValue = "" + DEFAULT_PORT,
      description = "TCP port (default ${DEFAULT-VALUE}; 0 = any free port, see DIR/service.json).")
  int port;

  @Option(
      names = "--threads",
      paramLabel = "N",
      description = "Worker threads; the running job gets all of them (default: all cores).")
  Integer threads;

  @Option(
      names = "--bind",
      paramLabel = "ADDR",
      defaultValue = "127.0.0.1",
      description =
          "Listen address (default ${DEFAULT-VALUE}); any non-loopback address requires --token-file.")
  String bind;

  @Option(
      names = "--token-file",
      paramLabel = "F",
      description =
          "File holding the API token (>= 16 bytes, surrounding whitespace ignored); every request must then send 'Authorization: Bearer TOKEN'.")
  Path tokenFile;

  @Option(
      names = "--linalg",
      paramLabel = "KIND",
      defaultValue = LinalgChoice.DEFAULT,
      description = "Dense linear algebra for the jobs: auto, native, java.")
  String linalg;

  @Option(
      names = "--pace-ms",
      hidden = true,
      defaultValue = "0",
      description =
          "Pause each worker this long after every realisation (demonstrations and tests).")
  long paceMillis;

  @Override
  public Integer call() throws IOException, InterruptedException {
    ServiceSpec spec =
        new ServiceSpec(
            rootDir,
            address(bind),
            port,
            RunCommand.threads(threads),
            LinalgChoice.resolve(linalg),
            token(tokenFile),
            Duration.ofMillis(paceMillis),
            Duration.ofMillis(500));
    BatchService service = BatchService.start(spec, Clock.systemUTC());
    Thread hook =
        new Thread(
            () -> {
              try {
                service.close();
              } catch (IOException e) {
                root.err.println("hopstat: stopping the service: " + e.getMessage());
              }
            },
            "hopstat-serve-stop");
    Runtime.getRuntime().addShutdownHook(hook);
    root.out.println(
        "hopstat service on "
            + service.uri()
            + " for "
            + spec.root()
            + " ("
            + spec.threads()
            + " thread(s)"
            + (spec.hasToken() ? ", token required" : "")
            + "); Ctrl-C stops it");
    service.awaitClosed();
    return ExitCode.OK;
  }

  private static InetAddress address(String text) {
    try {
      return InetAddress.getByName(text);
    } catch (UnknownHostException e) {
      throw new InvalidInputException("--bind", text, "not an address of this machine");
    }
  }

  private static byte[] token(Path file) {
    if (file == null) {
      return null;
    }
    try {
      return Files.readString(file, StandardCharsets.UTF_8)
          .strip()
          .getBytes(StandardCharsets.UTF_8);
    } catch (IOException e) {
      throw new InvalidInputException(
          "--token-file",
          file.toString(),
          "cannot read the token file (" + e.getClass().getSimpleName() + ")");
    }
  }
}
