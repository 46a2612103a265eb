package hopstat.serve;

import java.util.EnumSet;
import java.util.Map;
import java.util.Set;

/**
 * The lifecycle of a job in the batch service. {@link #canMoveTo} is the one table of allowed
 * transitions; {@link JobRecord#moveTo} throws on any other.
 *
 * <pre>
 * QUEUED   → RUNNING (picked by the scheduler), PAUSED (held), CANCELLED
 * RUNNING  → DONE (every planned realisation journaled), FAILED (the job could not run: I/O, locked
 *            run directory, corrupt journal), PAUSED (asked to pause), CANCELLED (asked to cancel),
 *            QUEUED (the service stopped or died while it ran; it resumes from its journal)
 * PAUSED   → QUEUED (resumed), CANCELLED
 * DONE, FAILED, CANCELLED are final.
 * </pre>
 *
 * A job whose realisations partly FAILED is still DONE: failed realisations are an outcome the
 * summary counts, not a failure of the job.
 */
public enum JobState {
  QUEUED,
  RUNNING,
  PAUSED,
  DONE,
  FAILED,
  CANCELLED;

  private static final Map<JobState, Set<JobState>> ALLOWED =
      Map.of(
          QUEUED, EnumSet.of(RUNNING, PAUSED, CANCELLED),
          RUNNING, EnumSet.of(DONE, FAILED, PAUSED, CANCELLED, QUEUED),
          PAUSED, EnumSet.of(QUEUED, CANCELLED),
          DONE, EnumSet.noneOf(JobState.class),
          FAILED, EnumSet.noneOf(JobState.class),
          CANCELLED, EnumSet.noneOf(JobState.class));

  /** True if the transition {@code this → next} is in the table. */
  public boolean canMoveTo(JobState next) {
    return ALLOWED.get(this).contains(next);
  }

  /** True for DONE, FAILED and CANCELLED: nothing changes such a job any more. */
  public boolean isFinal() {
    return ALLOWED.get(this).isEmpty();
  }
}
