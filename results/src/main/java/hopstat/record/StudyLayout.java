package hopstat.record;

import hopstat.model.SymmetryClass;
import hopstat.task.Quantity;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The shape of a study, from its spec: grid axes, points and the quantities measured. Lets the
 * summary list points that have no record yet.
 *
 * @param name job name
 * @param specHash SHA-256 of the canonical spec
 * @param gridNames grid axes in spec order
 * @param points every grid point
 * @param quantities measured quantities in observable order
 * @param plannedPerPoint realisations requested per point (the maximum under adaptive sampling)
 * @param effectiveClass the Altland–Zirnbauer class of the model with the spec's disorder (what the
 *     disorder keeps of the clean class); null when unknown. Used to pick the Wigner–Dyson
 *     reference of level statistics (the records do not carry it).
 */
public record StudyLayout(
    String name,
    String specHash,
    List<String> gridNames,
    List<Point> points,
    List<Quantity> quantities,
    int plannedPerPoint,
    SymmetryClass effectiveClass) {

  public StudyLayout {
    gridNames = List.copyOf(gridNames);
    points = List.copyOf(points);
    quantities = List.copyOf(quantities);
  }

  /** A layout whose effective symmetry class is unknown. */
  public StudyLayout(
      String name,
      String specHash,
      List<String> gridNames,
      List<Point> points,
      List<Quantity> quantities,
      int plannedPerPoint) {
    this(name, specHash, gridNames, points, quantities, plannedPerPoint, null);
  }

  /**
   * @param index 0-based grid point index
   * @param coordinates grid axes' values
   */
  public record Point(int index, Map<String, Double> coordinates) {
    public Point {
      coordinates = Collections.unmodifiableMap(new LinkedHashMap<>(coordinates));
    }
  }
}
