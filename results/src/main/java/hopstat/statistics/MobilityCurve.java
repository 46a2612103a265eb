package hopstat.statistics;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * One curve of a mobility estimator: a quantity's ensemble mean against an energy-like axis at one
 * size, with a percentile-bootstrap interval per position (for {@link
 * MobilityMethod#INVARIANT_PLATEAU}: the quantised fraction with its Wilson interval).
 *
 * @param method the estimator
 * @param quantity the quantity read from the records ({@code lambda}, {@code level-ratio}, {@code
 *     bott@E}, a grid-swept invariant)
 * @param axis the swept axis: a grid axis, or {@code level-ratio.e} / {@code <name>@E.energy} for
 *     per-realisation energies
 * @param fixed the other grid axes' values, without {@code L}
 * @param size linear size L; NaN when L is not a grid axis
 * @param plateauValue the plateau integer (INVARIANT_PLATEAU), else NaN
 * @param points ascending in position
 */
public record MobilityCurve(
    MobilityMethod method,
    String quantity,
    String axis,
    Map<String, Double> fixed,
    double size,
    double plateauValue,
    List<Point> points) {
  public MobilityCurve {
    fixed = Collections.unmodifiableMap(new LinkedHashMap<>(fixed));
    points = List.copyOf(points);
  }

  /**
   * @param position the axis value (a window's mean centre over realisations for level-ratio)
   * @param n realisations with a value here
   * @param mean ensemble mean (INVARIANT_PLATEAU: fraction quantised at the plateau value)
   * @param interval 95 % interval of the mean (percentile bootstrap; Wilson for fractions)
   * @param state {@code localised}, {@code extended}, {@code undecided} (size comparison with the
   *     next smaller size, or midpoint comparison for one size), {@code quantised}, {@code
   *     not-quantised}; empty when there is nothing to compare with
   */
  public record Point(double position, int n, double mean, Interval interval, String state) {}
}
