package hopstat.task;

import static hopstat.task.Points2d.aPoint;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import hopstat.linalg.LinalgFactory;
import hopstat.linalg.LinalgKind;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The foundation's checks on the Qi–Wu–Zhang model: Bott index, gap, weak disorder, backends. */
class QwzFoundationTest {

  /**
   * Qi, Wu, Zhang, PRB 74, 085308 (2006): the lower band of d(k) = (sin kx, sin ky, m + cos kx +
   * cos ky) has C = +1 for −2 &lt; m &lt; 0, −1 for 0 &lt; m &lt; 2, 0 for |m| &gt; 2 (sign with A
   * = i⟨u|∇u⟩, numerically checked in REFERENCE.md); the Bott index equals C (Loring &amp;
   * Hastings, EPL 92, 67004 (2010)). Tolerance 1e-8: Σ arg λ is an integer up to rounding because
   * det(VUV†U†) > 0 (derived), so anything but round-off is a bug.
   */
  @ParameterizedTest
  @CsvSource({"-3.0, 0", "-1.0, 1", "-0.5, 1", "0.5, -1", "1.0, -1", "3.0, 0"})
  void cleanBottIndexIsTheQwzChernNumber(double m, int chern) {
    Map<String, Double> v =
        aPoint("qwz").with("m", m).with("t", 1).size(10).observing("bott").values(1L);
    assertThat(v.get("bott")).isCloseTo(chern, within(1e-8));
  }

  /**
   * Clean gap (derived): the spectrum of the periodic L×L sample is ±|d(k)| on the mesh k = 2πn/L,
   * so the gap around E_F = 0 is 2 min_k |d(k)| and the Fermi gap is min_k |d(k)|.
   */
  @ParameterizedTest
  @CsvSource({"1.0, 8", "1.0, 10", "1.7, 9", "-0.3, 12"})
  void cleanGapIsTwiceTheSmallestBlochEnergyOnTheMesh(double m, int size) {
    double smallest = Double.POSITIVE_INFINITY;
    for (int nx = 0; nx < size; nx++) {
      for (int ny = 0; ny < size; ny++) {
        double kx = 2 * Math.PI * nx / size;
        double ky = 2 * Math.PI * ny / size;
        double dz = m + Math.cos(kx) + Math.cos(ky);
        smallest =
            Math.min(
                smallest,
                Math.sqrt(Math.sin(kx) * Math.sin(kx) + Math.sin(ky) * Math.sin(ky) + dz * dz));
      }
    }
    Map<String, Double> v =
        aPoint("qwz").with("m", m).with("t", 1).size(size).observing("gap").values(1L);
    assertThat(v.get("gap")).isCloseTo(2 * smallest, within(1e-10));
    assertThat(v.get("fermi-gap")).isCloseTo(smallest, within(1e-10));
  }

  /**
   * Weak disorder (W = 1, well below the clean gap 2 at m = 1) leaves the Bott index quantised at
   * its clean value (Loring &amp; Hastings 2010; common practice: the invariant is stable while the
   * gap stays open). Every realisation must give exactly −1 up to round-off.
   */
  @Test
  void weakDisorderLeavesTheBottIndexQuantised() {
    for (long seed = 1; seed <= 6; seed++) {
      Map<String, Double> v =
          aPoint("qwz")
              .with("m", 1)
              .with("t", 1)
              .size(10)
              .boxDisorder(1.0, Map.of())
              .observing("gap", "bott")
              .values(seed);
      assertThat(v.get("bott")).isCloseTo(-1.0, within(1e-8));
      assertThat(v.get("gap")).isGreaterThan(0.5);
    }
  }

  /** Strong disorder (W = 12 at L = 8) must actually change the spectrum: a test that can fail. */
  @Test
  void strongDisorderClosesTheCleanGap() {
    Map<String, Double> clean =
        aPoint("qwz").with("m", 1).with("t", 1).size(8).observing("gap").values(1L);
    Map<String, Double> dirty =
        aPoint("qwz")
            .with("m", 1)
            .with("t", 1)
            .size(8)
            .boxDisorder(12.0, Map.of())
            .observing("gap")
            .values(1L);
    assertThat(dirty.get("gap")).isLessThan(0.5 * clean.get("gap"));
  }

  /**
   * Both linear-algebra backends give the same invariants on the same realisation (common
   * practice).
   */
  @Test
  void nativeAndJavaBackendsAgreeOnTheSameRealisation() {
    PointSpec point =
        aPoint("qwz")
            .with("m", 1)
            .with("t", 1)
            .size(8)
            .boxDisorder(3.0, Map.of())
            .observing("gap", "bott")
            .build();
    for (long seed = 11; seed <= 13; seed++) {
      RealisationTask task = new RealisationTask("p0-r0", 0, 0, seed, point);
      RealisationResult nat =
          RealisationRunner.run(
              task, new RealisationWorkspace(LinalgFactory.create(LinalgKind.NATIVE)));
      RealisationResult java =
          RealisationRunner.run(
              task, new RealisationWorkspace(LinalgFactory.create(LinalgKind.JAVA)));
      assertThat(nat.outcome()).isEqualTo(Outcome.DONE);
      assertThat(java.outcome()).isEqualTo(Outcome.DONE);
      assertThat(Math.round(java.values().get("bott")))
          .isEqualTo(Math.round(nat.values().get("bott")));
      assertThat(java.values().get("bott")).isCloseTo(nat.values().get("bott"), within(1e-8));
      assertThat(java.values().get("gap")).isCloseTo(nat.values().get("gap"), within(1e-10));
    }
  }

  /** A realisation is a pure function of its task: the same seed gives bit-identical values. */
  @Test
  void realisationIsReproducibleFromItsSeed() {
    PointSpec point =
        aPoint("qwz")
            .with("m", 1)
            .with("t", 1)
            .size(6)
            .boxDisorder(4.0, Map.of())
            .observing("gap", "bott")
            .build();
    RealisationTask task = new RealisationTask("p0-r0", 0, 0, 99L, point);
    RealisationResult a =
        RealisationRunner.run(
            task, new RealisationWorkspace(LinalgFactory.create(LinalgKind.NATIVE)));
    RealisationResult b =
        RealisationRunner.run(
            task, new RealisationWorkspace(LinalgFactory.create(LinalgKind.NATIVE)));
    assertThat(a.values()).isEqualTo(b.values());
    RealisationResult other =
        RealisationRunner.run(
            new RealisationTask("p0-r1", 0, 1, 100L, point),
            new RealisationWorkspace(LinalgFactory.create(LinalgKind.NATIVE)));
    assertThat(other.values().get("gap")).isNotEqualTo(a.values().get("gap"));
  }

  /**
   * E_F outside the spectrum makes `gap` undefined: the realisation FAILS with a reason, it does
   * not throw.
   */
  @Test
  void fermiEnergyOutsideTheSpectrumFailsTheRealisation() {
    RealisationResult r =
        aPoint("qwz").with("m", 1).with("t", 1).size(4).fermiEnergy(50).observing("gap").run(1L);
    assertThat(r.outcome()).isEqualTo(Outcome.FAILED);
    assertThat(r.failure()).contains("outside the spectrum");
    assertThat(r.values()).isEmpty();
  }
}
