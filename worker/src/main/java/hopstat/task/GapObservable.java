package hopstat.task;

import hopstat.lattice.Boundary;
import hopstat.model.Model;
import hopstat.model.SymmetryClass;
import hopstat.spectrum.SpectralGapKernel;
import hopstat.spectrum.SpectralGapResult;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** {@code gap}: the spectral gap containing E_F and the distance from E_F to the nearest level. */
final class GapObservable implements Observable {

  static final String NAME = "gap";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "gap = E_above - E_below, the spectral gap containing the Fermi energy (E_below: highest eigenvalue"
        + " below E_F, E_above: lowest at or above); fermi-gap = distance from E_F to the nearest eigenvalue."
        + " Energies in the model's unit. Finite samples: the clean gap is the minimum of |d(k)| over the k-mesh.";
  }

  @Override
  public List<Quantity> quantities() {
    return List.of(
        new Quantity("gap", false, "energy", "E_above - E_below around the Fermi energy"),
        new Quantity(
            "fermi-gap",
            false,
            "energy",
            "distance from the Fermi energy to the nearest eigenvalue"));
  }

  @Override
  public boolean needsOccupiedStates() {
    return false;
  }

  @Override
  public Optional<String> whyNotApplicable(
      Model model, Boundary boundary, SymmetryClass effectiveClass) {
    return Optional.empty();
  }

  @Override
  public void compute(RealisationContext context, Map<String, Double> out) {
    SpectralGapResult r =
        SpectralGapKernel.compute(context.spectrum(), context.dimension(), context.fermiEnergy());
    if (Double.isNaN(r.gap())) {
      throw new IllegalStateException(
          "the Fermi energy "
              + context.fermiEnergy()
              + " lies outside the spectrum ["
              + context.spectrum()[0]
              + ", "
              + context.spectrum()[context.dimension() - 1]
              + "]");
    }
    out.put("gap", r.gap());
    out.put("fermi-gap", r.fermiDistance());
  }
}
