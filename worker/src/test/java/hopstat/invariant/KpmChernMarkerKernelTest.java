package hopstat.invariant;

import static hopstat.invariant.TestRealisation.aRealisation;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import hopstat.lattice.Boundary;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.spectrum.ChebyshevScale;
import hopstat.spectrum.CsrHermitianMatrix;
import hopstat.spectrum.KpmKernel;
import java.util.SplittableRandom;
import org.ejml.data.ZMatrixRMaj;
import org.junit.jupiter.api.Test;

/**
 * The KPM Chern marker against the dense Bianco–Resta marker (Bianco &amp; Resta, PRB 84, 241106(R)
 * (2011); {@link ChernMarkerKernel}) of the same open realisation.
 */
class KpmChernMarkerKernelTest {

  /**
   * With the bulk trace taken exactly (unit vectors), only the truncation of the Chebyshev
   * projector remains (Weiße et al., RMP 78, 275 (2006)). Measured on this realisation (qwz m = 1,
   * W = 1, L = 16, a = 5.5): |kpm − dense| = 1.1e−3, 1.1e−4, 8e−6 at M = 128, 256, 512, so at M =
   * 256 the tolerance 1e−3 leaves a factor 9. The two estimators must use the same bulk region
   * (same site count), and the marker has the sign of C: −1 for 0 &lt; m &lt; 2 (Qi, Wu, Zhang, PRB
   * 74, 085308 (2006)).
   */
  @Test
  void exactBulkTraceMatchesTheDenseMarkerUpToTruncation() {
    TestRealisation t =
        aRealisation("qwz")
            .with("m", 1.0)
            .with("t", 1.0)
            .size(16)
            .boundary(Boundary.OPEN)
            .disorder("onsite-box", 1.0)
            .seed(7);
    HamiltonianBuilder b = t.build();
    Lattice lattice = t.lattice();
    ChernMarkerResult dense = denseMarker(b, lattice, 0.0);
    CsrHermitianMatrix h = new CsrHermitianMatrix();
    h.assemble(b);
    ChebyshevScale scale = KpmKernel.scale(h);
    KpmChernMarkerWorkspace ws = new KpmChernMarkerWorkspace();
    double exact = KpmChernMarkerKernel.exactTrace(h, lattice, scale, 0.0, 256, ws);
    assertThat(exact).isCloseTo(dense.bulkAverage(), within(1e-3));
    assertThat(dense.bulkAverage()).isCloseTo(-1.0, within(0.01));
    int[] bulk = new int[lattice.orbitals()];
    assertThat(KpmChernMarkerKernel.bulkOrbitals(lattice, bulk) / lattice.orbitalsPerSite())
        .isEqualTo(dense.bulkSites());
  }

  /**
   * The stochastic estimate is the mean of R unbiased per-vector estimates; the reported standard
   * error s/√R (common practice) must cover the deviation from the dense marker: within 4 standard
   * errors plus the truncation tolerance 1e−3 above. The error is not zero and not absurd (measured
   * 0.036 at R = 8 on this sample).
   */
  @Test
  void stochasticEstimateAgreesWithinItsStandardError() {
    TestRealisation t =
        aRealisation("qwz")
            .with("m", -1.0)
            .with("t", 1.0)
            .size(16)
            .boundary(Boundary.OPEN)
            .disorder("onsite-box", 1.0)
            .seed(8);
    HamiltonianBuilder b = t.build();
    Lattice lattice = t.lattice();
    double dense = denseMarker(b, lattice, 0.0).bulkAverage();
    CsrHermitianMatrix h = new CsrHermitianMatrix();
    h.assemble(b);
    KpmChernMarkerWorkspace ws = new KpmChernMarkerWorkspace();
    for (long seed = 1; seed <= 3; seed++) {
      KpmChernMarkerResult r =
          KpmChernMarkerKernel.compute(
              h, lattice, KpmKernel.scale(h), 0.0, 256, 8, new SplittableRandom(seed), ws);
      assertThat(r.standardError()).isBetween(1e-3, 0.2);
      assertThat(r.bulkAverage()).isCloseTo(dense, within(4 * r.standardError() + 1e-3));
      assertThat(r.vectors()).isEqualTo(8);
    }
  }

  static ChernMarkerResult denseMarker(HamiltonianBuilder b, Lattice lattice, double fermi) {
    ZMatrixRMaj dense = new ZMatrixRMaj(1, 1);
    b.toDense(dense);
    int n = b.dimension();
    double[] ev = new double[n];
    ZMatrixRMaj vectors = new ZMatrixRMaj(1, 1);
    assertThat(
            OccupiedStates.LINALG
                .newHermitianEigenSolver()
                .eigenpairs(dense, ev, 0, n - 1, vectors))
        .isTrue();
    int occ = 0;
    while (occ < n && ev[occ] < fermi) {
      occ++;
    }
    ZMatrixRMaj out = new ZMatrixRMaj(n, occ);
    for (int i = 0; i < n; i++) {
      System.arraycopy(vectors.data, 2 * i * n, out.data, 2 * i * occ, 2 * occ);
    }
    return ChernMarkerKernel.compute(lattice, out, new ChernMarkerWorkspace(OccupiedStates.LINALG));
  }
}
