package hopstat.statistics;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * One estimated phase boundary along a grid cut, with a bootstrap interval over realisations.
 *
 * <p>The interval resamples the realisations of every point of the cut independently (with
 * replacement, same count), recomputes the estimate, and takes the central 95 % of the replicas in
 * which the crossing or peak exists; for crossings, a replica's estimate is its crossing nearest to
 * {@code estimate} within the window reaching halfway to the neighbouring crossings of the original
 * curve, if any. {@code existsFraction} is the fraction of replicas with such a crossing or peak.
 * The interval measures disorder-sampling error only, not the error of interpolating between grid
 * points, nor finite-size shifts.
 *
 * @param kind the estimator
 * @param quantity the integer-valued quantity
 * @param axis the swept grid axis
 * @param fixed the other axes' values (for SIZE_CROSSING without L)
 * @param level the half-integer crossed (HALF_INTEGER_CROSSING), else NaN
 * @param sizeLow the smaller L (SIZE_CROSSING), else NaN
 * @param sizeHigh the larger L (SIZE_CROSSING), else NaN
 * @param estimate position on the swept axis, in that axis' units
 * @param interval percentile-bootstrap interval of the position
 * @param existsFraction fraction of replicas in which the crossing or peak exists, in [0, 1]
 * @param resamples number of bootstrap replicas (streams seeded per grid point, see {@link
 *     BoundaryOps})
 * @param nearestPoint grid index of the cut point nearest the estimate (for SIZE_CROSSING, on the
 *     larger size)
 */
public record BoundaryEstimate(
    BoundaryKind kind,
    String quantity,
    String axis,
    Map<String, Double> fixed,
    double level,
    double sizeLow,
    double sizeHigh,
    double estimate,
    Interval interval,
    double existsFraction,
    int resamples,
    int nearestPoint) {
  public BoundaryEstimate {
    fixed = Collections.unmodifiableMap(new LinkedHashMap<>(fixed));
  }
}
