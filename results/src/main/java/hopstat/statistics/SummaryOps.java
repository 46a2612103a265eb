package hopstat.statistics;

import hopstat.record.RealisationRecord;
import hopstat.record.StudyLayout;
import hopstat.task.Outcome;
import hopstat.task.Quantity;
import hopstat.task.RealisationResult;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Builds the {@link Summary} of a study from its layout and journal records. A pure function:
 * records are put in canonical order (point, realisation) first, so the summary is the same bit for
 * bit whatever order, thread count, resume or sharding produced the journal.
 */
public final class SummaryOps {

  /** How many distinct failure reasons a point lists. */
  public static final int MAX_FAILURE_REASONS = 5;

  private SummaryOps() {}

  /**
   * @param layout the study's grid and quantities
   * @param records journal records, one per task id (deduplicated by the reader)
   */
  public static Summary summarise(StudyLayout layout, List<RealisationRecord> records) {
    List<List<RealisationResult>> byPoint = new ArrayList<>();
    for (int i = 0; i < layout.points().size(); i++) {
      byPoint.add(new ArrayList<>());
    }
    for (RealisationRecord r : records) {
      int p = r.result().pointIndex();
      if (p < 0 || p >= byPoint.size()) {
        throw new IllegalArgumentException(
            "record "
                + r.result().taskId()
                + " names point "
                + p
                + " outside the grid of "
                + byPoint.size());
      }
      byPoint.get(p).add(r.result());
    }
    List<String> integerQuantities = new ArrayList<>();
    for (Quantity q : layout.quantities()) {
      if (q.integerValued()) {
        integerQuantities.add(q.name());
      }
    }
    List<PointSummary> points = new ArrayList<>();
    for (StudyLayout.Point point : layout.points()) {
      List<RealisationResult> results = byPoint.get(point.index());
      results.sort(Comparator.comparingInt(RealisationResult::realisationIndex));
      points.add(summarisePoint(layout.specHash(), point, results, layout.quantities()));
    }
    return new Summary(
        layout.name(),
        layout.specHash(),
        layout.gridNames(),
        layout.plannedPerPoint(),
        layout.quantities().stream().map(Quantity::name).toList(),
        integerQuantities,
        points,
        BoundaryOps.estimate(layout, records),
        MobilityOps.estimate(layout, records));
  }

  private static PointSummary summarisePoint(
      String specHash,
      StudyLayout.Point point,
      List<RealisationResult> results,
      List<Quantity> quantities) {
    int done = 0;
    int failed = 0;
    Map<String, Integer> reasons = new LinkedHashMap<>();
    for (RealisationResult r : results) {
      if (r.outcome() == Outcome.DONE) {
        done++;
      } else {
        failed++;
        reasons.merge(r.failure(), 1, Integer::sum);
      }
    }
    List<QuantitySummary> summaries = new ArrayList<>();
    for (Quantity q : quantities) {
      double[] x =
          results.stream()
              .filter(r -> r.outcome() == Outcome.DONE && r.values().containsKey(q.name()))
              .mapToDouble(r -> r.values().get(q.name()))
              .toArray();
      if (x.length == 0) {
        continue;
      }
      double min = Double.POSITIVE_INFINITY;
      double max = Double.NEGATIVE_INFINITY;
      for (double v : x) {
        min = Math.min(min, v);
        max = Math.max(max, v);
      }
      summaries.add(
          new QuantitySummary(
              q.name(),
              SampleStatisticsOps.mean(x),
              SampleStatisticsOps.median(x),
              min,
              max,
              q.integerValued() ? SampleStatisticsOps.integerDistribution(x) : null,
              SampleStatisticsOps.quantiles(x),
              BootstrapOps.meanInterval(
                  x, BootstrapOps.seed(specHash, "mean", "point=" + point.index(), q.name())),
              q.integerValued() ? null : SampleStatisticsOps.typical(x)));
    }
    Map<String, Integer> topReasons = new LinkedHashMap<>();
    reasons.entrySet().stream()
        .sorted(
            Map.Entry.<String, Integer>comparingByValue()
                .reversed()
                .thenComparing(Map.Entry.comparingByKey()))
        .limit(MAX_FAILURE_REASONS)
        .forEach(e -> topReasons.put(e.getKey(), e.getValue()));
    return new PointSummary(
        point.index(), point.coordinates(), done, failed, summaries, topReasons);
  }
}
