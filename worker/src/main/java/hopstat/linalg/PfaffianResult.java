package hopstat.linalg;

/**
 * The Pfaffian of a real antisymmetric matrix, as sign and logarithm of the modulus (the modulus
 * itself over- or underflows for a few hundred rows).
 *
 * @param sign +1, −1, or 0 when the Pfaffian is exactly zero (odd dimension or an exactly zero
 *     pivot column)
 * @param logAbs ln|Pf(A)|; {@link Double#NEGATIVE_INFINITY} when {@code sign == 0}
 * @param smallestPivotRatio min over elimination steps of |pivot| / max|A_ij| (0 when sign == 0, 1
 *     for n = 0): a value near machine precision means the matrix is singular up to rounding and
 *     the sign is not reliable (an indicator, not a bound: like LU, pivots need not reveal every
 *     near-singularity)
 */
public record PfaffianResult(int sign, double logAbs, double smallestPivotRatio) {
  public PfaffianResult {
    if (sign < -1 || sign > 1) {
      throw new IllegalArgumentException("sign must be -1, 0 or +1: " + sign);
    }
    if (sign == 0 && logAbs != Double.NEGATIVE_INFINITY) {
      throw new IllegalArgumentException("a zero Pfaffian has logAbs = -infinity");
    }
  }

  /** The Pfaffian as a double: sign · exp(logAbs) (may overflow to ±∞ or underflow to 0). */
  public double value() {
    return sign == 0 ? 0.0 : sign * Math.exp(logAbs);
  }
}
