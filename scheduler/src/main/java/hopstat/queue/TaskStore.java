package hopstat.queue;

import hopstat.record.RealisationRecord;
import hopstat.task.RealisationTask;
import java.io.IOException;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The task queue. Every write is compare-and-set on the entry's version; losing a race is a normal
 * outcome reported by the return value, never an exception. Implementations are thread-safe.
 * Timestamps come from the store's injected clock.
 */
public interface TaskStore extends AutoCloseable {

  /**
   * Adds tasks as PENDING, in order. A task whose id the store already knows (e.g. finished in an
   * earlier session) is left as it is.
   *
   * @return how many were new
   */
  int add(List<RealisationTask> tasks);

  /** Claims the oldest PENDING task for {@code workerId} (PENDING → RUNNING), if any. */
  Optional<Claim> claim(String workerId);

  /** Refreshes a RUNNING task's heartbeat; false if the claim is no longer valid. */
  boolean heartbeat(Claim claim);

  /**
   * Finishes a claimed task: DONE or FAILED per the record's outcome. Durable stores persist the
   * record before the state changes.
   *
   * @return false if the claim is no longer valid (the task was re-queued meanwhile)
   */
  boolean complete(Claim claim, RealisationRecord record) throws IOException;

  /**
   * Returns RUNNING tasks whose last heartbeat is older than {@code staleBefore} to PENDING, or
   * marks them FAILED once they have been claimed {@code maxAttempts} times.
   *
   * @return how many tasks were swept
   */
  int sweep(Instant staleBefore, int maxAttempts) throws IOException;

  /** Snapshot of one task, if known. */
  Optional<TaskView> view(String taskId);

  /** Number of tasks in each state. */
  Map<TaskState, Integer> counts();

  /** Finished records (DONE and FAILED), one per task id. */
  List<RealisationRecord> finished();

  @Override
  void close() throws IOException;
}
