package hopstat.task;

import hopstat.invariant.RealSpaceWindingKernel;
import hopstat.invariant.WindingResult;
import hopstat.invariant.WindingWorkspace;
import hopstat.lattice.Boundary;
import hopstat.model.ChiralChain;
import hopstat.model.CustomModel;
import hopstat.model.Model;
import hopstat.model.SymmetryClass;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** {@code winding}: real-space winding number of a chiral chain at E_F = 0. */
final class WindingObservable implements Observable {

  static final String NAME = "winding";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "real-space winding number nu = T{Q_-+ [X, Q_+-]}, Q = 1 - 2P (Mondragon-Shem, Hughes, Song, Prodan, PRL 113,"
        + " 046802 (2014)), trace per cell over the central cells [L/4, L - L/4) of the open chain; needs chiral symmetry,"
        + " boundary open and fermiEnergy 0. Sign: ssh gives +1 for |v| < |w|.";
  }

  @Override
  public List<Quantity> quantities() {
    return List.of(
        new Quantity(
            "winding",
            true,
            "1",
            "real-space winding number, unrounded (ssh: 1 iff |v| < |w| clean)"));
  }

  @Override
  public boolean needsOccupiedStates() {
    return true;
  }

  @Override
  public Optional<String> whyNotApplicable(
      Model model, Boundary boundary, SymmetryClass effectiveClass) {
    boolean sublatticeChain =
        model instanceof ChiralChain || (model instanceof CustomModel c && c.isSublatticeChain());
    if (!sublatticeChain || model.dimension() != 1) {
      return Optional.of(
          "the winding is implemented for one-dimensional chiral chains (ssh, or a custom chain with two orbitals and S = diag(1, -1)); "
              + model.name()
              + " is not one");
    }
    if (!effectiveClass.hasChiral()) {
      return Optional.of(
          "the winding needs chiral symmetry; the disorder leaves class " + effectiveClass);
    }
    if (boundary != Boundary.OPEN) {
      return Optional.of(
          "the real-space winding uses the position operator of the open chain: needs \"boundary\": \"open\"");
    }
    return Optional.empty();
  }

  @Override
  public void compute(RealisationContext context, Map<String, Double> out) {
    if (context.fermiEnergy() != 0.0) {
      throw new IllegalStateException(
          "the winding is defined at the chiral point: fermiEnergy must be 0, got "
              + context.fermiEnergy());
    }
    WindingWorkspace ws =
        context.workspace().scratch(WindingWorkspace.class, WindingWorkspace::new);
    WindingResult r =
        RealSpaceWindingKernel.compute(context.lattice(), context.occupiedStates(), ws);
    out.put("winding", r.winding());
  }
}
