package hopstat.queue;

import java.time.Instant;
import java.util.List;

/**
 * A read-only snapshot of one task's entry.
 *
 * @param taskId task id
 * @param state current state
 * @param version incremented by every write
 * @param attempts times the task was claimed
 * @param history every state entered, oldest first, with the store clock's timestamp
 */
public record TaskView(
    String taskId, TaskState state, long version, int attempts, List<Transition> history) {
  public TaskView {
    history = List.copyOf(history);
  }

  /**
   * @param state the state entered
   * @param at when, from the store's injected clock
   */
  public record Transition(TaskState state, Instant at) {}
}
