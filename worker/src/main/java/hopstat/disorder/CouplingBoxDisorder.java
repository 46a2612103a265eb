package hopstat.disorder;

import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.model.Model;
import hopstat.model.ParameterValues;
import hopstat.model.Symmetry;
import hopstat.model.TransverseFieldChain;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.random.RandomGenerator;

/**
 * Random Ising couplings: J_j = J + W·u_j, u_j uniform in [−1/2, 1/2), one draw per bond j = 0, 1,
 * … (L−1 bonds open, L periodic, the closing bond L−1 → 0 last). Keeps every symmetry.
 */
public final class CouplingBoxDisorder implements DisorderKind, SliceDisorder {

  public static final String NAME = "coupling-box";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "transverse-field Ising chain: J_j = J + W*u_j, u uniform in [-1/2, 1/2), one draw per bond in bond order"
        + " (closing bond last on a periodic chain); keeps T, C, S";
  }

  @Override
  public Set<Symmetry> keptSymmetries(Model model) {
    return Set.of(Symmetry.TIME_REVERSAL, Symmetry.PARTICLE_HOLE, Symmetry.CHIRAL);
  }

  @Override
  public Optional<String> whyNotApplicable(Model model) {
    return model instanceof TransverseFieldChain
        ? Optional.empty()
        : Optional.of(
            NAME + " needs a transverse-field chain model (ising-chain), not " + model.name());
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
    TransverseFieldChain chain = (TransverseFieldChain) model;
    double w = term.strength();
    for (int bond = 0; bond < chain.bondCount(lattice); bond++) {
      chain.addCouplingShift(lattice, bond, w * (random.nextDouble() - 0.5), out);
    }
  }

  /** Slice n = site n of the chain: one draw for bond n (n → n+1), J_n = J + W u_n. */
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
    TransverseFieldChain chain = (TransverseFieldChain) model;
    chain.addCouplingShift(window, 0, term.strength() * (random.nextDouble() - 0.5), out);
  }
}
