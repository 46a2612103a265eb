package hopstat.statistics;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A one-dimensional cut of the grid: every grid axis but {@code axis} held fixed.
 *
 * @param axis the swept grid axis
 * @param fixed the other axes' values, in grid order
 * @param pointIndices grid point indices along the cut, ascending in the swept value
 * @param positions the swept axis' values at those points, ascending and distinct
 */
public record GridCut(
    String axis, Map<String, Double> fixed, List<Integer> pointIndices, List<Double> positions) {
  public GridCut {
    fixed = Collections.unmodifiableMap(new LinkedHashMap<>(fixed));
    pointIndices = List.copyOf(pointIndices);
    positions = List.copyOf(positions);
    if (pointIndices.size() != positions.size()) {
      throw new IllegalArgumentException("one position per point");
    }
  }

  /** The fixed axes as text, e.g. {@code "L=8, m=1.0"} (empty for a one-axis grid). */
  public String fixedText() {
    StringBuilder b = new StringBuilder();
    for (Map.Entry<String, Double> e : fixed.entrySet()) {
      if (b.length() > 0) {
        b.append(", ");
      }
      b.append(e.getKey()).append('=').append(e.getValue());
    }
    return b.toString();
  }
}
