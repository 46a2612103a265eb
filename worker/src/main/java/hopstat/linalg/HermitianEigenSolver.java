package hopstat.linalg;

import org.ejml.data.ZMatrixRMaj;

/**
 * Eigenvalues and eigenvectors of a dense complex Hermitian matrix.
 *
 * <p>Instances come from {@link Linalg#newHermitianEigenSolver()}. Each holds its own workspace,
 * which grows to the largest size seen and never shrinks; once warm a call allocates nothing on the
 * Java heap. Not thread-safe: one instance per worker thread.
 *
 * <p>Only the lower triangle of {@code a} is guaranteed to be read; callers must pass a Hermitian
 * matrix. Eigenvalues are returned in ascending order. Eigenvectors are unit-norm columns; their
 * complex phase is arbitrary.
 */
public interface HermitianEigenSolver {

  /**
   * All eigenvalues, no eigenvectors.
   *
   * @param a n×n Hermitian matrix; read, not modified
   * @param values length ≥ n; overwritten with the n eigenvalues in ascending order
   * @return false if the routine did not converge (an outcome, not an input error)
   */
  boolean eigenvalues(ZMatrixRMaj a, double[] values);

  /**
   * All eigenvalues and the eigenvectors with ascending 0-based indices {@code first..last}
   * (inclusive).
   *
   * @param a n×n Hermitian matrix; read, not modified
   * @param values length ≥ n; overwritten: all n eigenvalues in ascending order
   * @param first index of the first wanted eigenvector, 0 ≤ first
   * @param last index of the last wanted eigenvector, first − 1 ≤ last &lt; n (last = first − 1
   *     asks for none)
   * @param vectors overwritten; reshaped to n × (last − first + 1), column j is the eigenvector of
   *     {@code values[first + j]}
   * @return false if the routine did not converge
   */
  boolean eigenpairs(ZMatrixRMaj a, double[] values, int first, int last, ZMatrixRMaj vectors);
}
