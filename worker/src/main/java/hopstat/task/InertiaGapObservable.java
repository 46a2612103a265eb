package hopstat.task;

import hopstat.lattice.Boundary;
import hopstat.model.Model;
import hopstat.model.SymmetryClass;
import hopstat.spectrum.InertiaGapKernel;
import hopstat.spectrum.InertiaGapResult;
import hopstat.spectrum.SliceInertiaWorkspace;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * {@code gap-inertia}: the gap around E_F by eigenvalue counting (inertia of H − E), no
 * diagonalisation.
 */
final class InertiaGapObservable implements Observable {

  static final String NAME = "gap-inertia";

  /** Absolute bisection width in energy units (the gap is accurate to ± this). */
  static final double TOLERANCE = 1e-5;

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "gap-inertia = E_above - E_below around E_F (as gap), found without diagonalisation: the count of eigenvalues"
        + " below E is the number of negative pivots of an LDL^H factorisation of H - E (Sylvester's law), swept slice by"
        + " slice; both gap edges by bisection on the counts to +-1e-5 (energy units). Open samples (the slice sweep needs"
        + " open boundaries along x). states-below-fermi: number of eigenvalues below E_F.";
  }

  @Override
  public List<Quantity> quantities() {
    return List.of(
        new Quantity(
            "gap-inertia", false, "energy", "E_above - E_below around the Fermi energy, +-1e-5"),
        new Quantity(
            "states-below-fermi",
            true,
            "1",
            "number of eigenvalues below E_F (integrated density of states times N)"));
  }

  @Override
  public boolean needsOccupiedStates() {
    return false;
  }

  @Override
  public boolean needsDenseMatrix() {
    return false;
  }

  @Override
  public Optional<String> whyNotApplicable(
      Model model, Boundary boundary, SymmetryClass effectiveClass) {
    if (model.dimension() < 1) {
      return Optional.of(
          "gap-inertia slices the sample along x; " + model.name() + " has no positions (d = 0)");
    }
    if (boundary != Boundary.OPEN) {
      return Optional.of(
          "gap-inertia needs \"boundary\": \"open\" (the slice sweep cannot follow a periodic wrap)");
    }
    return Optional.empty();
  }

  @Override
  public void compute(RealisationContext context, Map<String, Double> out) {
    SliceInertiaWorkspace ws =
        context.workspace().scratch(SliceInertiaWorkspace.class, SliceInertiaWorkspace::new);
    InertiaGapResult r =
        InertiaGapKernel.compute(
            context.terms(), context.lattice(), context.fermiEnergy(), TOLERANCE, ws);
    if (Double.isNaN(r.gap())) {
      throw new IllegalStateException(
          "the Fermi energy " + context.fermiEnergy() + " lies outside the spectrum");
    }
    out.put("gap-inertia", r.gap());
    out.put("states-below-fermi", (double) r.statesBelow());
  }
}
