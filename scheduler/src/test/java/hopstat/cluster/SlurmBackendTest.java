package hopstat.cluster;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import hopstat.expand.GridExpander;
import hopstat.expand.StudyPlan;
import hopstat.linalg.LinalgKind;
import hopstat.pool.LocalPoolBackend;
import hopstat.pool.ProgressListener;
import hopstat.pool.RunOptions;
import hopstat.pool.RunResult;
import hopstat.pool.Shard;
import hopstat.queue.JournalWriter;
import hopstat.queue.RunDirectory;
import hopstat.spec.SpecParser;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SlurmBackendTest {

  @TempDir Path tmp;

  private static final Clock CLOCK =
      Clock.fixed(Instant.parse("2026-12-02T00:00:00Z"), ZoneOffset.UTC);
  private static final JavaLauncher LAUNCHER =
      new JavaLauncher("/opt/jdk/bin/java", List.of("-jar", "/opt/hopstat.jar"));

  private StudyPlan plan() {
    return GridExpander.expand(SpecParser.parse(ClusterCliTest.SPEC));
  }

  private RunDirectory newRun(StudyPlan plan, ClusterRun run) throws Exception {
    RunDirectory dir =
        RunDirectory.create(
            tmp.resolve("run"), ClusterCliTest.SPEC, Map.of("specHash", plan.spec().specHash()));
    ClusterRunStore.write(dir, run);
    return dir;
  }

  @Test
  void shardCountIsCappedAtTheGridPoints() {
    StudyPlan plan = plan();
    assertThat(
            SlurmBackend.prepare(
                    plan, new SlurmSubmitSpec(10, null, null, 1, null, List.of()), LAUNCHER, "auto")
                .shardCount())
        .isEqualTo(4);
    assertThat(
            SlurmBackend.prepare(
                    plan, new SlurmSubmitSpec(3, null, null, 1, null, List.of()), LAUNCHER, "auto")
                .shardCount())
        .isEqualTo(3);
  }

  @Test
  void submitRecordsArrayAndReportJobAndWritesBothScripts() throws Exception {
    StudyPlan plan = plan();
    ClusterRun run =
        SlurmBackend.prepare(
            plan, new SlurmSubmitSpec(2, null, "10", 1, null, List.of()), LAUNCHER, "java");
    RunDirectory dir = newRun(plan, run);
    FakeSlurm fake = FakeSlurm.create().thenOk("41\n").thenOk("42\n");
    ClusterSubmission s =
        new SlurmBackend(new SlurmClient(fake), CLOCK).submit(plan, dir, run, List.of(1, 0));
    assertThat(s)
        .isEqualTo(
            new ClusterSubmission(
                1,
                "2026-12-02T00:00:00Z",
                List.of(0, 1),
                "41",
                "42",
                "cluster/submit-01-shards.sbatch",
                "cluster/submit-01-report.sbatch"));
    assertThat(ClusterRunStore.read(dir).orElseThrow().submissions()).containsExactly(s);
    assertThat(Files.readString(dir.path().resolve(s.shardScript())))
        .contains("--linalg java", "#SBATCH --time=10");
    assertThat(Files.isExecutable(dir.path().resolve(s.reportScript()))).isTrue();
    assertThat(fake.calls.get(1)).contains("--dependency=afterany:41");
  }

  @Test
  void aRefusedReportJobKeepsTheArrayOnRecordAndSaysWhatToDo() throws Exception {
    StudyPlan plan = plan();
    ClusterRun run =
        SlurmBackend.prepare(
            plan, new SlurmSubmitSpec(2, null, null, 1, null, List.of()), LAUNCHER, "auto");
    RunDirectory dir = newRun(plan, run);
    FakeSlurm fake =
        FakeSlurm.create()
            .thenOk("41\n")
            .thenFail(1, "sbatch: error: Batch job submission failed: Job dependency problem\n");
    assertThatThrownBy(
            () ->
                new SlurmBackend(new SlurmClient(fake), CLOCK)
                    .submit(plan, dir, run, List.of(0, 1)))
        .isInstanceOf(ClusterException.class)
        .hasMessageContaining("shard array 41 was submitted")
        .hasMessageContaining("Job dependency problem")
        .hasMessageContaining("hopstat report");
    ClusterSubmission recorded = ClusterRunStore.read(dir).orElseThrow().submissions().get(0);
    assertThat(recorded.arrayJobId()).isEqualTo("41");
    assertThat(recorded.reportJobId()).isNull();
  }

  @Test
  void executeSubmitsExactlyTheShardsTheJournalLacks() throws Exception {
    StudyPlan plan = plan();
    ClusterRun run =
        SlurmBackend.prepare(
            plan, new SlurmSubmitSpec(3, null, null, 1, null, List.of()), LAUNCHER, "auto");
    RunDirectory dir = newRun(plan, run);
    // Shard 2 of 3 (grid point 2) runs for real, as its array element would.
    RunResult shard2 =
        new LocalPoolBackend(CLOCK)
            .execute(
                plan,
                dir,
                new RunOptions(
                    1,
                    LinalgKind.JAVA,
                    "shard-0002",
                    new Shard(2, 3),
                    JournalWriter.DEFAULT_SYNC_INTERVAL_NANOS),
                ProgressListener.NONE);
    assertThat(shard2.finishedThisSession()).isEqualTo(3);
    List<ShardProgress> progress = ShardProgressOps.progress(plan, dir, 3);
    assertThat(progress).extracting(ShardProgress::points).containsExactly(2, 1, 1);
    assertThat(progress).extracting(ShardProgress::finished).containsExactly(0L, 0L, 3L);
    assertThat(progress).extracting(ShardProgress::complete).containsExactly(false, false, true);

    FakeSlurm fake = FakeSlurm.create().otherwise(FakeSlurm.acceptingSbatch(7));
    SlurmBackend backend = new SlurmBackend(new SlurmClient(fake), CLOCK);
    RunResult handed =
        backend.execute(
            plan,
            dir,
            new RunOptions(1, LinalgKind.JAVA, "x", Shard.ALL, 1),
            ProgressListener.NONE);
    assertThat(handed.stoppedEarly()).isTrue();
    assertThat(handed.finishedTotal()).isEqualTo(3);
    assertThat(fake.callsOf("sbatch").get(0)).contains("--array=0-1");
  }
}
