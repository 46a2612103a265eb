package hopstat.statistics;

/**
 * Sample mean of n independent realisations with its standard error and a Student-t confidence
 * interval. Assumes independent, identically distributed realisations with finite variance; it
 * measures only the statistical (disorder-sampling) error, never finite-size or systematic error.
 *
 * @param n number of samples
 * @param mean arithmetic mean
 * @param standardDeviation sample standard deviation (n − 1 denominator); NaN for n &lt; 2
 * @param standardError standardDeviation/√n; NaN for n &lt; 2
 * @param confidenceLevel the interval's nominal coverage, 0.95
 * @param ciLow mean − t_{(1+level)/2, n−1}·standardError; NaN for n &lt; 2
 * @param ciHigh mean + t_{(1+level)/2, n−1}·standardError; NaN for n &lt; 2
 */
public record MeanEstimate(
    int n,
    double mean,
    double standardDeviation,
    double standardError,
    double confidenceLevel,
    double ciLow,
    double ciHigh) {

  /** Estimator name written into outputs. */
  public static final String ESTIMATOR = "sample mean";

  /** Error measure written into outputs. */
  public static final String ERROR_MEASURE = "standard error s/sqrt(n), s with n-1 denominator";

  /** Interval method written into outputs. */
  public static final String INTERVAL = "Student t, two-sided";
}
