package hopstat.model;

import java.util.Objects;

/**
 * The numerical check of one symmetry on one built Hamiltonian.
 *
 * @param symmetry the symmetry checked
 * @param relativeViolation ‖U H^(*) U† − σH‖_F / ‖H‖_F (σ = +1 for T, −1 for C and S; 0 when H = 0)
 * @param tolerance the threshold it was compared with
 */
public record SymmetryCheckResult(Symmetry symmetry, double relativeViolation, double tolerance) {
  public SymmetryCheckResult {
    Objects.requireNonNull(symmetry, "symmetry");
  }

  /** True if the violation is within the tolerance. */
  public boolean isSatisfied() {
    return relativeViolation <= tolerance;
  }
}
