package hopstat.cluster;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Slurm's command lines and output parsing. The fixtures under {@code
 * src/test/resources/hopstat/cluster} are outputs of Slurm 22.05.8 ({@code squeue -h -t all -r -o
 * '%i %T %r'}, {@code scontrol -o show job}) recorded on a single-node test cluster set up by
 * {@code .ci/slurm-up.sh}: an array of three elements whose element 1 exited 1, its report job, and
 * a held array {@code 0-3,7}.
 */
class SlurmClientTest {

  private static String fixture(String name) throws IOException {
    try (InputStream in = SlurmClientTest.class.getResourceAsStream(name)) {
      return new String(in.readAllBytes(), StandardCharsets.UTF_8);
    }
  }

  @Test
  void submitRunsSbatchParsableWithOptionsBeforeTheScript() throws Exception {
    FakeSlurm fake = FakeSlurm.create().thenOk("4711\n").thenOk("4712;cluster-a\n");
    SlurmClient slurm = new SlurmClient(fake);
    assertThat(slurm.submit(Path.of("/runs/a/s.sbatch"), List.of("--array=0-2", "--qos=x")))
        .isEqualTo("4711");
    // --parsable prints "jobid" or "jobid;cluster" (sbatch(1)).
    assertThat(slurm.submit(Path.of("/runs/a/r.sbatch"), List.of())).isEqualTo("4712");
    assertThat(fake.calls.get(0))
        .containsExactly("sbatch", "--parsable", "--array=0-2", "--qos=x", "/runs/a/s.sbatch");
    assertThat(fake.calls.get(1)).containsExactly("sbatch", "--parsable", "/runs/a/r.sbatch");
  }

  @Test
  void sbatchRefusalCarriesItsOwnMessage() {
    // Recorded from sbatch 22.05.8 with -p nosuch (exit 1).
    FakeSlurm fake =
        FakeSlurm.create()
            .thenFail(
                1,
                "sbatch: error: invalid partition specified: nosuch\nsbatch: error: Batch job submission failed: Invalid partition name specified\n");
    assertThatThrownBy(
            () -> new SlurmClient(fake).submit(Path.of("/x.sbatch"), List.of("-p", "nosuch")))
        .isInstanceOf(ClusterException.class)
        .hasMessageContaining("sbatch refused the job (exit 1)")
        .hasMessageContaining("invalid partition specified: nosuch")
        .hasMessageContaining("Invalid partition name specified");
    FakeSlurm silent = FakeSlurm.create().thenOk("Submitted batch job 12\n");
    assertThatThrownBy(() -> new SlurmClient(silent).submit(Path.of("/x.sbatch"), List.of()))
        .isInstanceOf(ClusterException.class)
        .hasMessageContaining("no job id");
  }

  @Test
  void squeueLinesGiveOneStatePerArrayElement() throws IOException {
    List<SlurmJobState> s = SlurmClient.parseSqueue(fixture("squeue-finished.txt"));
    assertThat(s)
        .extracting(SlurmJobState::displayId)
        .containsExactly("10_2", "10_0", "11", "10_1");
    assertThat(s)
        .extracting(SlurmJobState::phase)
        .containsExactly(
            JobPhase.COMPLETED, JobPhase.COMPLETED, JobPhase.COMPLETED, JobPhase.FAILED);
    assertThat(s.get(3).reason()).isEqualTo("NonZeroExitCode");
    assertThat(s.get(2).arrayIndex()).isEqualTo(-1);
  }

  @Test
  void scontrolLinesGiveExitCodesAndTimesAndExpandPendingRanges() throws IOException {
    List<SlurmJobState> done = SlurmClient.parseShowJob(fixture("scontrol-array-finished.txt"));
    assertThat(done).extracting(SlurmJobState::displayId).containsExactly("10_2", "10_1", "10_0");
    assertThat(done).extracting(SlurmJobState::exitCode).containsExactly("0:0", "1:0", "0:0");
    assertThat(done.get(1).slurmState()).isEqualTo("FAILED");
    assertThat(done.get(1).startTime()).matches("\\d{4}-\\d\\d-\\d\\dT\\d\\d:\\d\\d:\\d\\d");
    List<SlurmJobState> held = SlurmClient.parseShowJob(fixture("scontrol-array-pending.txt"));
    assertThat(held).extracting(SlurmJobState::arrayIndex).containsExactly(0, 1, 2, 3, 7);
    assertThat(held).allSatisfy(h -> assertThat(h.phase()).isEqualTo(JobPhase.PENDING));
  }

  @Test
  void statesMergeSqueueWithScontrolAndAskForEveryJob() throws Exception {
    FakeSlurm fake =
        FakeSlurm.create()
            .thenOk(fixture("squeue-finished.txt"))
            .thenOk(fixture("scontrol-array-finished.txt"))
            .thenOk(
                "JobId=11 JobName=hopstat-x-report UserId=root(0) JobState=COMPLETED Reason=None Dependency=(null) ExitCode=0:0 StartTime=2026-12-02T00:02:45 EndTime=2026-12-02T00:02:46\n");
    List<SlurmJobState> s = new SlurmClient(fake).states(List.of("10", "11"));
    assertThat(fake.calls.get(0))
        .containsExactly("squeue", "-h", "-t", "all", "-r", "-j", "10,11", "-o", "%i %T %r");
    assertThat(fake.calls.get(1)).containsExactly("scontrol", "-o", "show", "job", "10");
    assertThat(fake.calls.get(2)).containsExactly("scontrol", "-o", "show", "job", "11");
    assertThat(s)
        .filteredOn(x -> x.displayId().equals("10_1"))
        .singleElement()
        .satisfies(
            x -> {
              assertThat(x.exitCode()).isEqualTo("1:0");
              assertThat(x.phase()).isEqualTo(JobPhase.FAILED);
            });
    assertThat(s)
        .filteredOn(x -> x.displayId().equals("11"))
        .singleElement()
        .satisfies(x -> assertThat(x.startTime()).isEqualTo("2026-12-02T00:02:45"));
  }

  @Test
  void forgottenJobsAreAbsentNotAnError() throws Exception {
    // squeue/scontrol 22.05.8 for an id the controller no longer holds: exit 1, this message.
    FakeSlurm fake =
        FakeSlurm.create().thenFail(1, "slurm_load_jobs error: Invalid job id specified\n");
    assertThat(new SlurmClient(fake).states(List.of("999999"))).isEmpty();
    FakeSlurm down =
        FakeSlurm.create()
            .thenFail(
                1, "slurm_load_jobs error: Unable to contact slurm controller (connect failure)\n");
    assertThatThrownBy(() -> new SlurmClient(down).states(List.of("5")))
        .isInstanceOf(ClusterException.class)
        .hasMessageContaining("Unable to contact");
  }

  @Test
  void indexListsRoundTrip() {
    assertThat(SlurmClient.indexList(List.of(0, 1, 2, 5, 7, 8))).isEqualTo("0-2,5,7-8");
    assertThat(SlurmClient.indexList(List.of(3))).isEqualTo("3");
    assertThat(SlurmClient.expandIndices("0-2,5,7-8")).containsExactly(0, 1, 2, 5, 7, 8);
    // sbatch(1) --array: "A step function can also be specified with a suffix containing a colon
    // and number";
    // "%" followed by a number limits simultaneously running tasks.
    assertThat(SlurmClient.expandIndices("1-7:3%2")).containsExactly(1, 4, 7);
  }

  @Test
  void phasesMapSlurmStates() {
    assertThat(JobPhase.of("TIMEOUT")).isEqualTo(JobPhase.TIMEOUT);
    assertThat(JobPhase.of("NODE_FAIL")).isEqualTo(JobPhase.FAILED);
    assertThat(JobPhase.of("OUT_OF_MEMORY")).isEqualTo(JobPhase.FAILED);
    assertThat(JobPhase.of("CANCELLED")).isEqualTo(JobPhase.CANCELLED);
    assertThat(JobPhase.of("COMPLETING").isActive()).isTrue();
    assertThat(JobPhase.of("PENDING").isActive()).isTrue();
    assertThat(JobPhase.of("FAILED").isActive()).isFalse();
    assertThat(JobPhase.of("SOMETHING_NEW")).isEqualTo(JobPhase.UNKNOWN);
  }
}
