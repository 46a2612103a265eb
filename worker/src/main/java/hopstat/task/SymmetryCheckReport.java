package hopstat.task;

import hopstat.model.Symmetry;
import hopstat.model.SymmetryCheckResult;
import hopstat.model.SymmetryClass;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * The symmetry checks of one built realisation of a grid point.
 *
 * @param effectiveClass the model's class restricted by the disorder kinds' kept symmetries
 * @param checks one result per claimed symmetry whose operator the model declares
 * @param undeclared claimed symmetries for which the model declares no operator (not checked)
 */
public record SymmetryCheckReport(
    SymmetryClass effectiveClass, List<SymmetryCheckResult> checks, List<Symmetry> undeclared) {
  public SymmetryCheckReport {
    Objects.requireNonNull(effectiveClass, "effectiveClass");
    checks = List.copyOf(checks);
    undeclared = List.copyOf(undeclared);
  }

  /** The claimed symmetries that the built Hamiltonian violates. */
  public List<SymmetryCheckResult> violations() {
    List<SymmetryCheckResult> bad = new ArrayList<>();
    for (SymmetryCheckResult r : checks) {
      if (!r.isSatisfied()) {
        bad.add(r);
      }
    }
    return bad;
  }
}
