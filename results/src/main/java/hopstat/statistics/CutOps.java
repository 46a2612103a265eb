package hopstat.statistics;

import hopstat.record.StudyLayout;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** Splits a grid into its one-dimensional cuts. Pure functions; output order is canonical. */
public final class CutOps {

  private CutOps() {}

  /**
   * Every one-dimensional cut with at least two distinct positions: for each grid axis (grid
   * order), the points grouped by the values of all other axes (groups in order of their first
   * point index), sorted by the swept value. A second point at an already-seen position is left
   * out.
   */
  public static List<GridCut> cuts(List<String> gridNames, List<StudyLayout.Point> points) {
    List<GridCut> cuts = new ArrayList<>();
    for (String axis : gridNames) {
      Map<List<Double>, List<StudyLayout.Point>> groups = new LinkedHashMap<>();
      for (StudyLayout.Point p : points) {
        List<Double> key = new ArrayList<>();
        for (String g : gridNames) {
          if (!g.equals(axis)) {
            key.add(p.coordinates().get(g));
          }
        }
        groups.computeIfAbsent(key, k -> new ArrayList<>()).add(p);
      }
      for (List<StudyLayout.Point> group : groups.values()) {
        List<StudyLayout.Point> sorted = new ArrayList<>(group);
        sorted.sort(
            Comparator.comparingDouble((StudyLayout.Point p) -> p.coordinates().get(axis))
                .thenComparingInt(StudyLayout.Point::index));
        List<Integer> indices = new ArrayList<>();
        List<Double> positions = new ArrayList<>();
        for (StudyLayout.Point p : sorted) {
          double t = p.coordinates().get(axis);
          if (positions.isEmpty() || positions.get(positions.size() - 1) != t) {
            indices.add(p.index());
            positions.add(t);
          }
        }
        if (positions.size() >= 2) {
          Map<String, Double> fixed = new LinkedHashMap<>();
          for (String g : gridNames) {
            if (!g.equals(axis)) {
              fixed.put(g, sorted.get(0).coordinates().get(g));
            }
          }
          cuts.add(new GridCut(axis, fixed, indices, positions));
        }
      }
    }
    return cuts;
  }
}
