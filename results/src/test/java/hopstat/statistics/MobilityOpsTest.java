package hopstat.statistics;

import static hopstat.record.SyntheticStudy.aStudy;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import hopstat.model.SymmetryClass;
import hopstat.record.RealisationRecord;
import hopstat.record.StudyLayout;
import hopstat.record.SyntheticStudy;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** Mobility estimators on synthetic studies with known edges ({@link MobilityStudies}). */
class MobilityOpsTest {

  private static MobilitySummary mobility(SyntheticStudy s) {
    return MobilityOps.estimate(s.layout(), s.records());
  }

  @Test
  void referenceRatiosAndEnsembles() {
    // Poisson: P(r) = 2/(1 + r)² on [0, 1] gives ⟨r⟩ = 2 ln 2 − 1 (derived); check by quadrature.
    double sum = 0;
    int n = 200_000;
    for (int i = 0; i < n; i++) {
      double r = (i + 0.5) / n;
      sum += r * 2 / ((1 + r) * (1 + r)) / n;
    }
    assertThat(MobilityOps.POISSON_RATIO)
        .isCloseTo(sum, within(1e-9))
        .isCloseTo(0.386294, within(1e-6));
    // Atas, Bogomolny, Giraud, Roux, PRL 110, 084101 (2013): GOE 0.5307(1), GUE 0.5996(1), GSE
    // 0.6744(1)
    // (values from memory, see REFERENCE.md); the 3×3 surmises 2√3/π − 1/2 = 0.6027 (GUE) and
    // 4 − 2√3 = 0.5359 (GOE) (derived) lie within 0.01 of them, which catches a swapped constant.
    assertThat(MobilityOps.GOE_RATIO).isCloseTo(4 - 2 * Math.sqrt(3), within(0.01));
    assertThat(MobilityOps.GUE_RATIO).isCloseTo(2 * Math.sqrt(3) / Math.PI - 0.5, within(0.01));
    assertThat(MobilityOps.GSE_RATIO)
        .isCloseTo(32 * Math.sqrt(3) / (15 * Math.PI) - 0.5, within(0.01));
    // Dyson index from T² (derived): T² = +1 → GOE, none → GUE, T² = −1 → GSE.
    assertThat(MobilityOps.wignerDysonEnsemble(SymmetryClass.AI)).isEqualTo("GOE");
    assertThat(MobilityOps.wignerDysonEnsemble(SymmetryClass.BDI)).isEqualTo("GOE");
    assertThat(MobilityOps.wignerDysonEnsemble(SymmetryClass.A)).isEqualTo("GUE");
    assertThat(MobilityOps.wignerDysonEnsemble(SymmetryClass.D)).isEqualTo("GUE");
    assertThat(MobilityOps.wignerDysonEnsemble(SymmetryClass.AII)).isEqualTo("GSE");
    assertThat(MobilityOps.wignerDysonEnsemble(SymmetryClass.DIII)).isEqualTo("GSE");
    assertThat(MobilityOps.wignerDysonEnsemble(null)).isEmpty();
    assertThat(MobilityOps.wignerDysonRatio(null)).isNaN();
  }

  @Test
  void windowAroundTheReference() {
    double[] t = {0, 1, 2, 3, 4};
    // inside where d ≤ 0; zeros of the lines at 0.5 and 3.25 (derived)
    double[] w = MobilityOps.windowAround(t, new double[] {1, -1, -2, -1, 3}, 2);
    assertThat(w).containsExactly(0.5, 3.25, 0, 0);
    // reference between grid points, interpolated d = -1.5 at 1.5
    assertThat(MobilityOps.windowAround(t, new double[] {1, -1, -2, -1, 3}, 1.5))
        .containsExactly(0.5, 3.25, 0, 0);
    // reaching the end of the scan: open
    assertThat(MobilityOps.windowAround(t, new double[] {-1, -1, -2, -1, 3}, 2))
        .containsExactly(0, 3.25, 1, 0);
    // reference not inside, or outside the scan
    assertThat(MobilityOps.windowAround(t, new double[] {-1, 1, 2, 1, -3}, 2)).isNull();
    assertThat(MobilityOps.windowAround(t, new double[] {-1, -1, -2, -1, -3}, 5)).isNull();
    // NaN positions are skipped
    assertThat(MobilityOps.windowAround(t, new double[] {1, Double.NaN, -2, Double.NaN, 2}, 2))
        .containsExactly(new double[] {2.0 / 3, 3.0, 0, 0}, within(1e-12));
  }

  @Test
  void transferMatrixRecoversTheEdgesAndTheGap() {
    MobilitySummary m = mobility(MobilityStudies.transferMatrix(5, 30, MobilityStudies.TM_EDGE));
    List<MobilityEdge> edges =
        m.edges().stream().filter(e -> e.method() == MobilityMethod.TRANSFER_MATRIX).toList();
    assertThat(edges).hasSize(2);
    double[] truth = {-MobilityStudies.TM_EDGE, MobilityStudies.TM_EDGE};
    for (int i = 0; i < 2; i++) {
      MobilityEdge e = edges.get(i);
      assertThat(e.axis()).isEqualTo("energy");
      assertThat(e.criterion()).isEqualTo(MobilityOps.SIZE_CROSSING);
      assertThat(e.sizeLow()).isEqualTo(4);
      assertThat(e.sizeHigh()).isEqualTo(8);
      // Sampling error of the crossing (derived): se(Λ_8 − Λ_4) = 0.03·√(2/30) = 0.0077 over a
      // slope
      // 0.1·(8^{2/3} − 4^{2/3}) = 0.148 per unit E gives σ ≈ 0.05; allow 3σ.
      assertThat(e.estimate()).isCloseTo(truth[i], within(0.16));
      assertThat(e.interval().low()).isLessThanOrEqualTo(truth[i]);
      assertThat(e.interval().high()).isGreaterThanOrEqualTo(truth[i]);
      assertThat(e.existsFraction()).isGreaterThan(0.95);
    }
    MobilityGap gap = m.gaps().get(0);
    assertThat(m.gaps()).hasSize(1);
    assertThat(gap.reference()).isEqualTo(0.0);
    assertThat(gap.lowerOpen()).isFalse();
    assertThat(gap.upperOpen()).isFalse();
    assertThat(gap.halfWidth()).isCloseTo(MobilityStudies.TM_EDGE, within(0.16));
    assertThat(gap.interval().low()).isLessThanOrEqualTo(MobilityStudies.TM_EDGE);
    assertThat(gap.interval().high()).isGreaterThanOrEqualTo(MobilityStudies.TM_EDGE);
    assertThat(gap.insideFraction()).isEqualTo(1.0);
    // states on the larger width: localised well inside, extended well outside
    MobilityCurve large = m.curves().stream().filter(c -> c.size() == 8).findFirst().orElseThrow();
    for (MobilityCurve.Point p : large.points()) {
      if (Math.abs(p.position()) <= 0.5) {
        assertThat(p.state()).as("E = %s", p.position()).isEqualTo("localised");
      } else if (Math.abs(p.position()) >= 1.75) {
        assertThat(p.state()).as("E = %s", p.position()).isEqualTo("extended");
      }
    }
    assertThat(m.curves().stream().filter(c -> c.size() == 4).flatMap(c -> c.points().stream()))
        .allMatch(p -> p.state().isEmpty());
  }

  @Test
  void theReferenceInExtendedStatesGivesAZeroGap() {
    // Λ rises with M everywhere near E = 0 when the sign is flipped: no localised window there.
    SyntheticStudy s =
        aStudy("tm-ext")
            .axis("L", 4, 8)
            .axis("energy", MobilityStudies.ENERGIES)
            .real("lambda", "1")
            .realisations(20)
            .seed(3)
            .values(
                (c, random) ->
                    Map.of(
                        "lambda",
                        2 * MobilityStudies.LAMBDA_C
                            - MobilityStudies.lambda(c.get("energy"), c.get("L"), 1.1)
                            + 0.01 * random.nextGaussian()))
            .build();
    MobilityGap gap = mobility(s).gaps().get(0);
    assertThat(gap.halfWidth()).isZero();
    assertThat(gap.lower()).isNaN();
    assertThat(gap.insideFraction()).isZero();
  }

  @Test
  void levelRatioSizeCrossingsRecoverTheEdgeAndDropSparseWindows() {
    MobilitySummary m =
        mobility(MobilityStudies.levelRatio(9, 40, MobilityStudies.LEVEL_EDGE, 8, 16));
    assertThat(m.wignerDysonEnsemble()).isEqualTo("GOE");
    assertThat(m.wignerDysonRatio()).isEqualTo(MobilityOps.GOE_RATIO);
    List<MobilityEdge> edges = m.edges();
    assertThat(edges)
        .hasSize(2)
        .allMatch(
            e ->
                e.criterion().equals(MobilityOps.SIZE_CROSSING)
                    && e.axis().equals(MobilityOps.LEVEL_RATIO_AXIS));
    // σ of a crossing (derived): se(r_16 − r_8) = 0.02·√(2/40) = 0.0045 over a slope 0.072·(4 − 2)
    // =
    // 0.144 per unit E gives 0.031; allow 3σ.
    assertThat(edges.get(0).estimate()).isCloseTo(-MobilityStudies.LEVEL_EDGE, within(0.1));
    assertThat(edges.get(1).estimate()).isCloseTo(MobilityStudies.LEVEL_EDGE, within(0.1));
    // the band-tail windows (present in 30 % of realisations) are not on the curves
    for (MobilityCurve c : m.curves()) {
      assertThat(c.points()).hasSize(MobilityStudies.WINDOWS - 2);
      assertThat(c.points().get(0).position()).isEqualTo(MobilityStudies.CENTRES[1]);
    }
    MobilityGap gap = m.gaps().get(0);
    assertThat(gap.criterion()).isEqualTo(MobilityOps.CROSSING_VALUE);
    assertThat(gap.insideFraction()).isEqualTo(1.0);
    assertThat(gap.halfWidth()).isCloseTo(MobilityStudies.LEVEL_EDGE, within(0.1));
    assertThat(gap.interval().low()).isLessThanOrEqualTo(MobilityStudies.LEVEL_EDGE);
    assertThat(gap.interval().high()).isGreaterThanOrEqualTo(MobilityStudies.LEVEL_EDGE);
  }

  @Test
  void levelRatioOneSizeUsesTheMidpoint() {
    MobilitySummary m =
        mobility(MobilityStudies.levelRatio(10, 40, MobilityStudies.LEVEL_EDGE, 12));
    double mid = 0.5 * (MobilityOps.POISSON_RATIO + MobilityOps.GOE_RATIO);
    assertThat(m.edges())
        .hasSize(2)
        .allMatch(e -> e.criterion().equals(MobilityOps.MIDPOINT) && e.level() == mid);
    assertThat(m.edges().get(1).estimate()).isCloseTo(MobilityStudies.LEVEL_EDGE, within(0.05));
    assertThat(m.gaps().get(0).criterion()).isEqualTo(MobilityOps.MIDPOINT);
    MobilityCurve c = m.curves().get(0);
    assertThat(c.points().get(c.points().size() / 2).state()).isEqualTo("localised");
    assertThat(c.points().get(0).state()).isEqualTo("extended");
  }

  @Test
  void levelRatioWithoutAClassHasNoMidpoint() {
    SyntheticStudy s = MobilityStudies.levelRatio(10, 10, MobilityStudies.LEVEL_EDGE, 12);
    StudyLayout l = s.layout();
    StudyLayout unknown =
        new StudyLayout(
            l.name(), l.specHash(), l.gridNames(), l.points(), l.quantities(), l.plannedPerPoint());
    MobilitySummary m = MobilityOps.estimate(unknown, s.records());
    assertThat(m.wignerDysonRatio()).isNaN();
    assertThat(m.curves()).hasSize(1);
    assertThat(m.edges()).isEmpty();
    assertThat(m.gaps()).isEmpty();
  }

  @Test
  void invariantPlateauRecoversTheWindow() {
    MobilitySummary m = mobility(MobilityStudies.plateau(21, 100));
    assertThat(m.gaps()).hasSize(1);
    MobilityGap gap = m.gaps().get(0);
    assertThat(gap.method()).isEqualTo(MobilityMethod.INVARIANT_PLATEAU);
    assertThat(gap.quantity()).isEqualTo("bott@E");
    assertThat(gap.criterion()).isEqualTo(MobilityOps.QUANTISED);
    assertThat(gap.reference()).isEqualTo(0.0);
    assertThat(gap.halfWidth()).isCloseTo(MobilityStudies.PLATEAU_EDGE, within(0.1));
    assertThat(gap.interval().low()).isLessThanOrEqualTo(MobilityStudies.PLATEAU_EDGE);
    assertThat(gap.interval().high()).isGreaterThanOrEqualTo(MobilityStudies.PLATEAU_EDGE);
    MobilityCurve c = m.curves().get(0);
    assertThat(c.plateauValue()).isEqualTo(1.0);
    MobilityCurve.Point centre = c.points().get(10);
    assertThat(centre.mean()).isEqualTo(1.0);
    assertThat(centre.state()).isEqualTo("quantised");
    // Wilson interval of 100/100 (derived: lower end n/(n + z²) = 100/103.84 = 0.963)
    assertThat(centre.interval().low()).isCloseTo(100 / (100 + 1.959964 * 1.959964), within(1e-4));
    assertThat(c.points().get(0).state()).isEqualTo("not-quantised");
  }

  @Test
  void invariantPlateauFromAFermiEnergySweep() {
    SyntheticStudy s =
        aStudy("ef")
            .axis("fermiEnergy", MobilityStudies.FERMI)
            .integer("bott")
            .realisations(60)
            .seed(4)
            .values(
                (c, random) ->
                    Map.of(
                        "bott",
                        random.nextDouble()
                                < MobilityStudies.quantisedProbability(c.get("fermiEnergy"))
                            ? -1.0
                            : 0.3))
            .build();
    MobilitySummary m = mobility(s);
    assertThat(m.gaps()).hasSize(1);
    MobilityGap gap = m.gaps().get(0);
    assertThat(gap.axis()).isEqualTo("fermiEnergy");
    assertThat(m.curves().get(0).plateauValue()).isEqualTo(-1.0);
    assertThat(gap.halfWidth()).isCloseTo(MobilityStudies.PLATEAU_EDGE, within(0.12));
    assertThat(gap.interval().low()).isLessThanOrEqualTo(gap.halfWidth());
  }

  @Test
  void estimatorsAgreeWhenTheirEdgesMatchAndDisagreeOtherwise() {
    assertThat(combined(1.0, 1.0).agreements())
        .singleElement()
        .satisfies(
            a -> {
              assertThat(a.estimates())
                  .containsExactly("TRANSFER_MATRIX/lambda", "LEVEL_RATIO/level-ratio");
              assertThat(a.verdict()).isEqualTo("agree");
            });
    MobilitySummary m = combined(1.0, 1.5);
    assertThat(m.agreements())
        .as("%s", m.gaps())
        .singleElement()
        .satisfies(a -> assertThat(a.verdict()).isEqualTo("disagree"));
  }

  /** Λ on an (L, energy) grid with level ratios recorded only at the energy-0 points. */
  private static MobilitySummary combined(double tmEdge, double levelEdge) {
    SyntheticStudy.Builder b =
        aStudy("both")
            .axis("L", 8, 16)
            .axis("energy", MobilityStudies.ENERGIES)
            .real("lambda", "1")
            .real("level-ratio", "1")
            .realisations(40)
            .seed(8)
            .effectiveClass(SymmetryClass.AI);
    for (int k = 0; k < MobilityStudies.WINDOWS; k++) {
      b.real("level-ratio.w" + k, "1");
    }
    for (int k = 0; k < MobilityStudies.WINDOWS; k++) {
      b.real("level-ratio.e" + k, "energy");
    }
    SyntheticStudy s =
        b.values(
                (c, random) -> {
                  Map<String, Double> v = new HashMap<>();
                  v.put(
                      "lambda",
                      MobilityStudies.lambda(c.get("energy"), c.get("L"), tmEdge)
                          + 0.01 * random.nextGaussian());
                  if (c.get("energy") == 0.0) {
                    v.putAll(MobilityStudies.levelValues(c.get("L"), levelEdge, random));
                  }
                  return v;
                })
            .build();
    return mobility(s);
  }

  @Test
  void outputIsDeterministicAndIndependentOfRecordOrder() {
    SyntheticStudy s = MobilityStudies.transferMatrix(5, 10, MobilityStudies.TM_EDGE);
    List<RealisationRecord> reversed = new ArrayList<>(s.records());
    java.util.Collections.reverse(reversed);
    assertThat(MobilityOps.estimate(s.layout(), reversed))
        .isEqualTo(MobilityOps.estimate(s.layout(), s.records()));
  }
}
