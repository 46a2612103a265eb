package hopstat.serve;

import static org.assertj.core.api.Assertions.assertThat;

import hopstat.cli.ExitCode;
import hopstat.cli.HopstatCommand;
import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The {@code serve} command's refusals, and a graceful stop that re-queues the running job. */
class ServeCommandTest {

  @TempDir Path root;

  private static String[] run(String... args) {
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    ByteArrayOutputStream err = new ByteArrayOutputStream();
    int code =
        HopstatCommand.execute(
            args,
            new PrintStream(out, true, StandardCharsets.UTF_8),
            new PrintStream(err, true, StandardCharsets.UTF_8));
    return new String[] {Integer.toString(code), err.toString(StandardCharsets.UTF_8)};
  }

  @Test
  void nonLoopbackBindWithoutATokenIsBadInput() {
    String[] r = run("serve", "--root", root.toString(), "--bind", "0.0.0.0", "--port", "0");
    assertThat(r[0]).isEqualTo(Integer.toString(ExitCode.BAD_INPUT));
    assertThat(r[1])
        .contains(
            "--bind: binding an address other than loopback needs a token (--token-file) (got 0.0.0.0)");
    assertThat(root.resolve("service.lock")).doesNotExist(); // refused before touching the root
  }

  @Test
  void shortOrMissingTokenFilesAreBadInput() throws Exception {
    Path shortToken = Files.writeString(root.resolve("token"), "  short\n");
    String[] r =
        run(
            "serve",
            "--root",
            root.resolve("svc").toString(),
            "--token-file",
            shortToken.toString(),
            "--port",
            "0");
    assertThat(r[0]).isEqualTo(Integer.toString(ExitCode.BAD_INPUT));
    assertThat(r[1]).contains("--token-file: the token must be at least 16 bytes (got 5 bytes)");
    String[] missing =
        run(
            "serve",
            "--root",
            root.resolve("svc").toString(),
            "--token-file",
            root.resolve("nope").toString(),
            "--port",
            "0");
    assertThat(missing[0]).isEqualTo(Integer.toString(ExitCode.BAD_INPUT));
    assertThat(missing[1]).contains("--token-file: cannot read the token file");
  }

  @Test
  void closingTheServiceRequeuesTheRunningJobWhichThenFinishes() throws Exception {
    String id;
    try (BatchService service = ServeFixtures.start(root, null, Duration.ofMillis(50))) {
      id = service.submit(ServeFixtures.smallQwz("graceful", 10), 0, "api", null).id();
      ServeFixtures.await(
          "some progress",
          Duration.ofSeconds(30),
          () -> service.progress(id).map(p -> p.finished() >= 2).orElse(false));
    }
    assertThat(root.resolve("service.json")).doesNotExist();
    try (BatchService again = ServeFixtures.start(root, null, Duration.ZERO)) {
      JobRecord stopped = again.job(id).orElseThrow();
      // The restarted service may already have picked the job up again (a fourth entry, RUNNING).
      assertThat(stopped.history())
          .extracting(JobEvent::to)
          .startsWith(JobState.QUEUED, JobState.RUNNING, JobState.QUEUED);
      ServeFixtures.await(
          "the job to finish",
          Duration.ofSeconds(30),
          () -> again.job(id).orElseThrow().state() == JobState.DONE);
      assertThat(again.status(id).orElseThrow().path("progress").path("finished").asLong())
          .isEqualTo(30);
    }
  }
}
