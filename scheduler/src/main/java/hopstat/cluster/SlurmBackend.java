package hopstat.cluster;

import hopstat.expand.StudyPlan;
import hopstat.pool.Backend;
import hopstat.pool.ProgressListener;
import hopstat.pool.RunOptions;
import hopstat.pool.RunResult;
import hopstat.queue.JournalReader;
import hopstat.queue.RunDirectory;
import hopstat.record.RealisationRecord;
import hopstat.task.Outcome;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Hands a study to Slurm: the shards that the journal says are unfinished become one job array
 * (array task id = shard index; each element runs the local pool on its shard and writes its own
 * journal file on the shared file system), followed by a report job with {@code
 * --dependency=afterany:ARRAY}, which rebuilds the summary once every element has ended, however it
 * ended, so that a failed shard shows as a gap instead of blocking the summary forever (as {@code
 * afterok} would).
 *
 * <p>The run's cluster settings live in {@code DIR/cluster.json} ({@link ClusterRunStore}); {@link
 * #prepare} writes it, {@link #execute} and {@link #submit} append a submission to it.
 */
public final class SlurmBackend implements Backend {

  private static final Logger LOG = LoggerFactory.getLogger(SlurmBackend.class);

  private final SlurmClient slurm;
  private final Clock clock;

  public SlurmBackend(SlurmClient slurm, Clock clock) {
    this.slurm = slurm;
    this.clock = clock;
  }

  @Override
  public String name() {
    return "slurm";
  }

  /**
   * The cluster settings for a new run: the shard count is {@code options.tasks()} capped at the
   * number of grid points (shards split by grid point).
   *
   * @param linalg the shards' {@code --linalg} choice (auto, native, java)
   */
  public static ClusterRun prepare(
      StudyPlan plan, SlurmSubmitSpec options, JavaLauncher launcher, String linalg) {
    int shards = Math.min(options.tasks(), plan.points().size());
    return new ClusterRun(
        ClusterRun.FORMAT,
        "slurm",
        shards,
        linalg,
        launcher,
        jvmOptions(options),
        options,
        List.of());
  }

  /**
   * JVM options that follow from the Slurm options: with {@code --mem}, a heap limit of 3/4 of it,
   * leaving the rest for native LAPACK workspaces and the JVM itself (common practice; the JVM's
   * own default, 1/4 of the node's memory, ignores the job's limit on clusters that do not confine
   * jobs in cgroups).
   */
  public static List<String> jvmOptions(SlurmSubmitSpec options) {
    long mib = options.memMebibytes();
    if (mib <= 0) {
      return List.of();
    }
    return List.of("-Xmx" + Math.max(64, mib * 3 / 4) + "m");
  }

  /**
   * Submits the shards of the run that the journal does not hold complete. The settings come from
   * {@code DIR/cluster.json}; {@code options} and {@code listener} are not used (threads and linear
   * algebra per shard were fixed when the run was prepared; progress happens elsewhere).
   *
   * @return finishedThisSession 0; stoppedEarly true when shards were handed off (the study goes on
   *     in Slurm), false when nothing was left
   * @throws IllegalStateException if the run directory has no cluster.json
   */
  @Override
  public RunResult execute(
      StudyPlan plan, RunDirectory dir, RunOptions options, ProgressListener listener)
      throws IOException, InterruptedException {
    ClusterRun run =
        ClusterRunStore.read(dir)
            .orElseThrow(
                () -> new IllegalStateException(dir.path() + " has no " + ClusterRunStore.FILE));
    List<Integer> missing =
        ShardProgressOps.incomplete(ShardProgressOps.progress(plan, dir, run.shardCount()));
    Collection<RealisationRecord> journaled =
        JournalReader.read(dir.journalDir()).records().values();
    long failed = journaled.stream().filter(r -> r.result().outcome() == Outcome.FAILED).count();
    if (missing.isEmpty()) {
      return new RunResult(0, journaled.size(), failed, false, dir.journalDir());
    }
    submit(plan, dir, run, missing);
    return new RunResult(0, journaled.size(), failed, true, dir.journalDir());
  }

  /**
   * Writes the two scripts of a new submission, submits the array over {@code shards} and the
   * report job after it, and records both in cluster.json.
   *
   * @throws ClusterException with sbatch's message if sbatch refuses; when the array was accepted
   *     but the report job was not, the array is still recorded, and the message says so
   */
  public ClusterSubmission submit(
      StudyPlan plan, RunDirectory dir, ClusterRun run, List<Integer> shards)
      throws IOException, InterruptedException {
    List<Integer> sorted = shards.stream().sorted().distinct().toList();
    for (int k : sorted) {
      if (k < 0 || k >= run.shardCount()) {
        throw new IllegalArgumentException("no shard " + k + " in a run of " + run.shardCount());
      }
    }
    int number = run.submissions().size() + 1;
    Path abs = dir.path().toAbsolutePath().normalize();
    Files.createDirectories(abs.resolve(BatchScriptOps.LOG_DIR));
    String jobName = BatchScriptOps.jobName(plan.spec().name());
    String shardName = String.format(Locale.ROOT, "cluster/submit-%02d-shards.sbatch", number);
    String reportName = String.format(Locale.ROOT, "cluster/submit-%02d-report.sbatch", number);
    Path shardScript = abs.resolve(shardName);
    Path reportScript = abs.resolve(reportName);
    writeScript(shardScript, BatchScriptOps.shardScript(jobName, abs, run, number));
    writeScript(reportScript, BatchScriptOps.reportScript(jobName, abs, run, number));

    String arrayId = slurm.submit(shardScript, arrayOptions(run, sorted));
    LOG.info(
        "submitted shard array {} (shards {}) for {}", arrayId, SlurmClient.indexList(sorted), abs);
    String reportId;
    try {
      reportId = slurm.submit(reportScript, reportOptions(run, arrayId));
    } catch (ClusterException e) {
      ClusterSubmission partial =
          new ClusterSubmission(
              number, clock.instant().toString(), sorted, arrayId, null, shardName, reportName);
      ClusterRunStore.write(dir, run.with(partial));
      throw new ClusterException(
          "shard array "
              + arrayId
              + " was submitted, but the report job was not: "
              + e.getMessage()
              + "; when the array has ended run `hopstat report "
              + abs
              + "`");
    }
    ClusterSubmission submission =
        new ClusterSubmission(
            number, clock.instant().toString(), sorted, arrayId, reportId, shardName, reportName);
    ClusterRunStore.write(dir, run.with(submission));
    return submission;
  }

  /** sbatch options of the shard array besides the script's own #SBATCH lines. */
  public static List<String> arrayOptions(ClusterRun run, List<Integer> shards) {
    List<String> o = new ArrayList<>();
    o.add("--array=" + SlurmClient.indexList(shards));
    o.addAll(run.options().extra());
    return o;
  }

  /** sbatch options of the report job besides its script's #SBATCH lines. */
  public static List<String> reportOptions(ClusterRun run, String arrayJobId) {
    List<String> o = new ArrayList<>();
    o.add("--dependency=afterany:" + arrayJobId);
    o.addAll(run.options().extra());
    return o;
  }

  /**
   * Slurm's view of every job of the run's submissions (array elements and report jobs); jobs that
   * Slurm has forgotten are absent.
   */
  public List<SlurmJobState> states(ClusterRun run) throws IOException, InterruptedException {
    Set<String> ids = new java.util.LinkedHashSet<>();
    for (ClusterSubmission s : run.submissions()) {
      ids.add(s.arrayJobId());
      if (s.reportJobId() != null) {
        ids.add(s.reportJobId());
      }
    }
    return slurm.states(ids);
  }

  private static void writeScript(Path file, String text) throws IOException {
    RunDirectory.writeAtomically(file, text.getBytes(StandardCharsets.UTF_8));
    file.toFile().setExecutable(true, false);
  }
}
