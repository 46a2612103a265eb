package hopstat.statistics;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * A mobility-gap estimate: the window [lower, upper] on an energy axis around the reference energy
 * where one estimator classes states as localised (or the invariant as quantised), and its
 * half-width (upper − lower)/2. When the reference lies outside every such window the half-width is
 * 0 and lower/upper are NaN. Each bootstrap replica recomputes the window the same way (half-width
 * 0 when the reference is not inside); intervals are percentile intervals over replicas
 * (lower/upper: over replicas with the reference inside).
 *
 * @param method the estimator
 * @param quantity the quantity
 * @param axis the energy axis
 * @param fixed the other grid axes' values, without L
 * @param criterion how the window is bounded: {@code size-crossing} (Λ falls with M), {@code
 *     crossing-value} (larger size's ⟨r⟩ at or below its value at the robust size crossings),
 *     {@code midpoint} (⟨r⟩ at or below the Poisson–Wigner–Dyson midpoint), {@code
 *     quantised-fraction}
 * @param sizeLow smaller size compared (two sizes), else the size used or NaN
 * @param sizeHigh larger size compared (two sizes), else NaN
 * @param reference the reference energy (a fixed fermiEnergy inside the scan, else the scan centre)
 * @param lower lower end of the window
 * @param upper upper end of the window
 * @param lowerOpen the window reaches the lowest energy of the scan (lower is a bound, not an edge)
 * @param upperOpen the window reaches the highest energy of the scan
 * @param halfWidth (upper − lower)/2, the mobility-gap estimate; a lower bound when a side is open
 * @param interval percentile-bootstrap interval of the half-width
 * @param lowerInterval interval of lower
 * @param upperInterval interval of upper
 * @param insideFraction fraction of replicas in which the reference lies inside a window
 * @param resamples bootstrap replicas
 */
public record MobilityGap(
    MobilityMethod method,
    String quantity,
    String axis,
    Map<String, Double> fixed,
    String criterion,
    double sizeLow,
    double sizeHigh,
    double reference,
    double lower,
    double upper,
    boolean lowerOpen,
    boolean upperOpen,
    double halfWidth,
    Interval interval,
    Interval lowerInterval,
    Interval upperInterval,
    double insideFraction,
    int resamples) {
  public MobilityGap {
    fixed = Collections.unmodifiableMap(new LinkedHashMap<>(fixed));
  }
}
