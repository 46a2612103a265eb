package hopstat.task;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.data.Offset.offset;

import hopstat.disorder.DisorderTerm;
import hopstat.lattice.Boundary;
import hopstat.linalg.LinalgFactory;
import hopstat.localisation.EvanescentRoots;
import hopstat.model.DiiiWireBloch;
import hopstat.model.Model;
import hopstat.model.ModelCatalog;
import hopstat.model.ParameterValues;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * The {@code lyapunov} observable on the models without a hand-written slice form, through the
 * runner.
 */
class LyapunovAllModelsTest {

  private final RealisationWorkspace workspace =
      new RealisationWorkspace(LinalgFactory.preferred());

  private static RealisationTask task(
      String model,
      int l,
      Boundary boundary,
      Map<String, Double> parameters,
      List<DisorderTerm> disorder,
      long seed) {
    PointSpec point =
        new PointSpec(
            model,
            new ParameterValues(new HashMap<>(parameters)),
            l,
            boundary,
            0.0,
            disorder,
            List.of("lyapunov"));
    return new RealisationTask(RealisationTask.idOf(0, 0), 0, 0, seed, point);
  }

  /** ⟨ln|a + W u|⟩ for u uniform in [−1/2, 1/2] (derived, REFERENCE.md identity). */
  private static double meanLog(double a, double w) {
    double p = a + w / 2;
    double m = a - w / 2;
    return (xLogX(p) - xLogX(m)) / w - 1;
  }

  /** x ln|x|, continued by 0 at x = 0. */
  private static double xLogX(double x) {
    return x == 0 ? 0.0 : x * Math.log(Math.abs(x));
  }

  /**
   * Clean QWZ strip, periodic across (M = 4), E = 0.2 inside the bulk gap (m = −1.5): transverse
   * momenta k = 2πj/M decouple; with z = e^{i k_y}, E² = t²[sin²k + 1 + a² + a(z + 1/z)], a = m +
   * cos k (derived from the Bloch form of Qi, Wu, Zhang, PRB 74, 085308 (2006)), so each channel
   * decays at arccosh|c|, 2c = (E²/t² − sin²k − 1 − a²)/a, and γ is the smallest of them. A
   * deterministic clean run: agreement to 1e-6.
   */
  @Test
  void cleanQwzStripDecaysAtTheSlowestEvanescentChannel() {
    double m = -1.5;
    double e = 0.2;
    int width = 4;
    double expected = Double.POSITIVE_INFINITY;
    for (int j = 0; j < width; j++) {
      double k = 2 * Math.PI * j / width;
      double a = m + Math.cos(k);
      double c = (e * e - Math.sin(k) * Math.sin(k) - 1 - a * a) / (2 * a);
      expected = Math.min(expected, Math.log(Math.abs(c) + Math.sqrt(c * c - 1)));
    }
    RealisationResult r =
        RealisationRunner.run(
            task(
                "qwz",
                width,
                Boundary.PERIODIC,
                Map.of("m", m, "t", 1.0, "energy", e, "lyapunovError", 1e-9),
                List.of(),
                1),
            workspace);
    assertThat(r.outcome()).as(String.valueOf(r.failure())).isEqualTo(Outcome.DONE);
    assertThat(r.values().get("lyapunov")).isCloseTo(expected, offset(1e-6));
    assertThat(r.values().get("lambda"))
        .isCloseTo(1 / (width * r.values().get("lyapunov")), offset(1e-12));
  }

  /**
   * Kitaev wire, Δ = t, E = 0, onsite-box disorder (a chemical-potential shift): γ = |⟨ln|μ_j|⟩ −
   * ln|2t|| (Motrunich, Damle, Huse, PRB 63, 224204 (2001); derived Majorana recursion), μ_j = 1 +
   * W u, W = 2. One long realisation samples ⟨ln|μ|⟩; its error estimate covers that fluctuation.
   * Tolerance 4 × the stated error.
   */
  @Test
  void disorderedKitaevWireFollowsTheMajoranaCriterion() {
    RealisationResult r =
        RealisationRunner.run(
            task(
                "pwave-wire",
                8,
                Boundary.OPEN,
                Map.of("mu", 1.0, "t", 1.0, "delta", 1.0, "energy", 0.0, "lyapunovError", 0.005),
                List.of(new DisorderTerm("onsite-box", 2.0, Map.of())),
                9),
            workspace);
    assertThat(r.outcome()).as(String.valueOf(r.failure())).isEqualTo(Outcome.DONE);
    double expected = Math.abs(meanLog(1.0, 2.0) - Math.log(2.0));
    double gamma = r.values().get("lyapunov");
    assertThat(gamma).isCloseTo(expected, offset(4 * r.values().get("lyapunov-error") * gamma));
  }

  /**
   * SSH chain, E = 0, bond-box disorder on both bonds (random v_j and w_j, drawn slice by slice,
   * the intercell ones through T_n): γ = |⟨ln|w|⟩ − ⟨ln|v|⟩| (Mondragon-Shem, Hughes, Song, Prodan,
   * PRL 113, 046802 (2014) — formula from memory, REFERENCE.md). v = 0.6, w = 1, W = 0.8. Tolerance
   * 4 × the stated error. Same seed → same numbers, bit for bit.
   */
  @Test
  void disorderedSshChainFollowsTheBondLogarithms() {
    RealisationTask t =
        task(
            "ssh",
            8,
            Boundary.OPEN,
            Map.of("v", 0.6, "w", 1.0, "energy", 0.0, "lyapunovError", 0.005),
            List.of(new DisorderTerm("bond-box", 0.8, Map.of())),
            4);
    RealisationResult r = RealisationRunner.run(t, workspace);
    assertThat(r.outcome()).as(String.valueOf(r.failure())).isEqualTo(Outcome.DONE);
    double expected = Math.abs(meanLog(1.0, 0.8) - meanLog(0.6, 0.8));
    double gamma = r.values().get("lyapunov");
    assertThat(gamma).isCloseTo(expected, offset(4 * r.values().get("lyapunov-error") * gamma));
    assertThat(RealisationRunner.run(t, workspace).values()).isEqualTo(r.values());
  }

  /**
   * diii-wire (class DIII, Kramers pairs of Majorana end modes) at E = 0 with spin–orbit coupling λ
   * = 0.3 in its topological phase (μ = 0.5), onsite-box disorder, through the runner (this point
   * used to fail every realisation). W = 1: converges to the 1 % target. W = 0.05: within 2 % of
   * the clean slowest evanescent decay from the Bloch roots (derived, {@link EvanescentRoots}; weak
   * disorder shifts γ by O(W²), and the 2 % also covers 4 × the stated error).
   */
  @Test
  void disorderedDiiiWireWithSpinOrbitConvergesAtZeroEnergy() {
    Map<String, Double> p =
        Map.of(
            "mu", 0.5, "t", 1.0, "delta", 1.0, "lambda", 0.3, "energy", 0.0, "lyapunovError", 0.01);
    RealisationResult strong =
        RealisationRunner.run(
            task(
                "diii-wire",
                2,
                Boundary.PERIODIC,
                p,
                List.of(new DisorderTerm("onsite-box", 1.0, Map.of())),
                3),
            workspace);
    assertThat(strong.outcome()).as(String.valueOf(strong.failure())).isEqualTo(Outcome.DONE);
    assertThat(strong.values().get("lyapunov")).isPositive();
    assertThat(strong.values().get("lyapunov-error")).isLessThanOrEqualTo(0.01);
    RealisationResult weak =
        RealisationRunner.run(
            task(
                "diii-wire",
                2,
                Boundary.PERIODIC,
                p,
                List.of(new DisorderTerm("onsite-box", 0.05, Map.of())),
                3),
            workspace);
    assertThat(weak.outcome()).as(String.valueOf(weak.failure())).isEqualTo(Outcome.DONE);
    double clean =
        EvanescentRoots.slowestDecay(
            4, (z, h) -> DiiiWireBloch.continued(z, 0.5, 1.0, 1.0, 0.3, h));
    assertThat(weak.values().get("lyapunov")).isCloseTo(clean, offset(0.02 * clean));
  }

  /**
   * Disordered QWZ (class A, complex slices) and pip-square (BdG) strips are reproducible bit for
   * bit from the seed, also with a fresh workspace; a different seed gives a different number.
   */
  @Test
  void disorderedComplexAndBdgStripsAreReproducible() {
    for (String model : List.of("qwz", "pip-square")) {
      Map<String, Double> p =
          model.equals("qwz")
              ? Map.of("m", -1.0, "t", 1.0, "energy", 0.3, "lyapunovError", 0.05)
              : Map.of("mu", 1.0, "t", 1.0, "delta", 1.0, "energy", 0.3, "lyapunovError", 0.05);
      List<DisorderTerm> disorder = List.of(new DisorderTerm("onsite-box", 3.0, Map.of()));
      RealisationResult a =
          RealisationRunner.run(task(model, 4, Boundary.PERIODIC, p, disorder, 21), workspace);
      RealisationResult b =
          RealisationRunner.run(
              task(model, 4, Boundary.PERIODIC, p, disorder, 21),
              new RealisationWorkspace(LinalgFactory.preferred()));
      RealisationResult c =
          RealisationRunner.run(task(model, 4, Boundary.PERIODIC, p, disorder, 22), workspace);
      assertThat(a.outcome()).as(model + " " + a.failure()).isEqualTo(Outcome.DONE);
      assertThat(b.values()).isEqualTo(a.values());
      assertThat(c.values().get("lyapunov")).isNotEqualTo(a.values().get("lyapunov"));
      assertThat(a.values().get("lyapunov")).isPositive();
    }
  }

  /**
   * The {@code models} listing asks whyNotApplicable: every built-in model of d ≥ 1 takes lyapunov,
   * the d = 0 cluster does not; a disorder kind without a slice-wise form is named in the reason.
   */
  @Test
  void applicabilityIsTruthful() {
    Observable o = ObservableCatalog.find("lyapunov").orElseThrow();
    for (Model m : ModelCatalog.all()) {
      assertThat(o.whyNotApplicable(m, Boundary.PERIODIC, m.symmetryClass()).isEmpty())
          .as(m.name())
          .isEqualTo(m.dimension() > 0);
    }
    Model wire = ModelCatalog.find("pwave-wire").orElseThrow();
    assertThat(
            o.whyNotApplicable(
                wire, Boundary.OPEN, wire.symmetryClass(), List.of("onsite-box", "pairing-box")))
        .isEmpty();
    assertThat(
            o.whyNotApplicable(
                wire, Boundary.OPEN, wire.symmetryClass(), List.of("majorana-gauss")))
        .get()
        .asString()
        .contains("majorana-gauss");
  }
}
