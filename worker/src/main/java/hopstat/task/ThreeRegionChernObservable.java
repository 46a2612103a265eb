package hopstat.task;

import hopstat.invariant.ThreeRegionChernKernel;
import hopstat.invariant.ThreeRegionChernResult;
import hopstat.invariant.ThreeRegionChernWorkspace;
import hopstat.lattice.Boundary;
import hopstat.model.Model;
import hopstat.model.SymmetryClass;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** {@code chern-3region}: Kitaev's three-region formula in a disc at the centre of the sample. */
final class ThreeRegionChernObservable implements Observable {

  static final String NAME = "chern-3region";

  /** Disc radius as a fraction of the smaller extent of the sample (R = L/4 on an L × L sample). */
  static final double RADIUS_FRACTION = 0.25;

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "Kitaev three-region formula (Kitaev, Ann. Phys. 321, 2 (2006), App. C): nu = 12 pi i sum_{j in A, k in B, l in C}"
        + " (P_jk P_kl P_lj - P_jl P_lk P_kj), A, B, C the counter-clockwise 120-degree sectors of a disc of radius L/4"
        + " (lattice coordinates) at the sample centre; reported as -nu, which equals the Chern number in the"
        + " convention of qwz (C = +1 for -2<m<0) and bott. Open or periodic samples.";
  }

  @Override
  public List<Quantity> quantities() {
    return List.of(
        new Quantity(
            "chern-3region", true, "1", "minus Kitaev's three-region nu (= C), unrounded"));
  }

  @Override
  public boolean needsOccupiedStates() {
    return true;
  }

  @Override
  public Optional<String> whyNotApplicable(
      Model model, Boundary boundary, SymmetryClass effectiveClass) {
    if (model.dimension() != 2) {
      return Optional.of(
          "the three-region formula is defined for d = 2 models; "
              + model.name()
              + " has d = "
              + model.dimension());
    }
    Optional<String> noChern =
        TenfoldOps.whyNoChernNumber("the three-region formula", effectiveClass);
    if (noChern.isPresent()) {
      return noChern;
    }
    return Optional.empty();
  }

  @Override
  public void compute(RealisationContext context, Map<String, Double> out) {
    ThreeRegionChernWorkspace ws =
        context
            .workspace()
            .scratch(ThreeRegionChernWorkspace.class, ThreeRegionChernWorkspace::new);
    double[] extent = context.lattice().extent();
    double radius = RADIUS_FRACTION * Math.min(extent[0], extent[1]);
    ThreeRegionChernResult r =
        ThreeRegionChernKernel.compute(context.lattice(), context.occupiedStates(), radius, ws);
    if (r.sitesPerSector() == 0) {
      throw new IllegalStateException(
          "a sector of the three-region disc holds no site (L too small)");
    }
    out.put("chern-3region", r.chern());
  }
}
