package hopstat.spectrum;

/**
 * The affine map of energies onto the Chebyshev interval: x = (E − centre) / halfWidth, H̃ = (H −
 * centre)/halfWidth (Weiße, Wellein, Alvermann, Fehske, RMP 78, 275 (2006), Sec. II.B).
 *
 * @param centre b, in the model's energy unit
 * @param halfWidth a &gt; 0, in the model's energy unit
 */
public record ChebyshevScale(double centre, double halfWidth) {

  public ChebyshevScale {
    if (!(halfWidth > 0) || !Double.isFinite(halfWidth) || !Double.isFinite(centre)) {
      throw new IllegalArgumentException(
          "need a finite centre and a positive finite half-width: " + centre + ", " + halfWidth);
    }
  }

  /** x = (E − b)/a. */
  public double rescaled(double energy) {
    return (energy - centre) / halfWidth;
  }

  /** E = a·x + b. */
  public double energy(double x) {
    return halfWidth * x + centre;
  }
}
