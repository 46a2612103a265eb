package hopstat.spectrum;

import static hopstat.invariant.TestRealisation.aRealisation;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import hopstat.lattice.Boundary;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.linalg.LinalgFactory;
import hopstat.linalg.LinalgKind;
import java.util.SplittableRandom;
import org.ejml.data.ZMatrixRMaj;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Kernel polynomial method (Weiße, Wellein, Alvermann, Fehske, RMP 78, 275 (2006)): moments against
 * exact moments from dense eigenvalues, the normalisation of the density, the clean-chain density
 * against its closed form, and the Jackson-kernel step function.
 */
class KpmKernelTest {

  private static final int MOMENTS = 64;

  /** A small disordered open qwz sample (N = 50). */
  private static HamiltonianBuilder smallSample() {
    return aRealisation("qwz")
        .with("m", 1.0)
        .with("t", 1.0)
        .size(5)
        .boundary(Boundary.OPEN)
        .disorder("onsite-box", 2.0)
        .seed(3)
        .build();
  }

  /**
   * Exact μ_n = (1/N) Σ_k T_n(x_k) = (1/N) Σ_k cos(n arccos x_k) (Weiße et al. 2006, eq. 27) from
   * dense eigenvalues.
   */
  private static double[] exactMoments(HamiltonianBuilder b, ChebyshevScale scale, int moments) {
    ZMatrixRMaj dense = new ZMatrixRMaj(1, 1);
    b.toDense(dense);
    int n = b.dimension();
    double[] ev = new double[n];
    assertThat(
            LinalgFactory.create(LinalgKind.NATIVE)
                .newHermitianEigenSolver()
                .eigenvalues(dense, ev))
        .isTrue();
    double[] mu = new double[moments];
    for (double e : ev) {
      double theta = Math.acos(scale.rescaled(e));
      for (int k = 0; k < moments; k++) {
        mu[k] += Math.cos(k * theta) / n;
      }
    }
    return mu;
  }

  /**
   * The doubling recursion (Weiße et al. 2006, eq. 34) with the trace taken exactly over the N unit
   * vectors reproduces the exact moments; round-off only (1e−11), for even and odd M.
   */
  @ParameterizedTest(name = "M={0}")
  @ValueSource(ints = {2, 3, 63, 64})
  void exactTraceReproducesTheEigenvalueMoments(int moments) {
    HamiltonianBuilder b = smallSample();
    CsrHermitianMatrix h = new CsrHermitianMatrix();
    h.assemble(b);
    ChebyshevScale scale = KpmKernel.scale(h);
    double[] exact = exactMoments(b, scale, moments);
    int n = h.dimension();
    double[] acc = new double[moments];
    double[] unit = new double[2 * n];
    KpmWorkspace ws = new KpmWorkspace();
    for (int i = 0; i < n; i++) {
      unit[2 * i] = 1.0;
      KpmKernel.accumulateMoments(h, scale, unit, moments, ws, acc);
      unit[2 * i] = 0.0;
    }
    for (int k = 0; k < moments; k++) {
      assertThat(acc[k] / n).as("mu_%d", k).isCloseTo(exact[k], within(1e-11));
    }
  }

  /**
   * Stochastic trace (Weiße et al. 2006, Sec. II.D): with random-phase vectors the variance of
   * ⟨r|T_n|r⟩ is Σ_{i≠j}|T_n,ij|² ≤ N (derived, ‖T_n(H̃)‖ ≤ 1), so each μ_n is within 1/√(NR) per
   * standard deviation; checked at 5 standard deviations. μ_0 = 1 exactly (|r_i| = 1).
   */
  @Test
  void stochasticMomentsAgreeWithinTheirVarianceBound() {
    HamiltonianBuilder b = smallSample();
    CsrHermitianMatrix h = new CsrHermitianMatrix();
    h.assemble(b);
    ChebyshevScale scale = KpmKernel.scale(h);
    double[] exact = exactMoments(b, scale, MOMENTS);
    int vectors = 64;
    double[] mu = new double[MOMENTS];
    KpmKernel.stochasticMoments(
        h, scale, MOMENTS, vectors, new SplittableRandom(17), new KpmWorkspace(), mu);
    assertThat(mu[0]).isCloseTo(1.0, within(1e-12));
    double sigma = 1.0 / Math.sqrt((double) h.dimension() * vectors);
    double worst = 0;
    for (int k = 1; k < MOMENTS; k++) {
      assertThat(mu[k]).as("mu_%d", k).isCloseTo(exact[k], within(5 * sigma));
      worst = Math.max(worst, Math.abs(mu[k] - exact[k]));
    }
    // not trivially exact: the stochastic trace does carry noise
    assertThat(worst).isGreaterThan(1e-4);
  }

  /**
   * Normalisation ∫ρ dE = g_0 μ_0 = 1 (derived: ∫T_n(x)/(π√(1 − x²)) dx = δ_{n0}). With E = b + a
   * cos θ the integrand ρ·a sin θ is a trigonometric polynomial of degree &lt; M in θ, so the
   * midpoint rule with 4M nodes is exact up to round-off (1e−12).
   */
  @Test
  void densityIsNormalised() {
    CsrHermitianMatrix h = new CsrHermitianMatrix();
    h.assemble(smallSample());
    ChebyshevScale scale = KpmKernel.scale(h);
    double[] mu = new double[MOMENTS];
    KpmKernel.stochasticMoments(
        h, scale, MOMENTS, 4, new SplittableRandom(2), new KpmWorkspace(), mu);
    double[] g = new double[MOMENTS];
    KpmKernel.jacksonKernel(MOMENTS, g);
    int nodes = 4 * MOMENTS;
    double integral = 0;
    for (int j = 0; j < nodes; j++) {
      double theta = Math.PI * (j + 0.5) / nodes;
      double e = scale.energy(Math.cos(theta));
      integral +=
          KpmKernel.density(mu, g, MOMENTS, scale, e)
              * scale.halfWidth()
              * Math.sin(theta)
              * Math.PI
              / nodes;
    }
    assertThat(integral).isCloseTo(1.0, within(1e-12));
    // outside the rescaled interval the density is zero by definition
    assertThat(KpmKernel.density(mu, g, MOMENTS, scale, scale.energy(1.0) + 1e-9)).isZero();
  }

  /**
   * Clean chain H = −t Σ (c†_i c_{i+1} + h.c.), E(k) = −2t cos k: ρ(E) = 1/(π√(4t² − E²)) per site
   * (derived, van Hove). KPM bias from the Jackson broadening σ ≈ πa/M = 0.05 (Weiße et al. 2006,
   * eq. 72; a = 2.02, M = 128 here) is ≈ σ²ρ''/2 &lt; 1e−3 for |E| ≤ 1.5 (derived, ρ'' ≤ 0.7); the
   * stochastic error of ρ is ≈ 1.5e−3 per standard deviation at N = 4·10⁴, R = 16 (derived from var
   * μ_n ≈ 1/(2NR) on a ring). Tolerance 1e−2 ≈ 5 standard deviations.
   */
  @Test
  void cleanChainDensityMatchesTheClosedFormAwayFromTheBandEdges() {
    int size = 40_000;
    HamiltonianBuilder b =
        aRealisation("anderson-1d").with("t", 1.0).size(size).boundary(Boundary.PERIODIC).build();
    CsrHermitianMatrix h = new CsrHermitianMatrix();
    h.assemble(b);
    ChebyshevScale scale = KpmKernel.scale(h);
    assertThat(scale.centre()).isCloseTo(0.0, within(1e-12));
    assertThat(scale.halfWidth()).isCloseTo(2.0 / (1 - KpmKernel.EPSILON), within(1e-12));
    int moments = 128;
    double[] mu = new double[moments];
    KpmKernel.stochasticMoments(
        h, scale, moments, 16, new SplittableRandom(2026), new KpmWorkspace(), mu);
    double[] g = new double[moments];
    KpmKernel.jacksonKernel(moments, g);
    for (double e = -1.5; e <= 1.5 + 1e-9; e += 0.25) {
      double analytic = 1.0 / (Math.PI * Math.sqrt(4.0 - e * e));
      assertThat(KpmKernel.density(mu, g, moments, scale, e))
          .as("rho(%s)", e)
          .isCloseTo(analytic, within(1e-2));
    }
    // the odd moments of a bipartite chain vanish exactly in the mean; the estimate stays small
    assertThat(Math.abs(mu[1])).isLessThan(5.0 / Math.sqrt(2.0 * size * 16));
  }

  /**
   * Jackson kernel: g_0 = 1 and 0 &lt; g_n ≤ 1 decreasing (Weiße et al. 2006, eq. 71 and Sec.
   * II.C.3); the Jackson-smoothed step Σ c_n T_n(x) approaches θ(x_F − x) away from the step:
   * within 1e−3 at |x − x_F| ≥ 10π/M (derived from the kernel's Gaussian-like decay with width
   * π/M), and equals 1/2 within 0.05 at x = x_F (symmetric broadening).
   */
  @Test
  void jacksonStepApproachesTheStepFunction() {
    int moments = 256;
    double[] g = new double[moments];
    KpmKernel.jacksonKernel(moments, g);
    assertThat(g[0]).isCloseTo(1.0, within(1e-14));
    for (int k = 1; k < moments; k++) {
      assertThat(g[k]).isLessThan(g[k - 1]).isGreaterThan(0.0);
    }
    double fermi = 0.1;
    double[] c = new double[moments];
    KpmKernel.stepCoefficients(fermi, moments, c);
    for (double x = -0.99; x <= 0.99; x += 0.01) {
      double theta = Math.acos(x);
      double s = 0;
      for (int k = 0; k < moments; k++) {
        s += c[k] * Math.cos(k * theta);
      }
      if (Math.abs(x - fermi) >= 10 * Math.PI / moments) {
        assertThat(s).as("step at x = %s", x).isCloseTo(x < fermi ? 1.0 : 0.0, within(1e-3));
      }
    }
    double s = 0;
    for (int k = 0; k < moments; k++) {
      s += c[k] * Math.cos(k * Math.acos(fermi));
    }
    assertThat(s).isCloseTo(0.5, within(0.05));
  }

  /**
   * applySeries with c = e_3 gives T_3(H̃)x = 4H̃³x − 3H̃x (derived from T_3(x) = 4x³ − 3x), and
   * with c = (c_0, c_1) the affine c_0 x + c_1 H̃x; round-off only.
   */
  @Test
  void seriesApplicationMatchesExplicitPolynomials() {
    CsrHermitianMatrix h = new CsrHermitianMatrix();
    h.assemble(smallSample());
    ChebyshevScale scale = KpmKernel.scale(h);
    int n = h.dimension();
    double[] x = new double[2 * n];
    KpmKernel.randomPhases(new SplittableRandom(4), n, x);
    double[] h1 = rescaledProduct(h, scale, x);
    double[] h2 = rescaledProduct(h, scale, h1);
    double[] h3 = rescaledProduct(h, scale, h2);
    double[] y = new double[2 * n];
    KpmKernel.applySeries(h, scale, new double[] {0, 0, 0, 1}, 4, x, y, new KpmWorkspace());
    for (int i = 0; i < 2 * n; i++) {
      assertThat(y[i]).isCloseTo(4 * h3[i] - 3 * h1[i], within(1e-12));
    }
    KpmKernel.applySeries(h, scale, new double[] {0.5, -2}, 2, x, y, new KpmWorkspace());
    for (int i = 0; i < 2 * n; i++) {
      assertThat(y[i]).isCloseTo(0.5 * x[i] - 2 * h1[i], within(1e-12));
    }
  }

  private static double[] rescaledProduct(CsrHermitianMatrix h, ChebyshevScale scale, double[] x) {
    double[] y = new double[x.length];
    h.multiply(x, y);
    for (int i = 0; i < x.length; i++) {
      y[i] = (y[i] - scale.centre() * x[i]) / scale.halfWidth();
    }
    return y;
  }
}
