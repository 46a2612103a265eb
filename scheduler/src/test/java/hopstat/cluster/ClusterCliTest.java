package hopstat.cluster;

import static org.assertj.core.api.Assertions.assertThat;

import hopstat.cli.HopstatCommand;
import hopstat.pool.Shard;
import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The cluster commands end to end in one JVM, with Slurm's commands replaced by {@link FakeSlurm}
 * and the array elements played by calling the hidden {@code shard} command in-process: what the
 * job scripts would run on the nodes.
 */
class ClusterCliTest {

  /**
   * Small and quick: 4 grid points of QWZ at L = 4, 3 realisations each (a study, not a physics
   * check).
   */
  static final String SPEC =
      """
      {
        "name": "cluster-cli-test",
        "seed": 99,
        "model": "qwz",
        "parameters": { "m": 1.0, "W": [0.5, 1.5, 2.5, 3.5], "L": 4, "fermiEnergy": 0.0 },
        "disorder": [ { "type": "onsite-box", "strength": "W" } ],
        "boundary": "periodic",
        "observables": ["gap", "bott"],
        "realisations": 3
      }
      """;

  @TempDir Path tmp;
  Path spec;

  record Result(int exit, String out, String err) {}

  @BeforeEach
  void writeSpec() throws Exception {
    spec = tmp.resolve("spec.json");
    Files.writeString(spec, SPEC);
  }

  static Result hopstat(CommandRunner slurm, String... args) {
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    ByteArrayOutputStream err = new ByteArrayOutputStream();
    int exit =
        HopstatCommand.execute(
            args,
            new PrintStream(out, true, StandardCharsets.UTF_8),
            new PrintStream(err, true, StandardCharsets.UTF_8),
            slurm);
    return new Result(
        exit, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
  }

  @Test
  void dryRunPrintsScriptsAndCommandsAndCreatesNothing() {
    FakeSlurm fake = FakeSlurm.create();
    Path dir = tmp.resolve("c");
    Result r =
        hopstat(
            fake,
            "submit",
            spec.toString(),
            "--out",
            dir.toString(),
            "--tasks",
            "9",
            "--time",
            "00:05:00",
            "--extra",
            "--qos=short",
            "--dry-run");
    assertThat(r.exit()).as(r.err()).isZero();
    assertThat(r.err()).contains("--tasks 9 capped at 4");
    assertThat(r.out())
        .contains(
            "#SBATCH --time=00:05:00",
            "shard " + dir,
            "--count 4",
            "report " + dir,
            "sbatch --parsable --array=0-3 --qos=short "
                + dir.resolve("cluster/submit-01-shards.sbatch"),
            "sbatch --parsable '--dependency=afterany:<ARRAY_JOB_ID>' --qos=short "
                + dir.resolve("cluster/submit-01-report.sbatch"));
    assertThat(dir).doesNotExist();
    assertThat(fake.calls).isEmpty();
  }

  @Test
  void badOptionsAreBadInputAndSubmitNothing() {
    FakeSlurm fake = FakeSlurm.create();
    Result r =
        hopstat(
            fake,
            "submit",
            spec.toString(),
            "--out",
            tmp.resolve("c").toString(),
            "--tasks",
            "0",
            "--time",
            "abc");
    assertThat(r.exit()).isEqualTo(2);
    assertThat(r.err()).contains("--tasks", "--time", "abc");
    assertThat(fake.calls).isEmpty();
    assertThat(tmp.resolve("c")).doesNotExist();
  }

  @Test
  void sbatchRefusalIsRuntimeFailureWithSbatchsMessageAndResumeCanSubmitLater() throws Exception {
    Path dir = tmp.resolve("c");
    FakeSlurm refusing =
        FakeSlurm.create()
            .thenFail(
                1,
                "sbatch: error: invalid partition specified: nosuch\nsbatch: error: Batch job submission failed: Invalid partition name specified\n");
    Result r =
        hopstat(
            refusing,
            "submit",
            spec.toString(),
            "--out",
            dir.toString(),
            "--tasks",
            "2",
            "--partition",
            "nosuch");
    assertThat(r.exit()).isEqualTo(1);
    assertThat(r.err())
        .startsWith("hopstat: sbatch refused the job")
        .contains("invalid partition specified: nosuch", "hopstat resume " + dir)
        .doesNotContain("Exception");
    assertThat(r.err().lines()).hasSize(1);
    String cluster = Files.readString(dir.resolve("cluster.json"));
    assertThat(cluster).contains("\"submissions\" : [ ]");

    FakeSlurm accepting =
        FakeSlurm.create()
            .otherwise(
                argv ->
                    argv.get(0).equals("sbatch")
                        ? FakeSlurm.acceptingSbatch(500).apply(argv)
                        : new CommandOutput(
                            1, "", "slurm_load_jobs error: Invalid job id specified\n"));
    Result resumed = hopstat(accepting, "resume", dir.toString(), "--partition", "debug");
    assertThat(resumed.exit()).as(resumed.err()).isZero();
    assertThat(accepting.callsOf("sbatch")).hasSize(2);
    assertThat(accepting.callsOf("sbatch").get(0)).contains("--array=0-1");
    assertThat(Files.readString(dir.resolve("cluster/submit-01-shards.sbatch")))
        .contains("#SBATCH --partition=debug");
  }

  @Test
  void failedShardIsShownAndOnlyItIsResubmittedAndTheSummaryMatchesALocalRun() throws Exception {
    Path local = tmp.resolve("local");
    Result run =
        hopstat(
            FakeSlurm.create(),
            "run",
            spec.toString(),
            "--out",
            local.toString(),
            "--threads",
            "1",
            "--quiet");
    assertThat(run.exit()).as(run.err()).isZero();

    Path dir = tmp.resolve("cluster");
    FakeSlurm submitFake = FakeSlurm.create().otherwise(FakeSlurm.acceptingSbatch(100));
    Result submitted =
        hopstat(submitFake, "submit", spec.toString(), "--out", dir.toString(), "--tasks", "3");
    assertThat(submitted.exit()).as(submitted.err()).isZero();
    assertThat(submitted.out()).contains("shard array 100", "report job 101");
    assertThat(submitFake.calls)
        .containsExactly(
            List.of(
                "sbatch",
                "--parsable",
                "--array=0-2",
                dir.resolve("cluster/submit-01-shards.sbatch").toString()),
            List.of(
                "sbatch",
                "--parsable",
                "--dependency=afterany:100",
                dir.resolve("cluster/submit-01-report.sbatch").toString()));

    // The array elements, as the nodes would run them; shard 1 fails through the test hook.
    Files.createFile(dir.resolve("cluster/fault-shard-0001"));
    for (int k = 0; k < 3; k++) {
      Result shard =
          hopstat(
              FakeSlurm.create(),
              "shard",
              dir.toString(),
              "--index",
              Integer.toString(k),
              "--count",
              "3",
              "--threads",
              "1");
      assertThat(shard.exit()).as(shard.err()).isEqualTo(k == 1 ? 1 : 0);
    }
    assertThat(hopstat(FakeSlurm.create(), "report", dir.toString()).exit()).isZero();
    assertThat(Files.readString(dir.resolve("summary.csv")))
        .isNotEqualTo(Files.readString(local.resolve("summary.csv")));

    String squeue =
        "100_0 COMPLETED None\n100_1 FAILED NonZeroExitCode\n100_2 COMPLETED None\n101 COMPLETED None\n";
    String scontrol100 =
        "JobId=100 ArrayJobId=100 ArrayTaskId=2 JobState=COMPLETED Reason=None ExitCode=0:0 StartTime=2026-12-02T00:00:03 EndTime=2026-12-02T00:00:05\n"
            + "JobId=103 ArrayJobId=100 ArrayTaskId=1 JobState=FAILED Reason=NonZeroExitCode ExitCode=1:0 StartTime=2026-12-02T00:00:01 EndTime=2026-12-02T00:00:02\n"
            + "JobId=102 ArrayJobId=100 ArrayTaskId=0 JobState=COMPLETED Reason=None ExitCode=0:0 StartTime=2026-12-02T00:00:01 EndTime=2026-12-02T00:00:03\n";
    String scontrol101 =
        "JobId=101 JobState=COMPLETED Reason=None ExitCode=0:0 StartTime=2026-12-02T00:00:06 EndTime=2026-12-02T00:00:07\n";
    FakeSlurm statusFake =
        FakeSlurm.create().thenOk(squeue).thenOk(scontrol100).thenOk(scontrol101);
    Result status = hopstat(statusFake, "status", dir.toString());
    assertThat(status.exit()).as(status.err()).isZero();
    String shard1 = status.out().lines().filter(l -> l.startsWith("1 ")).findFirst().orElseThrow();
    assertThat(shard1.split("\\s+"))
        .containsSubsequence(
            "1", "1", "0/3", "0", "no", "100_1", "failed", "1:0", "NonZeroExitCode");
    assertThat(status.out()).contains("shard(s) [1] are incomplete");

    Files.delete(dir.resolve("cluster/fault-shard-0001"));
    FakeSlurm resumeFake =
        FakeSlurm.create()
            .thenOk(squeue)
            .thenOk(scontrol100)
            .thenOk(scontrol101)
            .otherwise(FakeSlurm.acceptingSbatch(200));
    Result resumed = hopstat(resumeFake, "resume", dir.toString());
    assertThat(resumed.exit()).as(resumed.err()).isZero();
    assertThat(resumeFake.callsOf("sbatch"))
        .containsExactly(
            List.of(
                "sbatch",
                "--parsable",
                "--array=1",
                dir.resolve("cluster/submit-02-shards.sbatch").toString()),
            List.of(
                "sbatch",
                "--parsable",
                "--dependency=afterany:200",
                dir.resolve("cluster/submit-02-report.sbatch").toString()));

    assertThat(
            hopstat(
                    FakeSlurm.create(),
                    "shard",
                    dir.toString(),
                    "--index",
                    "1",
                    "--count",
                    "3",
                    "--threads",
                    "1")
                .exit())
        .isZero();
    assertThat(hopstat(FakeSlurm.create(), "report", dir.toString()).exit()).isZero();
    assertThat(Files.readAllBytes(dir.resolve("summary.csv")))
        .isEqualTo(Files.readAllBytes(local.resolve("summary.csv")));
    assertThat(Files.readAllBytes(dir.resolve("summary.json")))
        .isEqualTo(Files.readAllBytes(local.resolve("summary.json")));
  }

  @Test
  void withoutSlurmResumePointsToLocalAndLocalResumeFinishesTheRun() throws Exception {
    Path dir = tmp.resolve("c");
    assertThat(
            hopstat(
                    FakeSlurm.create().otherwise(FakeSlurm.acceptingSbatch(10)),
                    "submit",
                    spec.toString(),
                    "--out",
                    dir.toString(),
                    "--tasks",
                    "2")
                .exit())
        .isZero();
    CommandRunner missing =
        argv -> {
          throw new ClusterException(
              "cannot run `"
                  + argv.get(0)
                  + "` (error=2, No such file or directory); is this a Slurm login node with the Slurm commands on PATH?");
        };
    Result r = hopstat(missing, "resume", dir.toString());
    assertThat(r.exit()).isEqualTo(1);
    assertThat(r.err()).contains("cannot run `squeue`", "--local");
    Result local =
        hopstat(missing, "resume", dir.toString(), "--local", "--threads", "1", "--quiet");
    assertThat(local.exit()).as(local.err()).isZero();
    assertThat(local.err()).contains("going on locally");
    Path reference = tmp.resolve("reference");
    assertThat(
            hopstat(
                    FakeSlurm.create(),
                    "run",
                    spec.toString(),
                    "--out",
                    reference.toString(),
                    "--threads",
                    "2",
                    "--quiet")
                .exit())
        .isZero();
    assertThat(Files.readAllBytes(dir.resolve("summary.csv")))
        .isEqualTo(Files.readAllBytes(reference.resolve("summary.csv")));
  }

  @Test
  void aShardStartsAgainAfterEarlierSessionsOfItself() throws Exception {
    // A resubmitted shard opens a new journal file next to its own earlier ones (shard-0000-NNNN):
    // the session number must not be taken from the shard index in the name.
    Path dir = tmp.resolve("c");
    assertThat(
            hopstat(
                    FakeSlurm.create().otherwise(FakeSlurm.acceptingSbatch(10)),
                    "submit",
                    spec.toString(),
                    "--out",
                    dir.toString(),
                    "--tasks",
                    "1")
                .exit())
        .isZero();
    for (int session = 0; session < 3; session++) {
      Result r =
          hopstat(FakeSlurm.create(), "shard", dir.toString(), "--index", "0", "--count", "1");
      assertThat(r.exit()).as(r.err()).isZero();
    }
    try (var files = Files.list(dir.resolve("journal"))) {
      assertThat(files.map(p -> p.getFileName().toString()).sorted().toList())
          .containsExactly(
              "shard-0000-0001.jsonl", "shard-0000-0002.jsonl", "shard-0000-0003.jsonl");
    }
  }

  @Test
  void resumeRefusesWhileAShardWorksOrSlurmStillHasJobs() throws Exception {
    Path dir = tmp.resolve("c");
    assertThat(
            hopstat(
                    FakeSlurm.create().otherwise(FakeSlurm.acceptingSbatch(10)),
                    "submit",
                    spec.toString(),
                    "--out",
                    dir.toString(),
                    "--tasks",
                    "2")
                .exit())
        .isZero();
    try (ShardLock held = ShardLock.acquire(dir, new Shard(1, 2))) {
      Result local = hopstat(FakeSlurm.create(), "resume", dir.toString(), "--local", "--quiet");
      assertThat(local.exit()).isEqualTo(1);
      assertThat(local.err()).contains("shard(s) [1]", "running right now");
      Result shardAgain =
          hopstat(FakeSlurm.create(), "shard", dir.toString(), "--index", "1", "--count", "2");
      assertThat(shardAgain.exit()).isEqualTo(1);
      assertThat(shardAgain.err()).contains("already being worked on");
    }
    FakeSlurm pending =
        FakeSlurm.create()
            .thenOk("10_0 RUNNING None\n10_1 PENDING Resources\n11 PENDING Dependency\n")
            .otherwise(argv -> new CommandOutput(0, "", ""));
    Result r = hopstat(pending, "resume", dir.toString());
    assertThat(r.exit()).isEqualTo(1);
    assertThat(r.err())
        .contains("still queued or running", "10_0 (running)", "11 (pending)", "scancel 10 11");
    assertThat(pending.callsOf("sbatch")).isEmpty();
  }
}
