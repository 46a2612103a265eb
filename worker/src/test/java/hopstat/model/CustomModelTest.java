package hopstat.model;

import static org.assertj.core.api.Assertions.assertThat;

import hopstat.lattice.Boundary;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.linalg.LinalgFactory;
import hopstat.linalg.LinalgKind;
import hopstat.model.CustomModelDefinition.Amplitude;
import hopstat.model.CustomModelDefinition.Onsite;
import hopstat.model.CustomModelDefinition.Orbital;
import hopstat.model.CustomModelDefinition.Term;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.assertj.core.data.Offset;
import org.ejml.data.ZMatrixRMaj;
import org.junit.jupiter.api.Test;

class CustomModelTest {

  /**
   * Kitaev chain H = Σ_j [−μ c†c − t(c†_{j+1} c_j + h.c.) + Δ(c†_{j+1} c†_j + h.c.)] in Nambu form,
   * class D.
   */
  private static CustomModel kitaev() {
    Amplitude mu = new Amplitude("mu", -1.0, 0.0);
    return new CustomModel(
        new CustomModelDefinition(
            1,
            List.of(List.of(1.0)),
            List.of(new Orbital("c", List.of(0.0))),
            List.of(new Onsite(0, mu)),
            List.of(new Term(List.of(1), 0, 0, new Amplitude("t", -1.0, 0.0))),
            List.of(new Term(List.of(1), 0, 0, new Amplitude("delta", 1.0, 0.0))),
            SymmetryClass.D,
            List.of()));
  }

  /**
   * Clean periodic Kitaev chain: E(k) = ±sqrt((2t cos k + μ)² + 4Δ² sin² k), k = 2πn/L (Kitaev,
   * Phys.-Usp. 44, 131 (2001); formula from memory, re-derived for this convention: ξ_k = −μ − 2t
   * cos k, D_k = −2iΔ sin k). Tolerance 1e-12: dense eigenvalues of a 16 × 16 matrix of O(1)
   * entries.
   */
  @Test
  void nambuChainHasTheKitaevSpectrum() {
    double mu = 0.7;
    double t = 1.0;
    double delta = 0.4;
    int size = 8;
    CustomModel model = kitaev();
    Lattice lattice = model.lattice(size, Boundary.PERIODIC);
    HamiltonianBuilder b = new HamiltonianBuilder();
    b.reset(lattice.orbitals());
    model.addClean(new ParameterValues(Map.of("mu", mu, "t", t, "delta", delta)), lattice, b);
    ZMatrixRMaj h = new ZMatrixRMaj(lattice.orbitals(), lattice.orbitals());
    b.toDense(h);
    double[] values = new double[lattice.orbitals()];
    assertThat(
            LinalgFactory.create(LinalgKind.JAVA).newHermitianEigenSolver().eigenvalues(h, values))
        .isTrue();
    double[] expected = new double[2 * size];
    for (int n = 0; n < size; n++) {
      double k = 2 * Math.PI * n / size;
      double e =
          Math.sqrt(
              Math.pow(2 * t * Math.cos(k) + mu, 2)
                  + 4 * delta * delta * Math.sin(k) * Math.sin(k));
      expected[2 * n] = e;
      expected[2 * n + 1] = -e;
    }
    Arrays.sort(expected);
    for (int i = 0; i < values.length; i++) {
      assertThat(values[i]).isCloseTo(expected[i], Offset.offset(1e-12));
    }
    // Source-free: the supplied C = tau_x K holds on the built matrix (U H* U^dagger = -H).
    List<SymmetryOperator> ops = model.symmetryOperators().on(lattice);
    assertThat(ops).hasSize(1);
    SymmetryCheckResult c =
        SymmetryCheckKernel.check(
            h, lattice, ops.get(0), SymmetryCheckKernel.TOLERANCE, new SymmetryCheckWorkspace());
    assertThat(c.isSatisfied()).isTrue();
  }

  /**
   * Derived: an onsite potential in Nambu form is +V on the particle and −V on the hole, so C
   * survives.
   */
  @Test
  void onsitePotentialEntersAsAChemicalPotentialShift() {
    CustomModel model = kitaev();
    Lattice lattice = model.lattice(3, Boundary.OPEN);
    HamiltonianBuilder b = new HamiltonianBuilder();
    b.reset(lattice.orbitals());
    model.addOnsitePotential(lattice, 1, 0.25, b);
    ZMatrixRMaj h = new ZMatrixRMaj(6, 6);
    b.toDense(h);
    assertThat(h.getReal(2, 2)).isEqualTo(0.25);
    assertThat(h.getReal(3, 3)).isEqualTo(-0.25);
    assertThat(h.getReal(0, 0)).isEqualTo(0.0);
  }

  @Test
  void definitionRejectsAnOperatorOfTheWrongSize() {
    SymmetryOperator s =
        SymmetryOperator.local(Symmetry.CHIRAL, new double[][] {{1}}, new double[][] {{0}});
    org.assertj.core.api.Assertions.assertThatThrownBy(
            () ->
                new CustomModelDefinition(
                    1,
                    List.of(List.of(1.0)),
                    List.of(new Orbital("a", List.of(0.0)), new Orbital("b", List.of(0.5))),
                    List.of(),
                    List.of(),
                    List.of(),
                    SymmetryClass.AIII,
                    List.of(s)))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("2 orbitals per cell");
  }
}
