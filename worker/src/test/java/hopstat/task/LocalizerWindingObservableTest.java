package hopstat.task;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import hopstat.disorder.DisorderTerm;
import hopstat.invariant.ChiralLocalizerKernel;
import hopstat.invariant.ChiralLocalizerWorkspace;
import hopstat.invariant.SpectralLocalizerKernel;
import hopstat.lattice.Boundary;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.linalg.LinalgFactory;
import hopstat.linalg.LinalgKind;
import hopstat.model.CustomModel;
import hopstat.model.CustomModelDefinition;
import hopstat.model.CustomModelDefinition.Amplitude;
import hopstat.model.CustomModelDefinition.Orbital;
import hopstat.model.CustomModelDefinition.Term;
import hopstat.model.Model;
import hopstat.model.ModelCatalog;
import hopstat.model.ParameterValues;
import hopstat.model.Symmetry;
import hopstat.model.SymmetryClass;
import hopstat.model.SymmetryOperator;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * {@code winding-localizer} (odd spectral localizer, Loring &amp; Schulz-Baldes, arXiv:1701.07455)
 * against the real-space {@code winding} (Mondragon-Shem, Hughes, Song, Prodan, PRL 113, 046802
 * (2014)) on the same open ssh realisations.
 */
class LocalizerWindingObservableTest {

  private static final RealisationWorkspace WORKSPACE =
      new RealisationWorkspace(LinalgFactory.create(LinalgKind.JAVA));

  private static Map<String, Double> run(
      double v,
      double w,
      int size,
      double bondBox,
      Double kappa,
      int realisation,
      String... observables) {
    Map<String, Double> parameters = new LinkedHashMap<>();
    parameters.put("v", v);
    parameters.put("w", w);
    if (kappa != null) {
      parameters.put("kappa", kappa);
    }
    List<DisorderTerm> disorder = new ArrayList<>();
    if (bondBox > 0) {
      disorder.add(new DisorderTerm("bond-box", bondBox, Map.of("bonds", "intracell")));
    }
    PointSpec point =
        new PointSpec(
            "ssh",
            new ParameterValues(parameters),
            size,
            Boundary.OPEN,
            0.0,
            disorder,
            List.of(observables));
    long seed = SeedOps.realisationSeed(7, 0, realisation);
    RealisationResult r =
        RealisationRunner.run(
            new RealisationTask(RealisationTask.idOf(0, realisation), 0, realisation, seed, point),
            WORKSPACE);
    assertThat(r.outcome()).as("outcome (%s)", r.failure()).isEqualTo(Outcome.DONE);
    return r.values();
  }

  /**
   * Clean ssh (Su, Schrieffer, Heeger, PRL 42, 1698 (1979)): Bloch winding of v + w e^{ik} is 1 iff
   * |v| &lt; |w|, else 0, for either sign of w (derived); the localizer index must equal it and the
   * real-space winding (within 1e-3, as in Phys1dObservablesTest) on the same chain.
   */
  @ParameterizedTest(name = "v={0} w={1}")
  @CsvSource({
    "0.0, 1.0",
    "0.5, 1.0",
    "-0.6, 1.0",
    "0.5, -1.0",
    "-0.3, -1.0",
    "1.6, 1.0",
    "3.0, -1.0",
    "-1.5, 1.0",
    "0.7, 0.35"
  })
  void cleanSshEqualsTheBlochWindingAndTheRealSpaceWinding(double v, double w) {
    Map<String, Double> out = run(v, w, 60, 0.0, null, 0, "winding-localizer", "winding");
    double expected = Math.abs(v) < Math.abs(w) ? 1.0 : 0.0;
    assertThat(out.get("winding-localizer")).isEqualTo(expected);
    assertThat(out.get("winding")).isCloseTo(expected, within(1e-3));
    // automatic rule: kappa = ||H||_G / L with the Gershgorin bound |v| + |w| (derived)
    assertThat(out.get("winding-localizer-kappa"))
        .isCloseTo((Math.abs(v) + Math.abs(w)) / 60.0, within(1e-12));
  }

  /**
   * Disordered ssh, intracell v_j = 1 + 1.6 u_j (bond-box, seeds fixed): deep in each phase (w =
   * w_c e^{±0.5}, w_c ≈ 0.871 from the Mondragon-Shem et al. (2014) criterion ⟨ln|w|⟩ = ⟨ln|v|⟩,
   * closed form derived in Phys1dObservablesTest) the localizer index equals the rounded real-space
   * winding realisation by realisation, and the expected phase.
   */
  @ParameterizedTest(name = "shift={0}")
  @CsvSource({"0.5", "-0.5"})
  void disorderedSshEqualsTheRoundedWindingPerRealisation(double shift) {
    double w = 0.871 * Math.exp(shift);
    for (int r = 0; r < 5; r++) {
      Map<String, Double> out = run(1.0, w, 80, 1.6, null, r, "winding-localizer", "winding");
      assertThat(out.get("winding-localizer"))
          .as("realisation %d", r)
          .isEqualTo((double) Math.round(out.get("winding")));
      assertThat(out.get("winding-localizer"))
          .as("realisation %d", r)
          .isEqualTo(shift > 0 ? 1.0 : 0.0);
    }
  }

  /**
   * κ window (Loring &amp; Schulz-Baldes, arXiv:1701.07455: the index is constant on an interval of
   * κ): the automatic κ, κ/2 and 2κ give the same index, clean and disordered, inside each phase.
   */
  @ParameterizedTest(name = "v={0} w={1} W={2}")
  @CsvSource({"0.5, 1.0, 0.0, 1", "1.5, -1.0, 0.0, 0", "1.0, 1.43, 1.6, 1", "1.0, 0.53, 1.6, 0"})
  void indexIsStableWhenKappaIsHalvedAndDoubled(double v, double w, double bondBox, int nu) {
    for (int r = 0; r < 3; r++) {
      Map<String, Double> auto = run(v, w, 60, bondBox, null, r, "winding-localizer");
      double kappa = auto.get("winding-localizer-kappa");
      assertThat(auto.get("winding-localizer")).isEqualTo((double) nu);
      for (double factor : new double[] {0.5, 2.0}) {
        Map<String, Double> out = run(v, w, 60, bondBox, factor * kappa, r, "winding-localizer");
        assertThat(out.get("winding-localizer-kappa")).isEqualTo(factor * kappa);
        assertThat(out.get("winding-localizer"))
            .as("kappa x %s realisation %d", factor, r)
            .isEqualTo((double) nu);
      }
    }
  }

  @Test
  void applicabilityIsExplained() {
    Model ssh = ModelCatalog.find("ssh").orElseThrow();
    Model qwz = ModelCatalog.find("qwz").orElseThrow();
    Observable o = ObservableCatalog.find("winding-localizer").orElseThrow();
    assertThat(o.needsDenseMatrix()).isFalse();
    assertThat(o.needsOccupiedStates()).isFalse();
    assertThat(o.whyNotApplicable(ssh, Boundary.OPEN, SymmetryClass.BDI)).isEmpty();
    assertThat(o.whyNotApplicable(ssh, Boundary.OPEN, SymmetryClass.AIII)).isEmpty();
    assertThat(o.whyNotApplicable(ssh, Boundary.PERIODIC, SymmetryClass.BDI)).isPresent();
    // a scalar onsite potential leaves class AI: no chiral symmetry (Altland-Zirnbauer table)
    assertThat(o.whyNotApplicable(ssh, Boundary.OPEN, SymmetryClass.AI)).isPresent();
    // DIII is chiral but has Z2 in d = 1 (Schnyder, Ryu, Furusaki, Ludwig, PRB 78, 195125 (2008))
    assertThat(o.whyNotApplicable(ssh, Boundary.OPEN, SymmetryClass.DIII)).isPresent();
    assertThat(o.whyNotApplicable(qwz, Boundary.OPEN, SymmetryClass.A)).isPresent();
  }

  @Test
  void needsTheChiralPoint() {
    PointSpec point =
        new PointSpec(
            "ssh",
            new ParameterValues(Map.of("v", 0.5, "w", 1.0)),
            20,
            Boundary.OPEN,
            0.1,
            List.of(),
            List.of("winding-localizer"));
    RealisationResult r =
        RealisationRunner.run(
            new RealisationTask(RealisationTask.idOf(0, 0), 0, 0, 1L, point), WORKSPACE);
    assertThat(r.outcome()).isEqualTo(Outcome.FAILED);
    assertThat(r.failure()).contains("fermiEnergy");
  }

  /**
   * A custom class-AIII chain with complex hoppings v e^{iα} (A_r → B_r) and w e^{iβ} (B_r →
   * A_{r+1}) and the declared chiral operator diag(1, −1): its Bloch winding is that of |v| + |w|
   * e^{i(k+β−α)} up to a gauge phase, 1 iff |v| &lt; |w| (derived). The observable accepts the
   * model and the kernel on its clean Hamiltonian gives that winding.
   */
  @ParameterizedTest(name = "v={0} w={1}")
  @CsvSource({"0.4, 1.0, 1", "-0.7, 0.9, 1", "1.3, 1.0, 0", "0.9, -0.5, 0"})
  void customAiiiChainWithDeclaredChiralOperator(double v, double w, int nu) {
    CustomModel chain =
        new CustomModel(
            new CustomModelDefinition(
                1,
                List.of(List.of(1.0)),
                List.of(new Orbital("A", List.of(0.0)), new Orbital("B", List.of(0.0))),
                List.of(),
                List.of(
                    new Term(List.of(0), 0, 1, new Amplitude("v", 0.6, 0.8)),
                    new Term(List.of(1), 1, 0, new Amplitude("w", 0.28, -0.96))),
                List.of(),
                SymmetryClass.AIII,
                List.of(
                    SymmetryOperator.local(
                        Symmetry.CHIRAL,
                        new double[][] {{1, 0}, {0, -1}},
                        new double[][] {{0, 0}, {0, 0}}))));
    assertThat(chain.isSublatticeChain()).isTrue();
    Observable o = ObservableCatalog.find("winding-localizer").orElseThrow();
    assertThat(o.whyNotApplicable(chain, Boundary.OPEN, SymmetryClass.AIII)).isEmpty();
    Lattice lattice = chain.lattice(40, Boundary.OPEN);
    HamiltonianBuilder h = new HamiltonianBuilder();
    h.reset(lattice.orbitals());
    chain.addClean(new ParameterValues(Map.of("v", v, "w", w)), lattice, h);
    double kappa = (Math.abs(v) + Math.abs(w)) / 40.0;
    int index =
        ChiralLocalizerKernel.index(
            h,
            lattice,
            kappa,
            SpectralLocalizerKernel.centre(lattice, 0),
            new ChiralLocalizerWorkspace(LinalgFactory.create(LinalgKind.JAVA)));
    assertThat(index).isEqualTo(nu);
  }
}
