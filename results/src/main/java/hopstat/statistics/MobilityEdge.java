package hopstat.statistics;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * A mobility edge: where two sizes' curves cross along an axis ({@code size-crossing}), or where a
 * single size's ⟨r⟩ passes the Poisson–Wigner–Dyson midpoint ({@code midpoint}). Interval,
 * existence fraction and replica matching as in {@link BoundaryEstimate}.
 *
 * @param method the estimator
 * @param quantity the quantity
 * @param axis the swept axis
 * @param fixed the other grid axes' values, without L
 * @param criterion {@code size-crossing} or {@code midpoint}
 * @param sizeLow smaller L (size-crossing), else the single size or NaN
 * @param sizeHigh larger L (size-crossing), else NaN
 * @param level the level crossed (midpoint), else NaN
 * @param estimate position on the axis
 * @param interval percentile-bootstrap interval of the position
 * @param existsFraction fraction of replicas in which the crossing exists
 * @param resamples bootstrap replicas
 */
public record MobilityEdge(
    MobilityMethod method,
    String quantity,
    String axis,
    Map<String, Double> fixed,
    String criterion,
    double sizeLow,
    double sizeHigh,
    double level,
    double estimate,
    Interval interval,
    double existsFraction,
    int resamples) {
  public MobilityEdge {
    fixed = Collections.unmodifiableMap(new LinkedHashMap<>(fixed));
  }
}
