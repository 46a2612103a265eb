package hopstat.cli;

import hopstat.expand.GridExpander;
import hopstat.expand.GridPoint;
import hopstat.expand.MemoryCheck;
import hopstat.expand.PlanValidation;
import hopstat.expand.StudyPlan;
import hopstat.linalg.Linalg;
import hopstat.linalg.LinalgFactory;
import hopstat.linalg.LinalgKind;
import hopstat.spec.JobSpec;
import hopstat.task.Outcome;
import hopstat.task.PointSpec;
import hopstat.task.RealisationCost;
import hopstat.task.RealisationResult;
import hopstat.task.RealisationRunner;
import hopstat.task.RealisationTask;
import hopstat.task.RealisationWorkspace;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

/**
 * {@code hopstat bench SPEC}: calibration before a long run. For each linear size of the spec,
 * times every requested observable on its own (one untimed warm-up, then {@code --realisations}
 * timed realisations of the first grid point with that L, one thread), prints seconds per
 * realisation per observable and in all, the memory per worker, and extrapolates the run's wall
 * time for the chosen thread count. Timing other grid points at the same L is not done: cost is
 * assumed to depend on L and the observables only.
 */
@Command(
    mixinStandardHelpOptions = true,
    name = "bench",
    description =
        "Time each observable of a spec at each size, print seconds per realisation and memory per worker, and extrapolate the run's wall time.")
final class BenchCommand implements Callable<Integer> {

  @ParentCommand HopstatCommand root;

  @Parameters(index = "0", paramLabel = "SPEC", description = "Job spec (JSON).")
  Path specFile;

  @Option(
      names = "--threads",
      paramLabel = "N",
      description = "Threads the run will use (default: all cores).")
  Integer threads;

  @Option(
      names = "--linalg",
      paramLabel = "KIND",
      defaultValue = LinalgChoice.DEFAULT,
      description = "Dense linear algebra: auto, native, java.")
  String linalg;

  @Option(
      names = "--realisations",
      paramLabel = "R",
      defaultValue = "2",
      description = "Timed realisations per size and observable (default 2).")
  int timed;

  @Option(
      names = "--scaling",
      paramLabel = "S",
      defaultValue = "1.0",
      description =
          "Throughput of N threads relative to N x one thread, e.g. 0.95 (measure it with `hopstat run --threads 1` and `--threads N`; default 1.0).")
  double scaling;

  @Override
  public Integer call() {
    JobSpec spec = SpecFiles.parse(SpecFiles.read(specFile));
    StudyPlan plan = GridExpander.expand(spec);
    PlanValidation.validate(plan);
    int n = RunCommand.threads(threads);
    if (timed < 1) {
      throw new hopstat.task.InvalidInputException("--realisations", timed, "must be at least 1");
    }
    if (!(scaling > 0 && scaling <= 1)) {
      throw new hopstat.task.InvalidInputException("--scaling", scaling, "must be in (0, 1]");
    }
    MemoryCheck.require(plan, n);
    LinalgKind kind = LinalgChoice.resolve(linalg);
    Linalg la = LinalgFactory.create(kind);
    RealisationWorkspace workspace = new RealisationWorkspace(la);
    PrintStream out = root.out;
    Map<Integer, GridPoint> bySize = new TreeMap<>();
    Map<Integer, Long> pointsBySize = new TreeMap<>();
    for (GridPoint p : plan.points()) {
      bySize.putIfAbsent(p.point().linearSize(), p);
      pointsBySize.merge(p.point().linearSize(), 1L, Long::sum);
    }
    out.printf(
        Locale.ROOT,
        "bench       %s: %d timed realisation(s) per size and observable, one thread, %s%n",
        spec.name(),
        timed,
        la.describe());
    double totalSeconds = 0;
    for (Map.Entry<Integer, GridPoint> e : bySize.entrySet()) {
      GridPoint gp = e.getValue();
      PointSpec point = gp.point();
      RealisationCost cost = RealisationCost.of(point);
      double perRealisation = 0;
      for (String observable : point.observables()) {
        PointSpec single =
            new PointSpec(
                point.model(),
                point.parameters(),
                point.linearSize(),
                point.boundary(),
                point.fermiEnergy(),
                point.disorder(),
                List.of(observable));
        double seconds = time(plan, gp, single, workspace);
        perRealisation += seconds;
        out.printf(
            Locale.ROOT,
            "L = %-6d %-20s %10.4f s per realisation%s%n",
            e.getKey(),
            observable,
            seconds,
            Double.isNaN(seconds) ? " (FAILED realisations)" : "");
      }
      long realisations = pointsBySize.get(e.getKey()) * (long) plannedPerPoint(spec, plan);
      totalSeconds += perRealisation * realisations;
      out.printf(
          Locale.ROOT,
          "L = %-6d %-20s %10.4f s per realisation; N = %d; memory per worker %s heap + %s native; %d realisation(s) planned%n",
          e.getKey(),
          "(all observables)",
          perRealisation,
          cost.matrixDimension(),
          MemoryCheck.bytes(cost.heapBytes()),
          MemoryCheck.bytes(cost.nativeBytes()),
          realisations);
    }
    double wall = totalSeconds / (n * scaling);
    out.printf(
        Locale.ROOT,
        "estimate    %s wall time on %d thread(s) (one-thread time / (threads x scaling %.2f)); one-thread total %s%n",
        CheckCommand.duration(wall),
        n,
        scaling,
        CheckCommand.duration(totalSeconds));
    return ExitCode.OK;
  }

  private static int plannedPerPoint(JobSpec spec, StudyPlan plan) {
    return (int) (plan.plannedTasks() / Math.max(1, plan.points().size()));
  }

  /** Mean wall seconds of {@code timed} realisations after one warm-up; NaN if any FAILED. */
  private double time(
      StudyPlan plan, GridPoint gp, PointSpec single, RealisationWorkspace workspace) {
    double sum = 0;
    boolean failed = false;
    for (int r = 0; r <= timed; r++) {
      RealisationTask base = plan.task(gp.index(), r);
      RealisationTask task =
          new RealisationTask(
              base.taskId(), base.pointIndex(), base.realisationIndex(), base.seed(), single);
      RealisationResult result = RealisationRunner.run(task, workspace);
      failed |= result.outcome() != Outcome.DONE;
      if (r > 0) {
        sum += result.wallSeconds();
      }
    }
    return failed ? Double.NaN : sum / timed;
  }
}
