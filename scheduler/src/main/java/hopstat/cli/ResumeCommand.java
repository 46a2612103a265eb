package hopstat.cli;

import hopstat.cluster.ClusterException;
import hopstat.cluster.ClusterRun;
import hopstat.cluster.ClusterRunStore;
import hopstat.cluster.ClusterSubmission;
import hopstat.cluster.ShardLock;
import hopstat.cluster.ShardProgress;
import hopstat.cluster.ShardProgressOps;
import hopstat.cluster.SlurmBackend;
import hopstat.cluster.SlurmClient;
import hopstat.cluster.SlurmJobState;
import hopstat.cluster.SlurmSubmitSpec;
import hopstat.expand.StudyPlan;
import hopstat.queue.RunDirectory;
import hopstat.queue.RunDirectoryException;
import java.nio.file.Path;
import java.time.Clock;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

/**
 * {@code hopstat resume DIR}: continues a run from its journal. A cluster run (DIR/cluster.json) is
 * continued on the cluster: the shards that the journal does not hold complete (failed, timed out,
 * cancelled, lost with their node) are resubmitted as a new job array plus a new report job; {@code
 * --local} runs the rest on this machine instead.
 */
@Command(
    mixinStandardHelpOptions = true,
    name = "resume",
    description = {
      "Continue a run from its journal: runs only what is not journaled yet, then writes the summary.",
      "For a run made by `submit`: resubmits only the incomplete shards to Slurm (a new array and report job); --local runs them here."
    })
final class ResumeCommand implements Callable<Integer> {

  @ParentCommand HopstatCommand root;

  @Parameters(
      index = "0",
      paramLabel = "DIR",
      description = "Run directory made by `hopstat run` or `hopstat submit`.")
  Path dirPath;

  @Option(
      names = "--threads",
      paramLabel = "N",
      description = "Worker threads (default: all cores). Local runs only.")
  Integer threads;

  @Option(
      names = "--linalg",
      paramLabel = "KIND",
      defaultValue = LinalgChoice.DEFAULT,
      description = "Dense linear algebra: auto, native, java. Local runs only.")
  String linalg;

  @Option(names = "--quiet", description = "No progress bar or summary lines.")
  boolean quiet;

  @Option(
      names = "--local",
      description =
          "Cluster run: finish the missing shards on this machine instead of resubmitting them.")
  boolean local;

  @Option(
      names = "--partition",
      paramLabel = "P",
      description = "Cluster run: partition for the resubmission (default: as before).")
  String partition;

  @Option(
      names = "--time",
      paramLabel = "HH:MM:SS",
      description = "Cluster run: time limit per shard for the resubmission (default: as before).")
  String time;

  @Option(
      names = "--mem",
      paramLabel = "M",
      description = "Cluster run: memory per shard for the resubmission (default: as before).")
  String mem;

  @Option(
      names = "--extra",
      paramLabel = "\"OPTS\"",
      description = "Cluster run: further sbatch options, replacing the earlier ones.")
  String extra;

  @Override
  public Integer call() throws Exception {
    RunDirectory dir = RunDirectory.open(dirPath);
    StudyPlan plan = RunSummaries.plan(dir);
    String recorded = dir.runMetadata().path("specHash").asText();
    if (!recorded.equals(plan.spec().specHash())) {
      throw new RunDirectoryException(
          dir.specFile()
              + " no longer matches the spec this run started with (hash "
              + recorded
              + "); results would mix two studies. Start a new run directory instead.");
    }
    ClusterRun cluster = ClusterRunStore.read(dir).orElse(null);
    if (cluster != null) {
      SlurmBackend backend =
          new SlurmBackend(new SlurmClient(root.clusterCommands), Clock.systemUTC());
      refuseWhileShardsWork(dir, cluster, backend);
      if (!local) {
        return resubmit(dir, plan, cluster, backend);
      }
    }
    return RunSession.execute(
        root, dir, plan, RunCommand.threads(threads), LinalgChoice.resolve(linalg), quiet);
  }

  /**
   * Refuses while a shard of the run may still write: its lock is held, or Slurm has it queued or
   * running.
   */
  private void refuseWhileShardsWork(RunDirectory dir, ClusterRun cluster, SlurmBackend backend)
      throws Exception {
    List<Integer> held = ShardLock.held(dir.path(), cluster.shardCount());
    if (!held.isEmpty()) {
      throw new ClusterException(
          "shard(s) "
              + held
              + " of "
              + dir.path()
              + " are running right now (their locks in "
              + dir.path().resolve("locks")
              + " are held); wait for them (`hopstat status "
              + dir.path()
              + "`) or cancel their jobs first");
    }
    List<SlurmJobState> states;
    try {
      states = backend.states(cluster);
    } catch (ClusterException e) {
      if (!local) {
        throw new ClusterException(
            e.getMessage()
                + "; `hopstat resume "
                + dir.path()
                + " --local` finishes the run on this machine instead");
      }
      root.err.println(
          "hopstat: cannot ask Slurm about this run's jobs ("
              + e.getMessage()
              + "); no shard lock is held, going on locally");
      return;
    }
    List<String> active = ClusterView.active(states);
    if (!active.isEmpty()) {
      List<String> ids =
          states.stream()
              .filter(s -> s.phase().isActive())
              .map(SlurmJobState::jobId)
              .distinct()
              .toList();
      throw new ClusterException(
          "jobs of this run are still queued or running: "
              + String.join(", ", active)
              + "; wait for them (`hopstat status "
              + dir.path()
              + "`) or cancel them (`scancel "
              + String.join(" ", ids)
              + "`) first");
    }
  }

  private int resubmit(RunDirectory dir, StudyPlan plan, ClusterRun cluster, SlurmBackend backend)
      throws Exception {
    SlurmSubmitSpec options =
        cluster
            .options()
            .withOverrides(
                partition, time, mem, extra == null ? null : SlurmSubmitSpec.splitExtra(extra));
    List<ShardProgress> progress = ShardProgressOps.progress(plan, dir, cluster.shardCount());
    List<Integer> missing = ShardProgressOps.incomplete(progress);
    if (missing.isEmpty()) {
      List<Path> written = RunSummaries.write(dir, plan);
      if (!quiet) {
        root.out.println("every shard is complete; nothing to resubmit");
        for (Path p : written) {
          root.out.println("wrote " + p);
        }
      }
      return ExitCode.OK;
    }
    ClusterRun updated = cluster.with(options, SlurmBackend.jvmOptions(options));
    ClusterRunStore.write(dir, updated);
    ClusterSubmission s = backend.submit(plan, dir, updated, missing);
    if (!quiet) {
      for (ShardProgress p : progress) {
        if (!p.complete()) {
          root.out.printf(
              Locale.ROOT,
              "shard %d: %d of %d realisation(s) journaled; resubmitting%n",
              p.shard(),
              p.finished(),
              p.scheduled());
        }
      }
      root.out.printf(
          Locale.ROOT,
          "submitted shard array %s (array indices %s) and report job %s (submission %d)%n",
          s.arrayJobId(),
          SlurmClient.indexList(s.shards()),
          s.reportJobId(),
          s.number());
    }
    return ExitCode.OK;
  }
}
