package hopstat.linalg;

import org.ejml.data.ZMatrixRMaj;

/**
 * Symmetric-indefinite (Bunch–Kaufman) factorisation P A Pᵀ = L D Lᴴ of a dense complex Hermitian
 * matrix, with D block diagonal (1×1 and 2×2 blocks), L unit lower triangular and P a permutation
 * (Bunch &amp; Kaufman, Math. Comp. 31, 163 (1977); LAPACK {@code zhetrf}). It gives the inertia of
 * A (Sylvester's law: the eigenvalue signs of D) in about n³/3 complex multiply–adds, without an
 * eigen-decomposition, and solves A X = B with the factors.
 *
 * <p>Instances come from {@link HermitianLdltFactory}. Each holds its own workspace, which grows to
 * the largest n seen and never shrinks; once warm a call allocates nothing on the Java heap. Not
 * thread-safe: one instance per worker thread. Only the lower triangle of {@code a} is read.
 *
 * <p>Inertia counts are exact for the factored matrix; a matrix with an eigenvalue within rounding
 * of zero may be counted on either side. Callers that need a margin compare the inertia of A ± δ.
 */
public interface HermitianLdltSolver {

  /**
   * Factors {@code a} and records its inertia.
   *
   * @param a n×n Hermitian matrix; read (lower triangle), not modified
   * @return false if a pivot block of D is exactly singular: the inertia is still valid (with a
   *     non-zero {@link #zeroCount()}) but {@link #solve} is not available
   */
  boolean factor(ZMatrixRMaj a);

  /** Positive eigenvalues of the last factored matrix. */
  int positiveCount();

  /** Negative eigenvalues of the last factored matrix. */
  int negativeCount();

  /**
   * Exactly-singular directions of the last factored matrix (0 unless {@link #factor} returned
   * false).
   */
  int zeroCount();

  /** The inertia of the last factored matrix (allocates a small record). */
  default InertiaResult inertia() {
    return new InertiaResult(positiveCount(), negativeCount(), zeroCount());
  }

  /**
   * Solves A X = B with the last factorisation.
   *
   * @param b n×m right-hand sides; overwritten with X = A⁻¹ B
   * @throws IllegalStateException if nothing was factored, the last matrix was singular, or b has
   *     the wrong number of rows (programming errors)
   */
  void solve(ZMatrixRMaj b);
}
