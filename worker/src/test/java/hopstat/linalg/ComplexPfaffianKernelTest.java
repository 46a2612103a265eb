package hopstat.linalg;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import org.ejml.data.ZMatrixRMaj;
import org.junit.jupiter.api.Test;

class ComplexPfaffianKernelTest {

  private final ComplexPfaffianWorkspace pfWorkspace = new ComplexPfaffianWorkspace();
  private final ComplexDeterminantWorkspace detWorkspace = new ComplexDeterminantWorkspace();

  static ZMatrixRMaj randomAntisymmetric(int n, long seed) {
    SplittableRandom random = new SplittableRandom(seed);
    ZMatrixRMaj a = new ZMatrixRMaj(n, n);
    for (int i = 0; i < n; i++) {
      for (int j = i + 1; j < n; j++) {
        double re = 2 * random.nextDouble() - 1;
        double im = 2 * random.nextDouble() - 1;
        a.set(i, j, re, im);
        a.set(j, i, -re, -im);
      }
    }
    return a;
  }

  /** Brute-force Pfaffian by expansion along the first row (derived; O(n!!)), as {re, im}. */
  static double[] bruteForce(ZMatrixRMaj a) {
    int n = a.numRows;
    if (n == 0) {
      return new double[] {1, 0};
    }
    double re = 0;
    double im = 0;
    for (int j = 1; j < n; j++) {
      ZMatrixRMaj minor = new ZMatrixRMaj(n - 2, n - 2);
      int r = 0;
      for (int i = 1; i < n; i++) {
        if (i == j) {
          continue;
        }
        int c = 0;
        for (int k = 1; k < n; k++) {
          if (k != j) {
            minor.set(r, c++, a.getReal(i, k), a.getImag(i, k));
          }
        }
        r++;
      }
      double[] m = bruteForce(minor);
      double sign = (j % 2 == 1) ? 1.0 : -1.0;
      double ar = a.getReal(0, j);
      double ai = a.getImag(0, j);
      re += sign * (ar * m[0] - ai * m[1]);
      im += sign * (ar * m[1] + ai * m[0]);
    }
    return new double[] {re, im};
  }

  @Test
  void squareIsTheDeterminantOnRandomMatrices() {
    // Pf(A)² = det A for antisymmetric A (Cayley; common practice, e.g. Wimmer 2012, Sec. 1).
    for (int n : new int[] {2, 4, 6, 10, 24, 41}) {
      ZMatrixRMaj a = randomAntisymmetric(n, 100 + n);
      ComplexLogResult pf = ComplexPfaffianKernel.compute(a, pfWorkspace);
      ComplexLogResult det = ComplexDeterminantKernel.compute(a, detWorkspace);
      if (n % 2 == 1) {
        assertThat(pf.isZero()).isTrue();
        continue;
      }
      assertThat(2 * pf.logAbs())
          .as("n=%d", n)
          .isCloseTo(det.logAbs(), within(1e-10 * (1 + Math.abs(det.logAbs()))));
      assertThat(ComplexLogResult.wrap(2 * pf.phase() - det.phase()))
          .as("n=%d", n)
          .isCloseTo(0.0, within(1e-9));
    }
  }

  @Test
  void agreesWithExpansionOnSmallMatrices() {
    // Derived: Laplace-type expansion of the Pfaffian along the first row.
    for (int n : new int[] {2, 4, 6, 8}) {
      ZMatrixRMaj a = randomAntisymmetric(n, 7 * n);
      double[] expected = bruteForce(a);
      ComplexLogResult pf = ComplexPfaffianKernel.compute(a, pfWorkspace);
      assertThat(pf.re()).as("n=%d", n).isCloseTo(expected[0], within(1e-12));
      assertThat(pf.im()).as("n=%d", n).isCloseTo(expected[1], within(1e-12));
    }
  }

  @Test
  void blockDiagonalSumGivesTheProduct() {
    // Derived: Pf(⊕_k [[0, a_k], [−a_k, 0]]) = Π_k a_k; the blocks are scattered by a permutation
    // with known sign to exercise the pivoting: interleave as (0, 3), (1, 2) etc. is avoided, the
    // direct sum is taken in order so the product carries no sign.
    double[][] blocks = {{0.5, 2.0}, {-1.5, 0.25}, {3.0, -1.0}, {0.0, 0.7}};
    int n = 2 * blocks.length;
    ZMatrixRMaj a = new ZMatrixRMaj(n, n);
    double re = 1;
    double im = 0;
    for (int k = 0; k < blocks.length; k++) {
      a.set(2 * k, 2 * k + 1, blocks[k][0], blocks[k][1]);
      a.set(2 * k + 1, 2 * k, -blocks[k][0], -blocks[k][1]);
      double r = re * blocks[k][0] - im * blocks[k][1];
      im = re * blocks[k][1] + im * blocks[k][0];
      re = r;
    }
    ComplexLogResult pf = ComplexPfaffianKernel.compute(a, pfWorkspace);
    assertThat(pf.re()).isCloseTo(re, within(1e-13));
    assertThat(pf.im()).isCloseTo(im, within(1e-13));
  }

  @Test
  void handCaseFourByFour() {
    // Derived (definition): Pf of a 4 × 4 antisymmetric matrix = a01 a23 − a02 a13 + a03 a12.
    // With a01 = i, a23 = 2, a02 = 1 + i, a13 = 3, a03 = −1, a12 = i: Pf = 2i − (3 + 3i) − i = −3 −
    // 2i.
    ZMatrixRMaj a = new ZMatrixRMaj(4, 4);
    set(a, 0, 1, 0, 1);
    set(a, 2, 3, 2, 0);
    set(a, 0, 2, 1, 1);
    set(a, 1, 3, 3, 0);
    set(a, 0, 3, -1, 0);
    set(a, 1, 2, 0, 1);
    ComplexLogResult pf = ComplexPfaffianKernel.compute(a, pfWorkspace);
    assertThat(pf.re()).isCloseTo(-3.0, within(1e-14));
    assertThat(pf.im()).isCloseTo(-2.0, within(1e-14));
  }

  @Test
  void realMatricesAgreeWithTheRealKernel() {
    // Cross-check against PfaffianKernel (tested separately against brute force).
    ZMatrixRMaj a = new ZMatrixRMaj(12, 12);
    var real = PfaffianKernelTest.randomAntisymmetric(12, 5);
    for (int i = 0; i < 12; i++) {
      for (int j = 0; j < 12; j++) {
        a.set(i, j, real.get(i, j), 0.0);
      }
    }
    PfaffianResult expected = PfaffianKernel.compute(real, new PfaffianWorkspace());
    ComplexLogResult pf = ComplexPfaffianKernel.compute(a, pfWorkspace);
    assertThat(pf.logAbs()).isCloseTo(expected.logAbs(), within(1e-12));
    assertThat(Math.cos(pf.phase())).isCloseTo(expected.sign(), within(1e-12));
  }

  @Test
  void zeroAndRejectedInputs() {
    ZMatrixRMaj zero = new ZMatrixRMaj(4, 4);
    assertThat(ComplexPfaffianKernel.compute(zero, pfWorkspace).isZero()).isTrue();
    ZMatrixRMaj notAnti = randomAntisymmetric(4, 3);
    notAnti.set(0, 1, 5.0, 0.0);
    assertThatThrownBy(() -> ComplexPfaffianKernel.compute(notAnti, pfWorkspace))
        .isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> ComplexPfaffianKernel.compute(new ZMatrixRMaj(2, 3), pfWorkspace))
        .isInstanceOf(IllegalArgumentException.class);
  }

  private static void set(ZMatrixRMaj a, int i, int j, double re, double im) {
    a.set(i, j, re, im);
    a.set(j, i, -re, -im);
  }
}
