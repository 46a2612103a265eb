package hopstat.disorder;

import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.model.Model;
import hopstat.model.ParameterValues;
import hopstat.model.Symmetry;
import java.util.Map;
import java.util.Set;
import java.util.random.RandomGenerator;

/**
 * Independent uniform onsite potential V_s = W·u_s, u_s uniform in [−1/2, 1/2), one draw per site
 * in site-index order. With {@code orbitals = same} (default) V_s is added to every orbital of the
 * site, i.e. a scalar potential (keeps time reversal, breaks chiral/sublattice symmetry); with
 * {@code orbitals = independent} every orbital gets its own draw, in matrix-index order. BdG models
 * receive V as a shift of the chemical potential (see {@link Model#addOnsitePotential}).
 */
public final class OnsiteBoxDisorder implements DisorderKind, SliceDisorder {

  public static final String NAME = "onsite-box";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "uniform onsite potential W*u, u in [-1/2, 1/2), one draw per site (orbitals=same, default)"
        + " or per orbital (orbitals=independent)";
  }

  /**
   * A real onsite potential keeps T and (as a chemical-potential shift) C; it breaks S on its own.
   * On a non-BdG chiral chain (e.g. ssh) the particle–hole symmetry is the sublattice one, so it
   * keeps only T there.
   */
  @Override
  public Set<Symmetry> keptSymmetries(Model model) {
    if (model instanceof hopstat.model.ChiralChain) {
      return Set.of(Symmetry.TIME_REVERSAL);
    }
    return Set.of(Symmetry.TIME_REVERSAL, Symmetry.PARTICLE_HOLE);
  }

  @Override
  public Map<String, Set<String>> options() {
    return Map.of("orbitals", Set.of("same", "independent"));
  }

  @Override
  public void apply(
      DisorderTerm term,
      Model model,
      ParameterValues parameters,
      Lattice lattice,
      RandomGenerator random,
      HamiltonianBuilder out) {
    double w = term.strength();
    boolean independent = "independent".equals(term.options().getOrDefault("orbitals", "same"));
    int orbitals = lattice.orbitalsPerSite();
    for (int s = 0; s < lattice.sites(); s++) {
      if (independent) {
        for (int o = 0; o < orbitals; o++) {
          model.addOrbitalPotential(lattice, s, o, w * (random.nextDouble() - 0.5), out);
        }
      } else {
        model.addOnsitePotential(lattice, s, w * (random.nextDouble() - 0.5), out);
      }
    }
  }

  /**
   * Slice n: one draw per site of the slice (or per orbital), in the slice's site order, as {@link
   * #apply}.
   */
  @Override
  public void applyToSlice(
      DisorderTerm term,
      Model model,
      ParameterValues parameters,
      Lattice window,
      int sliceSites,
      RandomGenerator random,
      HamiltonianBuilder out) {
    double w = term.strength();
    boolean independent = "independent".equals(term.options().getOrDefault("orbitals", "same"));
    int orbitals = window.orbitalsPerSite();
    for (int s = 0; s < sliceSites; s++) {
      if (independent) {
        for (int o = 0; o < orbitals; o++) {
          model.addOrbitalPotential(window, s, o, w * (random.nextDouble() - 0.5), out);
        }
      } else {
        model.addOnsitePotential(window, s, w * (random.nextDouble() - 0.5), out);
      }
    }
  }
}
