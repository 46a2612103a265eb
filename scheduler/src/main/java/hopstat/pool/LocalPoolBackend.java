package hopstat.pool;

import hopstat.expand.GridPoint;
import hopstat.expand.SamplingPlanner;
import hopstat.expand.StudyPlan;
import hopstat.linalg.Linalg;
import hopstat.linalg.LinalgFactory;
import hopstat.queue.Claim;
import hopstat.queue.JournalReader;
import hopstat.queue.JournalTaskStore;
import hopstat.queue.JournalWriter;
import hopstat.queue.RunDirectory;
import hopstat.queue.TaskState;
import hopstat.record.RealisationRecord;
import hopstat.task.BuildInfo;
import hopstat.task.Outcome;
import hopstat.task.RealisationResult;
import hopstat.task.RealisationRunner;
import hopstat.task.RealisationTask;
import hopstat.task.RealisationWorkspace;
import java.io.IOException;
import java.time.Clock;
import java.time.Duration;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;
import org.apache.commons.pool2.BasePooledObjectFactory;
import org.apache.commons.pool2.PooledObject;
import org.apache.commons.pool2.impl.DefaultPooledObject;
import org.apache.commons.pool2.impl.GenericObjectPool;
import org.apache.commons.pool2.impl.GenericObjectPoolConfig;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.slf4j.MDC;

/**
 * Runs a study on this machine: N worker threads, each with its own pooled {@link
 * RealisationWorkspace}, claiming tasks from a journal-backed store. Parallelism comes from running
 * realisations side by side (the native BLAS runs one thread per worker).
 *
 * <p>The journal decides what is left to do, so a fresh run and a resumed one are the same code:
 * tasks already journaled are skipped, and adaptive sampling replays its rule over them.
 */
public final class LocalPoolBackend implements Backend {

  /** How often workers' claims are heartbeated. */
  public static final Duration HEARTBEAT = Duration.ofSeconds(5);

  /** A RUNNING task without heartbeat for this long is returned to the queue. */
  public static final Duration STALE_AFTER = Duration.ofMinutes(10);

  /** Claims of one task before the sweeper gives it up as FAILED. */
  public static final int MAX_ATTEMPTS = 3;

  private static final Logger LOG = LoggerFactory.getLogger(LocalPoolBackend.class);

  private final Clock clock;
  private final Object lock = new Object();
  private final CountDownLatch stoppedLatch = new CountDownLatch(1);
  private volatile boolean stopRequested;
  private int inFlight;
  private volatile JournalTaskStore activeStore;

  public LocalPoolBackend(Clock clock) {
    this.clock = clock;
  }

  @Override
  public String name() {
    return "local";
  }

  /**
   * Asks the run to stop: workers finish their current realisation and exit. Safe from any thread.
   */
  public void requestStop() {
    stopRequested = true;
    synchronized (lock) {
      lock.notifyAll();
    }
  }

  /** Waits until the run has ended, up to {@code timeout}; true if it ended. */
  public boolean awaitEnded(Duration timeout) throws InterruptedException {
    return stoppedLatch.await(timeout.toMillis(), TimeUnit.MILLISECONDS);
  }

  /**
   * Forces this session's journal to disk and closes it; for a shutdown hook whose grace period ran
   * out. Realisations still running are abandoned (a resume runs them again).
   */
  public void abandon() {
    JournalTaskStore store = activeStore;
    if (store != null) {
      try {
        store.close();
      } catch (IOException e) {
        LOG.warn("closing the journal failed: {}", e.getMessage());
      }
    }
  }

  @Override
  public RunResult execute(
      StudyPlan plan, RunDirectory dir, RunOptions options, ProgressListener listener)
      throws IOException, InterruptedException {
    try {
      return run(plan, dir, options, listener);
    } finally {
      stoppedLatch.countDown();
    }
  }

  private RunResult run(
      StudyPlan plan, RunDirectory dir, RunOptions options, ProgressListener listener)
      throws IOException, InterruptedException {
    Linalg linalg = LinalgFactory.create(options.linalg());
    String toolVersion = BuildInfo.toolVersion();
    String linalgName = linalg.describe();

    Map<String, RealisationRecord> journaled = new LinkedHashMap<>();
    JournalReader.Contents contents = JournalReader.read(dir.journalDir());
    for (String torn : contents.tornLines()) {
      LOG.warn("dropped a torn journal line left by a crash: {}", torn);
    }
    for (RealisationRecord r : contents.records().values()) {
      if (options.shard().contains(r.result().pointIndex())) {
        journaled.put(r.result().taskId(), r);
      }
    }
    SamplingPlanner planner = new SamplingPlanner(plan);
    List<RealisationTask> initial = new ArrayList<>();
    for (RealisationTask t : planner.start(journaled.values())) {
      if (options.shard().contains(t.pointIndex())) {
        initial.add(t);
      }
    }
    JournalWriter writer =
        new JournalWriter(dir.newJournalFile(options.journalPrefix()), options.syncIntervalNanos());
    JournalTaskStore store =
        new JournalTaskStore(
            clock,
            (task, reason) -> record(plan, failedResult(task, reason), toolVersion, linalgName),
            journaled,
            writer);
    activeStore = store;
    store.add(initial);
    long already = journaled.size();
    listener.started(scheduledInShard(plan, planner, options.shard()), already);
    LOG.info(
        "run {}: {} realisations to do, {} journaled earlier, {} thread(s), {}",
        plan.spec().name(),
        initial.size(),
        already,
        options.threads(),
        linalgName);

    GenericObjectPool<RealisationWorkspace> workspaces = workspacePool(linalg, options.threads());
    ScheduledExecutorService heartbeats =
        Executors.newSingleThreadScheduledExecutor(r -> daemon(r, "hopstat-heartbeat"));
    Map<String, Claim> active = new java.util.concurrent.ConcurrentHashMap<>();
    heartbeats.scheduleAtFixedRate(
        () -> beat(store, active),
        HEARTBEAT.toMillis(),
        HEARTBEAT.toMillis(),
        TimeUnit.MILLISECONDS);
    List<Thread> threads = new ArrayList<>();
    long[] finishedHere = new long[1];
    for (int i = 0; i < options.threads(); i++) {
      String workerId = "w" + i;
      Thread t =
          new Thread(
              () ->
                  work(
                      workerId,
                      plan,
                      store,
                      planner,
                      options.shard(),
                      workspaces,
                      active,
                      listener,
                      toolVersion,
                      linalgName,
                      finishedHere),
              "hopstat-" + workerId);
      t.setDaemon(true);
      threads.add(t);
      t.start();
    }
    try {
      for (Thread t : threads) {
        t.join();
      }
    } finally {
      heartbeats.shutdownNow();
      workspaces.close();
      store.close();
      activeStore = null;
      listener.ended();
    }
    Map<TaskState, Integer> counts = store.counts();
    long failed =
        store.finished().stream().filter(r -> r.result().outcome() == Outcome.FAILED).count();
    boolean complete = counts.get(TaskState.PENDING) == 0 && counts.get(TaskState.RUNNING) == 0;
    return new RunResult(
        finishedHere[0],
        store.finished().size(),
        failed,
        stopRequested || !complete,
        writer.file());
  }

  private void work(
      String workerId,
      StudyPlan plan,
      JournalTaskStore store,
      SamplingPlanner planner,
      Shard shard,
      GenericObjectPool<RealisationWorkspace> workspaces,
      Map<String, Claim> active,
      ProgressListener listener,
      String toolVersion,
      String linalgName,
      long[] finishedHere) {
    RealisationWorkspace workspace;
    try {
      workspace = workspaces.borrowObject();
    } catch (Exception e) { // pool creation failures surface as a failed worker, not a silent hang
      LOG.error("worker {} could not get a workspace: {}", workerId, e.toString());
      return;
    }
    try {
      while (true) {
        Claim claim;
        synchronized (lock) {
          Optional<Claim> next = stopRequested ? Optional.empty() : store.claim(workerId);
          while (next.isEmpty()) {
            if (stopRequested || inFlight == 0) {
              lock.notifyAll();
              return;
            }
            lock.wait();
            next = stopRequested ? Optional.empty() : store.claim(workerId);
          }
          claim = next.get();
          inFlight++;
        }
        active.put(claim.task().taskId(), claim);
        MDC.put("task", claim.task().taskId());
        RealisationResult result;
        try {
          result = RealisationRunner.run(claim.task(), workspace);
        } catch (OutOfMemoryError e) {
          // One oversized realisation must not take the others down; its workspace is replaced.
          workspaces.invalidateObject(workspace);
          workspace = workspaces.borrowObject();
          result = failedResult(claim.task(), "OutOfMemoryError: " + e.getMessage());
        } finally {
          MDC.remove("task");
        }
        active.remove(claim.task().taskId());
        RealisationRecord record = record(plan, result, toolVersion, linalgName);
        synchronized (lock) {
          inFlight--;
          if (store.complete(claim, record)) {
            finishedHere[0]++;
            List<RealisationTask> next = new ArrayList<>();
            for (RealisationTask t : planner.onFinished(record)) {
              if (shard.contains(t.pointIndex())) {
                next.add(t);
              }
            }
            if (!next.isEmpty()) {
              store.add(next);
              listener.rescheduled(scheduledInShard(plan, planner, shard));
            } else if (planner.isStopped(record.result().pointIndex())) {
              listener.rescheduled(scheduledInShard(plan, planner, shard));
            }
          }
          lock.notifyAll();
        }
        if (result.outcome() == Outcome.FAILED) {
          LOG.warn("realisation {} failed: {}", result.taskId(), result.failure());
        }
        listener.finished(record);
      }
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
    } catch (
        Exception e) { // a journal write failed: stop this worker loudly, keep what is journaled
      LOG.error("worker {} stopped: {}", workerId, e.toString());
      requestStop();
    } finally {
      workspaces.returnObject(workspace);
    }
  }

  private static long scheduledInShard(StudyPlan plan, SamplingPlanner planner, Shard shard) {
    long total = 0;
    for (GridPoint p : plan.points()) {
      if (shard.contains(p.index())) {
        total += planner.scheduled(p.index());
      }
    }
    return total;
  }

  private static void beat(JournalTaskStore store, Map<String, Claim> active) {
    for (Claim c : active.values()) {
      store.heartbeat(c);
    }
  }

  static RealisationRecord record(
      StudyPlan plan, RealisationResult result, String toolVersion, String linalg) {
    GridPoint p = plan.points().get(result.pointIndex());
    return new RealisationRecord(
        result, p.coordinates(), p.point().parameters().values(), toolVersion, linalg);
  }

  static RealisationResult failedResult(RealisationTask task, String reason) {
    return new RealisationResult(
        task.taskId(),
        task.pointIndex(),
        task.realisationIndex(),
        task.seed(),
        Outcome.FAILED,
        Map.of(),
        reason,
        0.0);
  }

  private static GenericObjectPool<RealisationWorkspace> workspacePool(Linalg linalg, int threads) {
    GenericObjectPoolConfig<RealisationWorkspace> config = new GenericObjectPoolConfig<>();
    config.setMaxTotal(threads);
    config.setMaxIdle(threads);
    config.setJmxEnabled(false);
    return new GenericObjectPool<>(
        new BasePooledObjectFactory<>() {
          @Override
          public RealisationWorkspace create() {
            return new RealisationWorkspace(linalg);
          }

          @Override
          public PooledObject<RealisationWorkspace> wrap(RealisationWorkspace w) {
            return new DefaultPooledObject<>(w);
          }
        },
        config);
  }

  private static Thread daemon(Runnable r, String name) {
    Thread t = new Thread(r, name);
    t.setDaemon(true);
    return t;
  }
}
