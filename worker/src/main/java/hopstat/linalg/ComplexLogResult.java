package hopstat.linalg;

/**
 * A complex number in polar-logarithmic form, as returned by {@link ComplexPfaffianKernel} and
 * {@link ComplexDeterminantKernel}: z = exp(logAbs + i·phase). Moduli of determinants and Pfaffians
 * of a few hundred rows over- or underflow, their logarithms do not.
 *
 * @param logAbs ln|z|; {@link Double#NEGATIVE_INFINITY} when z is exactly zero
 * @param phase arg z in radians, in (−π, π]; 0 when z is exactly zero
 * @param smallestPivotRatio min over elimination steps of |pivot| / max|A_ij| (0 when z = 0, 1 for
 *     an empty matrix): near machine precision means singular up to rounding (an indicator, not a
 *     bound)
 */
public record ComplexLogResult(double logAbs, double phase, double smallestPivotRatio) {

  public ComplexLogResult {
    if (Double.isNaN(logAbs) || logAbs == Double.POSITIVE_INFINITY) {
      throw new IllegalArgumentException("logAbs must be finite or -infinity: " + logAbs);
    }
    if (!(phase > -Math.PI - 1e-12 && phase <= Math.PI + 1e-12)) {
      throw new IllegalArgumentException("phase must lie in (-pi, pi]: " + phase);
    }
  }

  /** True when the value is exactly zero (odd order Pfaffian, or an exactly zero pivot column). */
  public boolean isZero() {
    return logAbs == Double.NEGATIVE_INFINITY;
  }

  /** Real part exp(logAbs)·cos(phase) (may over- or underflow). */
  public double re() {
    return isZero() ? 0.0 : Math.exp(logAbs) * Math.cos(phase);
  }

  /** Imaginary part exp(logAbs)·sin(phase) (may over- or underflow). */
  public double im() {
    return isZero() ? 0.0 : Math.exp(logAbs) * Math.sin(phase);
  }

  /** Wraps an angle into (−π, π]. */
  public static double wrap(double angle) {
    double a = Math.IEEEremainder(angle, 2 * Math.PI);
    return a <= -Math.PI ? a + 2 * Math.PI : a;
  }

  static ComplexLogResult zero() {
    return new ComplexLogResult(Double.NEGATIVE_INFINITY, 0.0, 0.0);
  }
}
