package hopstat.statistics;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Everything summarised at one grid point.
 *
 * @param index grid point index
 * @param coordinates grid axes' values
 * @param done realisations that finished with all quantities
 * @param failed realisations journaled as FAILED
 * @param quantities per quantity, in observable order (only those with at least one sample)
 * @param failureReasons distinct failure reasons with counts, most frequent first (at most a few)
 */
public record PointSummary(
    int index,
    Map<String, Double> coordinates,
    int done,
    int failed,
    List<QuantitySummary> quantities,
    Map<String, Integer> failureReasons) {
  public PointSummary {
    coordinates = Collections.unmodifiableMap(new LinkedHashMap<>(coordinates));
    quantities = List.copyOf(quantities);
    failureReasons = Collections.unmodifiableMap(new LinkedHashMap<>(failureReasons));
  }
}
