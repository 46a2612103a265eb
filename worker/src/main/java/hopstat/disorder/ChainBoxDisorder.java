package hopstat.disorder;

import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.model.Model;
import hopstat.model.ParameterValues;
import hopstat.model.Symmetry;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.random.RandomGenerator;

/**
 * Box disorder on one real coupling of a chain model: coupling_i = value + W·u_i, u_i uniform in
 * [−1/2, 1/2), one draw per coupling in index order. Real shifts keep every symmetry of the chain.
 * Drawn slice by slice for {@code lyapunov} too: slice n draws the couplings that belong to it (its
 * sites, or the bond n → n+1), in the same order.
 *
 * @param <C> the model capability that owns the coupling (e.g. {@code PairingChain})
 */
abstract class ChainBoxDisorder<C> implements DisorderKind, SliceDisorder {

  private final String name;
  private final String description;
  private final Class<C> chainType;
  private final String requirement;

  /**
   * @param name the spec's disorder type
   * @param description shown by {@code hopstat models}
   * @param chainType models must implement it
   * @param requirement what a model needs, for the error message (e.g. "a BdG wire (pwave-wire)")
   */
  ChainBoxDisorder(String name, String description, Class<C> chainType, String requirement) {
    this.name = name;
    this.description = description;
    this.chainType = chainType;
    this.requirement = requirement;
  }

  /** Number of random couplings on {@code lattice}, drawn in index order 0, 1, …. */
  abstract int couplingCount(C chain, Lattice lattice);

  /** Number of couplings slice n draws, given the sites of one slice. */
  abstract int sliceCouplingCount(int sliceSites);

  /** Adds {@code delta} to coupling {@code index}. */
  abstract void addShift(C chain, Lattice lattice, int index, double delta, HamiltonianBuilder out);

  @Override
  public final String name() {
    return name;
  }

  @Override
  public final String description() {
    return description;
  }

  @Override
  public final Set<Symmetry> keptSymmetries(Model model) {
    return Set.of(Symmetry.TIME_REVERSAL, Symmetry.PARTICLE_HOLE, Symmetry.CHIRAL);
  }

  @Override
  public final Optional<String> whyNotApplicable(Model model) {
    return chainType.isInstance(model)
        ? Optional.empty()
        : Optional.of(name + " needs " + requirement + ", not " + model.name());
  }

  @Override
  public final Map<String, Set<String>> options() {
    return Map.of();
  }

  @Override
  public final void apply(
      DisorderTerm term,
      Model model,
      ParameterValues parameters,
      Lattice lattice,
      RandomGenerator random,
      HamiltonianBuilder out) {
    C chain = chainType.cast(model);
    double w = term.strength();
    int count = couplingCount(chain, lattice);
    for (int i = 0; i < count; i++) {
      addShift(chain, lattice, i, w * (random.nextDouble() - 0.5), out);
    }
  }

  @Override
  public final void applyToSlice(
      DisorderTerm term,
      Model model,
      ParameterValues parameters,
      Lattice window,
      int sliceSites,
      RandomGenerator random,
      HamiltonianBuilder out) {
    C chain = chainType.cast(model);
    double w = term.strength();
    int count = sliceCouplingCount(sliceSites);
    for (int i = 0; i < count; i++) {
      addShift(chain, window, i, w * (random.nextDouble() - 0.5), out);
    }
  }
}
