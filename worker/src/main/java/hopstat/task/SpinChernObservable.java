package hopstat.task;

import hopstat.invariant.SpinBottKernel;
import hopstat.invariant.SpinBottResult;
import hopstat.invariant.SpinBottWorkspace;
import hopstat.lattice.Boundary;
import hopstat.model.Model;
import hopstat.model.SpinZOperator;
import hopstat.model.SymmetryCheckKernel;
import hopstat.model.SymmetryClass;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * {@code spin-chern}: Chern numbers of the two spin sectors of an S_z-conserving 2D sample and the
 * spin Chern number (C_↑ − C_↓)/2; fails a realisation whose Hamiltonian mixes spins.
 */
final class SpinChernObservable implements Observable {

  static final String NAME = "spin-chern";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "for S_z-conserving models (e.g. bhz with rashba = 0) on the periodic sample: chern-up / chern-down = Bott"
        + " indices (Loring & Hastings, EPL 92, 67004 (2010)) of the occupied spin-up / spin-down states,"
        + " spin-chern = (C_up - C_down)/2; for class AII the Z2 index is spin-chern mod 2 (Kane & Mele, PRL 95, 146802"
        + " (2005); Sheng et al., PRL 97, 036808 (2006)). A realisation whose H mixes spins fails (use z2).";
  }

  @Override
  public List<Quantity> quantities() {
    return List.of(
        new Quantity("chern-up", true, "1", "Bott index of the occupied spin-up states, unrounded"),
        new Quantity(
            "chern-down", true, "1", "Bott index of the occupied spin-down states, unrounded"),
        new Quantity("spin-chern", true, "1", "(chern-up - chern-down)/2, unrounded"));
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
          "the spin Chern number is defined here for d = 2 models; "
              + model.name()
              + " has d = "
              + model.dimension());
    }
    if (model.spinZ().isEmpty()) {
      return Optional.of("model " + model.name() + " declares no S_z operator");
    }
    if (boundary != Boundary.PERIODIC) {
      return Optional.of(
          "the spin Chern number (via Bott indices) needs \"boundary\": \"periodic\"");
    }
    return Optional.empty();
  }

  @Override
  public void compute(RealisationContext context, Map<String, Double> out) {
    SpinZOperator spin =
        context.model().spinZ().orElseThrow(() -> new IllegalStateException("no S_z operator"));
    double mixing = SpinBottKernel.relativeSpinMixing(context.denseHamiltonian(), spin);
    if (mixing > SymmetryCheckKernel.TOLERANCE) {
      throw new IllegalStateException(
          "the Hamiltonian does not conserve S_z (relative spin mixing " + mixing + "); use z2");
    }
    SpinBottWorkspace ws =
        context.workspace().scratch(SpinBottWorkspace.class, SpinBottWorkspace::new);
    SpinBottResult r =
        SpinBottKernel.compute(context.lattice(), context.occupiedStates(), spin, ws);
    if (!r.converged()) {
      throw new ConvergenceFailure(
          "an eigen-solver did not converge in the spin-resolved Bott index");
    }
    out.put("chern-up", r.bottUp());
    out.put("chern-down", r.bottDown());
    out.put("spin-chern", r.spinBott());
  }
}
