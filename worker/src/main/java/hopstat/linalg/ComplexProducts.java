package hopstat.linalg;

import org.ejml.data.ZMatrixRMaj;

/**
 * Dense complex matrix products, the BLAS-3 part of the hot path (projected position operators).
 * Outputs are reshaped to fit; outputs must not alias inputs. One instance per worker thread.
 */
public interface ComplexProducts {

  /** c = a · b. a read, b read, c overwritten. */
  void mult(ZMatrixRMaj a, ZMatrixRMaj b, ZMatrixRMaj c);

  /** c = a† · b (a conjugate-transposed). a read, b read, c overwritten. */
  void multConjTransA(ZMatrixRMaj a, ZMatrixRMaj b, ZMatrixRMaj c);

  /** c = a · b† (b conjugate-transposed). a read, b read, c overwritten. */
  void multConjTransB(ZMatrixRMaj a, ZMatrixRMaj b, ZMatrixRMaj c);
}
