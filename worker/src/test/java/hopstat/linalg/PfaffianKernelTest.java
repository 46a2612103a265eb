package hopstat.linalg;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.LUDecomposition_F64;
import org.junit.jupiter.api.Test;

class PfaffianKernelTest {

  private final PfaffianWorkspace workspace = new PfaffianWorkspace();

  static DMatrixRMaj randomAntisymmetric(int n, long seed) {
    SplittableRandom random = new SplittableRandom(seed);
    DMatrixRMaj a = new DMatrixRMaj(n, n);
    for (int i = 0; i < n; i++) {
      for (int j = i + 1; j < n; j++) {
        double v = 2 * random.nextDouble() - 1;
        a.set(i, j, v);
        a.set(j, i, -v);
      }
    }
    return a;
  }

  /**
   * Pfaffian by expansion along the first row: Pf(A) = Σ_j (−1)^{j+1} a_{0j} Pf(A without 0, j).
   * Derived, O(n!!).
   */
  static double bruteForce(DMatrixRMaj a) {
    int n = a.numRows;
    if (n == 0) {
      return 1.0;
    }
    if (n % 2 == 1) {
      return 0.0;
    }
    double sum = 0.0;
    for (int j = 1; j < n; j++) {
      DMatrixRMaj minor = new DMatrixRMaj(n - 2, n - 2);
      int r = 0;
      for (int i = 1; i < n; i++) {
        if (i == j) {
          continue;
        }
        int c = 0;
        for (int k = 1; k < n; k++) {
          if (k == j) {
            continue;
          }
          minor.set(r, c++, a.get(i, k));
        }
        r++;
      }
      double sign = (j % 2 == 1) ? 1.0 : -1.0;
      sum += sign * a.get(0, j) * bruteForce(minor);
    }
    return sum;
  }

  static double det(DMatrixRMaj a) {
    LUDecomposition_F64<DMatrixRMaj> lu = DecompositionFactory_DDRM.lu(a.numRows, a.numCols);
    assertThat(lu.decompose(a.copy())).isTrue();
    return lu.computeDeterminant().real;
  }

  @Test
  void twoByTwoIsTheUpperEntry() {
    // Closed form (definition): Pf [[0, a], [−a, 0]] = a.
    DMatrixRMaj a = new DMatrixRMaj(new double[][] {{0, -2.5}, {2.5, 0}});
    PfaffianResult r = PfaffianKernel.compute(a, workspace);
    assertThat(r.sign()).isEqualTo(-1);
    assertThat(r.value()).isCloseTo(-2.5, within(1e-15));
  }

  @Test
  void fourByFourMatchesClosedForm() {
    // Closed form (definition): Pf = a01 a23 − a02 a13 + a03 a12.
    for (long seed = 1; seed <= 20; seed++) {
      DMatrixRMaj a = randomAntisymmetric(4, seed);
      double expected =
          a.get(0, 1) * a.get(2, 3) - a.get(0, 2) * a.get(1, 3) + a.get(0, 3) * a.get(1, 2);
      assertThat(PfaffianKernel.compute(a, workspace).value()).isCloseTo(expected, within(1e-14));
    }
  }

  @Test
  void matchesBruteForceExpansionWithPivoting() {
    // Source-free: expansion along the first row for n = 6, 8; pivoting is exercised because
    // random entries rarely put the largest element at (k+1, k).
    for (int n : new int[] {6, 8}) {
      for (long seed = 1; seed <= 5; seed++) {
        DMatrixRMaj a = randomAntisymmetric(n, 100 * n + seed);
        double expected = bruteForce(a);
        assertThat(PfaffianKernel.compute(a, workspace).value())
            .isCloseTo(expected, within(1e-12 * Math.max(1, Math.abs(expected))));
      }
    }
  }

  @Test
  void squareIsTheDeterminant() {
    // Pf(A)² = det A (Cayley; textbook identity). det from EJML's LU, a reference library.
    for (int n : new int[] {10, 30, 60}) {
      DMatrixRMaj a = randomAntisymmetric(n, n);
      PfaffianResult r = PfaffianKernel.compute(a, workspace);
      double det = det(a);
      assertThat(det).isPositive();
      assertThat(2 * r.logAbs())
          .isCloseTo(Math.log(det), within(1e-9 * Math.max(1, Math.abs(Math.log(det)))));
    }
  }

  @Test
  void congruenceMultipliesByTheDeterminant() {
    // Pf(B A Bᵀ) = det(B) Pf(A) (textbook identity); covers the sign, which Pf² = det cannot.
    for (long seed = 1; seed <= 5; seed++) {
      int n = 12;
      DMatrixRMaj a = randomAntisymmetric(n, seed);
      SplittableRandom random = new SplittableRandom(seed + 1000);
      DMatrixRMaj b = new DMatrixRMaj(n, n);
      for (int i = 0; i < n * n; i++) {
        b.data[i] = 2 * random.nextDouble() - 1;
      }
      DMatrixRMaj ba = new DMatrixRMaj(n, n);
      DMatrixRMaj bab = new DMatrixRMaj(n, n);
      CommonOps_DDRM.mult(b, a, ba);
      CommonOps_DDRM.multTransB(ba, b, bab);
      for (int i = 0; i < n; i++) { // remove rounding asymmetry
        for (int j = i; j < n; j++) {
          double v = 0.5 * (bab.get(i, j) - bab.get(j, i));
          bab.set(i, j, v);
          bab.set(j, i, -v);
        }
      }
      double expected = det(b) * PfaffianKernel.compute(a, workspace).value();
      assertThat(PfaffianKernel.compute(bab, workspace).value())
          .isCloseTo(expected, within(1e-9 * Math.abs(expected)));
    }
  }

  @Test
  void blockDiagonalIsTheProduct() {
    // Pf(A ⊕ B) = Pf(A) Pf(B) (derived from the definition).
    DMatrixRMaj a = randomAntisymmetric(6, 7);
    DMatrixRMaj b = randomAntisymmetric(4, 8);
    DMatrixRMaj sum = new DMatrixRMaj(10, 10);
    CommonOps_DDRM.insert(a, sum, 0, 0);
    CommonOps_DDRM.insert(b, sum, 6, 6);
    double expected =
        PfaffianKernel.compute(a, workspace).value() * PfaffianKernel.compute(b, workspace).value();
    assertThat(PfaffianKernel.compute(sum, workspace).value())
        .isCloseTo(expected, within(1e-13 * Math.abs(expected)));
  }

  @Test
  void logarithmAvoidsOverflow() {
    // Pf(cA) = c^{n/2} Pf(A) (homogeneity); with c = 1e10 and n = 200 the value itself overflows.
    DMatrixRMaj a = randomAntisymmetric(200, 3);
    PfaffianResult base = PfaffianKernel.compute(a, workspace);
    DMatrixRMaj scaled = a.copy();
    CommonOps_DDRM.scale(1e10, scaled);
    PfaffianResult big = PfaffianKernel.compute(scaled, workspace);
    assertThat(big.sign()).isEqualTo(base.sign());
    assertThat(big.logAbs())
        .isCloseTo(base.logAbs() + 100 * Math.log(1e10), within(1e-8 * big.logAbs()));
  }

  @Test
  void oddOrSingularGivesZero() {
    assertThat(PfaffianKernel.compute(randomAntisymmetric(5, 1), workspace).sign()).isZero();
    DMatrixRMaj a = randomAntisymmetric(6, 2);
    for (int j = 0; j < 6; j++) { // zero row and column 3
      a.set(3, j, 0);
      a.set(j, 3, 0);
    }
    assertThat(PfaffianKernel.compute(a, workspace).sign()).isZero();
  }

  @Test
  void pivotRatioFlagsSingularityUpToRounding() {
    // Source-free: a congruence B A Bᵀ with a rank-deficient B (two equal rows) is singular in
    // exact
    // arithmetic; in floating point some pivot is at rounding level while a generic matrix has
    // none.
    int n = 8;
    DMatrixRMaj a = randomAntisymmetric(n, 21);
    assertThat(PfaffianKernel.compute(a, workspace).smallestPivotRatio()).isGreaterThan(1e-6);
    SplittableRandom random = new SplittableRandom(22);
    DMatrixRMaj b = new DMatrixRMaj(n, n);
    for (int i = 0; i < n * n; i++) {
      b.data[i] = 2 * random.nextDouble() - 1;
    }
    for (int j = 0; j < n; j++) {
      b.set(5, j, b.get(2, j));
    }
    DMatrixRMaj ba = new DMatrixRMaj(n, n);
    DMatrixRMaj bab = new DMatrixRMaj(n, n);
    CommonOps_DDRM.mult(b, a, ba);
    CommonOps_DDRM.multTransB(ba, b, bab);
    for (int i = 0; i < n; i++) {
      for (int j = i; j < n; j++) {
        double v = 0.5 * (bab.get(i, j) - bab.get(j, i));
        bab.set(i, j, v);
        bab.set(j, i, -v);
      }
    }
    PfaffianResult r = PfaffianKernel.compute(bab, workspace);
    assertThat(r.sign() == 0 || r.smallestPivotRatio() < 1e-12).isTrue();
  }

  @Test
  void rejectsNonAntisymmetricInput() {
    DMatrixRMaj a = randomAntisymmetric(4, 1);
    a.set(0, 1, a.get(0, 1) + 0.1);
    assertThatThrownBy(() -> PfaffianKernel.compute(a, workspace))
        .isInstanceOf(IllegalArgumentException.class);
  }
}
