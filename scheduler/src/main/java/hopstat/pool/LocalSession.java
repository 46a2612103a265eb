package hopstat.pool;

import hopstat.expand.StudyPlan;
import hopstat.linalg.LinalgFactory;
import hopstat.linalg.LinalgKind;
import hopstat.queue.RunDirectory;
import hopstat.queue.RunLock;
import hopstat.report.ReportFormats;
import hopstat.statistics.Summary;
import hopstat.task.BuildInfo;
import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * One local session over a run directory: take its lock, run on the local pool what the journal
 * lacks, write the summaries. The same code serves {@code hopstat run}, {@code hopstat resume} and
 * the batch service, so a run started by any of them finishes with the same files.
 */
public final class LocalSession {

  private LocalSession() {}

  /**
   * The members of a new run's {@code run.json}.
   *
   * @param created when the run directory is created (from the caller's clock)
   */
  public static Map<String, Object> runMetadata(
      StudyPlan plan, int threads, LinalgKind linalg, Instant created) {
    return runMetadata(plan, threads, LinalgFactory.create(linalg).describe(), created);
  }

  /**
   * The members of a new run's {@code run.json}, for callers that create many runs and describe
   * their linear algebra once.
   *
   * @param linalgDescription {@link hopstat.linalg.Linalg#describe()} of the backend the run uses
   */
  public static Map<String, Object> runMetadata(
      StudyPlan plan, int threads, String linalgDescription, Instant created) {
    Map<String, Object> metadata = new LinkedHashMap<>();
    metadata.put("name", plan.spec().name());
    metadata.put("specHash", plan.spec().specHash());
    metadata.put("created", created.toString());
    metadata.put("createdBy", BuildInfo.provenance());
    metadata.put("linalg", linalgDescription);
    metadata.put("threads", threads);
    metadata.put("gridPoints", plan.points().size());
    metadata.put("plannedTasks", plan.plannedTasks());
    return metadata;
  }

  /**
   * Runs a session: locks {@code dir}, executes on {@code backend} (which the caller may stop with
   * {@link LocalPoolBackend#requestStop()}), writes summary.csv/json from the whole journal.
   *
   * @throws hopstat.queue.RunDirectoryException if another process holds the run directory
   */
  public static SessionResult execute(
      RunDirectory dir,
      StudyPlan plan,
      LocalPoolBackend backend,
      RunOptions options,
      ProgressListener listener)
      throws IOException, InterruptedException {
    try (RunLock lock = RunLock.acquire(dir.path())) {
      RunResult result = backend.execute(plan, dir, options, listener);
      Summary summary = RunSummaryOps.summarise(dir, plan);
      List<Path> written = ReportFormats.writeAll(summary, dir.path());
      return new SessionResult(result, summary, written);
    }
  }
}
