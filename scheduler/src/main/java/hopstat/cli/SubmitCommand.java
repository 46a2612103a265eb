package hopstat.cli;

import hopstat.cluster.BatchScriptOps;
import hopstat.cluster.ClusterRun;
import hopstat.cluster.ClusterRunStore;
import hopstat.cluster.ClusterSubmission;
import hopstat.cluster.JavaLauncher;
import hopstat.cluster.SlurmBackend;
import hopstat.cluster.SlurmClient;
import hopstat.cluster.SlurmSubmitSpec;
import hopstat.expand.GridExpander;
import hopstat.expand.MemoryCheck;
import hopstat.expand.PlanValidation;
import hopstat.expand.StudyPlan;
import hopstat.queue.RunDirectory;
import hopstat.spec.JobSpec;
import hopstat.task.BuildInfo;
import java.io.PrintStream;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

/**
 * {@code hopstat submit SPEC --out DIR}: runs a study on a Slurm cluster as one job array of shards
 * plus a report job. The run directory must be on a file system the compute nodes share.
 */
@Command(
    mixinStandardHelpOptions = true,
    name = "submit",
    description = {
      "Run a job spec on a Slurm cluster: one job array of shards, then a report job that writes the summary.",
      "Validates the spec like `run`, creates the run directory, splits the grid points into shards (element k of the array runs shard k)",
      "and submits the report job with afterany, so it runs however the shards end. DIR must be on a file system shared with the",
      "compute nodes. Watch with `status DIR`; resubmit failed shards with `resume DIR`."
    })
final class SubmitCommand implements Callable<Integer> {

  @ParentCommand HopstatCommand root;

  @Parameters(index = "0", paramLabel = "SPEC", description = "Job spec (JSON).")
  Path specFile;

  @Option(
      names = "--out",
      required = true,
      paramLabel = "DIR",
      description = "New run directory on a shared file system.")
  Path out;

  @Option(
      names = "--tasks",
      paramLabel = "N",
      defaultValue = "1",
      description =
          "Shards = array elements (default ${DEFAULT-VALUE}); at most one per grid point.")
  int tasks;

  @Option(
      names = "--partition",
      paramLabel = "P",
      description = "Slurm partition (default: the cluster's default).")
  String partition;

  @Option(
      names = "--time",
      paramLabel = "HH:MM:SS",
      description = "Wall-time limit per shard (also D-HH:MM:SS or minutes).")
  String time;

  @Option(
      names = "--cpus-per-task",
      paramLabel = "C",
      defaultValue = "1",
      description = "CPUs = worker threads per shard (default ${DEFAULT-VALUE}).")
  int cpusPerTask;

  @Option(
      names = "--mem",
      paramLabel = "M",
      description =
          "Memory per shard, e.g. 4G (plain numbers are MiB); the shard JVM's heap is set to 3/4 of it.")
  String mem;

  @Option(
      names = "--extra",
      paramLabel = "\"OPTS\"",
      description =
          "Further sbatch options for every job of the run, e.g. \"--account=phys --qos=short\".")
  String extra;

  @Option(
      names = "--linalg",
      paramLabel = "KIND",
      defaultValue = LinalgChoice.DEFAULT,
      description = "Dense linear algebra on the nodes: auto, native, java.")
  String linalg;

  @Option(
      names = "--dry-run",
      description = "Print the batch scripts and sbatch commands; create nothing, submit nothing.")
  boolean dryRun;

  @Override
  public Integer call() throws Exception {
    SlurmSubmitSpec options =
        new SlurmSubmitSpec(
            tasks, partition, time, cpusPerTask, mem, SlurmSubmitSpec.splitExtra(extra));
    LinalgChoice.resolve(linalg);
    String text = SpecFiles.read(specFile);
    JobSpec spec = SpecFiles.parse(text);
    StudyPlan plan = GridExpander.expand(spec);
    PlanValidation.validate(plan);
    MemoryCheck.require(plan, cpusPerTask);
    Path dirPath = out.toAbsolutePath().normalize();
    BatchScriptOps.requireSafePath(dirPath);
    PrintStream stdout = root.out;
    ClusterRun run =
        SlurmBackend.prepare(plan, options, JavaLauncher.current(HopstatCommand.class), linalg);
    if (run.shardCount() < tasks) {
      root.err.printf(
          java.util.Locale.ROOT,
          "hopstat: --tasks %d capped at %d: shards split by grid point and the spec has %d point(s)%n",
          tasks,
          run.shardCount(),
          plan.points().size());
    }
    List<Integer> all = java.util.stream.IntStream.range(0, run.shardCount()).boxed().toList();
    if (dryRun) {
      String jobName = BatchScriptOps.jobName(spec.name());
      stdout.println("# " + dirPath.resolve("cluster/submit-01-shards.sbatch"));
      stdout.print(BatchScriptOps.shardScript(jobName, dirPath, run, 1));
      stdout.println("# " + dirPath.resolve("cluster/submit-01-report.sbatch"));
      stdout.print(BatchScriptOps.reportScript(jobName, dirPath, run, 1));
      stdout.println("# submission commands (dry run: nothing was created or submitted)");
      stdout.println(
          BatchScriptOps.shellCommand(
              SlurmClient.submitCommand(
                  dirPath.resolve("cluster/submit-01-shards.sbatch"),
                  SlurmBackend.arrayOptions(run, all))));
      stdout.println(
          BatchScriptOps.shellCommand(
              SlurmClient.submitCommand(
                  dirPath.resolve("cluster/submit-01-report.sbatch"),
                  SlurmBackend.reportOptions(run, "<ARRAY_JOB_ID>"))));
      return ExitCode.OK;
    }
    Map<String, Object> metadata = new LinkedHashMap<>();
    metadata.put("name", spec.name());
    metadata.put("specHash", spec.specHash());
    metadata.put("created", Instant.now().toString());
    metadata.put("createdBy", BuildInfo.provenance());
    metadata.put("backend", "slurm");
    metadata.put("threads", cpusPerTask);
    metadata.put("shards", run.shardCount());
    metadata.put("gridPoints", plan.points().size());
    metadata.put("plannedTasks", plan.plannedTasks());
    RunDirectory dir = RunDirectory.create(dirPath, text, metadata);
    // cluster.json first: if sbatch refuses, `hopstat resume DIR` with corrected options submits.
    ClusterRunStore.write(dir, run);
    SlurmBackend backend =
        new SlurmBackend(new SlurmClient(root.clusterCommands), Clock.systemUTC());
    ClusterSubmission s;
    try {
      s = backend.submit(plan, dir, run, all);
    } catch (hopstat.cluster.ClusterException e) {
      if (ClusterRunStore.read(dir).orElseThrow().submissions().isEmpty()) {
        throw new hopstat.cluster.ClusterException(
            e.getMessage()
                + "; nothing was submitted. "
                + dirPath
                + " holds the spec: submit it with corrected options by `hopstat resume "
                + dirPath
                + " --partition ... --time ...`, or delete it");
      }
      throw e;
    }
    stdout.printf(
        java.util.Locale.ROOT,
        "run directory %s: %d grid point(s), %s%d realisation(s) in %d shard(s) of %d CPU(s)%n",
        dirPath,
        plan.points().size(),
        spec.adaptiveSampling().isPresent() ? "at most " : "",
        plan.plannedTasks(),
        run.shardCount(),
        cpusPerTask);
    stdout.printf(
        java.util.Locale.ROOT,
        "submitted shard array %s (array indices %s) and report job %s (runs after the array has ended, however it ended)%n",
        s.arrayJobId(),
        SlurmClient.indexList(s.shards()),
        s.reportJobId());
    stdout.printf(
        "watch with `hopstat status %s`; rerun failed shards with `hopstat resume %s`%n",
        dirPath, dirPath);
    return ExitCode.OK;
  }
}
