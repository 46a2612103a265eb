package hopstat.statistics;

import hopstat.model.SymmetryClass;
import java.util.List;

/**
 * Mobility edges and mobility gaps of a study ({@link MobilityOps}).
 *
 * @param effectiveClass the study's effective symmetry class (null when unknown)
 * @param wignerDysonEnsemble GOE, GUE or GSE for that class (empty when unknown)
 * @param wignerDysonRatio ⟨r⟩ of that ensemble; NaN when unknown
 * @param curves every estimator curve
 * @param edges every crossing
 * @param gaps mobility-gap estimates
 * @param agreements comparisons between estimators
 */
public record MobilitySummary(
    SymmetryClass effectiveClass,
    String wignerDysonEnsemble,
    double wignerDysonRatio,
    List<MobilityCurve> curves,
    List<MobilityEdge> edges,
    List<MobilityGap> gaps,
    List<MobilityAgreement> agreements) {
  public MobilitySummary {
    curves = List.copyOf(curves);
    edges = List.copyOf(edges);
    gaps = List.copyOf(gaps);
    agreements = List.copyOf(agreements);
  }

  /** True when no estimator had input. */
  public boolean isEmpty() {
    return curves.isEmpty();
  }
}
