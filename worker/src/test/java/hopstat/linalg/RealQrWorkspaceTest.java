package hopstat.linalg;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * Source-free checks of the real Householder QR: orthonormality, reconstruction, inverse residual.
 */
class RealQrWorkspaceTest {

  private final RealQrWorkspace qr = new RealQrWorkspace();

  @Test
  void thinFactorIsOrthonormalAndReconstructsTheInput() {
    int rows = 12;
    int cols = 5;
    double[] a = random(rows * cols, 3);
    double[] q = a.clone();
    double[] r = new double[cols];
    assertThat(qr.orthonormalise(q, rows, cols, r)).isTrue();
    // QᵀQ = 1
    for (int i = 0; i < cols; i++) {
      for (int j = 0; j < cols; j++) {
        double s = 0;
        for (int k = 0; k < rows; k++) {
          s += q[k * cols + i] * q[k * cols + j];
        }
        assertThat(s).isCloseTo(i == j ? 1.0 : 0.0, org.assertj.core.data.Offset.offset(1e-13));
      }
    }
    // R = QᵀA is upper triangular with the returned diagonal, and Q R = A
    double[] rFull = new double[cols * cols];
    for (int i = 0; i < cols; i++) {
      for (int j = 0; j < cols; j++) {
        double s = 0;
        for (int k = 0; k < rows; k++) {
          s += q[k * cols + i] * a[k * cols + j];
        }
        rFull[i * cols + j] = s;
      }
      assertThat(rFull[i * cols + i]).isCloseTo(r[i], org.assertj.core.data.Offset.offset(1e-12));
      for (int j = 0; j < i; j++) {
        assertThat(Math.abs(rFull[i * cols + j])).isLessThan(1e-12);
      }
    }
    for (int k = 0; k < rows; k++) {
      for (int j = 0; j < cols; j++) {
        double s = 0;
        for (int i = 0; i < cols; i++) {
          s += q[k * cols + i] * rFull[i * cols + j];
        }
        assertThat(s).isCloseTo(a[k * cols + j], org.assertj.core.data.Offset.offset(1e-12));
      }
    }
  }

  @Test
  void zeroColumnIsReported() {
    double[] a = {1, 0, 2, 0, 3, 0};
    assertThat(qr.orthonormalise(a, 3, 2, new double[2])).isFalse();
  }

  @Test
  void inverseTimesMatrixIsIdentity() {
    int n = 7;
    double[] a = random(n * n, 11);
    double[] inv = new double[n * n];
    assertThat(qr.invert(a, n, inv, new double[n * n], new double[n])).isTrue();
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        double s = 0;
        for (int k = 0; k < n; k++) {
          s += a[i * n + k] * inv[k * n + j];
        }
        assertThat(s).isCloseTo(i == j ? 1.0 : 0.0, org.assertj.core.data.Offset.offset(1e-12));
      }
    }
  }

  @Test
  void singularMatrixIsNotInverted() {
    double[] a = {1, 2, 2, 4};
    assertThat(qr.invert(a, 2, new double[4], new double[4], new double[2])).isFalse();
  }

  private static double[] random(int n, long seed) {
    SplittableRandom rng = new SplittableRandom(seed);
    double[] a = new double[n];
    for (int i = 0; i < n; i++) {
      a[i] = rng.nextDouble() - 0.5;
    }
    return a;
  }
}
