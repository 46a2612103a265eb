package hopstat.localisation;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.data.Offset.offset;

import hopstat.linalg.HermitianEigenSolver;
import hopstat.linalg.LinalgFactory;
import java.util.Arrays;
import java.util.SplittableRandom;
import org.ejml.data.ZMatrixRMaj;
import org.junit.jupiter.api.Test;

class LevelRatioKernelTest {

  private final HermitianEigenSolver solver = LinalgFactory.preferred().newHermitianEigenSolver();

  /**
   * Independent levels (Poisson): P(r) = 2/(1+r)² on [0, 1], ⟨r⟩ = 2 ln 2 − 1 = 0.386294 (derived;
   * Atas et al., PRL 110, 084101 (2013)). Var(r) = 3 − 4 ln 2 − ⟨r⟩² = 0.078 (derived), so with
   * 2·10⁴ ratios σ ≈ 0.002; tolerance 0.01 allows for the weak correlation of neighbouring ratios.
   */
  @Test
  void independentLevelsGiveThePoissonMean() {
    int n = 20_000;
    double[] levels = new double[n];
    SplittableRandom rng = new SplittableRandom(3);
    for (int i = 0; i < n; i++) {
      levels[i] = rng.nextDouble();
    }
    Arrays.sort(levels);
    double r = meanRatio(levels, n, new EnergyWindows(1, 0.0, 1.0));
    assertThat(r).isCloseTo(2 * Math.log(2) - 1, offset(0.01));
  }

  /**
   * Gaussian orthogonal ensemble: ⟨r⟩ = 0.5307(1) (Atas, Bogomolny, Giraud, Roux, PRL 110, 084101
   * (2013) — value from memory, REFERENCE.md). 30 matrices of N = 300, ratios in the central half
   * of the semicircle (≈ 5000 ratios, σ(r) ≈ 0.25, so σ ≈ 0.004); tolerance 0.015 ≈ 3.5σ, far below
   * the GOE–GUE distance 0.07.
   */
  @Test
  void goeMatricesGiveTheGoeMean() {
    assertThat(gaussianEnsembleMean(false, 5)).isCloseTo(0.5307, offset(0.015));
  }

  /** Gaussian unitary ensemble: ⟨r⟩ = 0.5996(1) (Atas et al. 2013 — from memory); as above. */
  @Test
  void gueMatricesGiveTheGueMean() {
    assertThat(gaussianEnsembleMean(true, 6)).isCloseTo(0.5996, offset(0.015));
  }

  @Test
  void ratiosGoToTheWindowOfTheirMiddleLevel() {
    double[] levels = {0.0, 1.0, 3.0, 4.0, 4.5, 10.0};
    double[] sums = new double[2];
    int[] counts = new int[2];
    LevelRatioKernel.accumulate(
        levels, levels.length, new EnergyWindows(2, 0.0, 8.0), sums, counts);
    // middle levels 1 (w0), 3 (w0), 4 (w1), 4.5 (w1): ratios 1/2, 1/2, 0.5/1, 0.5/5.5
    assertThat(counts).containsExactly(2, 2);
    assertThat(sums[0]).isCloseTo(1.0, offset(1e-15));
    assertThat(sums[1]).isCloseTo(0.5 + 0.5 / 5.5, offset(1e-15));
  }

  @Test
  void symmetricSpectraKeepPositiveLevelsAndOneOfEachKramersPair() {
    double[] bdg = {-3, -2, -2, -1, 1, 2, 2, 3};
    double[] out = new double[8];
    int m = LevelRatioKernel.selectLevels(bdg, 8, true, true, out);
    assertThat(Arrays.copyOf(out, m))
        .containsExactly(1, 2, 2, 3); // pairs (1,2) and (2,3) not degenerate: all kept
    double[] kramers = {-1, -1, 0.5, 0.5, 2, 2};
    m = LevelRatioKernel.selectLevels(kramers, 6, false, true, out);
    assertThat(Arrays.copyOf(out, m)).containsExactly(-1, 0.5, 2);
    m = LevelRatioKernel.selectLevels(kramers, 6, true, true, out);
    assertThat(Arrays.copyOf(out, m)).containsExactly(0.5, 2);
  }

  private double gaussianEnsembleMean(boolean complex, long seed) {
    int n = 300;
    int samples = 30;
    SplittableRandom rng = new SplittableRandom(seed);
    ZMatrixRMaj h = new ZMatrixRMaj(n, n);
    double[] e = new double[n];
    double sum = 0;
    int count = 0;
    for (int s = 0; s < samples; s++) {
      for (int i = 0; i < n; i++) {
        h.set(i, i, gaussian(rng), 0.0);
        for (int j = 0; j < i; j++) {
          double re = gaussian(rng) / Math.sqrt(2);
          double im = complex ? gaussian(rng) / Math.sqrt(2) : 0.0;
          h.set(i, j, re, im);
          h.set(j, i, re, -im);
        }
      }
      assertThat(solver.eigenvalues(h, e)).isTrue();
      double radius = complex ? 2 * Math.sqrt(n) : Math.sqrt(2.0 * n);
      double[] sums = new double[1];
      int[] counts = new int[1];
      LevelRatioKernel.accumulate(
          e, n, new EnergyWindows(1, -radius / 2, radius / 2), sums, counts);
      sum += sums[0];
      count += counts[0];
    }
    assertThat(count).isGreaterThan(4000);
    return sum / count;
  }

  private static double meanRatio(double[] levels, int n, EnergyWindows w) {
    double[] sums = new double[w.count()];
    int[] counts = new int[w.count()];
    LevelRatioKernel.accumulate(levels, n, w, sums, counts);
    return sums[0] / counts[0];
  }

  /** Box–Muller; fine for tests. */
  private static double gaussian(SplittableRandom rng) {
    double u = 1.0 - rng.nextDouble();
    return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * rng.nextDouble());
  }
}
