package hopstat.task;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.data.Offset.offset;

import hopstat.disorder.DisorderTerm;
import hopstat.lattice.Boundary;
import hopstat.lattice.Lattice;
import hopstat.linalg.LinalgFactory;
import hopstat.model.Model;
import hopstat.model.ModelCatalog;
import hopstat.model.ParameterValues;
import hopstat.model.SymmetryClass;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** The localisation observables through the worker boundary, on the Anderson model. */
class LocalisationObservablesTest {

  private final RealisationWorkspace workspace =
      new RealisationWorkspace(LinalgFactory.preferred());

  private static RealisationTask task(
      String model,
      int l,
      Boundary boundary,
      double w,
      Map<String, Double> parameters,
      int realisation,
      String... observables) {
    Map<String, Double> p = new HashMap<>(parameters);
    p.putIfAbsent("t", 1.0);
    List<DisorderTerm> disorder =
        w > 0 ? List.of(new DisorderTerm("onsite-box", w, Map.of())) : List.of();
    PointSpec point =
        new PointSpec(
            model, new ParameterValues(p), l, boundary, 0.0, disorder, List.of(observables));
    return new RealisationTask(
        RealisationTask.idOf(0, realisation),
        0,
        realisation,
        SeedOps.realisationSeed(42, 0, realisation),
        point);
  }

  /**
   * Band-centre chain through the runner: γ = W²/105.045 (Kappus &amp; Wegner, Z. Phys. B 45, 15
   * (1981) — from memory, REFERENCE.md). W = 1.5, 2 % target: tolerance 3 × error + 3 % (weak
   * disorder corrections at W = 1.5). Λ = 1/γ in d = 1.
   */
  @Test
  void chainLyapunovThroughTheRunner() {
    RealisationTask t =
        task(
            "anderson-1d",
            10,
            Boundary.OPEN,
            1.5,
            Map.of("energy", 0.0, "lyapunovError", 0.02),
            0,
            "lyapunov");
    RealisationResult r = RealisationRunner.run(t, workspace);
    assertThat(r.outcome()).as(String.valueOf(r.failure())).isEqualTo(Outcome.DONE);
    double gamma = r.values().get("lyapunov");
    double error = r.values().get("lyapunov-error");
    double expected = 1.5 * 1.5 / 105.045;
    assertThat(error).isLessThanOrEqualTo(0.02);
    assertThat(gamma).isCloseTo(expected, offset(expected * (3 * error + 0.03)));
    assertThat(r.values().get("lambda")).isCloseTo(1 / gamma, offset(1e-12));
    // reproducible from the seed, with a reused workspace
    assertThat(RealisationRunner.run(t, workspace).values()).isEqualTo(r.values());
  }

  /**
   * Clean periodic strip M = 4 at E = 5 through the model's slice form: γ_min = arccosh(1.5), Λ =
   * 1/(4γ) (derived, see TransferMatrixKernelTest).
   */
  @Test
  void cleanStripThroughTheModelsSliceForm() {
    RealisationTask t =
        task(
            "anderson-2d",
            4,
            Boundary.PERIODIC,
            0.0,
            Map.of("energy", 5.0, "lyapunovError", 1e-6),
            0,
            "lyapunov");
    RealisationResult r = RealisationRunner.run(t, workspace);
    assertThat(r.outcome()).as(String.valueOf(r.failure())).isEqualTo(Outcome.DONE);
    double gamma = Math.log(1.5 + Math.sqrt(1.25));
    assertThat(r.values().get("lyapunov")).isCloseTo(gamma, offset(1e-9));
    assertThat(r.values().get("lambda")).isCloseTo(1 / (4 * gamma), offset(1e-8));
  }

  /** Clean bar inside the band: γ = 0, the run hits the length guard and the realisation FAILS. */
  @Test
  void cleanBarInsideTheBandFailsAsNotConverged() {
    RealisationTask t =
        task(
            "anderson-3d",
            2,
            Boundary.OPEN,
            0.0,
            Map.of("energy", 0.5, "lyapunovMaxLength", 20_000.0),
            0,
            "lyapunov");
    RealisationResult r = RealisationRunner.run(t, workspace);
    assertThat(r.outcome()).isEqualTo(Outcome.FAILED);
    assertThat(r.failure()).startsWith("not converged");
  }

  @Test
  void lyapunovNeedsAnEnergyAndASliceModel() {
    RealisationResult r =
        RealisationRunner.run(
            task("anderson-2d", 4, Boundary.OPEN, 1.0, Map.of(), 0, "lyapunov"), workspace);
    assertThat(r.outcome()).isEqualTo(Outcome.FAILED);
    assertThat(r.failure()).contains("parameters.energy");
    Observable o = ObservableCatalog.find("lyapunov").orElseThrow();
    assertThat(
            o.whyNotApplicable(
                ModelCatalog.find("majorana-cluster").orElseThrow(),
                Boundary.OPEN,
                SymmetryClass.D))
        .isPresent();
    assertThat(
            o.whyNotApplicable(
                ModelCatalog.find("anderson-3d").orElseThrow(),
                Boundary.PERIODIC,
                SymmetryClass.AI))
        .isEmpty();
  }

  /**
   * Strongly disordered chain (W = 1000 ≫ t): eigenstates sit on single sites, levels are
   * independent, ⟨r⟩ = 2 ln 2 − 1 = 0.3863 (derived, Poisson). Three realisations of N = 800,
   * ratios in the central 80 % of the box: ≈ 1900 ratios, σ ≈ 0.007; tolerance 0.025. IPR of such
   * states is 1 − O((t/W)²) (derived, first-order perturbation).
   */
  @Test
  void stronglyDisorderedChainIsPoissonAndLocalised() {
    double sum = 0;
    for (int k = 0; k < 3; k++) {
      RealisationTask t =
          task(
              "anderson-1d",
              800,
              Boundary.OPEN,
              1000.0,
              Map.of("windows", 4.0, "windowMin", -400.0, "windowMax", 400.0),
              k,
              "level-ratio",
              "ipr");
      RealisationResult r = RealisationRunner.run(t, workspace);
      assertThat(r.outcome()).as(String.valueOf(r.failure())).isEqualTo(Outcome.DONE);
      sum += r.values().get("level-ratio");
      assertThat(r.values()).containsKeys("level-ratio.w0", "level-ratio.w3", "ipr.w0", "ipr.w3");
      assertThat(r.values()).doesNotContainKeys("level-ratio.w4", "ipr.e4");
      assertThat(r.values().get("level-ratio.e1")).isCloseTo(-100.0, offset(1e-12));
      assertThat(r.values().get("ipr")).isGreaterThan(0.99);
    }
    assertThat(sum / 3).isCloseTo(2 * Math.log(2) - 1, offset(0.025));
  }

  /**
   * Open clean chain of even length N: every eigenstate is a standing wave sqrt(2/(N+1))
   * sin(πkj/(N+1)) with Σ_j ψ_j⁴ = 3/(2(N+1)) (derived: Σ sin⁴ = 3(N+1)/8 when 2k ≠ N+1). Checks
   * that the window eigenvectors are the right, normalised ones.
   */
  @Test
  void openCleanChainStandingWavesHaveTheClosedFormIpr() {
    int n = 40;
    RealisationTask t =
        task(
            "anderson-1d",
            n,
            Boundary.OPEN,
            0.0,
            Map.of("windows", 3.0, "windowMin", -1.5, "windowMax", 1.5),
            0,
            "ipr");
    RealisationResult r = RealisationRunner.run(t, workspace);
    assertThat(r.outcome()).as(String.valueOf(r.failure())).isEqualTo(Outcome.DONE);
    for (int w = 0; w < 3; w++) {
      assertThat(r.values().get("ipr.w" + w)).isCloseTo(3.0 / (2 * (n + 1)), offset(1e-12));
    }
  }

  /**
   * The window eigenvectors are the same (up to phase, so compare |ψ_i|²) whether they are computed
   * on their own or sliced out of the full set another observable asked for.
   */
  @Test
  void windowEigenvectorsAgreeOnBothPaths() {
    Model model = ModelCatalog.find("anderson-2d").orElseThrow();
    RealisationTask t = task("anderson-2d", 6, Boundary.PERIODIC, 3.0, Map.of(), 0);
    org.ejml.data.ZMatrixRMaj[] got = new org.ejml.data.ZMatrixRMaj[2];
    for (int pass = 0; pass < 2; pass++) {
      Lattice lattice = model.lattice(6, Boundary.PERIODIC);
      workspace.builder.reset(lattice.orbitals());
      model.addClean(t.point().parameters(), lattice, workspace.builder);
      java.util.random.RandomGenerator random = SeedOps.generator(t.seed());
      new hopstat.disorder.OnsiteBoxDisorder()
          .apply(
              t.point().disorder().get(0),
              model,
              t.point().parameters(),
              lattice,
              random,
              workspace.builder);
      RealisationContext c =
          new RealisationContext(workspace, model, lattice, t.point(), pass == 1, random);
      got[pass] = c.eigenvectorsInWindow(-1.0, 1.0).copy();
      assertThat(got[pass].numCols)
          .isEqualTo(c.firstIndexAtOrAbove(1.0) - c.firstIndexAtOrAbove(-1.0))
          .isPositive();
    }
    assertThat(got[1].numCols).isEqualTo(got[0].numCols);
    for (int j = 0; j < got[0].numCols; j++) {
      for (int i = 0; i < got[0].numRows; i++) {
        double a =
            got[0].getReal(i, j) * got[0].getReal(i, j)
                + got[0].getImag(i, j) * got[0].getImag(i, j);
        double b =
            got[1].getReal(i, j) * got[1].getReal(i, j)
                + got[1].getImag(i, j) * got[1].getImag(i, j);
        assertThat(b).isCloseTo(a, offset(1e-10));
      }
    }
  }

  @Test
  void badWindowCountIsReported() {
    RealisationResult r =
        RealisationRunner.run(
            task("anderson-1d", 20, Boundary.OPEN, 1.0, Map.of("windows", 40.0), 0, "level-ratio"),
            workspace);
    assertThat(r.outcome()).isEqualTo(Outcome.FAILED);
    assertThat(r.failure()).contains("parameters.windows");
  }
}
