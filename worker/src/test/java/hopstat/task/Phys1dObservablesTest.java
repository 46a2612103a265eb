package hopstat.task;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import hopstat.disorder.DisorderCatalog;
import hopstat.disorder.DisorderTerm;
import hopstat.lattice.Boundary;
import hopstat.linalg.LinalgFactory;
import hopstat.linalg.LinalgKind;
import hopstat.model.Model;
import hopstat.model.ModelCatalog;
import hopstat.model.ParameterValues;
import hopstat.model.Symmetry;
import hopstat.model.SymmetryClass;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;

/** The d = 0, 1 observables run through the worker boundary, as a job would run them. */
class Phys1dObservablesTest {

  private static final RealisationWorkspace WORKSPACE =
      new RealisationWorkspace(LinalgFactory.create(LinalgKind.JAVA));

  /** Test-data builder for a realisation task. */
  private static final class TaskBuilder {
    private final String model;
    private final Map<String, Double> parameters = new LinkedHashMap<>();
    private final List<DisorderTerm> disorder = new ArrayList<>();
    private final List<String> observables = new ArrayList<>();
    private int size = 40;
    private Boundary boundary = Boundary.OPEN;
    private double fermiEnergy = 0.0;
    private int realisation = 0;

    TaskBuilder(String model) {
      this.model = model;
      for (var p : ModelCatalog.find(model).orElseThrow().parameters()) {
        if (p.defaultValue() != null) {
          parameters.put(p.name(), p.defaultValue());
        }
      }
    }

    TaskBuilder with(String name, double value) {
      parameters.put(name, value);
      return this;
    }

    TaskBuilder size(int l) {
      size = l;
      return this;
    }

    TaskBuilder periodic() {
      boundary = Boundary.PERIODIC;
      return this;
    }

    TaskBuilder fermiEnergy(double e) {
      fermiEnergy = e;
      return this;
    }

    TaskBuilder disorder(String type, double strength, Map<String, String> options) {
      disorder.add(new DisorderTerm(type, strength, options));
      return this;
    }

    TaskBuilder observe(String name) {
      observables.add(name);
      return this;
    }

    TaskBuilder realisation(int r) {
      realisation = r;
      return this;
    }

    RealisationResult run() {
      PointSpec point =
          new PointSpec(
              model,
              new ParameterValues(parameters),
              size,
              boundary,
              fermiEnergy,
              disorder,
              observables);
      long seed = SeedOps.realisationSeed(2024, 0, realisation);
      return RealisationRunner.run(
          new RealisationTask(RealisationTask.idOf(0, realisation), 0, realisation, seed, point),
          WORKSPACE);
    }
  }

  private static TaskBuilder aTask(String model) {
    return new TaskBuilder(model);
  }

  private static double value(RealisationResult r, String quantity) {
    assertThat(r.outcome()).as("outcome (%s)", r.failure()).isEqualTo(Outcome.DONE);
    return r.values().get(quantity);
  }

  @Test
  void cleanSshWindingIsOneIffIntracellBelowIntercell() {
    // Bloch winding of v + w e^{ik} (derived; Su, Schrieffer, Heeger 1979 model; real-space form
    // Mondragon-Shem et al., PRL 113, 046802 (2014)): 1 iff |v| < |w|, else 0, either sign of w.
    // Localisation length ≤ 1/ln(1/0.6) ≈ 2 cells against 15 cells from window to edge: error ≪
    // 1e-3.
    for (double w : new double[] {1.0, -1.0}) {
      for (double v : new double[] {0.0, 0.5, -0.6, 1.6, 3.0}) {
        double nu =
            value(
                aTask("ssh").with("v", v).with("w", w).size(60).observe("winding").run(),
                "winding");
        assertThat(nu)
            .as("v=%s w=%s", v, w)
            .isCloseTo(Math.abs(v) < Math.abs(w) ? 1.0 : 0.0, within(1e-3));
      }
    }
  }

  @Test
  void disorderedSshWindingChangesWhereMeanLogsMeet() {
    // Mondragon-Shem, Hughes, Song, Prodan, PRL 113, 046802 (2014) (cited, criterion from memory):
    // |ν| = 1 iff ⟨ln|w|⟩ > ⟨ln|v|⟩. Intracell v_j = 1 + 1.6 u_j; REFERENCE closed form (derived):
    // ⟨ln|1 + 1.6u|⟩ = (1.8 ln 1.8 − 0.2 ln 0.2)/1.6 − 1 ≈ −0.1376, so w_c = e^{−0.1376} ≈ 0.871.
    // Realisations well inside each phase (w = w_c e^{±0.5}); tolerance 0.1 covers the window
    // average of the local marker (measured spread ≈ 0.01 at L = 100).
    double meanLog = (1.8 * Math.log(1.8) - 0.2 * Math.log(0.2)) / 1.6 - 1;
    double critical = Math.exp(meanLog);
    for (double shift : new double[] {0.5, -0.5}) {
      double w = critical * Math.exp(shift);
      for (int r = 0; r < 4; r++) {
        double nu =
            value(
                aTask("ssh")
                    .with("v", 1.0)
                    .with("w", w)
                    .size(80)
                    .disorder("bond-box", 1.6, Map.of("bonds", "intracell"))
                    .observe("winding")
                    .realisation(r)
                    .run(),
                "winding");
        assertThat(nu)
            .as("w=%s realisation %d", w, r)
            .isCloseTo(shift > 0 ? 1.0 : 0.0, within(0.1));
      }
    }
  }

  @Test
  void windingNeedsTheChiralPoint() {
    RealisationResult r = aTask("ssh").with("v", 0.5).fermiEnergy(0.1).observe("winding").run();
    assertThat(r.outcome()).isEqualTo(Outcome.FAILED);
    assertThat(r.failure()).contains("fermiEnergy");
  }

  @Test
  void z2AndParityRunThroughTheWorker() {
    // Kitaev (2001): clean wire topological iff |μ| < 2|t|; Pfeuty (1970): ordered iff |h| < |J|.
    assertThat(
            value(
                aTask("pwave-wire")
                    .with("mu", 1.0)
                    .with("delta", 0.4)
                    .periodic()
                    .size(20)
                    .observe("z2")
                    .observe("gap")
                    .run(),
                "z2"))
        .isEqualTo(1.0);
    assertThat(
            value(
                aTask("pwave-wire").with("mu", 3.0).periodic().size(20).observe("z2").run(), "z2"))
        .isEqualTo(0.0);
    assertThat(
            value(
                aTask("ising-chain").with("h", 0.5).periodic().size(20).observe("z2").run(), "z2"))
        .isEqualTo(1.0);
    assertThat(
            value(
                aTask("ising-chain").with("h", 1.5).periodic().size(20).observe("z2").run(), "z2"))
        .isEqualTo(0.0);
    // Derived: mu ≫ W fills every mode, parity = L mod 2.
    assertThat(
            value(
                aTask("majorana-cluster")
                    .with("mu", 4.0)
                    .size(7)
                    .disorder("majorana-gauss", 0.1, Map.of())
                    .observe("parity")
                    .run(),
                "parity"))
        .isEqualTo(1.0);
  }

  @Test
  void z2FailsWhenAPfaffianVanishes() {
    // Derived: at μ = −2t the periodic ring has a zero mode at k = 0, so Pf(A_periodic) = 0.
    RealisationResult r =
        aTask("pwave-wire")
            .with("mu", -2.0)
            .with("delta", 0.5)
            .periodic()
            .size(10)
            .observe("z2")
            .run();
    assertThat(r.outcome()).isEqualTo(Outcome.FAILED);
  }

  private static SymmetryClass effectiveClass(Model model, String... disorder) {
    boolean t = true;
    boolean c = true;
    boolean s = true;
    for (String d : disorder) {
      Set<Symmetry> kept = DisorderCatalog.find(d).orElseThrow().keptSymmetries(model);
      t &= kept.contains(Symmetry.TIME_REVERSAL);
      c &= kept.contains(Symmetry.PARTICLE_HOLE);
      s &= kept.contains(Symmetry.CHIRAL);
    }
    return model.symmetryClass().restrictTo(t, c, s);
  }

  @Test
  void applicabilityIsExplained() {
    Model ssh = ModelCatalog.find("ssh").orElseThrow();
    Model wire = ModelCatalog.find("pwave-wire").orElseThrow();
    Model cluster = ModelCatalog.find("majorana-cluster").orElseThrow();
    Observable winding = ObservableCatalog.find("winding").orElseThrow();
    Observable z2 = ObservableCatalog.find("z2").orElseThrow();
    Observable parity = ObservableCatalog.find("parity").orElseThrow();

    assertThat(winding.whyNotApplicable(ssh, Boundary.OPEN, effectiveClass(ssh, "bond-box")))
        .isEmpty();
    assertThat(effectiveClass(ssh, "bond-box")).isEqualTo(SymmetryClass.BDI);
    assertThat(winding.whyNotApplicable(ssh, Boundary.PERIODIC, SymmetryClass.BDI)).isPresent();
    // A scalar onsite potential breaks the sublattice symmetry: BDI -> AI, no winding.
    assertThat(effectiveClass(ssh, "onsite-box")).isEqualTo(SymmetryClass.AI);
    assertThat(winding.whyNotApplicable(ssh, Boundary.OPEN, effectiveClass(ssh, "onsite-box")))
        .isPresent();
    assertThat(winding.whyNotApplicable(wire, Boundary.OPEN, SymmetryClass.BDI)).isPresent();

    assertThat(
            z2.whyNotApplicable(
                wire, Boundary.PERIODIC, effectiveClass(wire, "onsite-box", "pairing-box")))
        .isEmpty();
    assertThat(z2.whyNotApplicable(wire, Boundary.OPEN, SymmetryClass.BDI)).isPresent();
    assertThat(z2.whyNotApplicable(ssh, Boundary.PERIODIC, SymmetryClass.BDI)).isPresent();
    assertThat(z2.whyNotApplicable(cluster, Boundary.PERIODIC, SymmetryClass.D)).isPresent();

    assertThat(
            parity.whyNotApplicable(
                cluster, Boundary.OPEN, effectiveClass(cluster, "majorana-gauss")))
        .isEmpty();
    assertThat(effectiveClass(cluster, "majorana-gauss")).isEqualTo(SymmetryClass.D);
    assertThat(parity.whyNotApplicable(wire, Boundary.OPEN, SymmetryClass.BDI)).isPresent();

    assertThat(DisorderCatalog.find("field-box").orElseThrow().whyNotApplicable(wire)).isPresent();
    assertThat(DisorderCatalog.find("pairing-box").orElseThrow().whyNotApplicable(wire)).isEmpty();
    assertThat(DisorderCatalog.find("bond-box").orElseThrow().whyNotApplicable(ssh)).isEmpty();
    assertThat(DisorderCatalog.find("majorana-gauss").orElseThrow().whyNotApplicable(wire))
        .isPresent();
  }

  @Test
  void quantityNamesAreGloballyUnique() {
    Set<String> seen = new HashSet<>();
    for (Observable o : ObservableCatalog.all()) {
      for (Quantity q : o.quantities()) {
        assertThat(seen.add(q.name())).as("duplicate quantity %s", q.name()).isTrue();
      }
    }
    assertThat(ObservableCatalog.quantity("z2").orElseThrow().integerValued()).isTrue();
    assertThat(ObservableCatalog.quantity("winding").orElseThrow().integerValued()).isTrue();
    assertThat(ObservableCatalog.quantity("parity").orElseThrow().integerValued()).isTrue();
  }
}
