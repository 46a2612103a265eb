package hopstat.task;

import hopstat.invariant.SpinBottKernel;
import hopstat.invariant.SpinBottResult;
import hopstat.invariant.SpinBottWorkspace;
import hopstat.lattice.Boundary;
import hopstat.model.Model;
import hopstat.model.SpinZOperator;
import java.util.Map;
import java.util.Optional;

/**
 * The class AII, d = 2 branch of the {@code z2} observable: ν = (spin Chern number) mod 2, the spin
 * Chern number from the splitting of the occupied projector by P S_z P (Prodan, PRB 80, 125327
 * (2009)) with each half's Chern number evaluated as a Bott index ({@link SpinBottKernel}; "spin
 * Bott index", Huang &amp; Liu, PRL 121, 126401 (2018)). S_z need not be conserved, only declared
 * by the model ({@link Model#spinZ()}); the splitting must stay gapped.
 */
final class Z2ClassAii2d {

  /**
   * Below this min |eig P S_z P| the split into P₊ and P₋ is numerically ill-defined and the
   * realisation fails (round-off scale, not a physics threshold; the spin-bott-gap quantity of the
   * {@code spin-bott} observable shows how close realisations come).
   */
  static final double MIN_SPIN_GAP = 1e-6;

  private Z2ClassAii2d() {}

  static String description() {
    return "class AII, d = 2, periodic sample: z2 = (spin Chern number) mod 2, spin Chern number = (B+ - B-)/2 with"
        + " B+/- the Bott indices of the occupied states with positive/negative eigenvalue of P S_z P (Prodan, PRB 80,"
        + " 125327 (2009); spin Bott index, Huang & Liu, PRL 121, 126401 (2018)); needs a model that declares S_z"
        + " (e.g. bhz; S_z need not be conserved); fails a realisation where P S_z P has an eigenvalue within 1e-6 of 0.";
  }

  static Optional<String> whyNotApplicable(Model model, Boundary boundary) {
    if (model.spinZ().isEmpty()) {
      return Optional.of(
          "z2 for class AII in d = 2 uses the spin Chern number and needs a model that declares S_z; "
              + model.name()
              + " does not");
    }
    if (boundary != Boundary.PERIODIC) {
      return Optional.of("z2 for class AII in d = 2 needs \"boundary\": \"periodic\"");
    }
    return Optional.empty();
  }

  /** Puts {@code z2} (0 or 1); needs the context's occupied states. */
  static void compute(RealisationContext context, Map<String, Double> out) {
    SpinBottResult r = spinBott(context);
    if (!(r.spinGap() >= MIN_SPIN_GAP)) {
      throw new IllegalStateException(
          "P S_z P has an eigenvalue "
              + r.spinGap()
              + " within "
              + MIN_SPIN_GAP
              + " of 0: the spin splitting, hence z2, is undefined");
    }
    out.put("z2", r.z2());
  }

  /** The spin-resolved Bott indices of the context's occupied states. */
  static SpinBottResult spinBott(RealisationContext context) {
    SpinZOperator spin =
        context.model().spinZ().orElseThrow(() -> new IllegalStateException("no S_z operator"));
    SpinBottWorkspace ws =
        context.workspace().scratch(SpinBottWorkspace.class, SpinBottWorkspace::new);
    SpinBottResult r =
        SpinBottKernel.compute(context.lattice(), context.occupiedStates(), spin, ws);
    if (!r.converged()) {
      throw new ConvergenceFailure(
          "an eigen-solver did not converge in the spin-resolved Bott index");
    }
    return r;
  }
}
