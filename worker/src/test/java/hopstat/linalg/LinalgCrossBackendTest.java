package hopstat.linalg;

import static hopstat.linalg.LinalgTestMatrices.frobenius;
import static hopstat.linalg.LinalgTestMatrices.hermitianWithSpectrum;
import static hopstat.linalg.LinalgTestMatrices.multisetDistance;
import static hopstat.linalg.LinalgTestMatrices.randomGeneral;
import static hopstat.linalg.LinalgTestMatrices.randomHermitian;
import static org.assertj.core.api.Assertions.assertThat;

import org.ejml.data.ZMatrixRMaj;
import org.junit.jupiter.api.Test;

/**
 * Native and Java backends agree (the reference-library check: LAPACK against EJML). Both are
 * backward stable, so eigenvalues agree to a few n·ε·‖A‖ (common practice); 1e-10 relative leaves
 * ample margin.
 */
class LinalgCrossBackendTest {

  private static final double RELATIVE = 1e-10;

  private final Linalg nativeLinalg = LinalgFactory.create(LinalgKind.NATIVE);
  private final Linalg javaLinalg = LinalgFactory.create(LinalgKind.JAVA);

  @Test
  void hermitianEigenvaluesAgree() {
    double[] degenerate = new double[30];
    for (int i = 0; i < 30; i++) {
      degenerate[i] = (i / 4) * 0.7 - 2.0;
    }
    for (ZMatrixRMaj a :
        new ZMatrixRMaj[] {randomHermitian(60, 71), hermitianWithSpectrum(degenerate, 72)}) {
      int n = a.numRows;
      double[] fromNative = new double[n];
      double[] fromJava = new double[n];
      assertThat(nativeLinalg.newHermitianEigenSolver().eigenvalues(a, fromNative)).isTrue();
      assertThat(javaLinalg.newHermitianEigenSolver().eigenvalues(a, fromJava)).isTrue();
      double scale = frobenius(a);
      for (int i = 0; i < n; i++) {
        assertThat(Math.abs(fromNative[i] - fromJava[i])).isLessThan(RELATIVE * scale);
      }
    }
  }

  @Test
  void nondegenerateEigenvectorsAgreeUpToPhase() {
    // For a simple eigenvalue the eigenvector is unique up to a phase: |⟨v_native, v_java⟩| = 1.
    ZMatrixRMaj a = randomHermitian(30, 73);
    int n = 30;
    ZMatrixRMaj vn = new ZMatrixRMaj(1, 1);
    ZMatrixRMaj vj = new ZMatrixRMaj(1, 1);
    double[] values = new double[n];
    assertThat(nativeLinalg.newHermitianEigenSolver().eigenpairs(a, values, 5, 12, vn)).isTrue();
    assertThat(javaLinalg.newHermitianEigenSolver().eigenpairs(a, values, 5, 12, vj)).isTrue();
    ZMatrixRMaj overlap = LinalgTestMatrices.naiveProduct(vn, true, vj, false);
    for (int j = 0; j < 8; j++) {
      assertThat(Math.hypot(overlap.getReal(j, j), overlap.getImag(j, j)))
          .isCloseTo(1.0, org.assertj.core.data.Offset.offset(1e-9));
    }
  }

  @Test
  void generalEigenvaluesAgree() {
    int n = 50;
    ZMatrixRMaj a = randomGeneral(n, n, 74);
    double[] reN = new double[n];
    double[] imN = new double[n];
    double[] reJ = new double[n];
    double[] imJ = new double[n];
    assertThat(nativeLinalg.newGeneralEigenvalueSolver().eigenvalues(a, reN, imN)).isTrue();
    assertThat(javaLinalg.newGeneralEigenvalueSolver().eigenvalues(a, reJ, imJ)).isTrue();
    assertThat(multisetDistance(reN, imN, reJ, imJ, n)).isLessThan(RELATIVE * frobenius(a));
  }

  @Test
  void productsAgree() {
    ZMatrixRMaj a = randomGeneral(33, 17, 75);
    ZMatrixRMaj b = randomGeneral(33, 21, 76);
    ZMatrixRMaj cn = new ZMatrixRMaj(1, 1);
    ZMatrixRMaj cj = new ZMatrixRMaj(1, 1);
    nativeLinalg.newComplexProducts().multConjTransA(a, b, cn);
    javaLinalg.newComplexProducts().multConjTransA(a, b, cj);
    assertThat(LinalgTestMatrices.maxAbsDifference(cn, cj)).isLessThan(1e-13);
  }
}
