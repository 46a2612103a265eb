package hopstat.record;

import hopstat.task.RealisationResult;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;

/**
 * One journal record: a realisation's result with the grid coordinates and parameters it was
 * computed at, and where it was computed. This is all the statistics ever read.
 *
 * @param result the worker's result (values, outcome, seed, wall seconds)
 * @param grid the grid axes' values at the point (spec order)
 * @param parameters every resolved parameter at the point
 * @param toolVersion hopstat version that computed it
 * @param linalg linear-algebra backend that computed it
 */
public record RealisationRecord(
    RealisationResult result,
    Map<String, Double> grid,
    Map<String, Double> parameters,
    String toolVersion,
    String linalg) {
  public RealisationRecord {
    Objects.requireNonNull(result, "result");
    grid = Collections.unmodifiableMap(new LinkedHashMap<>(grid));
    parameters = Collections.unmodifiableMap(new LinkedHashMap<>(parameters));
    Objects.requireNonNull(toolVersion, "toolVersion");
    Objects.requireNonNull(linalg, "linalg");
  }
}
