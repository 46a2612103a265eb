package hopstat.localisation;

/**
 * Settings of one transfer-matrix run.
 *
 * @param energy E, in the model's energy unit
 * @param targetRelativeError stop when the estimated relative standard error of the smallest
 *     positive exponent is at or below this (e.g. 0.01); 0 runs to {@code maxSlices}
 * @param maxSlices length guard: give up (not converged) after this many slices, ≥ 1
 */
public record LyapunovSpec(double energy, double targetRelativeError, long maxSlices) {
  public LyapunovSpec {
    if (!Double.isFinite(energy)) {
      throw new IllegalArgumentException("energy must be finite: " + energy);
    }
    if (!(targetRelativeError >= 0) || Double.isInfinite(targetRelativeError)) {
      throw new IllegalArgumentException(
          "targetRelativeError must be finite and >= 0: " + targetRelativeError);
    }
    if (maxSlices < 1) {
      throw new IllegalArgumentException("maxSlices must be positive: " + maxSlices);
    }
  }
}
