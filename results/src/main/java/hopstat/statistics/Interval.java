package hopstat.statistics;

/**
 * A confidence interval with its method and nominal level stated.
 *
 * @param low lower end; NaN when undefined
 * @param high upper end; NaN when undefined
 * @param confidenceLevel nominal two-sided coverage, e.g. 0.95
 * @param method how it was computed, e.g. {@link BootstrapOps#METHOD}
 */
public record Interval(double low, double high, double confidenceLevel, String method) {

  /** An undefined interval (too few samples). */
  public static Interval undefined(String method) {
    return new Interval(Double.NaN, Double.NaN, SampleStatisticsOps.CONFIDENCE, method);
  }
}
