package hopstat.serve;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ObjectNode;
import hopstat.expand.GridExpander;
import hopstat.expand.MemoryCheck;
import hopstat.expand.PlanValidation;
import hopstat.expand.StudyPlan;
import hopstat.linalg.LinalgFactory;
import hopstat.pool.LocalPoolBackend;
import hopstat.pool.LocalSession;
import hopstat.pool.RunOptions;
import hopstat.pool.RunSummaryOps;
import hopstat.pool.SessionResult;
import hopstat.pool.Shard;
import hopstat.queue.JournalWriter;
import hopstat.queue.RunDirectory;
import hopstat.serve.internal.HttpApi;
import hopstat.serve.internal.Inbox;
import hopstat.serve.internal.ServiceLock;
import hopstat.spec.JobSpec;
import hopstat.spec.SpecParser;
import hopstat.task.BuildInfo;
import hopstat.task.InvalidInputException;
import java.io.IOException;
import java.net.URI;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * The batch service of one root directory: a durable priority queue of jobs ({@link JobStore}), fed
 * by an inbox directory and a loopback HTTP API, run one job at a time on the local pool with all
 * the service's threads.
 *
 * <p>Layout of the root:
 *
 * <pre>
 * ROOT/service.lock   OS lock: one service per root
 * ROOT/service.json   address, pid and start time of the live service
 * ROOT/inbox/         drop spec files here (see {@link Inbox} for the atomicity rule)
 * ROOT/rejected/      inbox files that failed validation, each with NAME.error.txt beside it
 * ROOT/jobs/          the queue (see {@link JobStore})
 * </pre>
 *
 * <p>Scheduling: the QUEUED job with the highest priority, first submitted first within a priority.
 * A running job is not pre-empted by a later, higher-priority one; it finishes (or is paused)
 * first. Recovery: a job found RUNNING at start (the service was killed) goes back to QUEUED and,
 * when picked, resumes from its journal, so the result is that of an uninterrupted run.
 */
public final class BatchService implements AutoCloseable {

  /** Time a running job gets to finish its in-flight realisations when the service stops. */
  public static final Duration STOP_GRACE = Duration.ofSeconds(20);

  /** Largest priority magnitude accepted. */
  public static final int MAX_PRIORITY = 1000;

  private static final Logger LOG = LoggerFactory.getLogger(BatchService.class);
  private static final ObjectMapper JSON =
      new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

  private enum StopReason {
    PAUSE,
    CANCEL,
    SHUTDOWN
  }

  private final ServiceSpec spec;
  private final Clock clock;
  private final ServiceLock serviceLock;
  private final JobStore store;
  private final JobStatusOps statusOps;
  private final Object monitor = new Object();
  private final Map<String, JobProgress> progress = new ConcurrentHashMap<>();
  private final CountDownLatch closed = new CountDownLatch(1);
  private final Thread scheduler;
  private final String linalgDescription;
  private Inbox inbox;
  private HttpApi http;
  // guarded by monitor
  private boolean closing;
  private String currentId;
  private LocalPoolBackend currentBackend;
  private StopReason stopReason;

  private BatchService(ServiceSpec spec, Clock clock, ServiceLock serviceLock, JobStore store) {
    this.spec = spec;
    this.clock = clock;
    this.serviceLock = serviceLock;
    this.store = store;
    this.statusOps = new JobStatusOps(store);
    this.linalgDescription = LinalgFactory.create(spec.linalg()).describe();
    this.scheduler = new Thread(this::schedule, "hopstat-serve-scheduler");
    this.scheduler.setDaemon(true);
  }

  /**
   * Starts the service: takes the root's lock, recovers jobs left RUNNING, starts the scheduler,
   * the inbox scanner and the HTTP API, and writes service.json.
   *
   * @throws hopstat.queue.RunDirectoryException if another service holds the root
   */
  public static BatchService start(ServiceSpec spec, Clock clock) throws IOException {
    Files.createDirectories(spec.root());
    ServiceLock lock = ServiceLock.acquire(spec.root());
    BatchService service = null;
    try {
      JobStore store = JobStore.open(spec.root(), clock);
      service = new BatchService(spec, clock, lock, store);
      service.recover();
      service.http = HttpApi.start(service, spec);
      service.inbox = Inbox.start(service, spec.root(), spec.inboxPoll());
      service.writeServiceFile();
      service.scheduler.start();
      LOG.info(
          "hopstat service on {} for {} ({} thread(s))",
          service.uri(),
          spec.root(),
          spec.threads());
      return service;
    } catch (IOException | RuntimeException e) {
      if (service != null) {
        service.close();
      } else {
        lock.close();
      }
      throw e;
    }
  }

  private void recover() throws IOException {
    for (JobRecord j : store.list()) {
      if (j.state() == JobState.RUNNING) {
        store.transition(
            j.id(),
            JobState.QUEUED,
            "the service stopped while the job ran; it resumes from its journal",
            null);
      }
    }
  }

  private void writeServiceFile() throws IOException {
    Map<String, Object> m = new LinkedHashMap<>();
    m.put("format", 1);
    m.put("url", uri().toString());
    m.put("pid", ProcessHandle.current().pid());
    m.put("started", clock.instant().toString());
    m.put("threads", spec.threads());
    m.put("tokenRequired", spec.hasToken());
    m.put("version", BuildInfo.toolVersion());
    RunDirectory.writeAtomically(spec.root().resolve("service.json"), JSON.writeValueAsBytes(m));
  }

  /** The service's validated settings. */
  public ServiceSpec spec() {
    return spec;
  }

  /** Base URI of the HTTP API, e.g. {@code http://127.0.0.1:8421/}. */
  public URI uri() {
    return http.uri();
  }

  /**
   * Validates spec text exactly as {@code hopstat run} does: parse, expand, check memory for {@code
   * threads} workers and the plan.
   *
   * @throws InvalidInputException with every problem and its field path
   */
  public static StudyPlan validate(String specText, int threads) {
    JobSpec parsed = SpecParser.parse(specText);
    StudyPlan plan = GridExpander.expand(parsed);
    MemoryCheck.require(plan, threads);
    PlanValidation.validate(plan);
    return plan;
  }

  /**
   * Queues a job.
   *
   * @param source how it came, e.g. {@code api}
   * @param consumed an inbox file to consume atomically with the submission, or {@code null}
   * @throws InvalidInputException if the spec or the priority is bad
   */
  public JobRecord submit(String specText, int priority, String source, Path consumed)
      throws IOException {
    if (Math.abs(priority) > MAX_PRIORITY) {
      throw new InvalidInputException(
          "priority", priority, "must be from -" + MAX_PRIORITY + " to " + MAX_PRIORITY);
    }
    StudyPlan plan = validate(specText, spec.threads());
    synchronized (monitor) {
      if (closing) {
        throw new IllegalStateException("the service is stopping");
      }
    }
    Map<String, Object> metadata =
        LocalSession.runMetadata(plan, spec.threads(), linalgDescription, clock.instant());
    JobRecord job =
        store.create(specText, plan.spec().name(), priority, source, metadata, consumed);
    LOG.info("queued job {} (priority {}) from {}", job.id(), priority, source);
    wake();
    return job;
  }

  /** Every job in submission order. */
  public List<JobRecord> jobs() {
    return store.list();
  }

  /** One job. */
  public Optional<JobRecord> job(String id) {
    return store.find(id);
  }

  /** Live progress of the job's current session, if it is running. */
  public Optional<JobProgress> progress(String id) {
    return Optional.ofNullable(progress.get(id));
  }

  /** The job's status document (see {@link JobStatusOps}). */
  public Optional<ObjectNode> status(String id) throws IOException {
    Optional<JobRecord> job = store.find(id);
    if (job.isEmpty()) {
      return Optional.empty();
    }
    return Optional.of(statusOps.status(job.get(), progress.get(id), true));
  }

  /** The job's entry in the list (no per-point detail). */
  public ObjectNode brief(JobRecord job) throws IOException {
    return statusOps.status(job, progress.get(job.id()), false);
  }

  /** The job's run directory. */
  public Path runDir(String id) {
    return store.runDir(id);
  }

  /** The summary text in a format ({@code csv} or {@code json}) from the journal so far. */
  public Optional<String> summaryText(String id, String format) throws IOException {
    Optional<JobRecord> job = store.find(id);
    if (job.isEmpty()) {
      return Optional.empty();
    }
    return Optional.of(statusOps.summaryText(job.get(), format));
  }

  /**
   * Cancels a job. A queued or paused job is CANCELLED at once; a running one is asked to stop and
   * becomes CANCELLED when its in-flight realisations are journaled.
   *
   * @throws IllegalStateException if the job is already final
   */
  public JobRecord cancel(String id) throws IOException {
    return stop(id, StopReason.CANCEL);
  }

  /** Pauses a queued or running job (a running one after its in-flight realisations). */
  public JobRecord pause(String id) throws IOException {
    return stop(id, StopReason.PAUSE);
  }

  /** Puts a paused job back in the queue. */
  public JobRecord resume(String id) throws IOException {
    JobRecord job = store.find(id).orElseThrow(() -> new IllegalArgumentException("no job " + id));
    JobRecord moved = store.transition(job.id(), JobState.QUEUED, "resumed", null);
    wake();
    return moved;
  }

  private JobRecord stop(String id, StopReason reason) throws IOException {
    JobState target = reason == StopReason.CANCEL ? JobState.CANCELLED : JobState.PAUSED;
    synchronized (monitor) {
      JobRecord job =
          store.find(id).orElseThrow(() -> new IllegalArgumentException("no job " + id));
      if (id.equals(currentId)) {
        if (!job.state().canMoveTo(target)) {
          throw new IllegalStateException(
              "job " + id + " cannot go from " + job.state() + " to " + target);
        }
        if (stopReason != StopReason.CANCEL) { // a cancel is not downgraded to a pause
          stopReason = reason;
        }
        currentBackend.requestStop();
        return job;
      }
      return store.transition(
          id, target, reason == StopReason.CANCEL ? "cancelled" : "paused", null);
    }
  }

  /** True if the job is running and has been asked to stop (pause or cancel). */
  public boolean isStopping(String id) {
    synchronized (monitor) {
      return id.equals(currentId) && stopReason != null;
    }
  }

  private void wake() {
    synchronized (monitor) {
      monitor.notifyAll();
    }
  }

  private void schedule() {
    while (true) {
      JobRecord job;
      LocalPoolBackend backend;
      synchronized (monitor) {
        Optional<JobRecord> next = closing ? Optional.empty() : store.nextQueued();
        while (next.isEmpty()) {
          if (closing) {
            return;
          }
          try {
            monitor.wait(1000);
          } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return;
          }
          next = closing ? Optional.empty() : store.nextQueued();
        }
        try {
          job =
              store.transition(
                  next.get().id(),
                  JobState.RUNNING,
                  "started on " + spec.threads() + " thread(s)",
                  null);
        } catch (IOException e) {
          LOG.error("cannot record the start of job {}: {}", next.get().id(), e.toString());
          closing = true;
          return;
        }
        backend = new LocalPoolBackend(clock);
        currentId = job.id();
        currentBackend = backend;
        stopReason = null;
      }
      runJob(job, backend);
    }
  }

  private void runJob(JobRecord job, LocalPoolBackend backend) {
    String id = job.id();
    JobProgress listener = new JobProgress(clock, spec.pace());
    progress.put(id, listener);
    JobState end;
    String reason;
    String message = null;
    try {
      RunDirectory dir = RunDirectory.open(store.runDir(id));
      StudyPlan plan = RunSummaryOps.plan(dir);
      SessionResult result =
          LocalSession.execute(
              dir,
              plan,
              backend,
              new RunOptions(
                  spec.threads(),
                  spec.linalg(),
                  "part",
                  Shard.ALL,
                  JournalWriter.DEFAULT_SYNC_INTERVAL_NANOS),
              listener);
      synchronized (monitor) {
        if (!result.run().stoppedEarly()) {
          end = JobState.DONE;
          reason =
              "finished: "
                  + result.summary().done()
                  + " done, "
                  + result.summary().failed()
                  + " failed";
          if (result.summary().failed() > 0) {
            message =
                result.summary().failed()
                    + " realisation(s) FAILED; reasons per point are in summary.json";
          }
        } else if (stopReason == StopReason.CANCEL) {
          end = JobState.CANCELLED;
          reason = "cancelled while running";
        } else if (stopReason == StopReason.PAUSE) {
          end = JobState.PAUSED;
          reason = "paused while running";
        } else {
          end = JobState.QUEUED;
          reason = "the service stopped; the job resumes from its journal";
        }
      }
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      end = JobState.QUEUED;
      reason = "interrupted; the job resumes from its journal";
    } catch (
        Exception
            e) { // the job boundary: a job that cannot run is FAILED with its reason, the service
      // goes on
      end = JobState.FAILED;
      reason = "could not run";
      message = e.getClass().getSimpleName() + ": " + e.getMessage();
      LOG.error("job {} failed: {}", id, message);
    }
    synchronized (monitor) {
      try {
        store.transition(id, end, reason, message);
      } catch (IOException e) {
        LOG.error("cannot record the end of job {}: {}", id, e.toString());
      }
      progress.remove(id);
      currentId = null;
      currentBackend = null;
      stopReason = null;
      monitor.notifyAll();
    }
    LOG.info("job {} {}", id, end);
  }

  /**
   * Stops the service: no new submissions, the running job finishes its in-flight realisations (up
   * to {@link #STOP_GRACE}) and goes back to QUEUED, the API and inbox stop, the lock is released.
   * Idempotent.
   */
  @Override
  public void close() throws IOException {
    LocalPoolBackend running;
    synchronized (monitor) {
      if (closing && closed.getCount() == 0) {
        return;
      }
      closing = true;
      running = currentBackend;
      if (running != null && stopReason == null) {
        stopReason = StopReason.SHUTDOWN;
      }
      monitor.notifyAll();
    }
    try {
      if (inbox != null) {
        inbox.close();
      }
      if (http != null) {
        http.close();
      }
      if (running != null) {
        running.requestStop();
        if (!running.awaitEnded(STOP_GRACE)) {
          running.abandon();
        }
      }
      if (scheduler.isAlive()) {
        scheduler.join(STOP_GRACE.toMillis());
      }
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
    } finally {
      Files.deleteIfExists(spec.root().resolve("service.json"));
      serviceLock.close();
      closed.countDown();
    }
  }

  /** Blocks until {@link #close()} has finished. */
  public void awaitClosed() throws InterruptedException {
    closed.await();
  }

  /** Waits up to {@code timeout} for {@link #close()} to finish; true if it did. */
  public boolean awaitClosed(Duration timeout) throws InterruptedException {
    return closed.await(timeout.toMillis(), TimeUnit.MILLISECONDS);
  }
}
