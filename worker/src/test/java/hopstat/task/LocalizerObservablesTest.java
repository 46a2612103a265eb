package hopstat.task;

import static hopstat.task.Points2d.aPoint;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import hopstat.lattice.Boundary;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The dense-free observables (chern-localizer, localizer-gap, gap-inertia) against the dense
 * estimators on the same realisations (same seed: the onsite-box draws are the same numbers).
 */
class LocalizerObservablesTest {

  private static final long SEED = 20261201L;

  /**
   * Reference: Qi, Wu, Zhang, PRB 74, 085308 (2006): C = +1 for −2 &lt; m &lt; 0, −1 for 0 &lt; m
   * &lt; 2, 0 for |m| &gt; 2. Localizer sign: ½ sig L_κ = −C with centred X, Y (Loring, Ann. Phys.
   * 356, 383 (2015); sign as in /work/shared/REFERENCE.md, numerically checked there at L = 16), so
   * chern-localizer = −½ sig must equal the Bott index (Loring &amp; Hastings, EPL 92, 67004
   * (2010)) of the periodic sample with the same disorder draws, and the Bianco–Resta marker (PRB
   * 84, 241106(R) (2011)) of the same open sample. Both are integers exactly; W ≤ 2 stays well
   * inside the phase (clean gap 2 at |m| = 1).
   */
  @ParameterizedTest(name = "m={0} W={1}")
  @CsvSource({
    "-1.0, 0.0, 1",
    "1.0, 0.0, -1",
    "3.0, 0.0, 0",
    "-1.0, 2.0, 1",
    "1.0, 2.0, -1",
    "3.0, 2.0, 0"
  })
  void localizerAgreesWithBottAndMarkerOnTheSameRealisation(double m, double w, int chern) {
    Points2d open =
        aPoint("qwz")
            .with("m", m)
            .with("t", 1.0)
            .size(12)
            .open()
            .observing("chern-localizer", "chern-marker");
    Points2d periodic =
        aPoint("qwz").with("m", m).with("t", 1.0).size(12).periodic().observing("bott");
    if (w > 0) {
      open.boxDisorder(w, Map.of());
      periodic.boxDisorder(w, Map.of());
    }
    for (long seed = SEED; seed < SEED + 3; seed++) {
      Map<String, Double> o = open.values(seed);
      Map<String, Double> p = periodic.values(seed);
      assertThat(o.get("chern-localizer")).isEqualTo((double) chern);
      assertThat(o.get("chern-localizer")).isCloseTo(p.get("bott"), within(1e-6));
      // marker: finite-size error ≤ 0.03 at L = 14 (ChernEstimatorAgreementTest); 0.1 at L = 12
      // with W = 2
      assertThat(o.get("chern-marker")).isCloseTo(chern, within(0.1));
    }
  }

  /**
   * κ window (Loring &amp; Schulz-Baldes, arXiv:1701.07455, Thm 1: the index is constant on an
   * interval of κ): the automatic κ, κ/2 and 2κ give the same index, clean and disordered, at two
   * sizes, deep in the phase.
   */
  @ParameterizedTest(name = "L={0} m={1} W={2}")
  @CsvSource({
    "10, -1.0, 0.0, 1",
    "10, 1.0, 2.0, -1",
    "20, 1.0, 0.0, -1",
    "20, -1.0, 2.0, 1",
    "20, 3.0, 2.0, 0"
  })
  void indexIsStableWhenKappaIsHalvedAndDoubled(int size, double m, double w, int chern) {
    Points2d auto =
        aPoint("qwz")
            .with("m", m)
            .with("t", 1.0)
            .size(size)
            .open()
            .boxDisorder(w, Map.of())
            .observing("chern-localizer");
    Map<String, Double> a = auto.values(SEED);
    double kappa = a.get("localizer-kappa");
    assertThat(kappa).isGreaterThan(0);
    assertThat(a.get("chern-localizer")).isEqualTo((double) chern);
    for (double factor : new double[] {0.5, 2.0}) {
      Points2d p =
          aPoint("qwz")
              .with("m", m)
              .with("t", 1.0)
              .with("kappa", factor * kappa)
              .size(size)
              .open()
              .boxDisorder(w, Map.of())
              .observing("chern-localizer");
      Map<String, Double> v = p.values(SEED);
      assertThat(v.get("localizer-kappa")).isEqualTo(factor * kappa);
      assertThat(v.get("chern-localizer")).as("kappa x %s", factor).isEqualTo((double) chern);
    }
  }

  /**
   * gap-inertia against the dense gap of the same open realisation: bisection width 1e-5 on each
   * edge (derived), so within 2e-5; states-below-fermi against the count of dense eigenvalues below
   * E_F.
   */
  @ParameterizedTest(name = "m={0} W={1} E={2}")
  @CsvSource({"1.0, 0.0, 0.0", "1.0, 2.0, 0.05", "-1.0, 1.0, 0.4"})
  void inertiaGapMatchesTheDenseGap(double m, double w, double fermi) {
    Points2d p =
        aPoint("qwz")
            .with("m", m)
            .with("t", 1.0)
            .size(8)
            .open()
            .fermiEnergy(fermi)
            .boxDisorder(w, Map.of())
            .observing("gap", "gap-inertia");
    Map<String, Double> v = p.values(SEED);
    assertThat(v.get("gap-inertia")).isCloseTo(v.get("gap"), within(2.1e-5));
    RealisationContextProbe probe = RealisationContextProbe.of(p.build(), SEED);
    assertThat(v.get("states-below-fermi")).isEqualTo((double) probe.countBelow(fermi));
  }

  /**
   * localizer-gap is a lower bound on min |eig L_κ| within 5% of it (its documented accuracy),
   * checked against the dense spectrum of the same localizer (source-free).
   */
  @Test
  void localizerGapBracketsTheSmallestModulus() {
    Points2d p =
        aPoint("qwz")
            .with("m", 1.0)
            .with("t", 1.0)
            .with("kappa", 0.3)
            .size(6)
            .open()
            .boxDisorder(2.0, Map.of())
            .observing("localizer-gap");
    double gap = p.values(SEED).get("localizer-gap");
    double exact = RealisationContextProbe.of(p.build(), SEED).smallestLocalizerModulus(0.3);
    assertThat(gap).isLessThanOrEqualTo(exact);
    assertThat(gap * 1.05).isGreaterThanOrEqualTo(exact);
  }

  @Test
  void localizerObservablesNeedOpenTwoDimensionalSamples() {
    Observable o = ObservableCatalog.find("chern-localizer").orElseThrow();
    var qwz = hopstat.model.ModelCatalog.find("qwz").orElseThrow();
    assertThat(o.whyNotApplicable(qwz, Boundary.OPEN, qwz.symmetryClass())).isEmpty();
    assertThat(o.whyNotApplicable(qwz, Boundary.PERIODIC, qwz.symmetryClass())).isPresent();
    var ssh = hopstat.model.ModelCatalog.find("ssh").orElseThrow();
    assertThat(o.whyNotApplicable(ssh, Boundary.OPEN, ssh.symmetryClass())).isPresent();
  }

  /**
   * RealisationCost: a dense-free L = 200 qwz point (N = 80 000) is sized from the slice blocks
   * (n_slice ≤ 1600, two 16·n² blocks ≈ 80 MB, well below the 100 GB of a dense 16·N² matrix),
   * while adding a dense observable brings back the N² matrix.
   */
  @Test
  void costOfDenseFreeRunsHasNoNSquaredMatrix() {
    var sparse =
        aPoint("qwz")
            .with("m", 1.0)
            .size(200)
            .open()
            .observing("chern-localizer", "gap-inertia")
            .build();
    RealisationCost c = RealisationCost.of(sparse);
    assertThat(c.matrixDimension()).isEqualTo(80_000);
    assertThat(c.heapBytes() + c.nativeBytes()).isLessThan(300L << 20);
    var dense =
        aPoint("qwz").with("m", 1.0).size(200).open().observing("chern-localizer", "gap").build();
    assertThat(RealisationCost.of(dense).heapBytes()).isGreaterThanOrEqualTo(16L * 80_000 * 80_000);
  }
}
