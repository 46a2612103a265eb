package hopstat.linalg.internal;

import static org.bytedeco.openblas.global.openblas.CblasConjTrans;
import static org.bytedeco.openblas.global.openblas.CblasNoTrans;
import static org.bytedeco.openblas.global.openblas.CblasRowMajor;
import static org.bytedeco.openblas.global.openblas.cblas_zgemm;

import hopstat.linalg.ComplexProducts;
import java.util.Arrays;
import org.bytedeco.javacpp.DoublePointer;
import org.ejml.data.ZMatrixRMaj;

/**
 * Complex products on CBLAS {@code zgemm}. CBLAS accepts row-major storage directly, so EJML's
 * interleaved row-major arrays are copied into native memory as they are, without transposition.
 * Buffers grow and never shrink; not thread-safe, one instance per worker thread.
 */
final class NativeComplexProducts implements ComplexProducts {

  private final DoublePointer one;
  private final DoublePointer zero;
  private DoublePointer left;
  private DoublePointer right;
  private DoublePointer result;

  NativeComplexProducts() {
    NativeLibrary.requireLoaded();
    one = new DoublePointer(1.0, 0.0);
    zero = new DoublePointer(0.0, 0.0);
  }

  @Override
  public void mult(ZMatrixRMaj a, ZMatrixRMaj b, ZMatrixRMaj c) {
    LinalgCheckOps.requireProduct(a, b, c, a.numCols, b.numRows, "mult");
    gemm(CblasNoTrans, CblasNoTrans, a, b, c, a.numRows, b.numCols, a.numCols);
  }

  @Override
  public void multConjTransA(ZMatrixRMaj a, ZMatrixRMaj b, ZMatrixRMaj c) {
    LinalgCheckOps.requireProduct(a, b, c, a.numRows, b.numRows, "multConjTransA");
    gemm(CblasConjTrans, CblasNoTrans, a, b, c, a.numCols, b.numCols, a.numRows);
  }

  @Override
  public void multConjTransB(ZMatrixRMaj a, ZMatrixRMaj b, ZMatrixRMaj c) {
    LinalgCheckOps.requireProduct(a, b, c, a.numCols, b.numCols, "multConjTransB");
    gemm(CblasNoTrans, CblasConjTrans, a, b, c, a.numRows, b.numRows, a.numCols);
  }

  /** c (m×n) = op(a) · op(b) with inner dimension k; a and b keep their stored shapes. */
  private void gemm(
      int transA, int transB, ZMatrixRMaj a, ZMatrixRMaj b, ZMatrixRMaj c, int m, int n, int k) {
    c.reshape(m, n);
    if (m == 0 || n == 0) {
      return;
    }
    if (k == 0) {
      Arrays.fill(c.data, 0, 2 * m * n, 0.0);
      return;
    }
    int lenA = a.getDataLength();
    int lenB = b.getDataLength();
    int lenC = 2 * m * n;
    left = NativeBufferOps.ensure(left, lenA);
    right = NativeBufferOps.ensure(right, lenB);
    result = NativeBufferOps.ensure(result, lenC);
    left.put(a.data, 0, lenA);
    right.put(b.data, 0, lenB);
    // Row-major leading dimensions are the stored column counts.
    cblas_zgemm(
        CblasRowMajor,
        transA,
        transB,
        m,
        n,
        k,
        one,
        left,
        a.numCols,
        right,
        b.numCols,
        zero,
        result,
        n);
    result.get(c.data, 0, lenC);
  }
}
