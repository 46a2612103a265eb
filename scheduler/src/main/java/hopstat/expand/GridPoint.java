package hopstat.expand;

import hopstat.task.PointSpec;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * One point of the parameter grid.
 *
 * @param index 0-based position in the expanded grid (first swept parameter varies slowest)
 * @param coordinates the grid axes' values (every swept parameter, and always {@code L}), in spec
 *     order
 * @param point the resolved specification the worker receives
 */
public record GridPoint(int index, Map<String, Double> coordinates, PointSpec point) {
  public GridPoint {
    coordinates = Collections.unmodifiableMap(new LinkedHashMap<>(coordinates));
  }
}
