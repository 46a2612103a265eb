package hopstat.task;

import hopstat.model.SymmetryClass;
import java.util.Optional;

/** Periodic-table checks shared by the observables. */
final class TenfoldOps {

  private TenfoldOps() {}

  /**
   * Why a Chern-number estimator does not apply: the effective class must have an integer strong
   * invariant in d = 2 (Z or 2Z: classes A, D, C; Kitaev 2009; Schnyder et al. 2008).
   */
  static Optional<String> whyNoChernNumber(String estimator, SymmetryClass effectiveClass) {
    String group = effectiveClass.invariantGroup(2);
    if (group.equals("Z") || group.equals("2Z")) {
      return Optional.empty();
    }
    return Optional.of(
        estimator
            + " measures a Chern number, but class "
            + effectiveClass
            + " in d = 2 has strong invariant group "
            + group
            + " (periodic table: Chern numbers in classes A, D, C)"
            + (group.equals("Z2") ? "; use z2" : ""));
  }
}
