package hopstat.task;

import hopstat.invariant.BottIndexKernel;
import hopstat.invariant.BottIndexResult;
import hopstat.lattice.Boundary;
import hopstat.model.Model;
import hopstat.model.ParameterInfo;
import hopstat.model.ParameterValues;
import hopstat.model.SymmetryClass;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.ejml.data.ZMatrixRMaj;

/**
 * {@code bott-vs-ef}: the Bott index (Loring &amp; Hastings, EPL 92, 67004 (2010); see {@link
 * BottIndexKernel}, same sign convention as {@code bott}) at several Fermi energies from one
 * eigen-decomposition of the realisation: the mobility-gap picture, where the index stays quantised
 * while E_F moves through localised states and changes where states delocalise.
 *
 * <p>Fermi energies: {@code fermiEnergyCount} equally spaced values E_k = fermiEnergyMin + k·
 * (fermiEnergyMax − fermiEnergyMin)/(count − 1), k = 0..count−1 (E_0 = fermiEnergyMin when count =
 * 1). The spec's {@code fermiEnergy} is not used. Quantities {@code bott@E<k>} (index at E_k, the
 * states strictly below E_k occupied) and {@code bott@E<k>.energy} (E_k), names fixed for k &lt;
 * {@link #MAX_ENERGIES}; a realisation writes only k &lt; count.
 */
final class BottVersusFermiEnergyObservable implements Observable {

  static final String NAME = "bott-vs-ef";
  static final int MAX_ENERGIES = 32;

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "Bott index (Loring & Hastings, EPL 92, 67004 (2010); sign as 'bott') at fermiEnergyCount equally spaced"
        + " Fermi energies from fermiEnergyMin to fermiEnergyMax, from one eigen-decomposition; bott@E<k> is the index"
        + " with the states below E_k occupied, bott@E<k>.energy the energy E_k. Periodic d = 2 samples only.";
  }

  @Override
  public List<ParameterInfo> parameters() {
    return List.of(
        new ParameterInfo("fermiEnergyCount", null, "number of Fermi energies, 1.." + MAX_ENERGIES),
        new ParameterInfo("fermiEnergyMin", null, "lowest Fermi energy (model energy unit)"),
        new ParameterInfo("fermiEnergyMax", null, "highest Fermi energy (model energy unit)"));
  }

  @Override
  public List<Quantity> quantities() {
    List<Quantity> q = new ArrayList<>();
    for (int k = 0; k < MAX_ENERGIES; k++) {
      q.add(
          new Quantity(
              "bott@E" + k,
              true,
              "1",
              "Bott index with the states below Fermi energy E_" + k + " occupied, unrounded"));
    }
    for (int k = 0; k < MAX_ENERGIES; k++) {
      q.add(new Quantity("bott@E" + k + ".energy", false, "energy", "the Fermi energy E_" + k));
    }
    return q;
  }

  /** All eigenvectors are needed (they are computed once and sliced per Fermi energy). */
  @Override
  public boolean needsOccupiedStates() {
    return true;
  }

  @Override
  public Optional<String> whyNotApplicable(
      Model model, Boundary boundary, SymmetryClass effectiveClass) {
    return new BottObservable().whyNotApplicable(model, boundary, effectiveClass);
  }

  @Override
  public void compute(RealisationContext context, Map<String, Double> out) {
    ParameterValues p = context.point().parameters();
    for (String name : List.of("fermiEnergyCount", "fermiEnergyMin", "fermiEnergyMax")) {
      if (!p.has(name)) {
        throw new InvalidInputException(
            "parameters." + name, null, "the observable '" + NAME + "' needs it");
      }
    }
    double count = p.get("fermiEnergyCount");
    if (count != Math.rint(count) || count < 1 || count > MAX_ENERGIES) {
      throw new InvalidInputException(
          "parameters.fermiEnergyCount", count, "must be an integer in 1.." + MAX_ENERGIES);
    }
    double min = p.get("fermiEnergyMin");
    double max = p.get("fermiEnergyMax");
    if (!(max >= min)) {
      throw new InvalidInputException(
          "parameters.fermiEnergyMax", max, "must be >= fermiEnergyMin (" + min + ")");
    }
    int n = (int) count;
    for (int k = 0; k < n; k++) {
      double energy = n == 1 ? min : min + k * (max - min) / (n - 1);
      ZMatrixRMaj occupied = context.eigenvectorsInWindow(Double.NEGATIVE_INFINITY, energy);
      BottIndexResult r =
          BottIndexKernel.compute(context.lattice(), occupied, context.workspace().bott);
      if (!r.converged()) {
        throw new ConvergenceFailure(
            "general eigenvalue routine did not converge in the Bott index at E_F = " + energy);
      }
      out.put("bott@E" + k, r.bott());
      out.put("bott@E" + k + ".energy", energy);
    }
  }
}
