package hopstat.localisation;

import hopstat.disorder.DisorderTerm;
import hopstat.disorder.OnsiteBoxDisorder;
import hopstat.lattice.Boundary;
import hopstat.lattice.Lattice;
import hopstat.model.AndersonModel;
import hopstat.model.ParameterValues;
import hopstat.task.SeedOps;
import java.util.Locale;
import java.util.Map;
import java.util.random.RandomGenerator;

/**
 * Benchmark, not a unit test: Λ_M(W) = 1/(γ_min M) of 3D Anderson bars (box disorder, E = 0,
 * periodic transverse boundary) for several M, whose curves cross near W_c ≈ 16.5 (Slevin &amp;
 * Ohtsuki, New J. Phys. 16, 015012 (2014); Λ_c = 0.576, PRL 82, 382 (1999)). Also reports the
 * throughput of the transfer-matrix kernel (slices per second).
 *
 * <p>Run: {@code mvn -q -B -o -Pbench -pl worker test-compile exec:java -Dexec.args="<error>
 * <M,M,..> <W,W,..>"}, e.g. {@code 0.01 4,6,8 14,15,16,17,18,19}. Output: one whitespace-separated
 * line per (W, M): W, M, Λ, relative error of Λ, slices, seconds, slices/s.
 */
public final class AndersonTransitionBenchmark {

  private AndersonTransitionBenchmark() {}

  public static void main(String[] args) {
    double error = args.length > 0 ? Double.parseDouble(args[0]) : 0.01;
    int[] sizes = parseInts(args.length > 1 ? args[1] : "4,6,8");
    double[] disorders = parseDoubles(args.length > 2 ? args[2] : "14,15,16,17,18,19");
    AndersonModel model = new AndersonModel(3);
    ParameterValues parameters = new ParameterValues(Map.of("t", 1.0));
    OnsiteBoxDisorder box = new OnsiteBoxDisorder();
    TransferMatrixWorkspace workspace = new TransferMatrixWorkspace();
    System.out.println(
        "# W M Lambda relErr slices seconds slicesPerSecond  (E = 0, periodic transverse, target "
            + error
            + ")");
    int point = 0;
    for (double w : disorders) {
      for (int m : sizes) {
        Lattice slice = model.sliceLattice(m, Boundary.PERIODIC);
        int k = slice.orbitals();
        double[] hopping = new double[k * k];
        model.interSliceHopping(parameters, slice, hopping);
        DisorderTerm term = new DisorderTerm("onsite-box", w, Map.of());
        RandomGenerator random = SeedOps.generator(SeedOps.realisationSeed(2014, point++, 0));
        long start = System.nanoTime();
        LyapunovResult r =
            TransferMatrixKernel.run(
                hopping,
                k,
                new LyapunovSpec(0.0, error, 200_000_000L),
                h -> {
                  model.addCleanSlice(parameters, slice, h);
                  box.apply(term, model, parameters, slice, random, h);
                },
                workspace);
        double seconds = (System.nanoTime() - start) * 1e-9;
        System.out.printf(
            Locale.ROOT,
            "%6.2f %3d %.4f %.4f %10d %8.1f %10.0f%n",
            w,
            m,
            1.0 / (r.smallestPositive() * m),
            r.relativeError(),
            r.slices(),
            seconds,
            r.slices() / seconds);
      }
    }
  }

  private static int[] parseInts(String s) {
    String[] p = s.split(",");
    int[] v = new int[p.length];
    for (int i = 0; i < p.length; i++) {
      v[i] = Integer.parseInt(p[i].trim());
    }
    return v;
  }

  private static double[] parseDoubles(String s) {
    String[] p = s.split(",");
    double[] v = new double[p.length];
    for (int i = 0; i < p.length; i++) {
      v[i] = Double.parseDouble(p[i].trim());
    }
    return v;
  }
}
