package hopstat.serve;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import hopstat.cli.ExitCode;
import hopstat.cli.HopstatCommand;
import hopstat.queue.JournalReader;
import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Crash recovery: the service runs in a child JVM, is killed with SIGKILL in the middle of a job,
 * and started again on the same root. The job must complete with summaries byte-identical to a
 * plain {@code hopstat run} of the same spec, and the realisations journaled before the kill must
 * not be run again.
 */
class RestartRecoveryTest {

  @TempDir Path root;
  @TempDir Path work;

  @Test
  void aKilledServiceResumesItsJobsExactly() throws Exception {
    String spec =
        ServeFixtures.smallQwz("restart-qwz", 10); // 3 points x 10 realisations = 30 tasks
    String jobId;
    String queuedId;
    try (ServiceProcess first =
        ServiceProcess.start(root, work.resolve("logs"), "first", "--pace-ms", "150")) {
      ServeFixtures.Client api = new ServeFixtures.Client(first.uri, null);
      HttpResponse<String> r = api.post("api/jobs", spec);
      assertThat(r.statusCode()).as(r.body()).isEqualTo(201);
      jobId = api.json(r).path("job").path("id").asText();
      HttpResponse<String> q = api.post("api/jobs", ServeFixtures.smallQwz("waits-its-turn", 2));
      queuedId = api.json(q).path("job").path("id").asText();
      ServeFixtures.await(
          "some realisations to be journaled",
          Duration.ofSeconds(60),
          () -> finished(api, jobId) >= 5);
      first.kill();
    }
    long journaledBeforeKill =
        JournalReader.read(root.resolve("jobs").resolve(jobId).resolve("run").resolve("journal"))
            .records()
            .size();
    assertThat(journaledBeforeKill).isBetween(5L, 29L);
    JsonNode record =
        ServeFixtures.JSON.readTree(
            root.resolve("jobs").resolve(jobId).resolve("job.json").toFile());
    assertThat(record.path("state").asText()).isEqualTo("RUNNING"); // the kill left it as it was

    try (ServiceProcess second = ServiceProcess.start(root, work.resolve("logs"), "second")) {
      ServeFixtures.Client api = new ServeFixtures.Client(second.uri, null);
      ServeFixtures.await(
          "the job to complete after the restart",
          Duration.ofSeconds(60),
          () -> api.state(jobId).equals("DONE"));
      ServeFixtures.await(
          "the queued job to run after it",
          Duration.ofSeconds(60),
          () -> api.state(queuedId).equals("DONE"));
      JsonNode history = api.status(jobId).path("job").path("history");
      assertThat(history)
          .extracting(e -> e.path("to").asText())
          .containsExactly("QUEUED", "RUNNING", "QUEUED", "RUNNING", "DONE");
    }

    Path served = root.resolve("jobs").resolve(jobId).resolve("run");
    // exactly once: the second session ran only what the first had not journaled
    List<Path> parts;
    try (Stream<Path> s = Files.list(served.resolve("journal"))) {
      parts = s.sorted().toList();
    }
    assertThat(parts)
        .extracting(p -> p.getFileName().toString())
        .containsExactly("part-0001.jsonl", "part-0002.jsonl");
    assertThat(Files.readAllLines(parts.get(1))).hasSize((int) (30 - journaledBeforeKill));

    Path specFile = Files.writeString(work.resolve("spec.json"), spec, StandardCharsets.UTF_8);
    Path plain = work.resolve("plain");
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    ByteArrayOutputStream err = new ByteArrayOutputStream();
    int code =
        HopstatCommand.execute(
            new String[] {
              "run",
              specFile.toString(),
              "--out",
              plain.toString(),
              "--threads",
              "1",
              "--linalg",
              "java",
              "--quiet"
            },
            new PrintStream(out, true, StandardCharsets.UTF_8),
            new PrintStream(err, true, StandardCharsets.UTF_8));
    assertThat(code).as(err.toString(StandardCharsets.UTF_8)).isEqualTo(ExitCode.OK);
    for (String f : List.of("summary.csv", "summary.json", "spec.json")) {
      assertThat(Files.readAllBytes(served.resolve(f)))
          .as(f)
          .isEqualTo(Files.readAllBytes(plain.resolve(f)));
    }
  }

  private static long finished(ServeFixtures.Client api, String id) {
    try {
      return api.status(id).path("progress").path("finished").asLong();
    } catch (Exception e) {
      throw new AssertionError(e);
    }
  }
}
