package hopstat.serve;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * The durable record of one job, stored as {@code ROOT/jobs/<id>/job.json} (format {@value
 * #FORMAT}). The job's run directory, made exactly as {@code hopstat run} makes one, is {@code
 * ROOT/jobs/<id>/run/}.
 *
 * @param format on-disk format version of job.json
 * @param id job id, {@code NNNNNN-name} (see {@link JobIds})
 * @param name the spec's name
 * @param priority larger runs first; FIFO (by sequence) within a priority
 * @param sequence submission number, 1-based, unique in the root
 * @param source how it was submitted, e.g. {@code api} or {@code inbox:demo@2.json}
 * @param state current state
 * @param history every change, oldest first; the first entry is the submission
 * @param message last error or note for the user, or {@code null}
 */
public record JobRecord(
    int format,
    String id,
    String name,
    int priority,
    long sequence,
    String source,
    JobState state,
    List<JobEvent> history,
    String message) {

  /** The job.json format this version writes and reads. */
  public static final int FORMAT = 1;

  public JobRecord {
    if (format != FORMAT) {
      throw new IllegalArgumentException(
          "job record format " + format + "; this version reads format " + FORMAT);
    }
    Objects.requireNonNull(id, "id");
    if (!JobIds.isValid(id)) {
      throw new IllegalArgumentException("not a job id: " + id);
    }
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(source, "source");
    Objects.requireNonNull(state, "state");
    if (sequence < 1) {
      throw new IllegalArgumentException("sequence must be >= 1");
    }
    history = List.copyOf(history);
    if (history.isEmpty() || history.get(history.size() - 1).to() != state) {
      throw new IllegalArgumentException(
          "the history of " + id + " must end in its state " + state);
    }
  }

  /** A new QUEUED job. */
  public static JobRecord submitted(
      String id, String name, int priority, long sequence, String source, Instant at) {
    return new JobRecord(
        FORMAT,
        id,
        name,
        priority,
        sequence,
        source,
        JobState.QUEUED,
        List.of(new JobEvent(at, null, JobState.QUEUED, "submitted via " + source)),
        null);
  }

  /**
   * This job moved to {@code next}, with the change appended to the history.
   *
   * @param message the new user-facing message ({@code null} clears it)
   * @throws IllegalStateException if the transition table does not allow it
   */
  public JobRecord moveTo(JobState next, String reason, Instant at, String message) {
    if (!state.canMoveTo(next)) {
      throw new IllegalStateException("job " + id + " cannot go from " + state + " to " + next);
    }
    List<JobEvent> h = new ArrayList<>(history);
    h.add(new JobEvent(at, state, next, reason));
    return new JobRecord(format, id, name, priority, sequence, source, next, h, message);
  }

  /** When the job was submitted. */
  public Instant submittedAt() {
    return history.get(0).at();
  }

  /** When the job last changed state. */
  public Instant updatedAt() {
    return history.get(history.size() - 1).at();
  }
}
