package hopstat.task;

import hopstat.invariant.SpinBottKernel;
import hopstat.invariant.SpinBottResult;
import hopstat.invariant.SpinBottWorkspace;
import hopstat.lattice.Boundary;
import hopstat.model.Model;
import hopstat.model.SpinZOperator;
import hopstat.model.SymmetryClass;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * {@code z2}: the Z2 index, dispatching on the effective class and dimension. Implemented here:
 * class AII in d = 2, via the spin Chern number of the P S_z P splitting (Prodan, PRB 80, 125327
 * (2009)) evaluated with Bott indices ({@link SpinBottKernel}); S_z need not be conserved, only
 * declared by the model. Other (class, d) combinations are reported as not applicable.
 */
final class Z2Observable implements Observable {

  static final String NAME = "z2";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "Z2 index nu in {0, 1} (1 = non-trivial). Class AII, d = 2, periodic sample: nu = (spin Chern number) mod 2,"
        + " spin Chern number = (B+ - B-)/2 with B+/- the Bott indices of the occupied states with positive/negative"
        + " eigenvalue of P S_z P (Prodan, PRB 80, 125327 (2009); spin Bott index of Huang & Liu, PRL 121, 126401 (2018));"
        + " valid while z2-spin-gap (min |eig P S_z P|) stays away from 0; needs a model that declares S_z.";
  }

  @Override
  public List<Quantity> quantities() {
    return List.of(
        new Quantity("z2", true, "1", "Z2 index, 0 trivial, 1 non-trivial"),
        new Quantity("z2-spin-bott", true, "1", "class AII d = 2: spin Chern number (B+ - B-)/2, unrounded"),
        new Quantity("z2-spin-gap", false, "1", "class AII d = 2: min |eigenvalue| of P S_z P (1 if S_z conserved)"));
  }

  @Override
  public boolean needsOccupiedStates() {
    return true;
  }

  @Override
  public Optional<String> whyNotApplicable(Model model, Boundary boundary, SymmetryClass effectiveClass) {
    if (effectiveClass == SymmetryClass.AII && model.dimension() == 2) {
      if (model.spinZ().isEmpty()) {
        return Optional.of("z2 for class AII in d = 2 uses the spin Chern number and needs a model that declares S_z; "
            + model.name() + " does not");
      }
      if (boundary != Boundary.PERIODIC) {
        return Optional.of("z2 for class AII in d = 2 needs \"boundary\": \"periodic\"");
      }
      return Optional.empty();
    }
    return Optional.of("z2 is implemented for class AII in d = 2; the point has class " + effectiveClass + " in d = " + model.dimension());
  }

  @Override
  public void compute(RealisationContext context, Map<String, Double> out) {
    Model model = context.model();
    SymmetryClass effective = SymmetryCheckOps.effectiveClass(model, context.point().disorder());
    if (effective == SymmetryClass.AII && model.dimension() == 2) {
      computeClassAii2d(context, out);
      return;
    }
    throw new IllegalStateException("z2 is not implemented for class " + effective + " in d = " + model.dimension());
  }

  private static void computeClassAii2d(RealisationContext context, Map<String, Double> out) {
    SpinZOperator spin = context.model().spinZ().orElseThrow(() -> new IllegalStateException("no S_z operator"));
    SpinBottWorkspace ws = context.workspace().scratch(SpinBottWorkspace.class, SpinBottWorkspace::new);
    SpinBottResult r = SpinBottKernel.compute(context.lattice(), context.occupiedStates(), spin, ws);
    if (!r.converged()) {
      throw new ConvergenceFailure("an eigen-solver did not converge in the spin-resolved Bott index");
    }
    out.put("z2", r.z2());
    out.put("z2-spin-bott", r.spinBott());
    out.put("z2-spin-gap", r.spinGap());
  }
}
