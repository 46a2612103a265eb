package hopstat.task;

import hopstat.invariant.SpinBottResult;
import hopstat.lattice.Boundary;
import hopstat.model.Model;
import hopstat.model.SymmetryClass;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * {@code spin-bott}: the unrounded spin Bott index behind the class AII {@code z2}, and the gap of
 * P S_z P that decides whether it is defined. For models that declare S_z, conserved or not.
 */
final class SpinBottObservable implements Observable {

  static final String NAME = "spin-bott";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "spin Bott index (B+ - B-)/2 on the periodic sample, B+/- the Bott indices (Loring & Hastings, EPL 92, 67004"
        + " (2010)) of the occupied states with positive/negative eigenvalue of P S_z P (Prodan, PRB 80, 125327 (2009);"
        + " Huang & Liu, PRL 121, 126401 (2018)); spin-bott-gap = min |eigenvalue of P S_z P| (1 when S_z is conserved,"
        + " the index is defined while it stays away from 0). Needs a model that declares S_z (e.g. bhz).";
  }

  @Override
  public List<Quantity> quantities() {
    return List.of(
        new Quantity(
            "spin-bott",
            true,
            "1",
            "spin Bott index (B+ - B-)/2, unrounded; class AII: z2 = spin-bott mod 2"),
        new Quantity(
            "spin-bott-gap", false, "1", "min |eigenvalue| of P S_z P in the occupied space"));
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
          "the spin Bott index is defined for d = 2 models; "
              + model.name()
              + " has d = "
              + model.dimension());
    }
    if (model.spinZ().isEmpty()) {
      return Optional.of("model " + model.name() + " declares no S_z operator");
    }
    if (boundary != Boundary.PERIODIC) {
      return Optional.of("the spin Bott index needs \"boundary\": \"periodic\"");
    }
    return Optional.empty();
  }

  @Override
  public void compute(RealisationContext context, Map<String, Double> out) {
    SpinBottResult r = Z2ClassAii2d.spinBott(context);
    out.put("spin-bott", r.spinBott());
    out.put("spin-bott-gap", r.spinGap());
  }
}
