package hopstat.task;

import hopstat.invariant.BottIndexKernel;
import hopstat.invariant.BottIndexResult;
import hopstat.lattice.Boundary;
import hopstat.model.Model;
import hopstat.model.SymmetryClass;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** {@code bott}: the Bott index of the occupied states on a periodic 2D sample. */
final class BottObservable implements Observable {

  static final String NAME = "bott";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "Bott index (Loring & Hastings, EPL 92, 67004 (2010)) of the states below E_F on the periodic sample,"
        + " (1/2pi) sum arg eig(V U V^+ U^+) with U, V the position unitaries exp(2 pi i x/L) projected on the"
        + " occupied states; equals the Chern number C of the filled bands (qwz: C = +1 for -2<m<0)."
        + " bott-min-modulus: smallest |eigenvalue| of V U V^+ U^+ (small = projector not local, index unreliable).";
  }

  @Override
  public List<Quantity> quantities() {
    return List.of(
        new Quantity("bott", true, "1", "Bott index, unrounded"),
        new Quantity(
            "bott-min-modulus",
            false,
            "1",
            "smallest |eigenvalue| of V U V^+ U^+ (near 1: well defined)"));
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
          "the Bott index is defined for d = 2 models; "
              + model.name()
              + " has d = "
              + model.dimension());
    }
    Optional<String> noChern = TenfoldOps.whyNoChernNumber("the Bott index", effectiveClass);
    if (noChern.isPresent()) {
      return noChern;
    }
    if (boundary != Boundary.PERIODIC) {
      return Optional.of("the Bott index needs \"boundary\": \"periodic\"");
    }
    return Optional.empty();
  }

  @Override
  public void compute(RealisationContext context, Map<String, Double> out) {
    BottIndexResult r =
        BottIndexKernel.compute(
            context.lattice(), context.occupiedStates(), context.workspace().bott);
    if (!r.converged()) {
      throw new ConvergenceFailure("general eigenvalue routine did not converge in the Bott index");
    }
    out.put("bott", r.bott());
    out.put("bott-min-modulus", r.smallestModulus());
  }
}
