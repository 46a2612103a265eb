package hopstat.invariant;

import hopstat.disorder.DisorderTerm;
import hopstat.lattice.Boundary;
import hopstat.linalg.LinalgFactory;
import hopstat.linalg.LinalgKind;
import hopstat.model.ParameterValues;
import hopstat.task.Outcome;
import hopstat.task.PointSpec;
import hopstat.task.RealisationResult;
import hopstat.task.RealisationRunner;
import hopstat.task.RealisationTask;
import hopstat.task.RealisationWorkspace;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * One whole realisation (build, disorder, observable) of disordered qwz (m = 1, onsite box W = 2, t
 * = 1): {@code chern-localizer} on the open sample (slice sweep, no dense matrix) against the dense
 * {@code bott} path on the periodic sample (full eigen-decomposition with vectors, then the Bott
 * index), side by side in one run on one thread, native backend.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 1, time = 5)
@Measurement(iterations = 3, time = 10)
@Fork(1)
public class SpectralLocalizerBenchmark {

  @Param({"40"})
  int size;

  private RealisationWorkspace workspace;
  private RealisationTask localizer;
  private RealisationTask bott;

  @Setup(Level.Trial)
  public void setUp() {
    workspace = new RealisationWorkspace(LinalgFactory.create(LinalgKind.NATIVE));
    ParameterValues p = new ParameterValues(Map.of("m", 1.0, "t", 1.0, "kappa", 0.0));
    List<DisorderTerm> disorder = List.of(new DisorderTerm("onsite-box", 2.0, Map.of()));
    localizer =
        new RealisationTask(
            "bench-localizer",
            0,
            0,
            20261201L,
            new PointSpec(
                "qwz", p, size, Boundary.OPEN, 0.0, disorder, List.of("chern-localizer")));
    bott =
        new RealisationTask(
            "bench-bott",
            0,
            0,
            20261201L,
            new PointSpec("qwz", p, size, Boundary.PERIODIC, 0.0, disorder, List.of("bott")));
  }

  @Benchmark
  public double chernLocalizer() {
    return value(RealisationRunner.run(localizer, workspace), "chern-localizer");
  }

  @Benchmark
  public double denseBott() {
    return value(RealisationRunner.run(bott, workspace), "bott");
  }

  private static double value(RealisationResult r, String key) {
    if (r.outcome() != Outcome.DONE) {
      throw new IllegalStateException("realisation failed: " + r.failure());
    }
    return r.values().get(key);
  }
}
