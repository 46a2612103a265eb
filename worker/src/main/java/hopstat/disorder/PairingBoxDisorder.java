package hopstat.disorder;

import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.model.Model;
import hopstat.model.PairingChain;
import hopstat.model.ParameterValues;
import hopstat.model.Symmetry;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.random.RandomGenerator;

/**
 * Random real p-wave pairing: Δ_j = delta + W·u_j, u_j uniform in [−1/2, 1/2), one draw per bond j
 * = 0, 1, … (closing bond last on a periodic chain). Real, so it keeps every symmetry.
 */
public final class PairingBoxDisorder implements DisorderKind, SliceDisorder {

  public static final String NAME = "pairing-box";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "BdG wire: delta_j = delta + W*u_j, u uniform in [-1/2, 1/2), one draw per bond in bond order; keeps T, C, S";
  }

  @Override
  public Set<Symmetry> keptSymmetries(Model model) {
    return Set.of(Symmetry.TIME_REVERSAL, Symmetry.PARTICLE_HOLE, Symmetry.CHIRAL);
  }

  @Override
  public Optional<String> whyNotApplicable(Model model) {
    return model instanceof PairingChain
        ? Optional.empty()
        : Optional.of(
            NAME + " needs a BdG wire with bond pairing (pwave-wire), not " + model.name());
  }

  @Override
  public Map<String, Set<String>> options() {
    return Map.of();
  }

  @Override
  public void apply(
      DisorderTerm term,
      Model model,
      ParameterValues parameters,
      Lattice lattice,
      RandomGenerator random,
      HamiltonianBuilder out) {
    PairingChain chain = (PairingChain) model;
    double w = term.strength();
    for (int bond = 0; bond < chain.bondCount(lattice); bond++) {
      chain.addPairingShift(lattice, bond, w * (random.nextDouble() - 0.5), out);
    }
  }

  /** Slice n = site n of the chain: one draw for bond n (n → n+1), Δ_n = delta + W u_n. */
  @Override
  public Optional<String> whyNotSliceable(Model model) {
    return model.dimension() == 1
        ? Optional.empty()
        : Optional.of(NAME + " is drawn slice by slice only on a chain");
  }

  @Override
  public void applyToSlice(
      DisorderTerm term,
      Model model,
      ParameterValues parameters,
      Lattice window,
      int sliceSites,
      RandomGenerator random,
      HamiltonianBuilder out) {
    PairingChain chain = (PairingChain) model;
    chain.addPairingShift(window, 0, term.strength() * (random.nextDouble() - 0.5), out);
  }
}
