package hopstat.localisation;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.data.Offset.offset;

import hopstat.lattice.Boundary;
import hopstat.lattice.CubicLattices;
import hopstat.lattice.HamiltonianBuilder;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class TransferMatrixKernelTest {

  private final TransferMatrixWorkspace workspace = new TransferMatrixWorkspace();

  /** Acosh, for the closed forms below. */
  private static double arccosh(double x) {
    return Math.log(x + Math.sqrt(x * x - 1));
  }

  /** Chain slices: one site, potential W·u, hopping −1 between slices. */
  private static TransferMatrixKernel.SliceSource chain(double w, long seed) {
    SplittableRandom rng = new SplittableRandom(seed);
    return h -> h.addOnsite(0, w * (rng.nextDouble() - 0.5));
  }

  private static LyapunovResult runChain(
      double energy, double w, double target, long maxSlices, TransferMatrixWorkspace ws) {
    return TransferMatrixKernel.run(
        new double[] {-1.0}, 1, new LyapunovSpec(energy, target, maxSlices), chain(w, 17), ws);
  }

  /**
   * Clean chain outside the band |E| &gt; 2t: ψ_n ~ λ^n with λ + 1/λ = E/t, so γ = arccosh(|E|/2t)
   * (derived). The iteration is deterministic, so agreement is to rounding.
   */
  @Test
  void cleanChainOutsideTheBandDecaysAtArccosh() {
    for (double e : new double[] {2.5, 3.0, -4.0}) {
      LyapunovResult r = runChain(e, 0.0, 1e-3, 100_000, workspace);
      assertThat(r.converged()).isTrue();
      assertThat(r.smallestPositive()).isCloseTo(arccosh(Math.abs(e) / 2), offset(1e-10));
    }
  }

  /** Clean chain inside the band: Bloch waves, γ = 0 (derived); a fixed-length run gives O(1/N). */
  @Test
  void cleanChainInsideTheBandHasZeroExponentAndNeverConverges() {
    LyapunovResult r = runChain(1.0, 0.0, 1e-3, 40_000, workspace);
    assertThat(r.converged()).isFalse();
    assertThat(r.slices()).isEqualTo(40_000);
    assertThat(Math.abs(r.smallestPositive())).isLessThan(1e-3);
  }

  /**
   * Clean periodic strip of width M: transverse modes ε_q = −2t cos(2πq/M) decouple, each a chain
   * at energy E − ε_q, so the K = M exponents are arccosh(|E − ε_q|/2t) for evanescent modes and 0
   * for propagating ones (derived). M = 4, E = 5: |E − ε_q|/2 = 3.5, 2.5, 2.5, 1.5.
   */
  @Test
  void cleanStripExponentsAreThoseOfItsTransverseModes() {
    int m = 4;
    double[] t = identityTimes(m, -1.0);
    TransferMatrixKernel.SliceSource clean =
        h ->
            CubicLattices.forEachBond(
                1, m, Boundary.PERIODIC, (a, b, d) -> h.addHopping(a, b, -1.0, 0.0));
    LyapunovResult r =
        TransferMatrixKernel.run(t, m, new LyapunovSpec(5.0, 1e-6, 100_000), clean, workspace);
    double[] expected = {arccosh(3.5), arccosh(2.5), arccosh(2.5), arccosh(1.5)};
    double[] got = r.exponents();
    assertThat(r.converged()).isTrue();
    for (int j = 0; j < m; j++) {
      assertThat(got[j]).isCloseTo(expected[j], offset(1e-6));
    }
    assertThat(r.smallestPositive()).isEqualTo(got[m - 1]);
  }

  /**
   * The exponents do not depend on the basis inside a slice: with an orthogonal O, H_n → OᵀH_nO and
   * T → OᵀTO (a non-diagonal T, the general path) give the same product of transfer matrices up to
   * the similarity diag(O, O), hence the same exponents (derived). Same disorder draws in both
   * runs. The start frames [1; 0] and [Oᵀ; 0] span the same subspace, so the volume growth, i.e.
   * the sum of the exponents, agrees to rounding; single exponents differ by a start-frame
   * transient that decays like 1/length (1e-4 at 4000 slices is generous).
   */
  @Test
  void rotatedSliceBasisGivesTheSameExponents() {
    int m = 3;
    double w = 4.0;
    double[] o = rotation(m);
    double[] t = identityTimes(m, -1.0);
    double[] tRotated = conjugate(o, t, m);
    LyapunovSpec spec = new LyapunovSpec(0.3, 0.0, 4_000);

    LyapunovResult plain =
        TransferMatrixKernel.run(t, m, spec, disorderedStrip(m, w, 5, null), workspace);
    LyapunovResult rotated =
        TransferMatrixKernel.run(
            tRotated, m, spec, disorderedStrip(m, w, 5, o), new TransferMatrixWorkspace());
    double sumPlain = 0;
    double sumRotated = 0;
    for (int j = 0; j < m; j++) {
      assertThat(rotated.exponents()[j]).isCloseTo(plain.exponents()[j], offset(1e-4));
      sumPlain += plain.exponents()[j];
      sumRotated += rotated.exponents()[j];
    }
    assertThat(sumRotated).isCloseTo(sumPlain, offset(1e-10));
    assertThat(plain.smallestPositive()).isGreaterThan(0.0);
  }

  /**
   * Weak box disorder, 1D, away from band centre and edges: γ = W²/(96 t² (1 − E²/4t²)) (Thouless
   * 1979; Derrida &amp; Gardner, J. Physique 45, 1283 (1984) — formula from memory, REFERENCE.md).
   * W = 1, E = 0.5: γ = 0.0111111. Tolerance: 3 × the run's own 1 % error estimate plus 2 % for the
   * O(W⁴) corrections (REFERENCE.md reports agreement within ~1 % at W = 0.5–1; a 0.3 % run here
   * gave 1.008 × the formula).
   */
  @Test
  void weakDisorderChainFollowsThePerturbativeFormula() {
    double w = 1.0;
    double e = 0.5;
    LyapunovResult r = runChain(e, w, 0.01, 50_000_000, workspace);
    double expected = w * w / (96 * (1 - e * e / 4));
    assertThat(r.converged()).isTrue();
    assertThat(r.relativeError()).isLessThanOrEqualTo(0.01);
    assertThat(r.smallestPositive())
        .isCloseTo(expected, offset(expected * (3 * r.relativeError() + 0.02)));
  }

  /**
   * Band centre anomaly: γ(E = 0) = W²/105.045 (Kappus &amp; Wegner, Z. Phys. B 45, 15 (1981) —
   * constant from memory; exact form (W²/12)Γ(3/4)²/Γ(1/4)², REFERENCE.md), 9 % below the
   * perturbative W²/96. W = 1: 0.0095197. Same tolerance rule as above; the two formulas differ by
   * 9 %, more than the tolerance (about 5 % with the 1 % target), so the test tells them apart.
   */
  @Test
  void bandCentreShowsTheKappusWegnerAnomaly() {
    double w = 1.0;
    LyapunovResult r = runChain(0.0, w, 0.01, 50_000_000, workspace);
    double expected = w * w / 105.045;
    assertThat(r.converged()).isTrue();
    double tolerance = expected * (3 * r.relativeError() + 0.02);
    assertThat(tolerance).isLessThan(0.09 * expected);
    assertThat(r.smallestPositive()).isCloseTo(expected, offset(tolerance));
  }

  @Test
  void sameSlicesGiveBitwiseTheSameResult() {
    LyapunovResult a = runChain(0.7, 2.0, 0.02, 10_000_000, workspace);
    LyapunovResult b = runChain(0.7, 2.0, 0.02, 10_000_000, new TransferMatrixWorkspace());
    assertThat(b.smallestPositive()).isEqualTo(a.smallestPositive());
    assertThat(b.slices()).isEqualTo(a.slices());
  }

  private static TransferMatrixKernel.SliceSource disorderedStrip(
      int m, double w, long seed, double[] rotation) {
    SplittableRandom rng = new SplittableRandom(seed);
    double[] h = new double[m * m];
    return out -> {
      java.util.Arrays.fill(h, 0.0);
      for (int i = 0; i < m; i++) {
        h[i * m + i] = w * (rng.nextDouble() - 0.5);
      }
      CubicLattices.forEachBond(
          1,
          m,
          Boundary.OPEN,
          (a, b, d) -> {
            h[a * m + b] = -1.0;
            h[b * m + a] = -1.0;
          });
      double[] hh = rotation == null ? h : conjugate(rotation, h, m);
      addDense(out, hh, m);
    };
  }

  private static void addDense(HamiltonianBuilder out, double[] h, int m) {
    for (int i = 0; i < m; i++) {
      out.addOnsite(i, h[i * m + i]);
      for (int j = i + 1; j < m; j++) {
        out.addHopping(i, j, h[i * m + j], 0.0);
      }
    }
  }

  private static double[] identityTimes(int m, double v) {
    double[] t = new double[m * m];
    for (int i = 0; i < m; i++) {
      t[i * m + i] = v;
    }
    return t;
  }

  /** A fixed orthogonal matrix: product of two Givens rotations. */
  private static double[] rotation(int m) {
    double[] o = identityTimes(m, 1.0);
    double c = Math.cos(0.7);
    double s = Math.sin(0.7);
    o[0] = c;
    o[1] = -s;
    o[m] = s;
    o[m + 1] = c;
    double[] g = identityTimes(m, 1.0);
    double c2 = Math.cos(-1.1);
    double s2 = Math.sin(-1.1);
    g[(m - 2) * m + m - 2] = c2;
    g[(m - 2) * m + m - 1] = -s2;
    g[(m - 1) * m + m - 2] = s2;
    g[(m - 1) * m + m - 1] = c2;
    return multiply(o, g, m);
  }

  private static double[] multiply(double[] a, double[] b, int m) {
    double[] c = new double[m * m];
    for (int i = 0; i < m; i++) {
      for (int j = 0; j < m; j++) {
        double s = 0;
        for (int k = 0; k < m; k++) {
          s += a[i * m + k] * b[k * m + j];
        }
        c[i * m + j] = s;
      }
    }
    return c;
  }

  /** Oᵀ A O. */
  private static double[] conjugate(double[] o, double[] a, int m) {
    double[] ot = new double[m * m];
    for (int i = 0; i < m; i++) {
      for (int j = 0; j < m; j++) {
        ot[i * m + j] = o[j * m + i];
      }
    }
    return multiply(ot, multiply(a, o, m), m);
  }
}
