package hopstat.linalg;

/**
 * Inertia of a Hermitian matrix: how many eigenvalues are positive, negative and zero (Sylvester's
 * law of inertia: congruence A = P L D Lᴴ Pᵀ preserves these counts, so they are read from the
 * block-diagonal D of an LDLᴴ factorisation without computing eigenvalues).
 *
 * @param positive number of positive eigenvalues, ≥ 0
 * @param negative number of negative eigenvalues, ≥ 0
 * @param zero number of eigenvalues that are exactly zero in the factorisation (a pivot block of D
 *     that is exactly singular), ≥ 0
 */
public record InertiaResult(int positive, int negative, int zero) {

  public InertiaResult {
    if (positive < 0 || negative < 0 || zero < 0) {
      throw new IllegalArgumentException(
          "inertia counts must be non-negative: " + positive + ", " + negative + ", " + zero);
    }
  }

  /** Signature: positive − negative. */
  public int signature() {
    return positive - negative;
  }

  /** Matrix dimension: positive + negative + zero. */
  public int dimension() {
    return positive + negative + zero;
  }
}
