package hopstat.linalg.internal;

import hopstat.linalg.ComplexProducts;
import java.util.Arrays;
import org.ejml.data.ZMatrixRMaj;
import org.ejml.dense.row.CommonOps_ZDRM;

/**
 * Complex products on EJML's {@link CommonOps_ZDRM}. For complex matrices EJML's {@code
 * multTransA}/{@code multTransB} conjugate as well as transpose (checked in the contract test
 * against a naive loop). Stateless apart from EJML internals; one instance per worker thread.
 */
final class JavaComplexProducts implements ComplexProducts {

  @Override
  public void mult(ZMatrixRMaj a, ZMatrixRMaj b, ZMatrixRMaj c) {
    LinalgCheckOps.requireProduct(a, b, c, a.numCols, b.numRows, "mult");
    if (reshapeTrivial(c, a.numRows, b.numCols, a.numCols)) {
      return;
    }
    CommonOps_ZDRM.mult(a, b, c);
  }

  @Override
  public void multConjTransA(ZMatrixRMaj a, ZMatrixRMaj b, ZMatrixRMaj c) {
    LinalgCheckOps.requireProduct(a, b, c, a.numRows, b.numRows, "multConjTransA");
    if (reshapeTrivial(c, a.numCols, b.numCols, a.numRows)) {
      return;
    }
    CommonOps_ZDRM.multTransA(a, b, c);
  }

  @Override
  public void multConjTransB(ZMatrixRMaj a, ZMatrixRMaj b, ZMatrixRMaj c) {
    LinalgCheckOps.requireProduct(a, b, c, a.numCols, b.numCols, "multConjTransB");
    if (reshapeTrivial(c, a.numRows, b.numRows, a.numCols)) {
      return;
    }
    CommonOps_ZDRM.multTransB(a, b, c);
  }

  /** Reshapes c to m×n; for an empty inner dimension fills zeros and reports the work done. */
  private static boolean reshapeTrivial(ZMatrixRMaj c, int m, int n, int k) {
    c.reshape(m, n);
    if (k == 0 || m == 0 || n == 0) {
      Arrays.fill(c.data, 0, 2 * m * n, 0.0);
      return true;
    }
    return false;
  }
}
