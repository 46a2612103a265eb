package hopstat.localisation;

import hopstat.lattice.Boundary;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.linalg.LinalgFactory;
import hopstat.model.AndersonModel;
import hopstat.model.ParameterValues;
import hopstat.task.SeedOps;
import java.util.Locale;
import java.util.Map;
import java.util.random.RandomGenerator;
import org.ejml.data.ZMatrixRMaj;

/**
 * Benchmark, not a unit test: cost per slice of the two Lyapunov engines on the same disordered 2D
 * Anderson strips (box disorder W, E = 0.5, periodic transverse boundary, one fixed number of
 * slices): the real transfer matrix with QR ({@link TransferMatrixKernel}, used for the anderson
 * models) and the complex QR-stabilised solution-frame recursion ({@link GreenRecursionKernel},
 * used for every other model). Both consume the same random potentials, so their γ must agree
 * within the stated errors.
 *
 * <p>Run: {@code mvn -q -B -o -Pbench -pl worker test-compile exec:java
 * -Dexec.mainClass=hopstat.localisation.SliceRecursionBenchmark -Dexec.args="<slices> <M,M,..>"},
 * e.g. {@code 40000 4,8,16}. Output: one line per M: M, K, γ and relative error of each engine,
 * slices per second of each, and the cost ratio (recursion / transfer matrix).
 */
public final class SliceRecursionBenchmark {

  private static final double W = 4.0;
  private static final double ENERGY = 0.5;

  private SliceRecursionBenchmark() {}

  public static void main(String[] args) {
    long slices = args.length > 0 ? Long.parseLong(args[0]) : 40_000;
    String[] sizes = (args.length > 1 ? args[1] : "4,8,16").split(",");
    AndersonModel model = new AndersonModel(2);
    ParameterValues parameters = new ParameterValues(Map.of("t", 1.0));
    System.out.println(
        "# M K gammaTM errTM gammaRec errRec slicesPerSecTM slicesPerSecRec costRatio  (W = "
            + W
            + ", E = "
            + ENERGY
            + ", "
            + slices
            + " slices, periodic transverse)");
    // warm-up: let the JIT compile both engines before anything is timed
    measure(model, parameters, 8, slices / 4);
    for (String size : sizes) {
      System.out.println(measure(model, parameters, Integer.parseInt(size.trim()), slices));
    }
  }

  /** Runs both engines on one strip of width m and returns the result line. */
  private static String measure(
      AndersonModel model, ParameterValues parameters, int m, long slices) {
    Lattice slice = model.sliceLattice(m, Boundary.PERIODIC);
    int k = slice.orbitals();
    double[] hopping = new double[k * k];
    model.interSliceHopping(parameters, slice, hopping);
    LyapunovSpec spec = new LyapunovSpec(ENERGY, 0.0, slices);

    RandomGenerator random = SeedOps.generator(SeedOps.realisationSeed(77, m, 0));
    TransferMatrixWorkspace tmWorkspace = new TransferMatrixWorkspace();
    long start = System.nanoTime();
    LyapunovResult tm =
        TransferMatrixKernel.run(
            hopping,
            k,
            spec,
            h -> {
              model.addCleanSlice(parameters, slice, h);
              for (int s = 0; s < k; s++) {
                h.addOnsite(s, W * (random.nextDouble() - 0.5));
              }
            },
            tmWorkspace);
    double tmSeconds = (System.nanoTime() - start) * 1e-9;

    HamiltonianBuilder clean = new HamiltonianBuilder();
    clean.reset(k);
    model.addCleanSlice(parameters, slice, clean);
    ZMatrixRMaj cleanSlice = new ZMatrixRMaj(k, k);
    clean.toDense(cleanSlice);
    RandomGenerator sameRandom = SeedOps.generator(SeedOps.realisationSeed(77, m, 0));
    GreenRecursionWorkspace recWorkspace = new GreenRecursionWorkspace(LinalgFactory.preferred());
    start = System.nanoTime();
    LyapunovResult rec =
        GreenRecursionKernel.run(
            k,
            spec,
            (h, t) -> {
              h.setTo(cleanSlice);
              for (int s = 0; s < k; s++) {
                h.set(s, s, h.getReal(s, s) + W * (sameRandom.nextDouble() - 0.5), 0.0);
                for (int j = 0; j < k; j++) {
                  t.set(s, j, hopping[j * k + s], 0.0); // T_n = H_{n+1,n} = (H_{n,n+1})^T, real
                }
              }
            },
            recWorkspace);
    double recSeconds = (System.nanoTime() - start) * 1e-9;
    return (String.format(
        Locale.ROOT,
        "%d %d %.6f %.4f %.6f %.4f %.0f %.0f %.2f",
        m,
        k,
        tm.smallestPositive(),
        tm.relativeError(),
        rec.smallestPositive(),
        rec.relativeError(),
        tm.slices() / tmSeconds,
        rec.slices() / recSeconds,
        (recSeconds / rec.slices()) / (tmSeconds / tm.slices())));
  }
}
