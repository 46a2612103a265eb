package hopstat.task;

import hopstat.invariant.ChernMarkerKernel;
import hopstat.invariant.ChernMarkerResult;
import hopstat.invariant.ChernMarkerWorkspace;
import hopstat.lattice.Boundary;
import hopstat.model.Model;
import hopstat.model.SymmetryClass;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** {@code chern-marker}: bulk average of the Bianco–Resta local Chern marker on an open sample. */
final class ChernMarkerObservable implements Observable {

  static final String NAME = "chern-marker";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "Bianco-Resta local Chern marker (Bianco & Resta, PRB 84, 241106(R) (2011)) c(r) = -4 pi Im <r|P X Q Y P|r>"
        + " summed over the orbitals of each site and normalised per unit cell, averaged over the central half"
        + " (in each direction) of the open sample; P projects on the states below E_F. Same sign as the Chern"
        + " number of qwz (C = +1 for -2<m<0) and as bott.";
  }

  @Override
  public List<Quantity> quantities() {
    return List.of(
        new Quantity("chern-marker", true, "1", "bulk-averaged local Chern marker, unrounded"));
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
          "the Chern marker is defined for d = 2 models; "
              + model.name()
              + " has d = "
              + model.dimension());
    }
    Optional<String> noChern = TenfoldOps.whyNoChernNumber("the Chern marker", effectiveClass);
    if (noChern.isPresent()) {
      return noChern;
    }
    if (boundary != Boundary.OPEN) {
      return Optional.of(
          "the Chern marker needs \"boundary\": \"open\" (position operators on a torus are not defined)");
    }
    return Optional.empty();
  }

  @Override
  public void compute(RealisationContext context, Map<String, Double> out) {
    ChernMarkerWorkspace ws =
        context.workspace().scratch(ChernMarkerWorkspace.class, ChernMarkerWorkspace::new);
    ChernMarkerResult r =
        ChernMarkerKernel.compute(context.lattice(), context.occupiedStates(), ws);
    if (r.bulkSites() == 0) {
      throw new IllegalStateException("the bulk region of the sample holds no site (L too small)");
    }
    out.put("chern-marker", r.bulkAverage());
  }
}
