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

/** CSR assembly against the dense matrix of the same term list (source-free checks). */
class CsrHermitianMatrixTest {

  /** A disordered open qwz sample plus deliberately repeated terms (duplicates must be summed). */
  private static HamiltonianBuilder terms() {
    HamiltonianBuilder b =
        aRealisation("qwz")
            .with("m", 1.0)
            .with("t", 1.0)
            .size(5)
            .boundary(Boundary.OPEN)
            .disorder("onsite-box", 2.0)
            .seed(11)
            .build();
    b.addHopping(0, 3, 0.25, -0.5);
    b.addHopping(3, 0, 0.125, 0.75);
    b.addHopping(7, 8, 0.3, 0.1);
    b.addOnsite(4, 0.7);
    b.addOnsite(4, -0.2);
    return b;
  }

  /**
   * Derived: H_ij = conj(H_ji) for every stored entry; the columns of each row increase strictly.
   */
  @Test
  void storedMatrixIsHermitianWithSortedUniqueColumns() {
    CsrHermitianMatrix h = new CsrHermitianMatrix();
    h.assemble(terms());
    int n = h.dimension();
    for (int i = 0; i < n; i++) {
      for (int p = h.rowStart(i); p < h.rowStart(i + 1); p++) {
        int j = h.column(p);
        if (p > h.rowStart(i)) {
          assertThat(j).isGreaterThan(h.column(p - 1));
        }
        int q = find(h, j, i);
        assertThat(q).as("mirror of (%d, %d)", i, j).isGreaterThanOrEqualTo(0);
        assertThat(h.realPart(q)).isEqualTo(h.realPart(p));
        assertThat(h.imaginaryPart(q)).isEqualTo(-h.imaginaryPart(p));
      }
    }
  }

  /**
   * Derived: the CSR entries equal HamiltonianBuilder.toDense (duplicates summed), and so does the
   * product with a vector.
   */
  @Test
  void matchesTheDenseMatrixAndItsProduct() {
    HamiltonianBuilder b = terms();
    ZMatrixRMaj dense = new ZMatrixRMaj(1, 1);
    b.toDense(dense);
    CsrHermitianMatrix h = new CsrHermitianMatrix();
    h.assemble(
        aRealisation("qwz")
            .with("m", -1.0)
            .with("t", 1.0)
            .size(8)
            .disorder("onsite-box", 1.0)
            .build()); // a different, larger matrix first: reuse must not leak entries
    h.assemble(b);
    int n = b.dimension();
    ZMatrixRMaj fromCsr = new ZMatrixRMaj(n, n);
    for (int i = 0; i < n; i++) {
      for (int p = h.rowStart(i); p < h.rowStart(i + 1); p++) {
        fromCsr.set(i, h.column(p), h.realPart(p), h.imaginaryPart(p));
      }
    }
    for (int k = 0; k < 2 * n * n; k++) {
      assertThat(fromCsr.data[k]).isCloseTo(dense.data[k], within(1e-14));
    }
    SplittableRandom random = new SplittableRandom(5);
    double[] x = new double[2 * n];
    for (int k = 0; k < 2 * n; k++) {
      x[k] = random.nextDouble() - 0.5;
    }
    double[] y = new double[2 * n];
    h.multiply(x, y);
    for (int i = 0; i < n; i++) {
      double re = 0;
      double im = 0;
      for (int j = 0; j < n; j++) {
        re += dense.getReal(i, j) * x[2 * j] - dense.getImag(i, j) * x[2 * j + 1];
        im += dense.getReal(i, j) * x[2 * j + 1] + dense.getImag(i, j) * x[2 * j];
      }
      assertThat(y[2 * i]).isCloseTo(re, within(1e-12));
      assertThat(y[2 * i + 1]).isCloseTo(im, within(1e-12));
    }
  }

  /**
   * Gershgorin circle theorem: every dense eigenvalue lies within the bounds; the bounds are not
   * absurdly loose.
   */
  @Test
  void gershgorinBoundsContainTheSpectrum() {
    HamiltonianBuilder b = terms();
    ZMatrixRMaj dense = new ZMatrixRMaj(1, 1);
    b.toDense(dense);
    int n = b.dimension();
    double[] ev = new double[n];
    assertThat(
            LinalgFactory.create(LinalgKind.NATIVE)
                .newHermitianEigenSolver()
                .eigenvalues(dense, ev))
        .isTrue();
    CsrHermitianMatrix h = new CsrHermitianMatrix();
    h.assemble(b);
    double[] bounds = new double[2];
    h.gershgorinBounds(bounds);
    assertThat(bounds[0]).isLessThanOrEqualTo(ev[0]);
    assertThat(bounds[1]).isGreaterThanOrEqualTo(ev[n - 1]);
    assertThat(bounds[1] - bounds[0]).isLessThan(4 * (ev[n - 1] - ev[0]));
  }

  private static int find(CsrHermitianMatrix h, int row, int column) {
    for (int p = h.rowStart(row); p < h.rowStart(row + 1); p++) {
      if (h.column(p) == column) {
        return p;
      }
    }
    return -1;
  }
}
