package hopstat.cli;

import hopstat.expand.GridExpander;
import hopstat.expand.GridPoint;
import hopstat.expand.MemoryCheck;
import hopstat.expand.PlanValidation;
import hopstat.expand.StudyPlan;
import hopstat.linalg.Linalg;
import hopstat.linalg.LinalgFactory;
import hopstat.linalg.LinalgKind;
import hopstat.model.Model;
import hopstat.spec.JobSpec;
import hopstat.task.RealisationCost;
import hopstat.task.RealisationResult;
import hopstat.task.RealisationRunner;
import hopstat.task.RealisationWorkspace;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

/**
 * {@code hopstat check SPEC}: validates a spec and prints the plan, memory and an estimated wall
 * time.
 */
@Command(
    mixinStandardHelpOptions = true,
    name = "check",
    description =
        "Validate a job spec and print the plan: grid, tasks, matrix sizes, memory per worker and estimated wall time.")
final class CheckCommand implements Callable<Integer> {

  /** Realisations timed per linear size (after one untimed warm-up). */
  static final int TIMED_REALISATIONS = 2;

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
      description = "Dense linear algebra to time: auto, native, java.")
  String linalg;

  @Option(
      names = "--no-timing",
      description = "Skip timing real realisations (no wall-time estimate).")
  boolean noTiming;

  @Override
  public Integer call() {
    JobSpec spec = SpecFiles.parse(SpecFiles.read(specFile));
    StudyPlan plan = GridExpander.expand(spec);
    int n = RunCommand.threads(threads);
    LinalgKind kind = LinalgChoice.resolve(linalg);
    PrintStream out = root.out;
    Model model = spec.resolveModel();
    out.printf(
        Locale.ROOT, "spec        %s (sha256 %s)%n", spec.name(), spec.specHash().substring(0, 16));
    out.printf(
        Locale.ROOT,
        "model       %s: class %s, d = %d; with this disorder: class %s%n",
        model.name(),
        model.symmetryClass(),
        model.dimension(),
        spec.effectiveClass());
    out.printf(Locale.ROOT, "boundary    %s%n", spec.boundary().specName());
    out.printf(Locale.ROOT, "observables %s%n", String.join(", ", spec.observables()));
    out.printf(
        Locale.ROOT,
        "grid        %s = %d point(s)%n",
        plan.gridNames().isEmpty() ? "(single point)" : String.join(" x ", plan.gridNames()),
        plan.points().size());
    if (spec.adaptiveSampling().isPresent()) {
      var s = spec.sampling();
      out.printf(
          Locale.ROOT,
          "sampling    adaptive: %d to %d realisations per point in batches of %d -> %d to %d tasks%n",
          s.minimum(),
          s.maximum(),
          s.batch(),
          (long) s.minimum() * plan.points().size(),
          plan.plannedTasks());
    } else {
      out.printf(
          Locale.ROOT,
          "sampling    %d realisations per point -> %d tasks%n",
          spec.realisations(),
          plan.plannedTasks());
    }
    Map<Integer, GridPoint> bySize = new TreeMap<>();
    Map<Integer, List<GridPoint>> allBySize = new TreeMap<>();
    for (GridPoint p : plan.points()) {
      bySize.putIfAbsent(p.point().linearSize(), p);
      allBySize.computeIfAbsent(p.point().linearSize(), k -> new ArrayList<>()).add(p);
    }
    for (Map.Entry<Integer, GridPoint> e : bySize.entrySet()) {
      RealisationCost c = RealisationCost.of(e.getValue().point());
      out.printf(
          Locale.ROOT,
          "L = %-8d matrix dimension N = %d; memory per worker %s heap + %s native%n",
          e.getKey(),
          c.matrixDimension(),
          MemoryCheck.bytes(c.heapBytes()),
          MemoryCheck.bytes(c.nativeBytes()));
    }
    MemoryCheck.require(plan, n);
    PlanValidation.validate(plan);
    out.printf(
        Locale.ROOT,
        "memory      fits with %d thread(s) (JVM heap limit %s)%n",
        n,
        MemoryCheck.bytes(Runtime.getRuntime().maxMemory()));
    if (!noTiming) {
      Linalg la = LinalgFactory.create(kind);
      RealisationWorkspace workspace = new RealisationWorkspace(la);
      double totalSeconds = 0;
      for (Map.Entry<Integer, List<GridPoint>> e : allBySize.entrySet()) {
        List<GridPoint> points = e.getValue();
        // the cost can depend strongly on the point (e.g. lyapunov's length grows as gamma -> 0),
        // so time the first, middle and last point of this size, not only the first
        Set<Integer> sampled = new TreeSet<>();
        sampled.add(points.get(0).index());
        sampled.add(points.get(points.size() / 2).index());
        sampled.add(points.get(points.size() - 1).index());
        RealisationRunner.run(plan.task(points.get(0).index(), 0), workspace);
        double sum = 0;
        for (int p : sampled) {
          for (int r = 1; r <= TIMED_REALISATIONS; r++) {
            RealisationResult result = RealisationRunner.run(plan.task(p, r), workspace);
            sum += result.wallSeconds();
          }
        }
        double perRealisation = sum / (TIMED_REALISATIONS * sampled.size());
        totalSeconds += perRealisation * points.size() * spec.realisations();
        out.printf(
            Locale.ROOT,
            "timing      L = %d: %.4f s per realisation (mean over %d grid point(s); %s, one thread)%n",
            e.getKey(),
            perRealisation,
            sampled.size(),
            la.describe());
      }
      out.printf(
          Locale.ROOT,
          "estimate    %s wall time for %s%d task(s) on %d thread(s) (assumes threads scale linearly)%n",
          duration(totalSeconds / n),
          spec.adaptiveSampling().isPresent() ? "at most " : "",
          plan.plannedTasks(),
          n);
    }
    out.println("ok: spec is valid");
    return ExitCode.OK;
  }

  static String duration(double seconds) {
    if (seconds < 120) {
      return String.format(Locale.ROOT, "%.1f s", seconds);
    }
    if (seconds < 7200) {
      return String.format(Locale.ROOT, "%.1f min", seconds / 60);
    }
    return String.format(Locale.ROOT, "%.1f h", seconds / 3600);
  }
}
