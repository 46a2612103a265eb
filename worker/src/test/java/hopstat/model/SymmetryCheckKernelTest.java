package hopstat.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import hopstat.lattice.Boundary;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import java.util.Map;
import org.ejml.data.ZMatrixRMaj;
import org.junit.jupiter.api.Test;

class SymmetryCheckKernelTest {

  private final SymmetryCheckWorkspace workspace = new SymmetryCheckWorkspace();

  private static ZMatrixRMaj dense(HamiltonianBuilder b) {
    ZMatrixRMaj h = new ZMatrixRMaj(1, 1);
    b.toDense(h);
    return h;
  }

  /**
   * Derived: the bhz Bloch form with the Rashba-like term satisfies i s_y H*(−k) (−i s_y) = H(k).
   */
  @Test
  void bhzWithRashbaHasTimeReversal() {
    BhzModel model = new BhzModel();
    Lattice lattice = model.lattice(5, Boundary.PERIODIC);
    HamiltonianBuilder b = new HamiltonianBuilder();
    b.reset(lattice.orbitals());
    model.addClean(
        new ParameterValues(Map.of("A", 1.0, "B", 1.0, "M", 2.0, "rashba", 0.4)), lattice, b);
    SymmetryOperator t = model.symmetryOperators().on(lattice).get(0);
    SymmetryCheckResult r =
        SymmetryCheckKernel.check(dense(b), lattice, t, SymmetryCheckKernel.TOLERANCE, workspace);
    assertThat(r.symmetry()).isEqualTo(Symmetry.TIME_REVERSAL);
    assertThat(r.relativeViolation()).isLessThan(1e-14);
    assertThat(r.isSatisfied()).isTrue();
  }

  /**
   * Derived: a Zeeman term Z = h s_z is odd under T = i s_y K (U Z* U† = −Z), so for H' = H + Z the
   * residual U H'* U† − H' = −2Z and the relative violation is 2‖Z‖_F / ‖H'‖_F exactly.
   */
  @Test
  void zeemanTermBreaksTimeReversalByTheExpectedAmount() {
    BhzModel model = new BhzModel();
    Lattice lattice = model.lattice(4, Boundary.PERIODIC);
    HamiltonianBuilder b = new HamiltonianBuilder();
    b.reset(lattice.orbitals());
    model.addClean(
        new ParameterValues(Map.of("A", 1.0, "B", 1.0, "M", 2.0, "rashba", 0.0)), lattice, b);
    double h = 0.05;
    for (int s = 0; s < lattice.sites(); s++) {
      for (int o = 0; o < 4; o++) {
        b.addOnsite(4 * s + o, o < 2 ? h : -h);
      }
    }
    ZMatrixRMaj hPrime = dense(b);
    double norm = 0;
    for (double x : hPrime.data) {
      norm += x * x;
    }
    double expected = 2.0 * h * Math.sqrt(lattice.orbitals()) / Math.sqrt(norm);
    SymmetryCheckResult r =
        SymmetryCheckKernel.check(
            hPrime,
            lattice,
            model.symmetryOperators().on(lattice).get(0),
            SymmetryCheckKernel.TOLERANCE,
            workspace);
    assertThat(r.relativeViolation()).isCloseTo(expected, within(1e-12));
    assertThat(r.isSatisfied()).isFalse();
  }

  /**
   * Derived: nearest-neighbour hopping on the bipartite square lattice anticommutes with the
   * staggered S = (−1)^{x+y} (even L on the torus); an onsite potential breaks it.
   */
  @Test
  void staggeredChiralOperatorOnTheSquareLattice() {
    int size = 4;
    Lattice lattice = Lattice.square(size, 1, Boundary.PERIODIC);
    HamiltonianBuilder b = new HamiltonianBuilder();
    b.reset(lattice.orbitals());
    double[] signs = new double[lattice.sites()];
    for (int y = 0; y < size; y++) {
      for (int x = 0; x < size; x++) {
        int s = x + size * y;
        signs[s] = (x + y) % 2 == 0 ? 1 : -1;
        b.addHopping((x + 1) % size + size * y, s, -1.0, 0.0);
        b.addHopping(x + size * ((y + 1) % size), s, -1.0, 0.0);
      }
    }
    SymmetryOperator chiral =
        new SymmetryOperator(Symmetry.CHIRAL, 1, new double[] {1}, new double[] {0}, signs);
    assertThat(chiral.isAntiunitary()).isFalse();
    assertThat(
            SymmetryCheckKernel.check(
                    dense(b), lattice, chiral, SymmetryCheckKernel.TOLERANCE, workspace)
                .relativeViolation())
        .isEqualTo(0.0);
    b.addOnsite(3, 0.5);
    assertThat(
            SymmetryCheckKernel.check(
                    dense(b), lattice, chiral, SymmetryCheckKernel.TOLERANCE, workspace)
                .isSatisfied())
        .isFalse();
  }

  @Test
  void operatorsMustBeUnitaryAndSignsPlusMinusOne() {
    assertThatThrownBy(
            () ->
                SymmetryOperator.local(
                    Symmetry.TIME_REVERSAL, new double[][] {{1, 1}, {0, 1}}, new double[2][2]))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("not unitary");
    assertThatThrownBy(
            () ->
                new SymmetryOperator(
                    Symmetry.CHIRAL, 1, new double[] {1}, new double[] {0}, new double[] {0.5}))
        .isInstanceOf(IllegalArgumentException.class);
  }
}
