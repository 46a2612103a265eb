package hopstat.statistics;

/**
 * Sample quantiles at the fixed levels {@link #LEVELS}, by linear interpolation between order
 * statistics (Hyndman and Fan, Am. Stat. 50, 361 (1996), definition 7; the default of R and NumPy):
 * for sorted x_0..x_{n−1}, Q(p) = x_j + (h − j)(x_{j+1} − x_j) with h = (n − 1)p, j = ⌊h⌋.
 *
 * @param q05 5 % quantile
 * @param q25 25 % quantile (lower quartile)
 * @param q75 75 % quantile (upper quartile)
 * @param q95 95 % quantile
 */
public record Quantiles(double q05, double q25, double q75, double q95) {

  /** The levels reported, in component order. */
  public static final java.util.List<Double> LEVELS = java.util.List.of(0.05, 0.25, 0.75, 0.95);

  /** Method text written into outputs. */
  public static final String METHOD =
      "linear interpolation between order statistics (Hyndman-Fan type 7)";
}
