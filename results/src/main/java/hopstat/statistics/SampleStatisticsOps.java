package hopstat.statistics;

import java.util.Arrays;
import java.util.SortedMap;
import java.util.TreeMap;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.distribution.TDistribution;

/** Estimators over one sample of realisations. Pure functions; sums run in the order given. */
public final class SampleStatisticsOps {

  /** Confidence level of every interval hopstat reports. */
  public static final double CONFIDENCE = 0.95;

  /**
   * A sample of an integer invariant counts as quantised when it lies within this distance of an
   * integer (our choice: well above the 1e-10 noise of a converged index, well below the 0.5 that
   * would make rounding ambiguous).
   */
  public static final double QUANTISATION_TOLERANCE = 0.05;

  private static final double Z =
      new NormalDistribution(null, 0, 1).inverseCumulativeProbability(0.5 + CONFIDENCE / 2);

  private SampleStatisticsOps() {}

  /**
   * Mean, standard error and Student-t interval. The sum runs over {@code x} in the given order, so
   * callers that want bit-identical results pass samples in a canonical order.
   *
   * @param x samples; read, not modified
   */
  public static MeanEstimate mean(double[] x) {
    int n = x.length;
    if (n == 0) {
      return new MeanEstimate(
          0, Double.NaN, Double.NaN, Double.NaN, CONFIDENCE, Double.NaN, Double.NaN);
    }
    double sum = 0;
    for (double v : x) {
      sum += v;
    }
    double mean = sum / n;
    if (n == 1) {
      return new MeanEstimate(1, mean, Double.NaN, Double.NaN, CONFIDENCE, Double.NaN, Double.NaN);
    }
    double ss = 0;
    for (double v : x) {
      ss += (v - mean) * (v - mean);
    }
    double sd = Math.sqrt(ss / (n - 1));
    double se = sd / Math.sqrt(n);
    double t = new TDistribution(null, n - 1).inverseCumulativeProbability(0.5 + CONFIDENCE / 2);
    return new MeanEstimate(n, mean, sd, se, CONFIDENCE, mean - t * se, mean + t * se);
  }

  /** Median of the samples (mean of the two middle values for even n); NaN when empty. */
  public static double median(double[] x) {
    if (x.length == 0) {
      return Double.NaN;
    }
    double[] s = x.clone();
    Arrays.sort(s);
    int m = s.length / 2;
    return s.length % 2 == 1 ? s[m] : 0.5 * (s[m - 1] + s[m]);
  }

  /**
   * Type-7 quantile (see {@link Quantiles}) of an ascending array.
   *
   * @param sorted ascending, non-empty; read, not modified
   * @param p level in [0, 1]
   */
  public static double quantileOfSorted(double[] sorted, double p) {
    if (sorted.length == 0) {
      return Double.NaN;
    }
    if (!(p >= 0 && p <= 1)) {
      throw new IllegalArgumentException("quantile level must lie in [0, 1]: " + p);
    }
    double h = (sorted.length - 1) * p;
    int j = (int) Math.floor(h);
    if (j >= sorted.length - 1) {
      return sorted[sorted.length - 1];
    }
    return sorted[j] + (h - j) * (sorted[j + 1] - sorted[j]);
  }

  /** Quantiles at {@link Quantiles#LEVELS}; NaN when empty. */
  public static Quantiles quantiles(double[] x) {
    double[] s = x.clone();
    Arrays.sort(s);
    return new Quantiles(
        quantileOfSorted(s, 0.05),
        quantileOfSorted(s, 0.25),
        quantileOfSorted(s, 0.75),
        quantileOfSorted(s, 0.95));
  }

  /**
   * Typical value exp⟨ln x⟩ with its log-scale Student-t interval.
   *
   * @return null unless every sample is strictly positive and finite (and there is at least one)
   */
  public static TypicalValue typical(double[] x) {
    if (x.length == 0) {
      return null;
    }
    double[] logs = new double[x.length];
    for (int i = 0; i < x.length; i++) {
      if (!(x[i] > 0) || !Double.isFinite(x[i])) {
        return null;
      }
      logs[i] = Math.log(x[i]);
    }
    MeanEstimate m = mean(logs);
    return new TypicalValue(
        m.n(), Math.exp(m.mean()), m.standardError(), Math.exp(m.ciLow()), Math.exp(m.ciHigh()));
  }

  /**
   * Wilson score interval for a binomial proportion k/n at {@link #CONFIDENCE} (Wilson, J. Am.
   * Stat. Assoc. 22, 209 (1927)).
   *
   * @return {low, high}; {NaN, NaN} for n = 0
   */
  public static double[] wilson(int k, int n) {
    if (n == 0) {
      return new double[] {Double.NaN, Double.NaN};
    }
    double p = (double) k / n;
    double z2 = Z * Z;
    double denominator = 1 + z2 / n;
    double centre = (p + z2 / (2.0 * n)) / denominator;
    double half = Z / denominator * Math.sqrt(p * (1 - p) / n + z2 / (4.0 * n * n));
    return new double[] {Math.max(0, centre - half), Math.min(1, centre + half)};
  }

  /** Distribution of rounded values of an integer-valued quantity. */
  public static IntegerDistribution integerDistribution(double[] x) {
    SortedMap<Long, Integer> counts = new TreeMap<>();
    double maxDistance = 0;
    int nonQuantised = 0;
    for (double v : x) {
      long r = Math.round(v);
      counts.merge(r, 1, Integer::sum);
      double d = Math.abs(v - r);
      maxDistance = Math.max(maxDistance, d);
      if (d > QUANTISATION_TOLERANCE) {
        nonQuantised++;
      }
    }
    long modal = 0;
    int best = -1;
    for (var e : counts.entrySet()) {
      if (e.getValue() > best) {
        best = e.getValue();
        modal = e.getKey();
      }
    }
    int n = x.length;
    double[] ci = wilson(Math.max(best, 0), n);
    java.util.List<ValueProbability> probabilities = new java.util.ArrayList<>();
    for (var e : counts.entrySet()) {
      double[] w = wilson(e.getValue(), n);
      probabilities.add(
          new ValueProbability(e.getKey(), e.getValue(), (double) e.getValue() / n, w[0], w[1]));
    }
    return new IntegerDistribution(
        n,
        counts,
        modal,
        n == 0 ? Double.NaN : (double) best / n,
        ci[0],
        ci[1],
        n == 0 ? Double.NaN : maxDistance,
        nonQuantised,
        QUANTISATION_TOLERANCE,
        probabilities);
  }
}
