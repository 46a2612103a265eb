package hopstat.model;

import static hopstat.task.Points2d.aPoint;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import hopstat.task.Outcome;
import hopstat.task.RealisationResult;
import java.util.Map;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class BhzModelTest {

  private static final int L = 8;

  /**
   * Reference: Bernevig, Hughes, Zhang, Science 314, 1757 (2006); with the lattice form of
   * REFERENCE.md each spin block is qwz with m = M/(2B) − 2 (mapping derived), so Z2 is odd for 0
   * &lt; M/B &lt; 8, M/B ≠ 4, and the spin-up Chern number is +1 for 0 &lt; M/B &lt; 4, −1 for 4
   * &lt; M/B &lt; 8 (qwz sign convention, Qi, Wu, Zhang, PRB 74, 085308 (2006)). At rashba = 0
   * spin-chern (C_↑ − C_↓)/2 and the z2 observable (spin-resolved Bott index, Prodan, PRB 80,
   * 125327 (2009)) must agree; T symmetry forces the total Chern number (bott) to 0 (derived).
   * Points ≥ 1 away from M/B = 0, 4, 8; the gap is asserted ≥ 0.5 at L = 8, so the indices are
   * integers to 1e−6.
   */
  @ParameterizedTest
  @CsvSource({"-1.0, 0, 0", "1.0, 1, 1", "2.0, 1, 1", "6.0, 1, -1", "9.0, 0, 0"})
  void z2AndSpinChernWithoutRashba(double mass, int z2, int spinChern) {
    Map<String, Double> v =
        aPoint("bhz")
            .with("A", 1.0)
            .with("B", 1.0)
            .with("M", mass)
            .with("rashba", 0.0)
            .size(L)
            .observing("spin-chern", "z2", "spin-bott", "bott", "gap")
            .values(3L);
    assertThat(v.get("gap")).isGreaterThan(0.5);
    assertThat(v.get("chern-up")).isCloseTo(spinChern, within(1e-6));
    assertThat(v.get("chern-down")).isCloseTo(-spinChern, within(1e-6));
    assertThat(v.get("spin-chern")).isCloseTo(spinChern, within(1e-6));
    assertThat(v.get("spin-bott")).isCloseTo(spinChern, within(1e-6));
    assertThat(v.get("z2")).isEqualTo(z2);
    // S_z conserved: P S_z P has eigenvalues exactly ±1 (derived)
    assertThat(v.get("spin-bott-gap")).isCloseTo(1.0, within(1e-9));
    assertThat(v.get("bott")).isCloseTo(0.0, within(1e-6));
  }

  /**
   * The T-preserving Rashba-like term R (s_x sin ky − s_y sin kx) mixes spins but cannot change Z2
   * while the bulk gap stays open (Kane &amp; Mele, PRL 95, 146802 (2005): Z2 is robust to
   * T-invariant perturbations). R = 0.3, 0.6 keep the gap open at these M (asserted ≥ 0.5); the
   * spin-resolved Bott index stays defined while min |eig P S_z P| is away from 0 (Prodan 2009),
   * asserted ≥ 0.5. Weak onsite disorder W = 1 (T-invariant) must not change Z2 either.
   */
  @ParameterizedTest
  @CsvSource({
    "-1.0, 0.3, 0.0, 0",
    "2.0, 0.3, 0.0, 1",
    "6.0, 0.6, 0.0, 1",
    "9.0, 0.6, 0.0, 0",
    "2.0, 0.3, 1.0, 1",
    "9.0, 0.3, 1.0, 0"
  })
  void z2WithRashbaAndWeakDisorder(double mass, double rashba, double w, int z2) {
    var point =
        aPoint("bhz")
            .with("A", 1.0)
            .with("B", 1.0)
            .with("M", mass)
            .with("rashba", rashba)
            .size(L)
            .observing("z2", "spin-bott", "gap");
    if (w > 0) {
      point.boxDisorder(w, Map.of());
    }
    Map<String, Double> v = point.values(5L);
    assertThat(v.get("gap")).isGreaterThan(0.5);
    assertThat(v.get("z2")).isEqualTo(z2);
    assertThat(Math.abs(v.get("spin-bott"))).isCloseTo(z2, within(1e-3));
    assertThat(v.get("spin-bott-gap")).isGreaterThan(0.5).isLessThan(1.0);
  }

  /**
   * spin-chern needs S_z conservation: with rashba ≠ 0 the realisation must fail with a reason
   * (derived: R mixes spins).
   */
  @ParameterizedTest
  @CsvSource({"2.0, 0.3"})
  void spinChernRefusesSpinMixingHamiltonians(double mass, double rashba) {
    RealisationResult r =
        aPoint("bhz")
            .with("A", 1.0)
            .with("B", 1.0)
            .with("M", mass)
            .with("rashba", rashba)
            .size(6)
            .observing("spin-chern")
            .run(1L);
    assertThat(r.outcome()).isEqualTo(Outcome.FAILED);
    assertThat(r.failure()).contains("does not conserve S_z");
  }
}
