package hopstat.serve;

import java.time.Instant;
import java.util.Objects;

/**
 * One entry of a job's append-only history.
 *
 * @param at when it happened (from the service's clock, UTC)
 * @param from the state before, or {@code null} for the submission
 * @param to the state after
 * @param reason why, in words (e.g. {@code submitted via inbox file demo.json})
 */
public record JobEvent(Instant at, JobState from, JobState to, String reason) {
  public JobEvent {
    Objects.requireNonNull(at, "at");
    Objects.requireNonNull(to, "to");
    Objects.requireNonNull(reason, "reason");
  }
}
