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
 * Random transverse field of an Ising chain: h_j = h + W·u_j, u_j uniform in [−1/2, 1/2), one draw
 * per site j = 0, 1, …, L−1. Real, so it keeps every symmetry of the chain.
 */
public final class FieldBoxDisorder implements DisorderKind, SliceDisorder {

  public static final String NAME = "field-box";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "transverse-field Ising chain: h_j = h + W*u_j, u uniform in [-1/2, 1/2), one draw per site in site order; keeps T, C, S";
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
    for (int j = 0; j < lattice.sites(); j++) {
      chain.addFieldShift(lattice, j, w * (random.nextDouble() - 0.5), out);
    }
  }

  /** Slice n = site n of the chain: one draw, h_n = h + W u_n. */
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
    double w = term.strength();
    for (int j = 0; j < sliceSites; j++) {
      chain.addFieldShift(window, j, w * (random.nextDouble() - 0.5), out);
    }
  }
}
