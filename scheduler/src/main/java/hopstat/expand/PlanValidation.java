package hopstat.expand;

import hopstat.model.Model;
import hopstat.model.SymmetryCheckKernel;
import hopstat.model.SymmetryCheckResult;
import hopstat.task.InvalidInputException;
import hopstat.task.SeedOps;
import hopstat.task.SymmetryCheckOps;
import hopstat.task.SymmetryCheckReport;
import java.util.LinkedHashSet;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

/**
 * Checks that need the expanded grid: each point's parameters against the model's own rules, and
 * the symmetries the spec's class claims against a built realisation.
 */
public final class PlanValidation {

  /** Points whose first realisation is built and symmetry-checked, spread evenly over the grid. */
  public static final int SYMMETRY_CHECKED_POINTS = 12;

  /**
   * Points whose matrix is larger are not built here (their realisations are still checked as they
   * run).
   */
  public static final int SYMMETRY_CHECK_MAX_DIMENSION = 2000;

  /** At most this many distinct problems are listed. */
  static final int MAX_LISTED = 10;

  private PlanValidation() {}

  /**
   * @throws InvalidInputException listing every point whose parameters the model refuses, and every
   *     symmetry the effective class claims but a realisation breaks
   */
  public static void validate(StudyPlan plan) {
    InvalidInputException.Collector problems = new InvalidInputException.Collector();
    Model model = plan.spec().resolveModel();
    Set<String> seen = new LinkedHashSet<>();
    for (GridPoint p : plan.points()) {
      model
          .whyNotValid(p.point().parameters(), p.point().linearSize(), p.point().boundary())
          .ifPresent(
              reason -> {
                if (seen.add(reason) && seen.size() <= MAX_LISTED) {
                  problems.add("parameters", describe(p.coordinates()), reason);
                }
              });
    }
    problems.throwIfAny();
    int points = plan.points().size();
    int step = Math.max(1, points / SYMMETRY_CHECKED_POINTS);
    for (int i = 0; i < points; i += step) {
      GridPoint p = plan.points().get(i);
      hopstat.lattice.Lattice lattice = model.lattice(p.point().linearSize(), p.point().boundary());
      if (lattice.orbitals() > SYMMETRY_CHECK_MAX_DIMENSION
          || model.symmetryOperators().on(lattice).isEmpty()) {
        continue;
      }
      SymmetryCheckReport report =
          SymmetryCheckOps.check(
              p.point(),
              SeedOps.realisationSeed(plan.spec().seed(), p.index(), 0),
              SymmetryCheckKernel.TOLERANCE);
      for (SymmetryCheckResult v : report.violations()) {
        String reason =
            String.format(
                Locale.ROOT,
                "model %s with this disorder claims class %s, but a realisation breaks %s (relative violation %.2e > %.0e);"
                    + " remove the disorder that breaks it or the observables that need it",
                model.name(),
                report.effectiveClass(),
                v.symmetry(),
                v.relativeViolation(),
                SymmetryCheckKernel.TOLERANCE);
        if (plan.spec().customModel() != null && plan.spec().disorder().isEmpty()) {
          reason =
              String.format(
                  Locale.ROOT,
                  "the lattice declares class %s, but its Hamiltonian breaks %s (relative violation %.2e > %.0e);"
                      + " a term does not respect the declared operator: fix the term, the operator or the class",
                  report.effectiveClass(),
                  v.symmetry(),
                  v.relativeViolation(),
                  SymmetryCheckKernel.TOLERANCE);
        }
        if (seen.add(reason)) {
          problems.add(
              plan.spec().disorder().isEmpty() && plan.spec().customModel() != null
                  ? "lattice.symmetries"
                  : "disorder",
              describe(p.coordinates()),
              reason);
        }
      }
    }
    problems.throwIfAny();
  }

  private static String describe(Map<String, Double> coordinates) {
    StringBuilder b = new StringBuilder("point ");
    coordinates.forEach((k, v) -> b.append(k).append('=').append(v).append(' '));
    return b.toString().trim();
  }
}
