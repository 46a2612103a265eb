package hopstat.disorder;

import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.model.Model;
import hopstat.model.ParameterValues;
import hopstat.model.Symmetry;
import hopstat.model.ZeemanCoupling;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.random.RandomGenerator;

/**
 * Random Zeeman field along the spin axis z, h_s = W·u_s with u_s uniform in [−1/2, 1/2), one draw
 * per site in site-index order, added as h_s (n_↑ − n_↓) through {@link ZeemanCoupling}. A Zeeman
 * term is odd under T = i s_y K and, written in BdG form, particle–hole symmetric: it keeps only C,
 * so a class-DIII wire becomes class D.
 */
public final class ZeemanBoxDisorder implements DisorderKind {

  public static final String NAME = "zeeman-box";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "uniform random Zeeman field h_s = W*u, u in [-1/2, 1/2), one draw per site, h_s (n_up - n_dn); spinful BdG"
        + " models (diii-wire); breaks T, keeps C (DIII -> D)";
  }

  @Override
  public Set<Symmetry> keptSymmetries(Model model) {
    return Set.of(Symmetry.PARTICLE_HOLE);
  }

  @Override
  public Optional<String> whyNotApplicable(Model model) {
    return model instanceof ZeemanCoupling
        ? Optional.empty()
        : Optional.of(
            NAME
                + " needs a spinful model with a Zeeman coupling (diii-wire), not "
                + model.name());
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
    ZeemanCoupling zeeman = (ZeemanCoupling) model;
    double w = term.strength();
    for (int s = 0; s < lattice.sites(); s++) {
      zeeman.addZeemanField(lattice, s, w * (random.nextDouble() - 0.5), out);
    }
  }
}
