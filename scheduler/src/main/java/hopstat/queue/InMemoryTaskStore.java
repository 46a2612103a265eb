package hopstat.queue;

import hopstat.record.RealisationRecord;
import hopstat.task.Outcome;
import hopstat.task.RealisationTask;
import java.io.IOException;
import java.time.Clock;
import java.time.Instant;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.BiFunction;

/**
 * A task store held in memory. Durable stores extend it and persist finished records in {@link
 * #persist} before the state changes. Thread-safe by a single monitor: a claim or a completion is
 * microseconds against realisations of milliseconds to minutes.
 */
public class InMemoryTaskStore implements TaskStore {

  private static final class Entry {
    final RealisationTask task;
    TaskState state = TaskState.PENDING;
    long version;
    int attempts;
    String owner;
    Instant heartbeat;
    RealisationRecord record;
    final List<TaskView.Transition> history = new ArrayList<>(4);

    Entry(RealisationTask task) {
      this.task = task;
    }
  }

  private final Clock clock;
  private final BiFunction<RealisationTask, String, RealisationRecord> failureRecords;
  private final Map<String, Entry> entries = new LinkedHashMap<>();
  private final Map<String, RealisationRecord> preloaded;
  private final Deque<Entry> pending = new ArrayDeque<>();

  /**
   * @param clock timestamps of history and heartbeats
   * @param failureRecords builds the FAILED record of a task given up by the sweeper (task, reason)
   * @param preloaded records finished in earlier sessions, by task id: such tasks enter as
   *     DONE/FAILED when added
   */
  public InMemoryTaskStore(
      Clock clock,
      BiFunction<RealisationTask, String, RealisationRecord> failureRecords,
      Map<String, RealisationRecord> preloaded) {
    this.clock = clock;
    this.failureRecords = failureRecords;
    this.preloaded = new LinkedHashMap<>(preloaded);
  }

  /** Persists a finished record before the state change; in memory: nothing to do. */
  protected void persist(RealisationRecord record) throws IOException {}

  @Override
  public synchronized int add(List<RealisationTask> tasks) {
    int added = 0;
    for (RealisationTask t : tasks) {
      if (entries.containsKey(t.taskId())) {
        continue;
      }
      Entry e = new Entry(t);
      entries.put(t.taskId(), e);
      RealisationRecord done = preloaded.get(t.taskId());
      Instant now = clock.instant();
      e.history.add(new TaskView.Transition(TaskState.PENDING, now));
      if (done != null) {
        e.record = done;
        move(e, TaskState.RUNNING, now);
        move(e, done.result().outcome() == Outcome.DONE ? TaskState.DONE : TaskState.FAILED, now);
      } else {
        pending.addLast(e);
        added++;
      }
    }
    return added;
  }

  @Override
  public synchronized Optional<Claim> claim(String workerId) {
    Entry e = pending.pollFirst();
    if (e == null) {
      return Optional.empty();
    }
    Instant now = clock.instant();
    move(e, TaskState.RUNNING, now);
    e.attempts++;
    e.owner = workerId;
    e.heartbeat = now;
    return Optional.of(new Claim(e.task, workerId, e.version));
  }

  @Override
  public synchronized boolean heartbeat(Claim claim) {
    Entry e = entries.get(claim.task().taskId());
    if (e == null || e.version != claim.version() || e.state != TaskState.RUNNING) {
      return false;
    }
    e.heartbeat = clock.instant();
    return true;
  }

  @Override
  public synchronized boolean complete(Claim claim, RealisationRecord record) throws IOException {
    Entry e = entries.get(claim.task().taskId());
    if (e == null || e.version != claim.version() || e.state != TaskState.RUNNING) {
      return false;
    }
    if (!record.result().taskId().equals(e.task.taskId())) {
      throw new IllegalArgumentException(
          "record " + record.result().taskId() + " completes claim " + e.task.taskId());
    }
    persist(record);
    e.record = record;
    move(
        e,
        record.result().outcome() == Outcome.DONE ? TaskState.DONE : TaskState.FAILED,
        clock.instant());
    return true;
  }

  @Override
  public synchronized int sweep(Instant staleBefore, int maxAttempts) throws IOException {
    int swept = 0;
    for (Entry e : entries.values()) {
      if (e.state != TaskState.RUNNING || !e.heartbeat.isBefore(staleBefore)) {
        continue;
      }
      swept++;
      if (e.attempts >= maxAttempts) {
        RealisationRecord failed =
            failureRecords.apply(
                e.task,
                "worker lost " + e.attempts + " time(s): heartbeat older than " + staleBefore);
        persist(failed);
        e.record = failed;
        move(e, TaskState.FAILED, clock.instant());
      } else {
        move(e, TaskState.PENDING, clock.instant());
        pending.addFirst(e);
      }
    }
    return swept;
  }

  @Override
  public synchronized Optional<TaskView> view(String taskId) {
    Entry e = entries.get(taskId);
    return e == null
        ? Optional.empty()
        : Optional.of(new TaskView(taskId, e.state, e.version, e.attempts, e.history));
  }

  @Override
  public synchronized Map<TaskState, Integer> counts() {
    Map<TaskState, Integer> counts = new EnumMap<>(TaskState.class);
    for (TaskState s : TaskState.values()) {
      counts.put(s, 0);
    }
    for (Entry e : entries.values()) {
      counts.merge(e.state, 1, Integer::sum);
    }
    return counts;
  }

  @Override
  public synchronized List<RealisationRecord> finished() {
    List<RealisationRecord> out = new ArrayList<>();
    for (Entry e : entries.values()) {
      if (e.state.isTerminal()) {
        out.add(e.record);
      }
    }
    return out;
  }

  /**
   * Records finished in earlier sessions that no added task claimed (e.g. beyond an adaptive stop).
   */
  public synchronized List<RealisationRecord> preloadedNotAdded() {
    List<RealisationRecord> out = new ArrayList<>();
    for (Map.Entry<String, RealisationRecord> e : preloaded.entrySet()) {
      if (!entries.containsKey(e.getKey())) {
        out.add(e.getValue());
      }
    }
    return out;
  }

  @Override
  public void close() throws IOException {}

  private void move(Entry e, TaskState next, Instant at) {
    e.state.checkMoveTo(next);
    e.state = next;
    e.version++;
    e.history.add(new TaskView.Transition(next, at));
  }
}
