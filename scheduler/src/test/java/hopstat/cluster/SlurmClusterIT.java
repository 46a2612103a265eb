package hopstat.cluster;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assertions.fail;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.LocalDateTime;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * hopstat on a real Slurm: the shaded jar is submitted with {@code hopstat submit}, runs as array
 * elements under slurmd, and is watched and recovered with {@code status} and {@code resume}, all
 * as separate processes as a user would run them. Needs a reachable Slurm whose jobs can read this
 * machine's /tmp (the single-node cluster of {@code .ci/slurm-up.sh}). With {@code CI=true} an
 * unreachable Slurm fails the tests; elsewhere they are skipped with the reason.
 *
 * <p>Run with {@code mvn -Pslurm verify} (failsafe, after the jar is packaged).
 */
class SlurmClusterIT {

  /**
   * QWZ at L = 6, three disorder strengths, 8 realisations: ~1 s of work per shard, so Slurm's
   * scheduling dominates.
   */
  static final String SPEC =
      """
      {
        "name": "slurm-it-qwz",
        "description": "Cluster integration test: QWZ L=6 under onsite box disorder at three W.",
        "seed": 4242,
        "model": "qwz",
        "parameters": { "m": 1.0, "W": [1.0, 3.0, 5.0], "L": 6, "fermiEnergy": 0.0 },
        "disorder": [ { "type": "onsite-box", "strength": "W" } ],
        "boundary": "periodic",
        "observables": ["gap", "bott"],
        "realisations": 8
      }
      """;

  static final Duration JOB_WAIT = Duration.ofSeconds(120);
  static final ObjectMapper JSON = new ObjectMapper();

  @TempDir static Path tmp;
  static Path jar;
  static Path spec;
  static Path local;

  record Result(int exit, String out, String err) {}

  /** Why Slurm cannot be used, or null when it can. */
  static String unavailable;

  @BeforeAll
  static void needsSlurmAndTheJar() throws Exception {
    String reason = slurmProblem();
    if (reason != null) {
      unavailable =
          "Slurm is not reachable ("
              + reason
              + "); start the test cluster with `bash .ci/slurm-up.sh`";
      if ("true".equals(System.getenv("CI"))) {
        fail(unavailable);
      }
      return;
    }
    String jarProperty = System.getProperty("hopstat.jar");
    assertThat(jarProperty)
        .as("system property hopstat.jar (set by the slurm profile)")
        .isNotNull();
    jar = Path.of(jarProperty).toAbsolutePath();
    assertThat(jar).as("the shaded jar; the slurm profile runs after package").isRegularFile();
    spec = tmp.resolve("spec.json");
    Files.writeString(spec, SPEC);
    local = tmp.resolve("local");
    Result run =
        hopstat("run", spec.toString(), "--out", local.toString(), "--threads", "1", "--quiet");
    assertThat(run.exit()).as(run.err()).isZero();
  }

  /**
   * Outside CI, each test is reported as skipped with the reason (an abort in @BeforeAll would hide
   * it).
   */
  @BeforeEach
  void skipWithoutSlurm() {
    Assumptions.assumeTrue(unavailable == null, unavailable);
  }

  /**
   * Null if {@code scontrol ping} says the controller is up and a partition is up, else why not.
   */
  static String slurmProblem() {
    try {
      Result ping = exec(List.of("scontrol", "ping"));
      if (ping.exit() != 0 || !ping.out().contains("UP")) {
        return "scontrol ping: " + (ping.out() + ping.err()).strip();
      }
      Result parts = exec(List.of("sinfo", "-h", "-o", "%a %D"));
      if (parts.exit() != 0 || !parts.out().contains("up")) {
        return "sinfo shows no partition that is up: " + (parts.out() + parts.err()).strip();
      }
      return null;
    } catch (IOException e) {
      return e.getMessage();
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      return "interrupted";
    }
  }

  @Test
  void clusterSummaryEqualsTheLocalRunByteForByteAndTheReportRunsAfterTheArray() throws Exception {
    Path dir = tmp.resolve("clean");
    Result submit =
        hopstat(
            "submit",
            spec.toString(),
            "--out",
            dir.toString(),
            "--tasks",
            "3",
            "--time",
            "00:05:00");
    assertThat(submit.exit()).as(submit.err()).isZero();
    JsonNode sub = cluster(dir).path("submissions").get(0);
    assertThat(sub.path("shards").toString()).isEqualTo("[0,1,2]");
    String array = sub.path("arrayJobId").asText();
    String report = sub.path("reportJobId").asText();
    assertThat(submit.out()).contains("shard array " + array, "report job " + report);

    awaitEnded(report, dir);
    assertThat(state(report)).isEqualTo("COMPLETED");
    assertThat(Files.readAllBytes(dir.resolve("summary.csv")))
        .isEqualTo(Files.readAllBytes(local.resolve("summary.csv")));
    assertThat(Files.readAllBytes(dir.resolve("summary.json")))
        .isEqualTo(Files.readAllBytes(local.resolve("summary.json")));
    // afterany: the report job started no earlier than the last array element ended.
    LocalDateTime reportStart = LocalDateTime.parse(field(report, "StartTime").get(0));
    for (String end : field(array, "EndTime")) {
      assertThat(reportStart).isAfterOrEqualTo(LocalDateTime.parse(end));
    }
    try (Stream<Path> journals = Files.list(dir.resolve("journal"))) {
      assertThat(
              journals
                  .map(p -> p.getFileName().toString().substring(0, "shard-0000".length()))
                  .sorted()
                  .toList())
          .containsExactly("shard-0000", "shard-0001", "shard-0002");
    }
    Result status = hopstat("status", dir.toString());
    assertThat(status.exit()).as(status.err()).isZero();
    assertThat(status.out()).contains("24 of 24 realisations journaled");
    assertThat(rows(status.out()))
        .allSatisfy(row -> assertThat(row).contains("8/8", "yes", "completed", "0:0"));
  }

  @Test
  void aFailedShardShowsInStatusAndResumeResubmitsOnlyIt() throws Exception {
    Path dir = tmp.resolve("faulty");
    // Test hook of the shard command: this file makes shard 1 exit 1 before any work.
    Files.createDirectories(dir.resolve("cluster"));
    Path fault = dir.resolve("cluster/fault-shard-0001");
    Files.createFile(fault);
    Result submit =
        hopstat(
            "submit",
            spec.toString(),
            "--out",
            dir.toString(),
            "--tasks",
            "3",
            "--time",
            "00:05:00");
    assertThat(submit.exit()).as(submit.err()).isZero();
    JsonNode first = cluster(dir).path("submissions").get(0);
    String array = first.path("arrayJobId").asText();
    String report = first.path("reportJobId").asText();

    // While the run's jobs are queued or running, resume refuses (a running shard's lock, or
    // Slurm's job states, whichever it sees first); the report job is still active afterwards,
    // so it was during the call.
    Result early = hopstat("resume", dir.toString());
    if (isActive(report)) {
      assertThat(early.exit()).isEqualTo(1);
      assertThat(early.err()).containsAnyOf("still queued or running", "are running right now");
      assertThat(cluster(dir).path("submissions").size()).isEqualTo(1);
    }

    awaitEnded(report, dir);
    assertThat(state(report))
        .as("the report job runs although a shard failed (afterany)")
        .isEqualTo("COMPLETED");
    Result status = hopstat("status", dir.toString());
    assertThat(status.out()).contains("16 of 24 realisations journaled");
    String shard1 = rows(status.out()).get(1);
    assertThat(shard1.split("\\s+"))
        .containsSubsequence(
            "1", "1", "0/8", "0", "no", array + "_1", "failed", "1:0", "NonZeroExitCode");
    assertThat(status.out()).contains("shard(s) [1] are incomplete");
    // The summary written after the failure shows the gap: no realisations at the shard's point.
    assertThat(Files.readString(dir.resolve("summary.csv")))
        .isNotEqualTo(Files.readString(local.resolve("summary.csv")));

    Files.delete(fault);
    Result resume = hopstat("resume", dir.toString());
    assertThat(resume.exit()).as(resume.err()).isZero();
    JsonNode second = cluster(dir).path("submissions").get(1);
    assertThat(second.path("shards").toString()).isEqualTo("[1]");
    assertThat(resume.out()).contains("array indices 1", "submission 2");
    awaitEnded(second.path("reportJobId").asText(), dir);

    assertThat(Files.readAllBytes(dir.resolve("summary.csv")))
        .isEqualTo(Files.readAllBytes(local.resolve("summary.csv")));
    assertThat(Files.readAllBytes(dir.resolve("summary.json")))
        .isEqualTo(Files.readAllBytes(local.resolve("summary.json")));
    Result after = hopstat("status", dir.toString());
    assertThat(rows(after.out()))
        .allSatisfy(row -> assertThat(row).contains("8/8", "yes", "completed"));
    Result nothingLeft = hopstat("resume", dir.toString());
    assertThat(nothingLeft.exit()).isZero();
    assertThat(nothingLeft.out()).contains("nothing to resubmit");
  }

  /**
   * One point at L = 16 with 30 realisations: several seconds of work, long enough to cancel the
   * shard midway.
   */
  static final String SLOW_SPEC =
      """
      {
        "name": "slurm-it-cancel",
        "seed": 777,
        "model": "qwz",
        "parameters": { "m": 1.0, "W": 2.0, "L": 16, "fermiEnergy": 0.0 },
        "disorder": [ { "type": "onsite-box", "strength": "W" } ],
        "boundary": "periodic",
        "observables": ["gap", "bott"],
        "realisations": 30
      }
      """;

  @Test
  void aShardCancelledMidwayKeepsItsJournalAndResumeRunsOnlyTheRest() throws Exception {
    Path slowSpec = tmp.resolve("slow.json");
    Files.writeString(slowSpec, SLOW_SPEC);
    Path dir = tmp.resolve("cancelled");
    Result submit = hopstat("submit", slowSpec.toString(), "--out", dir.toString(), "--tasks", "1");
    assertThat(submit.exit()).as(submit.err()).isZero();
    JsonNode first = cluster(dir).path("submissions").get(0);
    String array = first.path("arrayJobId").asText();

    // Cancel once the shard has journaled some realisations (scancel: SIGTERM, then SIGKILL after
    // KillWait).
    long deadline = System.nanoTime() + JOB_WAIT.toNanos();
    while (journalLines(dir) < 3) {
      if (System.nanoTime() > deadline || !isActive(array)) {
        fail("the shard did not journal 3 realisations while running (state " + state(array) + ")");
      }
      Thread.sleep(100);
    }
    Result cancel = exec(List.of("scancel", array));
    assertThat(cancel.exit()).as(cancel.err()).isZero();
    awaitEnded(first.path("reportJobId").asText(), dir);
    long kept = journalLines(dir);
    assertThat(kept).as("realisations journaled before the cancel are kept").isBetween(3L, 29L);

    Result status = hopstat("status", dir.toString());
    String shard0 = rows(status.out(), 1).get(0);
    assertThat(shard0).contains("cancelled", "no");
    Result resume = hopstat("resume", dir.toString());
    assertThat(resume.exit()).as(resume.err()).isZero();
    assertThat(resume.out())
        .contains("shard 0: " + kept + " of 30 realisation(s) journaled; resubmitting");
    awaitEnded(cluster(dir).path("submissions").get(1).path("reportJobId").asText(), dir);

    Path reference = tmp.resolve("slow-local");
    Result run =
        hopstat(
            "run", slowSpec.toString(), "--out", reference.toString(), "--threads", "2", "--quiet");
    assertThat(run.exit()).as(run.err()).isZero();
    assertThat(Files.readAllBytes(dir.resolve("summary.csv")))
        .isEqualTo(Files.readAllBytes(reference.resolve("summary.csv")));
    assertThat(Files.readAllBytes(dir.resolve("summary.json")))
        .isEqualTo(Files.readAllBytes(reference.resolve("summary.json")));
    assertThat(journalLines(dir)).as("nothing ran twice").isEqualTo(30);
  }

  @Test
  void sbatchRefusalIsExitOneWithSbatchsMessageAndOwnValidationIsExitTwo() throws Exception {
    Result badPartition =
        hopstat(
            "submit",
            spec.toString(),
            "--out",
            tmp.resolve("refused").toString(),
            "--tasks",
            "2",
            "--partition",
            "no-such-partition");
    assertThat(badPartition.exit()).isEqualTo(1);
    assertThat(badPartition.err())
        .contains("sbatch refused the job", "invalid partition specified: no-such-partition");
    Result badTime =
        hopstat(
            "submit", spec.toString(), "--out", tmp.resolve("invalid").toString(), "--time", "abc");
    assertThat(badTime.exit()).isEqualTo(2);
    assertThat(badTime.err()).contains("--time", "abc");
    assertThat(tmp.resolve("invalid")).doesNotExist();
  }

  // --- helpers -------------------------------------------------------------------------------

  static Result hopstat(String... args) throws IOException, InterruptedException {
    List<String> argv =
        new ArrayList<>(
            List.of(
                Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-jar",
                jar.toString()));
    argv.addAll(List.of(args));
    return exec(argv);
  }

  static Result exec(List<String> argv) throws IOException, InterruptedException {
    Path out = Files.createTempFile(tmp == null ? null : tmp, "out", ".txt");
    Path err = Files.createTempFile(tmp == null ? null : tmp, "err", ".txt");
    Process p =
        new ProcessBuilder(argv)
            .redirectInput(new File("/dev/null"))
            .redirectOutput(out.toFile())
            .redirectError(err.toFile())
            .start();
    if (!p.waitFor(2, TimeUnit.MINUTES)) {
      p.destroyForcibly();
      fail("timed out: " + argv);
    }
    Result r =
        new Result(
            p.exitValue(),
            Files.readString(out, StandardCharsets.UTF_8),
            Files.readString(err, StandardCharsets.UTF_8));
    Files.delete(out);
    Files.delete(err);
    return r;
  }

  static JsonNode cluster(Path dir) throws IOException {
    return JSON.readTree(dir.resolve("cluster.json").toFile());
  }

  /** The shard rows of {@code status}'s cluster table (three shards). */
  static List<String> rows(String statusOut) {
    return rows(statusOut, 3);
  }

  static List<String> rows(String statusOut, int shards) {
    List<String> lines = statusOut.lines().toList();
    int header =
        lines.indexOf(
            lines.stream().filter(l -> l.startsWith("shard  points")).findFirst().orElseThrow());
    return lines.subList(header + 1, header + 1 + shards);
  }

  /** Complete journal lines in all of the run's journal files. */
  static long journalLines(Path dir) throws IOException {
    long n = 0;
    try (Stream<Path> files = Files.list(dir.resolve("journal"))) {
      for (Path f : files.filter(p -> p.toString().endsWith(".jsonl")).toList()) {
        String text = Files.readString(f, StandardCharsets.UTF_8);
        n += text.chars().filter(c -> c == '\n').count();
      }
    }
    return n;
  }

  static String state(String jobId) throws IOException, InterruptedException {
    Result r = exec(List.of("squeue", "-h", "-t", "all", "-j", jobId, "-o", "%T"));
    assertThat(r.exit()).as(r.err()).isZero();
    return r.out().strip();
  }

  static boolean isActive(String jobId) throws IOException, InterruptedException {
    return JobPhase.of(state(jobId)).isActive();
  }

  /**
   * Values of one field over every line of {@code scontrol -o show job ID} (all elements of an
   * array).
   */
  static List<String> field(String jobId, String name) throws IOException, InterruptedException {
    Result r = exec(List.of("scontrol", "-o", "show", "job", jobId));
    assertThat(r.exit()).as(r.err()).isZero();
    List<String> values = new ArrayList<>();
    for (String line : r.out().lines().toList()) {
      for (String token : line.split("\\s+")) {
        if (token.startsWith(name + "=")) {
          values.add(token.substring(name.length() + 1));
        }
      }
    }
    return values;
  }

  static void awaitEnded(String jobId, Path dir) throws Exception {
    long deadline = System.nanoTime() + JOB_WAIT.toNanos();
    while (isActive(jobId)) {
      if (System.nanoTime() > deadline) {
        StringBuilder logs = new StringBuilder();
        try (Stream<Path> files = Files.list(dir.resolve("cluster/logs"))) {
          for (Path f : files.toList()) {
            logs.append("\n--- ").append(f.getFileName()).append('\n').append(Files.readString(f));
          }
        }
        fail(
            "job "
                + jobId
                + " still "
                + state(jobId)
                + " after "
                + JOB_WAIT.toSeconds()
                + " s; job logs:"
                + logs);
      }
      Thread.sleep(500);
    }
  }
}
