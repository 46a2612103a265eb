package hopstat.disorder;

import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.model.ChiralChain;
import hopstat.model.Model;
import hopstat.model.ParameterValues;
import hopstat.model.Symmetry;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.random.RandomGenerator;

/**
 * Random real hoppings of a chiral chain: each selected hopping gets + W·u, u uniform in [−1/2,
 * 1/2). Option {@code bonds}: {@code intracell} (v_j = v + W u_j), {@code intercell} (w_j = w + W
 * u_j) or {@code all} (default, both, independent draws). Draw order: cell by cell, j = 0, 1, …;
 * within cell j first the intracell bond, then the intercell bond j (if it exists). Only A–B
 * hoppings change, so chiral symmetry is kept, and real values keep T: all of BDI survives.
 */
public final class BondBoxDisorder implements DisorderKind, SliceDisorder {

  public static final String NAME = "bond-box";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "chiral chain: W*u added to each selected hopping, u uniform in [-1/2, 1/2); bonds = intracell | intercell | all"
        + " (default); draws cell by cell, intracell before intercell; keeps T, C, S";
  }

  @Override
  public Set<Symmetry> keptSymmetries(Model model) {
    return Set.of(Symmetry.TIME_REVERSAL, Symmetry.PARTICLE_HOLE, Symmetry.CHIRAL);
  }

  @Override
  public Optional<String> whyNotApplicable(Model model) {
    return model instanceof ChiralChain
        ? Optional.empty()
        : Optional.of(NAME + " needs a chiral chain model (ssh), not " + model.name());
  }

  @Override
  public Map<String, Set<String>> options() {
    return Map.of("bonds", Set.of("intracell", "intercell", "all"));
  }

  @Override
  public void apply(
      DisorderTerm term,
      Model model,
      ParameterValues parameters,
      Lattice lattice,
      RandomGenerator random,
      HamiltonianBuilder out) {
    ChiralChain chain = (ChiralChain) model;
    String bonds = term.options().getOrDefault("bonds", "all");
    boolean intra = !"intercell".equals(bonds);
    boolean inter = !"intracell".equals(bonds);
    double w = term.strength();
    int intercellBonds = chain.intercellBondCount(lattice);
    for (int j = 0; j < lattice.sites(); j++) {
      if (intra) {
        chain.addIntracellShift(lattice, j, w * (random.nextDouble() - 0.5), out);
      }
      if (inter && j < intercellBonds) {
        chain.addIntercellShift(lattice, j, w * (random.nextDouble() - 0.5), out);
      }
    }
  }

  /**
   * Slice n = cell n of the chain, draws in the order of {@link #apply}: the intracell bond of cell
   * n, then the intercell bond n (cell n → n+1), each if selected.
   */
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
    ChiralChain chain = (ChiralChain) model;
    String bonds = term.options().getOrDefault("bonds", "all");
    double w = term.strength();
    if (!"intercell".equals(bonds)) {
      chain.addIntracellShift(window, 0, w * (random.nextDouble() - 0.5), out);
    }
    if (!"intracell".equals(bonds)) {
      chain.addIntercellShift(window, 0, w * (random.nextDouble() - 0.5), out);
    }
  }
}
