package hopstat.queue;

import java.util.EnumSet;
import java.util.Map;
import java.util.Set;

/**
 * Lifecycle of a task, with the one table of allowed transitions:
 *
 * <pre>
 *   PENDING → RUNNING            claimed by a worker
 *   RUNNING → DONE | FAILED      finished (journaled)
 *   RUNNING → PENDING            heartbeat went stale, retried
 *   RUNNING → FAILED             stale too many times
 * </pre>
 *
 * DONE and FAILED are terminal.
 */
public enum TaskState {
  PENDING,
  RUNNING,
  DONE,
  FAILED;

  private static final Map<TaskState, Set<TaskState>> ALLOWED =
      Map.of(
          PENDING, EnumSet.of(RUNNING),
          RUNNING, EnumSet.of(DONE, FAILED, PENDING),
          DONE, EnumSet.noneOf(TaskState.class),
          FAILED, EnumSet.noneOf(TaskState.class));

  public boolean canMoveTo(TaskState next) {
    return ALLOWED.get(this).contains(next);
  }

  /**
   * @throws IllegalStateException if the transition is not in the table
   */
  public void checkMoveTo(TaskState next) {
    if (!canMoveTo(next)) {
      throw new IllegalStateException("illegal task transition " + this + " -> " + next);
    }
  }

  public boolean isTerminal() {
    return this == DONE || this == FAILED;
  }
}
