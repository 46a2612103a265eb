package hopstat.task;

import static hopstat.task.Points2d.aPoint;
import static org.assertj.core.api.Assertions.assertThat;

import hopstat.model.Symmetry;
import hopstat.model.SymmetryCheckKernel;
import hopstat.model.SymmetryCheckResult;
import hopstat.model.SymmetryClass;
import java.util.Map;
import org.junit.jupiter.api.Test;

class SymmetryCheckOpsTest {

  private static final long SEED = 99L;

  /**
   * Derived: a scalar onsite potential keeps T (real, spin-independent), so bhz stays AII and
   * passes.
   */
  @Test
  void bhzWithOnsiteDisorderKeepsTimeReversal() {
    SymmetryCheckReport r =
        SymmetryCheckOps.check(
            aPoint("bhz")
                .with("A", 1.0)
                .with("B", 1.0)
                .with("M", 2.0)
                .with("rashba", 0.3)
                .size(6)
                .boxDisorder(2.0, Map.of())
                .build(),
            SEED,
            SymmetryCheckKernel.TOLERANCE);
    assertThat(r.effectiveClass()).isEqualTo(SymmetryClass.AII);
    assertThat(r.checks())
        .extracting(SymmetryCheckResult::symmetry)
        .containsExactly(Symmetry.TIME_REVERSAL);
    assertThat(r.violations()).isEmpty();
    assertThat(r.undeclared()).isEmpty();
  }

  /**
   * Derived: onsite-box claims to keep C (it enters BdG models as a chemical-potential shift),
   * which holds for {@code orbitals = same}; with {@code orbitals = independent} the particle and
   * hole orbitals get unrelated potentials, which breaks C = τx K. The audit must catch this.
   */
  @Test
  void pipSquareWithIndependentOrbitalDisorderViolatesParticleHole() {
    SymmetryCheckReport same =
        SymmetryCheckOps.check(
            aPoint("pip-square")
                .with("mu", 1.0)
                .with("t", 1.0)
                .with("delta", 1.0)
                .size(6)
                .boxDisorder(1.0, Map.of("orbitals", "same"))
                .build(),
            SEED,
            SymmetryCheckKernel.TOLERANCE);
    assertThat(same.effectiveClass()).isEqualTo(SymmetryClass.D);
    assertThat(same.violations()).isEmpty();
    SymmetryCheckReport independent =
        SymmetryCheckOps.check(
            aPoint("pip-square")
                .with("mu", 1.0)
                .with("t", 1.0)
                .with("delta", 1.0)
                .size(6)
                .boxDisorder(1.0, Map.of("orbitals", "independent"))
                .build(),
            SEED,
            SymmetryCheckKernel.TOLERANCE);
    assertThat(independent.violations())
        .extracting(SymmetryCheckResult::symmetry)
        .containsExactly(Symmetry.PARTICLE_HOLE);
    assertThat(independent.violations().get(0).relativeViolation()).isGreaterThan(1e-3);
  }

  /** Class A models claim nothing, so nothing is checked or missing. */
  @Test
  void classAModelsHaveNothingToCheck() {
    for (String model : new String[] {"qwz", "haldane", "flux-square"}) {
      SymmetryCheckReport r =
          SymmetryCheckOps.check(
              aPoint(model)
                  .with("m", 1.0)
                  .with("t", 1.0)
                  .with("t1", 1.0)
                  .with("t2", 0.1)
                  .with("phi", 1.0)
                  .with("M", 0.0)
                  .with("p", 1.0)
                  .with("q", 3.0)
                  .size(6)
                  .build(),
              SEED,
              SymmetryCheckKernel.TOLERANCE);
      assertThat(r.effectiveClass()).isEqualTo(SymmetryClass.A);
      assertThat(r.checks()).isEmpty();
      assertThat(r.undeclared()).isEmpty();
    }
  }
}
