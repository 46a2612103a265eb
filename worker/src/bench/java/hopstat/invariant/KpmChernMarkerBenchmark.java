package hopstat.invariant;

import hopstat.disorder.DisorderTerm;
import hopstat.lattice.Boundary;
import hopstat.linalg.LinalgFactory;
import hopstat.linalg.LinalgKind;
import hopstat.model.ParameterValues;
import hopstat.spectrum.CsrHermitianMatrix;
import hopstat.task.Outcome;
import hopstat.task.PointSpec;
import hopstat.task.RealisationCost;
import hopstat.task.RealisationResult;
import hopstat.task.RealisationRunner;
import hopstat.task.RealisationTask;
import hopstat.task.RealisationWorkspace;
import java.util.List;
import java.util.Locale;
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
 * One whole realisation (build, disorder, CSR assembly, observable) of disordered open qwz (m = 1,
 * t = 1, onsite box W = 2, E_F = 0) with {@code kpm-chern-marker} at the defaults M = 256 moments,
 * R = 8 vectors, on one thread, at L = 100, 200, 400 (N = 2L²).
 *
 * <p>JMH (single-shot, each realisation takes seconds): {@code mvn -B -o -Pbench -pl worker
 * test-compile exec:exec -Djmh.args="KpmChernMarkerBenchmark -rf json"}. Wall time and memory in
 * one JVM (plain main): {@code mvn -B -o -Pbench -pl worker test-compile exec:exec
 * -Dbench.args="-cp %classpath hopstat.invariant.KpmChernMarkerBenchmark 100,200,400"}.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 1)
@Measurement(iterations = 3)
@Fork(
    value = 1,
    jvmArgs = {"-Xmx4g"})
public class KpmChernMarkerBenchmark {

  @Param({"100", "200", "400"})
  int size;

  private RealisationWorkspace workspace;
  private RealisationTask task;

  @Setup(Level.Trial)
  public void setUp() {
    workspace = new RealisationWorkspace(LinalgFactory.create(LinalgKind.NATIVE));
    task = task(size, 20261202L);
  }

  @Benchmark
  public double kpmChernMarker() {
    return value(RealisationRunner.run(task, workspace));
  }

  static RealisationTask task(int size, long seed) {
    ParameterValues p =
        new ParameterValues(Map.of("m", 1.0, "t", 1.0, "kpmMoments", 256.0, "kpmVectors", 8.0));
    List<DisorderTerm> disorder = List.of(new DisorderTerm("onsite-box", 2.0, Map.of()));
    return new RealisationTask(
        "bench-kpm-marker",
        0,
        0,
        seed,
        new PointSpec("qwz", p, size, Boundary.OPEN, 0.0, disorder, List.of("kpm-chern-marker")));
  }

  private static double value(RealisationResult r) {
    if (r.outcome() != Outcome.DONE) {
      throw new IllegalStateException("realisation failed: " + r.failure());
    }
    return r.values().get("kpm-chern-marker");
  }

  /**
   * Wall time of two realisations per size (the first grows the workspace) and the CPU time of the
   * second (this thread; less sensitive to other load) after one warm-up realisation at the
   * smallest size, with the marker, its error, the CSR and vector storage and the heap in use after
   * a GC. Args: comma-separated sizes.
   */
  public static void main(String[] args) {
    String[] sizes = (args.length > 0 ? args[0] : "100,200,400").split(",");
    RealisationWorkspace ws = new RealisationWorkspace(LinalgFactory.create(LinalgKind.NATIVE));
    value(RealisationRunner.run(task(Integer.parseInt(sizes[0].trim()), 1L), ws));
    Runtime rt = Runtime.getRuntime();
    java.lang.management.ThreadMXBean threads =
        java.lang.management.ManagementFactory.getThreadMXBean();
    System.out.printf(
        Locale.ROOT,
        "%6s %8s %10s %10s %9s %9s %9s %9s %10s %12s%n",
        "L",
        "N",
        "nnz",
        "seconds",
        "seconds2",
        "cpu2",
        "marker",
        "error",
        "csr+vec MB",
        "heapUsed MB");
    for (String s : sizes) {
      int size = Integer.parseInt(s.trim());
      long t0 = System.nanoTime();
      RealisationResult r1 = RealisationRunner.run(task(size, 20261202L), ws);
      long t1 = System.nanoTime();
      long c1 = threads.getCurrentThreadCpuTime();
      RealisationResult r2 = RealisationRunner.run(task(size, 20261203L), ws);
      long c2 = threads.getCurrentThreadCpuTime();
      long t2 = System.nanoTime();
      value(r1);
      value(r2);
      CsrHermitianMatrix h = ws.scratch(CsrHermitianMatrix.class, l -> new CsrHermitianMatrix());
      KpmChernMarkerWorkspace kw =
          ws.scratch(KpmChernMarkerWorkspace.class, l -> new KpmChernMarkerWorkspace());
      System.gc();
      long used = rt.totalMemory() - rt.freeMemory();
      System.out.printf(
          Locale.ROOT,
          "%6d %8d %10d %10.2f %9.2f %9.2f %9.4f %9.4f %10.1f %12.1f  (RealisationCost estimate %.1f MB)%n",
          size,
          h.dimension(),
          h.nonZeros(),
          (t1 - t0) * 1e-9,
          (t2 - t1) * 1e-9,
          (c2 - c1) * 1e-9,
          r1.values().get("kpm-chern-marker"),
          r1.values().get("kpm-chern-marker-error"),
          (h.storageBytes() + kw.vectorBytes()) / 1048576.0,
          used / 1048576.0,
          (RealisationCost.of(task(size, 1L).point()).heapBytes()
                  + RealisationCost.of(task(size, 1L).point()).nativeBytes())
              / 1048576.0);
    }
  }
}
