package hopstat.linalg;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import org.ejml.data.Complex_F64;
import org.ejml.data.ZMatrixRMaj;
import org.ejml.dense.row.CommonOps_ZDRM;
import org.junit.jupiter.api.Test;

class ComplexDeterminantKernelTest {

  private final ComplexDeterminantWorkspace workspace = new ComplexDeterminantWorkspace();

  private static ZMatrixRMaj random(int n, long seed) {
    SplittableRandom random = new SplittableRandom(seed);
    ZMatrixRMaj a = new ZMatrixRMaj(n, n);
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        a.set(i, j, 2 * random.nextDouble() - 1, 2 * random.nextDouble() - 1);
      }
    }
    return a;
  }

  @Test
  void agreesWithEjmlOnRandomMatrices() {
    // Reference library: EJML's complex determinant (CommonOps_ZDRM.det, LU based).
    for (int n : new int[] {1, 2, 5, 17, 30}) {
      ZMatrixRMaj a = random(n, n);
      Complex_F64 expected = CommonOps_ZDRM.det(a.copy());
      ComplexLogResult det = ComplexDeterminantKernel.compute(a, workspace);
      double scale = expected.getMagnitude();
      assertThat(det.re()).as("n=%d", n).isCloseTo(expected.real, within(1e-10 * scale));
      assertThat(det.im()).as("n=%d", n).isCloseTo(expected.imaginary, within(1e-10 * scale));
    }
  }

  @Test
  void productRuleAndPermutationSign() {
    // Derived: det(AB) = det A det B; swapping two rows flips the sign.
    ZMatrixRMaj a = random(8, 1);
    ZMatrixRMaj b = random(8, 2);
    ZMatrixRMaj ab = new ZMatrixRMaj(8, 8);
    CommonOps_ZDRM.mult(a, b, ab);
    ComplexLogResult da = ComplexDeterminantKernel.compute(a, workspace);
    ComplexLogResult db = ComplexDeterminantKernel.compute(b, workspace);
    ComplexLogResult dab = ComplexDeterminantKernel.compute(ab, workspace);
    assertThat(dab.logAbs()).isCloseTo(da.logAbs() + db.logAbs(), within(1e-11));
    assertThat(ComplexLogResult.wrap(dab.phase() - da.phase() - db.phase()))
        .isCloseTo(0.0, within(1e-11));
    ZMatrixRMaj swapped = a.copy();
    for (int j = 0; j < 8; j++) {
      swapped.set(0, j, a.getReal(3, j), a.getImag(3, j));
      swapped.set(3, j, a.getReal(0, j), a.getImag(0, j));
    }
    ComplexLogResult ds = ComplexDeterminantKernel.compute(swapped, workspace);
    assertThat(ds.logAbs()).isCloseTo(da.logAbs(), within(1e-12));
    assertThat(Math.abs(ComplexLogResult.wrap(ds.phase() - da.phase())))
        .isCloseTo(Math.PI, within(1e-11));
  }

  @Test
  void singularMatrixIsZero() {
    ZMatrixRMaj a = random(4, 3);
    for (int j = 0; j < 4; j++) {
      a.set(2, j, 0, 0);
    }
    assertThat(ComplexDeterminantKernel.compute(a, workspace).isZero()).isTrue();
  }
}
