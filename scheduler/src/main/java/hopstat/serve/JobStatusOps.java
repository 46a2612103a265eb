package hopstat.serve;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import hopstat.expand.LayoutOps;
import hopstat.expand.StudyPlan;
import hopstat.pool.RunSummaryOps;
import hopstat.queue.RunDirectory;
import hopstat.report.ReportFormats;
import hopstat.statistics.PointSummary;
import hopstat.statistics.QuantitySummary;
import hopstat.statistics.Summary;
import hopstat.task.Quantity;
import java.io.IOException;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.concurrent.ConcurrentHashMap;
import java.util.stream.Stream;

/**
 * Builds the status documents of the API from a job's record, its journal (through {@link
 * hopstat.statistics.SummaryOps}, the same statistics as summary.csv/json) and the live progress of
 * a running session. Summaries are cached per job: a job that is not running is summarised once per
 * state change; the running job at most once per {@link #LIVE_REUSE_NANOS} and only when its
 * journal files changed size. The summary endpoints (summary.csv/json) are therefore up to that age
 * behind a running job's journal; for a job that is not running they are exact.
 *
 * <p>Non-finite numbers (e.g. the standard error of a single sample) are written as {@code null}.
 */
final class JobStatusOps {

  /** Format of the status documents. */
  static final int FORMAT = 1;

  private static final ObjectMapper JSON = new ObjectMapper();

  /**
   * A running job's summary is reused for this long before the journal is looked at again: many
   * clients polling then cost one journal read per interval, and the dashboard polls once a second.
   */
  static final long LIVE_REUSE_NANOS = 250_000_000L;

  private record Cached(String fingerprint, Summary summary, long computedNanos) {}

  private final JobStore store;
  private final Map<String, StudyPlan> plans = new ConcurrentHashMap<>();
  private final Map<String, Cached> summaries = new ConcurrentHashMap<>();
  private final Map<String, Object> locks = new ConcurrentHashMap<>();

  JobStatusOps(JobStore store) {
    this.store = store;
  }

  /** The plan of a job (its spec never changes, so it is expanded once). */
  StudyPlan plan(String id) throws IOException {
    StudyPlan p = plans.get(id);
    if (p == null) {
      p = RunSummaryOps.plan(RunDirectory.open(store.runDir(id)));
      plans.put(id, p);
    }
    return p;
  }

  /**
   * The summary of the job's journal as it is now. Only a RUNNING job's journal grows (the service
   * holds the root, and a job's run directory is locked while it runs), so other jobs are keyed on
   * their history length and cost no file access once cached; the running job is keyed on the
   * journal files' names and sizes.
   */
  Summary summary(JobRecord job) throws IOException {
    String id = job.id();
    Object lock = locks.computeIfAbsent(id, k -> new Object());
    synchronized (lock) { // one reader per job at a time; the others wait and reuse its result
      Cached c = summaries.get(id);
      boolean running = job.state() == JobState.RUNNING;
      if (running
          && c != null
          && c.fingerprint().startsWith("running:")
          && System.nanoTime() - c.computedNanos() < LIVE_REUSE_NANOS) {
        return c.summary();
      }
      String key =
          running
              ? "running:" + fingerprint(store.runDir(id).resolve("journal"))
              : "still:" + job.history().size();
      if (c == null || !c.fingerprint().equals(key)) {
        c =
            new Cached(
                key,
                RunSummaryOps.summarise(RunDirectory.open(store.runDir(id)), plan(id)),
                System.nanoTime());
      } else {
        c = new Cached(key, c.summary(), System.nanoTime());
      }
      summaries.put(id, c);
      return c.summary();
    }
  }

  /**
   * The summary text ({@code csv} or {@code json}), byte for byte what summary.csv/json would hold
   * now.
   */
  String summaryText(JobRecord job, String format) throws IOException {
    ReportFormats f = ReportFormats.valueOf(format.toUpperCase(Locale.ROOT));
    StringWriter w = new StringWriter();
    f.format().write(summary(job), w);
    return w.toString();
  }

  private static String fingerprint(Path journalDir) throws IOException {
    StringBuilder b = new StringBuilder();
    try (Stream<Path> s = Files.list(journalDir)) {
      for (Path p : s.sorted().toList()) {
        b.append(p.getFileName()).append(':').append(Files.size(p)).append(';');
      }
    }
    return b.toString();
  }

  /**
   * The status document of a job.
   *
   * @param live the running session's progress, or {@code null}
   * @param detail include history, per-point estimates and quantities (else a list entry)
   */
  ObjectNode status(JobRecord job, JobProgress live, boolean detail) throws IOException {
    ObjectNode o = JSON.createObjectNode();
    o.put("format", FORMAT);
    ObjectNode j = JobStore.toJson(job);
    if (!detail) {
      j.remove("history");
    }
    o.set("job", j);
    StudyPlan plan = plan(job.id());
    Summary s = summary(job);
    ObjectNode p = o.putObject("progress");
    long planned = plan.plannedTasks();
    long finished = s.done() + s.failed();
    p.put("planned", planned);
    p.put("adaptive", plan.spec().adaptiveSampling().isPresent());
    p.put("done", s.done());
    p.put("failed", s.failed());
    p.put("finished", finished);
    if (live != null && live.scheduled() > 0) {
      p.put("scheduled", live.scheduled());
    } else {
      p.put("scheduled", planned);
    }
    number(p, "fraction", planned == 0 ? 1.0 : Math.min(1.0, (double) finished / planned));
    OptionalDouble rate = live == null ? OptionalDouble.empty() : live.ratePerSecond();
    OptionalDouble eta = live == null ? OptionalDouble.empty() : live.etaSeconds();
    number(p, "ratePerSecond", rate.isPresent() ? rate.getAsDouble() : Double.NaN);
    number(p, "etaSeconds", eta.isPresent() ? eta.getAsDouble() : Double.NaN);
    long nonQuantised = 0;
    for (PointSummary ps : s.points()) {
      for (QuantitySummary q : ps.quantities()) {
        if (q.integer() != null) {
          nonQuantised += q.integer().nonQuantised();
        }
      }
    }
    p.put("nonQuantised", nonQuantised);
    Path run = store.runDir(job.id());
    ObjectNode files = o.putObject("files");
    files.put("summaryCsv", Files.isRegularFile(run.resolve("summary.csv")));
    files.put("summaryJson", Files.isRegularFile(run.resolve("summary.json")));
    files.put("report", Files.isRegularFile(run.resolve("report.html")));
    if (!detail) {
      return o;
    }
    ArrayNode grid = o.putArray("grid");
    s.gridNames().forEach(grid::add);
    ArrayNode quantities = o.putArray("quantities");
    for (Quantity q : LayoutOps.layout(plan).quantities()) {
      ObjectNode x = quantities.addObject();
      x.put("name", q.name());
      x.put("integerValued", q.integerValued());
      x.put("unit", q.unit());
      x.put("description", q.description());
    }
    o.put("plannedPerPoint", s.plannedPerPoint());
    ArrayNode points = o.putArray("points");
    for (PointSummary ps : s.points()) {
      ObjectNode x = points.addObject();
      x.put("index", ps.index());
      ObjectNode coords = x.putObject("coordinates");
      ps.coordinates().forEach((k, v) -> number(coords, k, v));
      x.put("planned", s.plannedPerPoint());
      x.put("done", ps.done());
      x.put("failed", ps.failed());
      ObjectNode reasons = x.putObject("failureReasons");
      ps.failureReasons().forEach(reasons::put);
      ObjectNode qs = x.putObject("quantities");
      for (QuantitySummary q : ps.quantities()) {
        ObjectNode e = qs.putObject(q.name());
        e.put("n", q.mean().n());
        number(e, "mean", q.mean().mean());
        number(e, "stderr", q.mean().standardError());
        number(e, "ciLow", q.mean().ciLow());
        number(e, "ciHigh", q.mean().ciHigh());
        number(e, "confidenceLevel", q.mean().confidenceLevel());
        number(e, "median", q.median());
        number(e, "min", q.min());
        number(e, "max", q.max());
        if (q.integer() != null) {
          e.put("nonQuantised", q.integer().nonQuantised());
          e.put("modalValue", q.integer().modalValue());
          number(e, "modalFraction", q.integer().modalFraction());
        }
      }
    }
    return o;
  }

  private static void number(ObjectNode o, String name, double v) {
    if (Double.isFinite(v)) {
      o.put(name, v);
    } else {
      o.putNull(name);
    }
  }
}
