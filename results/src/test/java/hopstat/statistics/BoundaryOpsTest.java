package hopstat.statistics;

import static hopstat.record.SyntheticStudy.aStudy;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import hopstat.record.SyntheticStudy;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class BoundaryOpsTest {

  @Test
  void zeroCrossingsInterpolateLinearlyAndSkipQuantisedPlateaus() {
    double[] t = {0, 1, 2, 3, 4};
    // Line through (1, 0.5) and (2, -0.5) vanishes at 1.5 (derived); the plateau of round-off
    // differences at both ends crosses nothing.
    double[] d = {1e-13, 0.5, -0.5, -1e-12, 2e-13};
    assertThat(BoundaryOps.zeroCrossings(t, d)).containsExactly(1.5);
    // Exact zeros are skipped too: the line through (1, 0.5) and (4, -1) vanishes at 2 (derived).
    assertThat(BoundaryOps.zeroCrossings(t, new double[] {1, 0.5, 0, 0, -1})).containsExactly(2.0);
  }

  @Test
  void variancePeakIsTheVertexOfAnExactParabola() {
    // v = 3 − (t − 1.3)² sampled on an uneven grid: the three-point vertex is exact (derived).
    double[] t = {0, 0.5, 1.0, 2.5, 3};
    double[] v = new double[t.length];
    for (int i = 0; i < t.length; i++) {
      v[i] = 3 - (t[i] - 1.3) * (t[i] - 1.3);
    }
    assertThat(BoundaryOps.peak(t, v)).isCloseTo(1.3, within(1e-12));
    // A maximum on the end of the cut is not a resolved peak.
    assertThat(BoundaryOps.peak(new double[] {0, 1, 2}, new double[] {3, 2, 1})).isNaN();
  }

  @Test
  void cutsFixEveryAxisButOne() {
    SyntheticStudy s =
        aStudy("h")
            .axis("L", 8, 12)
            .axis("W", 0, 1, 2)
            .integer("c")
            .realisations(1)
            .values((c, r) -> Map.of("c", 0.0))
            .build();
    List<GridCut> cuts = CutOps.cuts(s.layout().gridNames(), s.layout().points());
    // Along L: one cut per W (3); along W: one per L (2).
    assertThat(cuts).hasSize(5);
    assertThat(cuts.get(0).axis()).isEqualTo("L");
    assertThat(cuts.get(0).fixed()).containsExactly(Map.entry("W", 0.0));
    assertThat(cuts.get(3).axis()).isEqualTo("W");
    assertThat(cuts.get(3).positions()).containsExactly(0.0, 1.0, 2.0);
    assertThat(cuts.get(4).fixed()).containsExactly(Map.entry("L", 12.0));
  }

  @Test
  void aSharpDeterministicTransitionIsFoundWithATightInterval() {
    // Invariant 1 below W = 2.5 and 0 above in every realisation: the mean crosses 1/2 midway
    // between W = 2 and 3 (derived), with no sampling error at all.
    SyntheticStudy s =
        aStudy("sharp")
            .axis("W", 0, 1, 2, 3, 4)
            .integer("c")
            .realisations(5)
            .values((c, r) -> Map.of("c", c.get("W") < 2.5 ? 1.0 : 0.0))
            .build();
    List<BoundaryEstimate> b = BoundaryOps.estimate(s.layout(), s.records());
    assertThat(b).hasSize(1);
    assertThat(b.get(0).kind()).isEqualTo(BoundaryKind.HALF_INTEGER_CROSSING);
    assertThat(b.get(0).estimate()).isEqualTo(2.5);
    assertThat(b.get(0).interval().low()).isEqualTo(2.5);
    assertThat(b.get(0).interval().high()).isEqualTo(2.5);
    assertThat(b.get(0).existsFraction()).isEqualTo(1.0);
    assertThat(b.get(0).nearestPoint()).isEqualTo(2);
  }

  @Test
  void estimatesAreBitIdenticalForEqualJournalsInAnyOrder() {
    SyntheticStudy s =
        aStudy("order")
            .axis("W", 0, 1, 2, 3, 4)
            .integer("c")
            .realisations(20)
            .values(
                (c, r) ->
                    Map.of("c", r.nextDouble() < 1 / (1 + Math.exp(c.get("W") - 2)) ? 1.0 : 0.0))
            .build();
    List<hopstat.record.RealisationRecord> reversed = new java.util.ArrayList<>(s.records());
    java.util.Collections.reverse(reversed);
    assertThat(BoundaryOps.estimate(s.layout(), reversed))
        .isEqualTo(BoundaryOps.estimate(s.layout(), s.records()));
  }
}
