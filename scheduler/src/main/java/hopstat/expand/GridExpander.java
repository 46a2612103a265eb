package hopstat.expand;

import hopstat.disorder.DisorderTerm;
import hopstat.model.ParameterValues;
import hopstat.spec.DisorderSpec;
import hopstat.spec.JobSpec;
import hopstat.spec.ParameterSpec;
import hopstat.spec.SpecParser;
import hopstat.task.PointSpec;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** Expands a job spec into its grid: the Cartesian product of all swept parameters. */
public final class GridExpander {

  /** Largest grid accepted, to catch a mistyped range before it allocates. */
  public static final int MAX_POINTS = 1_000_000;

  private GridExpander() {}

  /**
   * Expands {@code spec}. Point order: nested loops over the swept parameters in spec order, the
   * first one outermost (slowest).
   */
  public static StudyPlan expand(JobSpec spec) {
    List<ParameterSpec> params = spec.parameters();
    List<String> gridNames = new ArrayList<>();
    for (ParameterSpec p : params) {
      if (p.swept() || p.name().equals(SpecParser.SIZE)) {
        gridNames.add(p.name());
      }
    }
    long count = 1;
    for (ParameterSpec p : params) {
      count *= p.values().size();
      if (count > MAX_POINTS) {
        throw new hopstat.task.InvalidInputException(
            "parameters", null, "the grid has more than " + MAX_POINTS + " points");
      }
    }
    int[] odometer = new int[params.size()];
    List<GridPoint> points = new ArrayList<>((int) count);
    for (int index = 0; index < count; index++) {
      Map<String, Double> values = new LinkedHashMap<>();
      Map<String, Double> coordinates = new LinkedHashMap<>();
      for (int k = 0; k < params.size(); k++) {
        ParameterSpec p = params.get(k);
        double v = p.values().get(odometer[k]);
        values.put(p.name(), v);
        if (gridNames.contains(p.name())) {
          coordinates.put(p.name(), v);
        }
      }
      points.add(new GridPoint(index, coordinates, pointSpec(spec, values)));
      for (int k = params.size() - 1; k >= 0; k--) {
        if (++odometer[k] < params.get(k).values().size()) {
          break;
        }
        odometer[k] = 0;
      }
    }
    return new StudyPlan(spec, gridNames, points);
  }

  private static PointSpec pointSpec(JobSpec spec, Map<String, Double> values) {
    List<DisorderTerm> disorder = new ArrayList<>();
    for (DisorderSpec d : spec.disorder()) {
      double w =
          d.strengthParameter() == null ? d.strengthValue() : values.get(d.strengthParameter());
      disorder.add(new DisorderTerm(d.type(), w, d.options()));
    }
    int size = (int) Math.round(values.get(SpecParser.SIZE));
    return new PointSpec(
        spec.model(),
        new ParameterValues(values),
        size,
        spec.boundary(),
        values.get(SpecParser.FERMI_ENERGY),
        disorder,
        spec.observables(),
        spec.customModel());
  }
}
