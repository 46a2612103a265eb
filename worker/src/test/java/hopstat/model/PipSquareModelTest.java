package hopstat.model;

import static hopstat.task.Points2d.aPoint;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import hopstat.lattice.Boundary;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import java.util.Map;
import org.ejml.data.ZMatrixRMaj;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class PipSquareModelTest {

  /**
   * Derived (see {@link PipSquareModel}): H(k) is the qwz Bloch form mirrored in d_z with m = μ/2t,
   * so C = −C_qwz(μ/2t): +1 for 0 &lt; μ &lt; 4t, −1 for −4t &lt; μ &lt; 0, 0 for |μ| &gt; 4t (qwz
   * signs: Qi, Wu, Zhang, PRB 74, 085308 (2006); consistent with the weak-pairing phase of Read
   * &amp; Green, PRB 61, 10267 (2000), where |C| = 1 for a Fermi sea of positive μ measured from
   * the band bottom). Points at least 1 away from the transitions μ = 0, ±4t, where the gap is
   * asserted ≥ 0.5, so the Bott index is an integer to round-off. Also μ = 5 with Δ = 0.5 and t =
   * 1: still trivial.
   */
  @ParameterizedTest
  @CsvSource({
    "2.0, 1.0, 1",
    "1.0, 1.0, 1",
    "3.0, 0.5, 1",
    "-2.0, 1.0, -1",
    "-3.0, 0.5, -1",
    "5.0, 1.0, 0",
    "-5.0, 0.5, 0"
  })
  void cleanChernNumberAsAFunctionOfMu(double mu, double delta, int expected) {
    Map<String, Double> v =
        aPoint("pip-square")
            .with("mu", mu)
            .with("t", 1.0)
            .with("delta", delta)
            .size(12)
            .observing("bott", "gap")
            .values(1L);
    assertThat(v.get("gap")).isGreaterThan(0.5);
    assertThat(v.get("bott")).isCloseTo(expected, within(1e-6));
  }

  /**
   * Derived: with C = τx K anticommuting with H, the BdG spectrum is symmetric, E ↔ −E; a uniform
   * potential V enters as μ → μ − V (+V on particles, −V on holes), so it must reproduce the matrix
   * of the shifted chemical potential exactly.
   */
  @Test
  void uniformPotentialIsAChemicalPotentialShift() {
    PipSquareModel model = new PipSquareModel();
    Lattice lattice = model.lattice(4, Boundary.PERIODIC);
    HamiltonianBuilder a = new HamiltonianBuilder();
    a.reset(lattice.orbitals());
    model.addClean(new ParameterValues(Map.of("mu", 1.0, "t", 1.0, "delta", 0.7)), lattice, a);
    for (int s = 0; s < lattice.sites(); s++) {
      model.addOnsitePotential(lattice, s, 0.25, a);
    }
    HamiltonianBuilder b = new HamiltonianBuilder();
    b.reset(lattice.orbitals());
    model.addClean(new ParameterValues(Map.of("mu", 0.75, "t", 1.0, "delta", 0.7)), lattice, b);
    ZMatrixRMaj ha = new ZMatrixRMaj(1, 1);
    ZMatrixRMaj hb = new ZMatrixRMaj(1, 1);
    a.toDense(ha);
    b.toDense(hb);
    for (int k = 0; k < ha.data.length; k++) {
      assertThat(ha.data[k]).isCloseTo(hb.data[k], within(1e-14));
    }
  }
}
