package hopstat.model;

import static hopstat.invariant.TestRealisation.aRealisation;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import hopstat.invariant.TestRealisation;
import hopstat.lattice.Boundary;
import hopstat.lattice.ChainLattices;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import java.util.Arrays;
import java.util.SplittableRandom;
import org.ejml.data.DMatrixRMaj;
import org.ejml.data.ZMatrixRMaj;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.EigenDecomposition_F64;
import org.junit.jupiter.api.Test;

class MajoranaOpsTest {

  private static final double TOL = 1e-13;

  @Test
  void pwaveWireMajoranaMatrixMatchesTheMajoranaHamiltonian() {
    // REFERENCE (derived): H = (i/2) Σ_j [−μ_j a_j b_j + (Δ − t) a_j b_{j+1} + (Δ + t) b_j
    // a_{j+1}],
    // so A[a_j][b_j] = −μ_j, A[a_j][b_{j+1}] = Δ − t, A[b_j][a_{j+1}] = Δ + t (closing bond ×
    // phase).
    // Δ ≠ t so that the a_j b_{j+1} entries are non-zero (a swapped index would show).
    int size = 7;
    double t = 0.8;
    double delta = 0.3;
    TestRealisation r =
        aRealisation("pwave-wire")
            .with("mu", 0.4)
            .with("t", t)
            .with("delta", delta)
            .size(size)
            .disorder("onsite-box", 2.0)
            .seed(5);
    HamiltonianBuilder terms = r.build();
    double[] mu = new double[size];
    var random = hopstat.task.SeedOps.generator(5);
    for (int j = 0; j < size; j++) {
      mu[j] = 0.4 + 2.0 * (random.nextDouble() - 0.5);
    }
    for (int phase : new int[] {1, -1}) {
      DMatrixRMaj a = new DMatrixRMaj(1, 1);
      MajoranaOps.toMajoranaMatrix(r.lattice(), terms, phase, a, new DMatrixRMaj(1, 1));
      DMatrixRMaj expected = new DMatrixRMaj(2 * size, 2 * size);
      for (int j = 0; j < size; j++) {
        int k = (j + 1) % size;
        double s = k == 0 ? phase : 1.0;
        put(expected, MajoranaOps.a(j), MajoranaOps.b(j), -mu[j]);
        put(expected, MajoranaOps.a(j), MajoranaOps.b(k), s * (delta - t));
        put(expected, MajoranaOps.b(j), MajoranaOps.a(k), s * (delta + t));
      }
      for (int i = 0; i < expected.data.length; i++) {
        assertThat(a.data[i])
            .as("entry %d, phase %d", i, phase)
            .isCloseTo(expected.data[i], within(TOL));
      }
    }
  }

  @Test
  void addCouplingRoundTrips() {
    // Source-free: H_BdG = 2i W A W† followed by A = −2i W† H_BdG W is the identity.
    int sites = 4;
    SplittableRandom random = new SplittableRandom(11);
    DMatrixRMaj expected = new DMatrixRMaj(2 * sites, 2 * sites);
    HamiltonianBuilder terms = new HamiltonianBuilder();
    terms.reset(2 * sites);
    for (int m = 0; m < 2 * sites; m++) {
      for (int n = m + 1; n < 2 * sites; n++) {
        double x = random.nextDouble() - 0.5;
        put(expected, m, n, x);
        MajoranaOps.addCoupling(m, n, x, terms);
      }
    }
    Lattice cluster = ChainLattices.cluster(sites, sites, 2);
    DMatrixRMaj a = new DMatrixRMaj(1, 1);
    MajoranaOps.toMajoranaMatrix(cluster, terms, 1, a, new DMatrixRMaj(1, 1));
    for (int i = 0; i < a.data.length; i++) {
      assertThat(a.data[i]).isCloseTo(expected.data[i], within(TOL));
    }
    // and the built BdG matrix is particle-hole symmetric: τx H* τx = −H (Nambu per site).
    ZMatrixRMaj h = new ZMatrixRMaj(1, 1);
    terms.toDense(h);
    for (int p = 0; p < 2 * sites; p++) {
      for (int q = 0; q < 2 * sites; q++) {
        int pp = p ^ 1;
        int qq = q ^ 1;
        assertThat(h.getReal(pp, qq)).isCloseTo(-h.getReal(p, q), within(TOL));
        assertThat(-h.getImag(pp, qq)).isCloseTo(-h.getImag(p, q), within(TOL));
      }
    }
  }

  @Test
  void rejectsTermsThatAreNotParticleHoleSymmetric() {
    Lattice chain = ChainLattices.chain(4, 2, Boundary.PERIODIC);
    HamiltonianBuilder terms = new HamiltonianBuilder();
    terms.reset(8);
    terms.addHopping(0, 2, 1.0, 0.0); // particle hopping without the hole partner
    assertThatThrownBy(
            () ->
                MajoranaOps.toMajoranaMatrix(
                    chain, terms, 1, new DMatrixRMaj(1, 1), new DMatrixRMaj(1, 1)))
        .isInstanceOf(IllegalStateException.class);
  }

  @Test
  void cleanPwaveWireBdgSpectrum() {
    // Kitaev, Phys.-Usp. 44, 131 (2001) (dispersion derived for this sign convention):
    // E(k) = ±√((2t cos k + μ)² + 4Δ² sin² k), k = 2πn/L on the periodic ring.
    int size = 9;
    double mu = 0.7;
    double t = 1.1;
    double delta = 0.4;
    HamiltonianBuilder terms =
        aRealisation("pwave-wire")
            .with("mu", mu)
            .with("t", t)
            .with("delta", delta)
            .size(size)
            .build();
    double[] expected = new double[2 * size];
    for (int n = 0; n < size; n++) {
      double k = 2 * Math.PI * n / size;
      double e =
          Math.sqrt(
              Math.pow(2 * t * Math.cos(k) + mu, 2) + 4 * delta * delta * Math.pow(Math.sin(k), 2));
      expected[2 * n] = e;
      expected[2 * n + 1] = -e;
    }
    assertSpectrum(terms, expected);
  }

  @Test
  void cleanIsingChainBdgSpectrum() {
    // Pfeuty, Ann. Phys. 57, 79 (1970): ε_k = 2√(J² + h² − 2Jh cos k) (from memory; the
    // BdG spectrum is ±ε_k). Odd L with periodic fermions (k = 2πn/L) fixes the sign of cos k.
    int size = 7;
    double coupling = 0.9;
    double field = 0.35;
    HamiltonianBuilder terms =
        aRealisation("ising-chain").with("J", coupling).with("h", field).size(size).build();
    double[] expected = new double[2 * size];
    for (int n = 0; n < size; n++) {
      double k = 2 * Math.PI * n / size;
      double e =
          2 * Math.sqrt(coupling * coupling + field * field - 2 * coupling * field * Math.cos(k));
      expected[2 * n] = e;
      expected[2 * n + 1] = -e;
    }
    assertSpectrum(terms, expected);
  }

  /** Eigenvalues of the (real, for these models) BdG matrix vs the expected multiset. */
  private static void assertSpectrum(HamiltonianBuilder terms, double[] expected) {
    ZMatrixRMaj h = new ZMatrixRMaj(1, 1);
    terms.toDense(h);
    int n = h.numRows;
    DMatrixRMaj real = new DMatrixRMaj(n, n);
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        assertThat(h.getImag(i, j)).isZero();
        real.set(i, j, h.getReal(i, j));
      }
    }
    EigenDecomposition_F64<DMatrixRMaj> eig = DecompositionFactory_DDRM.eig(n, false, true);
    assertThat(eig.decompose(real)).isTrue();
    double[] values = new double[n];
    for (int i = 0; i < n; i++) {
      values[i] = eig.getEigenvalue(i).real;
    }
    Arrays.sort(values);
    double[] sorted = expected.clone();
    Arrays.sort(sorted);
    for (int i = 0; i < n; i++) {
      assertThat(values[i]).isCloseTo(sorted[i], within(1e-10));
    }
  }

  private static void put(DMatrixRMaj a, int m, int n, double x) {
    a.set(m, n, a.get(m, n) + x);
    a.set(n, m, a.get(n, m) - x);
  }
}
