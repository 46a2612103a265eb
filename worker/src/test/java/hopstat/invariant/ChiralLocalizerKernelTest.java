package hopstat.invariant;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import hopstat.lattice.Boundary;
import hopstat.lattice.ChainLattices;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.linalg.HermitianEigenSolver;
import hopstat.linalg.Linalg;
import hopstat.linalg.LinalgFactory;
import hopstat.linalg.LinalgKind;
import java.util.SplittableRandom;
import org.ejml.data.ZMatrixRMaj;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * {@link ChiralLocalizerKernel}: closed forms (derived) and the dense signature of the same matrix.
 */
class ChiralLocalizerKernelTest {

  private static final Linalg LINALG = LinalgFactory.create(LinalgKind.JAVA);

  /**
   * Chain of L cells, intracell hopping v_j (complex allowed), intercell w_j; orbital 0 = A, 1 = B.
   */
  private static HamiltonianBuilder chain(
      Lattice lattice, double[] vRe, double[] vIm, double[] wRe, double[] wIm) {
    HamiltonianBuilder h = new HamiltonianBuilder();
    int cells = lattice.sites();
    h.reset(2 * cells);
    for (int j = 0; j < cells; j++) {
      h.addHopping(2 * j, 2 * j + 1, vRe[j], vIm[j]);
      if (j + 1 < cells) {
        h.addHopping(2 * j + 1, 2 * j + 2, wRe[j], wIm[j]);
      }
    }
    return h;
  }

  private static double[] constant(int n, double value) {
    double[] a = new double[n];
    java.util.Arrays.fill(a, value);
    return a;
  }

  /**
   * Derived (class Javadoc): v = 0 leaves intercell dimers (signature 0 each while κ &lt; 2|w| for
   * even L) and the ends A_0 (κ(x_0 − x0) &lt; 0) and B_{L−1} (−κ(x_{L−1} − x0) &lt; 0), so −½ sig
   * = 1; w = 0 leaves only intracell dimers, index 0. Here |w| = |−1.3 + 0.4i| ≈ 1.36, 2|w| ≈ 2.72:
   * at κ = 3 the dimer straddling the centre turns positive definite and the index drops to 0.
   */
  @ParameterizedTest(name = "L={0} kappa={1}")
  @CsvSource({"4, 0.01, 1", "10, 0.3, 1", "16, 2.5, 1", "16, 3.0, 0"})
  void dimerLimitsGiveTheDerivedIndex(int cells, double kappa, int index) {
    Lattice lattice = ChainLattices.chain(cells, 2, Boundary.OPEN);
    ChiralLocalizerWorkspace ws = new ChiralLocalizerWorkspace(LINALG);
    double x0 = SpectralLocalizerKernel.centre(lattice, 0);
    HamiltonianBuilder topological =
        chain(
            lattice,
            constant(cells, 0),
            constant(cells, 0),
            constant(cells, -1.3),
            constant(cells, 0.4));
    HamiltonianBuilder trivial =
        chain(
            lattice,
            constant(cells, 0.8),
            constant(cells, -0.2),
            constant(cells, 0),
            constant(cells, 0));
    assertThat(ChiralLocalizerKernel.index(topological, lattice, kappa, x0, ws)).isEqualTo(index);
    assertThat(ChiralLocalizerKernel.index(trivial, lattice, kappa, x0, ws)).isEqualTo(0);
  }

  /**
   * Odd L, v = 0 exactly: a site sits at x0 and the cell sweep meets a zero pivot (documented
   * limitation).
   */
  @Test
  void exactZeroPivotIsReportedAsUndefined() {
    Lattice lattice = ChainLattices.chain(9, 2, Boundary.OPEN);
    HamiltonianBuilder h =
        chain(lattice, constant(9, 0), constant(9, 0), constant(9, 1), constant(9, 0));
    ChiralLocalizerWorkspace ws = new ChiralLocalizerWorkspace(LINALG);
    assertThat(
            ChiralLocalizerKernel.index(
                h, lattice, 0.3, SpectralLocalizerKernel.centre(lattice, 0), ws))
        .isEqualTo(Integer.MIN_VALUE);
  }

  /**
   * Source-free check of the sweep: −½ sig from the LDLᴴ inertia equals −½ (#positive − #negative)
   * of the dense eigenvalues of H + κ(X − x0)S for random complex (class AIII) chains, including
   * off-centre x0 (where the index need not be the winding but the signature is still defined).
   */
  @Test
  void sweepSignatureMatchesDenseEigenvalues() {
    SplittableRandom random = new SplittableRandom(20261202L);
    ChiralLocalizerWorkspace ws = new ChiralLocalizerWorkspace(LINALG);
    HermitianEigenSolver eig = LINALG.newHermitianEigenSolver();
    int nonzero = 0;
    for (int trial = 0; trial < 40; trial++) {
      int cells = 3 + random.nextInt(14);
      Lattice lattice = ChainLattices.chain(cells, 2, Boundary.OPEN);
      double[] vRe = new double[cells];
      double[] vIm = new double[cells];
      double[] wRe = new double[cells];
      double[] wIm = new double[cells];
      double scale = random.nextDouble(0.2, 2.0);
      for (int j = 0; j < cells; j++) {
        vRe[j] = random.nextDouble(-1, 1) * scale;
        vIm[j] = random.nextDouble(-1, 1) * scale;
        wRe[j] = random.nextDouble(-1, 1);
        wIm[j] = random.nextDouble(-1, 1);
      }
      HamiltonianBuilder h = chain(lattice, vRe, vIm, wRe, wIm);
      double kappa = random.nextDouble(0.01, 1.0);
      double x0 = random.nextDouble(-1, cells);
      ZMatrixRMaj dense = new ZMatrixRMaj(2 * cells, 2 * cells);
      h.toDense(dense);
      for (int i = 0; i < 2 * cells; i++) {
        double s = i % 2 == 0 ? 1.0 : -1.0;
        dense.set(i, i, s * kappa * (lattice.position(0, i / 2) - x0), 0.0);
      }
      double[] values = new double[2 * cells];
      assertThat(eig.eigenvalues(dense, values)).isTrue();
      int sig = 0;
      for (double e : values) {
        sig += e > 0 ? 1 : -1;
      }
      int expected = -sig / 2;
      assertThat(ChiralLocalizerKernel.index(h, lattice, kappa, x0, ws))
          .as("trial %d", trial)
          .isEqualTo(expected);
      nonzero += expected != 0 ? 1 : 0;
    }
    // the draw must exercise nonzero indices too (w-dominated chains occur with scale < 1)
    assertThat(nonzero).isGreaterThan(3);
  }

  @Test
  void rejectsTermsInsideOneSublattice() {
    Lattice lattice = ChainLattices.chain(4, 2, Boundary.OPEN);
    HamiltonianBuilder h =
        chain(lattice, constant(4, 0.5), constant(4, 0), constant(4, 1), constant(4, 0));
    h.addOnsite(2, 0.1);
    ChiralLocalizerWorkspace ws = new ChiralLocalizerWorkspace(LINALG);
    assertThatThrownBy(() -> ChiralLocalizerKernel.index(h, lattice, 0.1, 1.5, ws))
        .isInstanceOf(IllegalArgumentException.class);
  }
}
