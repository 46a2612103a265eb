package hopstat.statistics;

import java.util.List;

/**
 * The summary of a study: a pure function of its layout and journal records.
 *
 * @param name job name
 * @param specHash SHA-256 of the canonical spec
 * @param gridNames grid axes in spec order
 * @param plannedPerPoint realisations requested per point
 * @param quantityNames quantities in observable order
 * @param integerQuantities the integer-valued ones among them
 * @param points per-point statistics in index order
 * @param boundaries phase-boundary estimates along grid cuts ({@link BoundaryOps})
 * @param mobility mobility edges and gaps ({@link MobilityOps})
 */
public record Summary(
    String name,
    String specHash,
    List<String> gridNames,
    int plannedPerPoint,
    List<String> quantityNames,
    List<String> integerQuantities,
    List<PointSummary> points,
    List<BoundaryEstimate> boundaries,
    MobilitySummary mobility) {
  public Summary {
    gridNames = List.copyOf(gridNames);
    quantityNames = List.copyOf(quantityNames);
    integerQuantities = List.copyOf(integerQuantities);
    points = List.copyOf(points);
    boundaries = List.copyOf(boundaries);
    java.util.Objects.requireNonNull(mobility, "mobility");
  }

  /** Total DONE realisations. */
  public long done() {
    return points.stream().mapToLong(PointSummary::done).sum();
  }

  /** Total FAILED realisations. */
  public long failed() {
    return points.stream().mapToLong(PointSummary::failed).sum();
  }
}
