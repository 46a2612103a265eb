package hopstat.statistics;

import static hopstat.record.SyntheticStudy.aStudy;
import static org.assertj.core.api.Assertions.assertThat;

import hopstat.record.SyntheticStudy;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * Coverage of the bootstrap intervals of phase-boundary estimates on synthetic studies with a known
 * boundary. The invariant is 1 with probability P(W) = 1/(1 + exp((W − W_c)·s/w)) and 0 otherwise
 * (a logistic crossover, common practice as a model of a finite-size-broadened transition), with
 * W_c = 4.5 midway between grid points 4 and 5: P(W_c + x) = 1 − P(W_c − x) makes the linear
 * interpolation of the exact mean (and of a difference of two sizes' means) cross 1/2 (resp. 0)
 * exactly at W_c (derived), so any miss is sampling error, which the interval is meant to cover.
 */
class BoundaryCoverageTest {

  private static final double W_C = 4.5;
  private static final double WIDTH = 1.0;
  private static final int STUDIES = 200;

  /** Realisations per point: small, as in a quick scan, where interval coverage is most at risk. */
  private static final int REALISATIONS = 40;

  /**
   * Binomial tolerance: with 200 studies and true coverage 0.95 the observed rate has standard
   * deviation √(0.95·0.05/200) = 0.0154 (derived); we accept ±3 standard deviations, [0.904,
   * 0.996], i.e. a correct 95 % interval fails this test with probability ~0.3 %; the seeds are
   * fixed, so the outcome is deterministic.
   */
  private static final double LOW = 0.904;

  private static final double HIGH = 0.996;

  private static SyntheticStudy study(int s, double[] w, double... sizes) {
    return aStudy("coverage-" + s)
        .axis("L", sizes)
        .axis("W", w)
        .integer("chern")
        .realisations(REALISATIONS)
        .seed(1000 + s)
        .values(
            (c, random) -> {
              double scale = c.get("L") / 8.0;
              double p = 1 / (1 + Math.exp((c.get("W") - W_C) * scale / WIDTH));
              return Map.of("chern", random.nextDouble() < p ? 1.0 : 0.0);
            })
        .build();
  }

  private static BoundaryEstimate mostRobust(List<BoundaryEstimate> all, BoundaryKind kind) {
    return all.stream()
        .filter(b -> b.kind() == kind && b.axis().equals("W"))
        .max(Comparator.comparingDouble(BoundaryEstimate::existsFraction))
        .orElse(null);
  }

  @Test
  void halfIntegerCrossingIntervalsCoverTheTrueBoundaryAtTheNominalRate() {
    int covered = 0;
    for (int s = 0; s < STUDIES; s++) {
      SyntheticStudy st = study(s, new double[] {2, 3, 4, 5, 6, 7}, 8);
      BoundaryEstimate b =
          mostRobust(
              BoundaryOps.estimate(st.layout(), st.records()), BoundaryKind.HALF_INTEGER_CROSSING);
      if (b == null) {
        continue;
      }
      assertThat(b.level()).isEqualTo(0.5);
      if (b.interval().low() <= W_C && W_C <= b.interval().high()) {
        covered++;
      }
    }
    assertThat((double) covered / STUDIES).isBetween(LOW, HIGH);
  }

  @Test
  void sizeCrossingIntervalsCoverTheTrueBoundaryAtTheNominalRate() {
    int covered = 0;
    for (int s = 0; s < STUDIES; s++) {
      SyntheticStudy st = study(s, new double[] {3, 4, 5, 6}, 8, 16);
      BoundaryEstimate b =
          mostRobust(BoundaryOps.estimate(st.layout(), st.records()), BoundaryKind.SIZE_CROSSING);
      if (b == null) {
        // The sampled curves need not cross; a study without an estimate counts as a miss.
        continue;
      }
      assertThat(b.sizeLow()).isEqualTo(8.0);
      assertThat(b.sizeHigh()).isEqualTo(16.0);
      if (b.interval().low() <= W_C && W_C <= b.interval().high()) {
        covered++;
      }
    }
    assertThat((double) covered / STUDIES).isBetween(LOW, HIGH);
  }

  @Test
  void aBiasedEstimatorWouldFail() {
    // Source-free check that the test can fail: shifting every interval by one grid spacing must
    // destroy the coverage.
    int covered = 0;
    for (int s = 0; s < 40; s++) {
      SyntheticStudy st = study(s, new double[] {2, 3, 4, 5, 6, 7}, 8);
      BoundaryEstimate b =
          mostRobust(
              BoundaryOps.estimate(st.layout(), st.records()), BoundaryKind.HALF_INTEGER_CROSSING);
      if (b != null && b.interval().low() + 1 <= W_C && W_C <= b.interval().high() + 1) {
        covered++;
      }
    }
    assertThat((double) covered / 40).isLessThan(LOW);
  }
}
