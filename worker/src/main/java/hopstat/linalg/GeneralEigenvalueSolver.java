package hopstat.linalg;

import org.ejml.data.ZMatrixRMaj;

/**
 * Eigenvalues of a dense general (non-Hermitian) complex matrix, no eigenvectors. Used for the Bott
 * index, whose matrix V U V† U† is unitary only up to finite-size corrections.
 *
 * <p>One instance per worker thread; holds a growing workspace. Not thread-safe.
 */
public interface GeneralEigenvalueSolver {

  /**
   * @param a n×n complex matrix; read, not modified
   * @param real length ≥ n; overwritten with the real parts (no particular order)
   * @param imaginary length ≥ n; overwritten with the imaginary parts, paired with {@code real}
   * @return false if the routine did not converge
   */
  boolean eigenvalues(ZMatrixRMaj a, double[] real, double[] imaginary);
}
