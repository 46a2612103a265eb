package hopstat.serve;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.time.Instant;
import java.util.EnumSet;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;

/** The job lifecycle table, against the table in JobState's Javadoc (derived: it is the design). */
class JobStateTest {

  private static final Map<JobState, Set<JobState>> DOCUMENTED =
      Map.of(
          JobState.QUEUED, EnumSet.of(JobState.RUNNING, JobState.PAUSED, JobState.CANCELLED),
          JobState.RUNNING,
              EnumSet.of(
                  JobState.DONE,
                  JobState.FAILED,
                  JobState.PAUSED,
                  JobState.CANCELLED,
                  JobState.QUEUED),
          JobState.PAUSED, EnumSet.of(JobState.QUEUED, JobState.CANCELLED),
          JobState.DONE, EnumSet.noneOf(JobState.class),
          JobState.FAILED, EnumSet.noneOf(JobState.class),
          JobState.CANCELLED, EnumSet.noneOf(JobState.class));

  @Test
  void everyPairFollowsTheDocumentedTable() {
    for (JobState from : JobState.values()) {
      for (JobState to : JobState.values()) {
        assertThat(from.canMoveTo(to))
            .as(from + " -> " + to)
            .isEqualTo(DOCUMENTED.get(from).contains(to));
      }
      assertThat(from.isFinal()).isEqualTo(DOCUMENTED.get(from).isEmpty());
    }
  }

  @Test
  void recordAppendsHistoryAndRefusesIllegalMoves() {
    Instant t0 = Instant.parse("2026-01-01T00:00:00Z");
    JobRecord r = JobRecord.submitted("000001-demo", "demo", 0, 1, "api", t0);
    JobRecord running = r.moveTo(JobState.RUNNING, "started", t0.plusSeconds(1), null);
    JobRecord done = running.moveTo(JobState.DONE, "finished", t0.plusSeconds(2), null);
    assertThat(done.history())
        .extracting(JobEvent::to)
        .containsExactly(JobState.QUEUED, JobState.RUNNING, JobState.DONE);
    assertThat(done.history())
        .extracting(JobEvent::from)
        .containsExactly(null, JobState.QUEUED, JobState.RUNNING);
    assertThat(done.submittedAt()).isEqualTo(t0);
    assertThat(done.updatedAt()).isEqualTo(t0.plusSeconds(2));
    assertThat(r.history()).hasSize(1); // records are values: the original is unchanged
    assertThatThrownBy(() -> done.moveTo(JobState.QUEUED, "again", t0, null))
        .isInstanceOf(IllegalStateException.class);
    assertThatThrownBy(() -> r.moveTo(JobState.DONE, "skip", t0, null))
        .isInstanceOf(IllegalStateException.class);
  }

  @Test
  void idsAreSafeDirectoryNames() {
    assertThat(JobIds.of(7, "demo-qwz.disorder")).isEqualTo("000007-demo-qwz-disorder");
    assertThat(JobIds.of(8, "../../etc/passwd")).isEqualTo("000008-etc-passwd");
    assertThat(JobIds.of(9, "")).isEqualTo("000009-job");
    assertThat(JobIds.of(10, "x".repeat(100))).hasSize(7 + JobIds.NAME_LENGTH);
    for (String bad :
        new String[] {
          "..",
          "000001-..",
          "000001-a/b",
          "000001-a\\b",
          "000001-",
          "1-a",
          "000001-.hidden",
          "000001-a.b",
          "/000001-a",
          "000001-a\u0000"
        }) {
      assertThat(JobIds.isValid(bad)).as(bad).isFalse();
    }
    assertThat(JobIds.isValid("000001-a_b-C9")).isTrue();
  }
}
