package hopstat.task;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.data.Offset.offset;

import hopstat.disorder.DisorderTerm;
import hopstat.lattice.Boundary;
import hopstat.linalg.LinalgFactory;
import hopstat.model.ParameterValues;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class BottVersusFermiEnergyObservableTest {

  private final RealisationWorkspace workspace =
      new RealisationWorkspace(LinalgFactory.preferred());

  private static RealisationTask task(
      double fermiEnergy, List<String> observables, Map<String, Double> extra) {
    Map<String, Double> p = new java.util.HashMap<>(Map.of("m", -1.0, "t", 1.0));
    p.putAll(extra);
    PointSpec point =
        new PointSpec(
            "qwz",
            new ParameterValues(p),
            8,
            Boundary.PERIODIC,
            fermiEnergy,
            List.of(new DisorderTerm("onsite-box", 1.0, Map.of())),
            observables);
    return new RealisationTask("p0-r0", 0, 0, SeedOps.realisationSeed(9, 0, 0), point);
  }

  /**
   * QWZ at m = −1 with weak disorder (W = 1, inside the clean gap of 2): C = +1 for the lower band
   * (Qi, Wu, Zhang, PRB 74, 085308 (2006); sign as REFERENCE.md), 0 for an empty or full band
   * (trivial projector). The scan at E_F = 0 must equal the single-E_F {@code bott} of the same
   * realisation to rounding.
   */
  @Test
  void scanAgreesWithTheSingleFermiEnergyIndex() {
    Map<String, Double> scan =
        Map.of("fermiEnergyCount", 3.0, "fermiEnergyMin", -10.0, "fermiEnergyMax", 10.0);
    RealisationResult r =
        RealisationRunner.run(task(0.0, List.of("bott-vs-ef", "bott"), scan), workspace);
    assertThat(r.outcome()).as(String.valueOf(r.failure())).isEqualTo(Outcome.DONE);
    assertThat(r.values().get("bott@E0")).isCloseTo(0.0, offset(1e-12));
    assertThat(r.values().get("bott@E1")).isCloseTo(1.0, offset(1e-6));
    assertThat(r.values().get("bott@E1")).isCloseTo(r.values().get("bott"), offset(1e-10));
    assertThat(r.values().get("bott@E2")).isCloseTo(0.0, offset(1e-12));
    assertThat(r.values().get("bott@E1.energy")).isEqualTo(0.0);
    assertThat(r.values()).doesNotContainKey("bott@E3");
  }

  @Test
  void missingScanParametersAreReported() {
    RealisationResult r =
        RealisationRunner.run(task(0.0, List.of("bott-vs-ef"), Map.of()), workspace);
    assertThat(r.outcome()).isEqualTo(Outcome.FAILED);
    assertThat(r.failure()).contains("parameters.fermiEnergyCount");
  }
}
