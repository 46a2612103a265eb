package hopstat.statistics;

import hopstat.record.RealisationRecord;
import hopstat.record.StudyLayout;
import hopstat.task.Outcome;
import hopstat.task.Quantity;
import hopstat.task.RealisationResult;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.TreeMap;

/**
 * Phase-boundary estimates along every one-dimensional cut of the grid, for every integer-valued
 * quantity, each with a percentile-bootstrap interval over realisations (see {@link
 * BoundaryEstimate} and {@link BoundaryKind} for the definitions). Pure functions of the layout and
 * the journal records; samples enter in canonical (realisation-index) order and the bootstrap
 * stream of grid point p and quantity q is seeded by {@code BootstrapOps.seed(specHash, "boundary",
 * "point=" + p, q)}, so the output is the same bit for bit for equal journals.
 *
 * <p>Cost: {@link BootstrapOps#RESAMPLES} × (realisations with samples) random draws per integer
 * quantity, plus O(RESAMPLES × points on the cut) per cut.
 */
public final class BoundaryOps {

  /** Grid axis holding the linear system size. */
  public static final String SIZE_AXIS = "L";

  /**
   * A mean difference (or distance of the mean from a level) at most this large counts as zero, so
   * curves that are quantised to the same integer up to round-off do not produce spurious crossings
   * (our choice: far above the ~1e-12 round-off of a converged index, far below the 1/n resolution
   * of a sampled mean).
   */
  public static final double ZERO_DIFFERENCE = 1e-9;

  /**
   * A variance peak is reported only if the largest variance along the cut exceeds this (our
   * choice: below it the invariant is quantised to one value everywhere up to round-off).
   */
  public static final double VARIANCE_FLOOR = 1e-6;

  private BoundaryOps() {}

  /** All boundary estimates, in order: quantity, cut (as {@link CutOps#cuts}), kind, position. */
  public static List<BoundaryEstimate> estimate(
      StudyLayout layout, List<RealisationRecord> records) {
    List<GridCut> cuts = CutOps.cuts(layout.gridNames(), layout.points());
    List<BoundaryEstimate> out = new ArrayList<>();
    for (Quantity q : layout.quantities()) {
      if (!q.integerValued()) {
        continue;
      }
      double[][] samples = samplesByPoint(layout.points().size(), records, q.name());
      PointReplicas[] replicas = new PointReplicas[samples.length];
      Map<GridCut, CutData> data = new LinkedHashMap<>();
      for (GridCut cut : cuts) {
        CutData d =
            CutData.of(
                cut,
                samples,
                p -> {
                  if (replicas[p] == null) {
                    replicas[p] =
                        PointReplicas.of(
                            samples[p],
                            BootstrapOps.seed(
                                layout.specHash(), "boundary", "point=" + p, q.name()));
                  }
                  return replicas[p];
                });
        if (d != null) {
          data.put(cut, d);
          halfIntegerCrossings(q.name(), d, out);
          variancePeak(q.name(), d, out);
        }
      }
      if (layout.gridNames().contains(SIZE_AXIS)) {
        sizeCrossings(q.name(), data, out);
      }
    }
    return out;
  }

  /** DONE samples of one quantity per grid point, in realisation order. */
  static double[][] samplesByPoint(
      int pointCount, List<RealisationRecord> records, String quantity) {
    List<List<RealisationResult>> byPoint = new ArrayList<>();
    for (int i = 0; i < pointCount; i++) {
      byPoint.add(new ArrayList<>());
    }
    for (RealisationRecord r : records) {
      RealisationResult res = r.result();
      if (res.outcome() == Outcome.DONE && res.values().containsKey(quantity)) {
        byPoint.get(res.pointIndex()).add(res);
      }
    }
    double[][] x = new double[pointCount][];
    for (int i = 0; i < pointCount; i++) {
      x[i] =
          byPoint.get(i).stream()
              .sorted((a, b) -> Integer.compare(a.realisationIndex(), b.realisationIndex()))
              .mapToDouble(res -> res.values().get(quantity))
              .toArray();
    }
    return x;
  }

  /**
   * Bootstrap replicas of one point's sample mean and variance. Seeded per point and quantity, so
   * every cut through the point (and both sizes of a size crossing) sees the same replicas of it.
   */
  private record PointReplicas(double[] mean, double[] variance) {
    /**
     * One pass per replica over centred samples y = x − x̄: mean = x̄ + Σy/n and variance = (Σy² −
     * (Σy)²/n)/(n − 1), which is well conditioned because Σy is small.
     */
    static PointReplicas of(double[] x, long seed) {
      int b = BootstrapOps.RESAMPLES;
      int n = x.length;
      double[] mean = new double[b];
      double[] variance = new double[b];
      double centre = meanOf(x);
      double[] y = new double[n];
      for (int i = 0; i < n; i++) {
        y[i] = x[i] - centre;
      }
      SplittableRandom random = BootstrapOps.generator(seed);
      for (int r = 0; r < b; r++) {
        double sum = 0;
        double squares = 0;
        for (int i = 0; i < n; i++) {
          double v = y[BootstrapOps.index(random, n)];
          sum += v;
          squares += v * v;
        }
        mean[r] = centre + sum / n;
        variance[r] = n < 2 ? Double.NaN : Math.max(0, (squares - sum * sum / n) / (n - 1));
      }
      return new PointReplicas(mean, variance);
    }
  }

  /** One cut's points with samples, their statistics and the bootstrap replicas of them. */
  private record CutData(
      GridCut cut,
      int[] points,
      double[] t,
      long[] modal,
      double[] mean,
      double[] variance,
      double[][] replicaMean,
      double[][] replicaVariance) {

    static CutData of(
        GridCut cut, double[][] samples, java.util.function.IntFunction<PointReplicas> replicasOf) {
      List<Integer> kept = new ArrayList<>();
      for (int i = 0; i < cut.pointIndices().size(); i++) {
        if (samples[cut.pointIndices().get(i)].length > 0) {
          kept.add(i);
        }
      }
      int m = kept.size();
      if (m < 2) {
        return null;
      }
      int[] points = new int[m];
      double[] t = new double[m];
      long[] modal = new long[m];
      double[] mean = new double[m];
      double[] variance = new double[m];
      int b = BootstrapOps.RESAMPLES;
      double[][] replicaMean = new double[b][m];
      double[][] replicaVariance = new double[b][m];
      for (int j = 0; j < m; j++) {
        points[j] = cut.pointIndices().get(kept.get(j));
        t[j] = cut.positions().get(kept.get(j));
        double[] x = samples[points[j]];
        modal[j] = SampleStatisticsOps.integerDistribution(x).modalValue();
        mean[j] = meanOf(x);
        variance[j] = varianceOf(x, mean[j]);
        PointReplicas pr = replicasOf.apply(points[j]);
        for (int r = 0; r < b; r++) {
          replicaMean[r][j] = pr.mean()[r];
          replicaVariance[r][j] = pr.variance()[r];
        }
      }
      return new CutData(cut, points, t, modal, mean, variance, replicaMean, replicaVariance);
    }

    int nearestPoint(double position) {
      int best = 0;
      for (int j = 1; j < t.length; j++) {
        if (Math.abs(t[j] - position) < Math.abs(t[best] - position)) {
          best = j;
        }
      }
      return points[best];
    }
  }

  private static double meanOf(double[] x) {
    double s = 0;
    for (double v : x) {
      s += v;
    }
    return s / x.length;
  }

  /** Sample variance (n − 1 denominator); NaN for n &lt; 2. */
  private static double varianceOf(double[] x, double mean) {
    if (x.length < 2) {
      return Double.NaN;
    }
    double s = 0;
    for (double v : x) {
      s += (v - mean) * (v - mean);
    }
    return s / (x.length - 1);
  }

  /**
   * Positions where the piecewise-linear curve through (t_i, d_i) changes sign. Values with |d| ≤
   * {@link #ZERO_DIFFERENCE} (and NaN) are skipped; a sign change between consecutive kept points i
   * &lt; j gives the zero of the line through them.
   */
  static double[] zeroCrossings(double[] t, double[] d) {
    double[] found = new double[t.length];
    int count = 0;
    int previous = -1;
    for (int j = 0; j < t.length; j++) {
      if (!(Math.abs(d[j]) > ZERO_DIFFERENCE)) {
        continue;
      }
      if (previous >= 0 && Math.signum(d[previous]) != Math.signum(d[j])) {
        found[count++] = t[previous] + (t[j] - t[previous]) * d[previous] / (d[previous] - d[j]);
      }
      previous = j;
    }
    return Arrays.copyOf(found, count);
  }

  private static double nearest(double[] candidates, double target) {
    return nearestWithin(candidates, target, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY);
  }

  static double nearestWithin(double[] candidates, double target, double low, double high) {
    double best = Double.NaN;
    for (double c : candidates) {
      if (c >= low
          && c <= high
          && (Double.isNaN(best) || Math.abs(c - target) < Math.abs(best - target))) {
        best = c;
      }
    }
    return best;
  }

  /**
   * The window of positions that belong to original crossing {@code k} of {@code all} (ascending):
   * from the midpoint with its left neighbour to the midpoint with its right neighbour. A replica's
   * crossing counts as a replica of crossing k only inside this window, so when the original curve
   * crosses several times each crossing gets its own interval and existence fraction.
   */
  static double[] window(double[] all, double estimate) {
    double low = Double.NEGATIVE_INFINITY;
    double high = Double.POSITIVE_INFINITY;
    for (double c : all) {
      if (c < estimate) {
        low = Math.max(low, 0.5 * (c + estimate));
      } else if (c > estimate) {
        high = Math.min(high, 0.5 * (c + estimate));
      }
    }
    return new double[] {low, high};
  }

  private static double[] minus(double[] y, double level) {
    double[] d = new double[y.length];
    for (int j = 0; j < y.length; j++) {
      d[j] = y[j] - level;
    }
    return d;
  }

  private static void halfIntegerCrossings(String quantity, CutData d, List<BoundaryEstimate> out) {
    List<double[]> seen = new ArrayList<>();
    for (int j = 0; j + 1 < d.t.length; j++) {
      long lo = Math.min(d.modal[j], d.modal[j + 1]);
      long hi = Math.max(d.modal[j], d.modal[j + 1]);
      for (long k = lo; k < hi; k++) {
        double level = k + 0.5;
        double[] all = zeroCrossings(d.t, minus(d.mean, level));
        double estimate = nearest(all, 0.5 * (d.t[j] + d.t[j + 1]));
        if (Double.isNaN(estimate)
            || seen.stream().anyMatch(s -> s[0] == level && s[1] == estimate)) {
          continue;
        }
        seen.add(new double[] {level, estimate});
        double[] w = window(all, estimate);
        double[] replicas = new double[d.replicaMean.length];
        int exists = 0;
        for (double[] rm : d.replicaMean) {
          double c = nearestWithin(zeroCrossings(d.t, minus(rm, level)), estimate, w[0], w[1]);
          if (!Double.isNaN(c)) {
            replicas[exists++] = c;
          }
        }
        out.add(
            new BoundaryEstimate(
                BoundaryKind.HALF_INTEGER_CROSSING,
                quantity,
                d.cut.axis(),
                d.cut.fixed(),
                level,
                Double.NaN,
                Double.NaN,
                estimate,
                BootstrapOps.percentileInterval(replicas, exists),
                (double) exists / replicas.length,
                replicas.length,
                d.nearestPoint(estimate)));
      }
    }
  }

  /**
   * Interior argmax of v refined by the vertex of the parabola through it and its neighbours
   * (derived: for three points the vertex is t1 − ½[(t1−t0)²(v1−v2) − (t1−t2)²(v1−v0)] /
   * [(t1−t0)(v1−v2) − (t1−t2)(v1−v0)]), clamped to [t0, t2]; NaN if the maximum lies on an end of
   * the cut or does not exceed {@link #VARIANCE_FLOOR}.
   */
  static double peak(double[] t, double[] v) {
    int best = -1;
    for (int j = 0; j < v.length; j++) {
      if (!Double.isNaN(v[j]) && (best < 0 || v[j] > v[best])) {
        best = j;
      }
    }
    if (best <= 0
        || best >= v.length - 1
        || !(v[best] > VARIANCE_FLOOR)
        || Double.isNaN(v[best - 1])
        || Double.isNaN(v[best + 1])) {
      return Double.NaN;
    }
    double t0 = t[best - 1];
    double t1 = t[best];
    double t2 = t[best + 1];
    double a = (t1 - t0) * (v[best] - v[best + 1]);
    double c = (t1 - t2) * (v[best] - v[best - 1]);
    double denominator = a - c;
    if (denominator == 0) {
      return t1;
    }
    double vertex = t1 - 0.5 * ((t1 - t0) * a - (t1 - t2) * c) / denominator;
    return Math.max(t0, Math.min(t2, vertex));
  }

  private static void variancePeak(String quantity, CutData d, List<BoundaryEstimate> out) {
    if (d.t.length < 3) {
      return;
    }
    double estimate = peak(d.t, d.variance);
    if (Double.isNaN(estimate)) {
      return;
    }
    double[] replicas = new double[d.replicaVariance.length];
    int exists = 0;
    for (double[] rv : d.replicaVariance) {
      double c = peak(d.t, rv);
      if (!Double.isNaN(c)) {
        replicas[exists++] = c;
      }
    }
    out.add(
        new BoundaryEstimate(
            BoundaryKind.VARIANCE_PEAK,
            quantity,
            d.cut.axis(),
            d.cut.fixed(),
            Double.NaN,
            Double.NaN,
            Double.NaN,
            estimate,
            BootstrapOps.percentileInterval(replicas, exists),
            (double) exists / replicas.length,
            replicas.length,
            d.nearestPoint(estimate)));
  }

  /**
   * Crossings of consecutive sizes' mean curves along cuts of a non-size axis; replica r pairs
   * replica r of both sizes' (independently seeded) points.
   */
  private static void sizeCrossings(
      String quantity, Map<GridCut, CutData> data, List<BoundaryEstimate> out) {
    Map<String, TreeMap<Double, CutData>> families = new LinkedHashMap<>();
    for (CutData d : data.values()) {
      GridCut cut = d.cut;
      if (cut.axis().equals(SIZE_AXIS) || !cut.fixed().containsKey(SIZE_AXIS)) {
        continue;
      }
      Map<String, Double> others = new LinkedHashMap<>(cut.fixed());
      double size = others.remove(SIZE_AXIS);
      families.computeIfAbsent(cut.axis() + "|" + others, k -> new TreeMap<>()).put(size, d);
    }
    for (TreeMap<Double, CutData> family : families.values()) {
      List<Map.Entry<Double, CutData>> sizes = new ArrayList<>(family.entrySet());
      for (int s = 0; s + 1 < sizes.size(); s++) {
        CutData a = sizes.get(s).getValue();
        CutData b = sizes.get(s + 1).getValue();
        if (!Arrays.equals(a.t, b.t)) {
          continue;
        }
        Map<String, Double> fixed = new LinkedHashMap<>(a.cut.fixed());
        fixed.remove(SIZE_AXIS);
        double[] diff = new double[a.t.length];
        for (int j = 0; j < diff.length; j++) {
          diff[j] = b.mean[j] - a.mean[j];
        }
        double[] all = zeroCrossings(a.t, diff);
        for (double estimate : all) {
          double[] w = window(all, estimate);
          double[] replicas = new double[a.replicaMean.length];
          int exists = 0;
          double[] rd = new double[diff.length];
          for (int r = 0; r < replicas.length; r++) {
            for (int j = 0; j < rd.length; j++) {
              rd[j] = b.replicaMean[r][j] - a.replicaMean[r][j];
            }
            double c = nearestWithin(zeroCrossings(a.t, rd), estimate, w[0], w[1]);
            if (!Double.isNaN(c)) {
              replicas[exists++] = c;
            }
          }
          out.add(
              new BoundaryEstimate(
                  BoundaryKind.SIZE_CROSSING,
                  quantity,
                  a.cut.axis(),
                  fixed,
                  Double.NaN,
                  sizes.get(s).getKey(),
                  sizes.get(s + 1).getKey(),
                  estimate,
                  BootstrapOps.percentileInterval(replicas, exists),
                  (double) exists / replicas.length,
                  replicas.length,
                  b.nearestPoint(estimate)));
        }
      }
    }
  }
}
