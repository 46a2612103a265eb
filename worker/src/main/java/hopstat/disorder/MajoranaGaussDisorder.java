package hopstat.disorder;

import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.model.MajoranaForm;
import hopstat.model.MajoranaOps;
import hopstat.model.Model;
import hopstat.model.ParameterValues;
import hopstat.model.Symmetry;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.random.RandomGenerator;

/**
 * All-to-all random Majorana couplings of a zero-dimensional cluster: A_{mn} += W·g_{mn} (A_{nm} −=
 * W·g_{mn}), g standard normal, for every pair m &lt; n of the 2·sites Majoranas, drawn row by row
 * (m ascending, then n ascending). A real antisymmetric Gaussian A is the class-D ensemble: only
 * particle–hole symmetry is kept.
 */
public final class MajoranaGaussDisorder implements DisorderKind {

  public static final String NAME = "majorana-gauss";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "d = 0 Majorana cluster: A_mn += W*g_mn, g ~ N(0,1) (W = standard deviation), every pair m < n, row by row;"
        + " keeps only C (class D)";
  }

  @Override
  public Set<Symmetry> keptSymmetries(Model model) {
    return Set.of(Symmetry.PARTICLE_HOLE);
  }

  @Override
  public Optional<String> whyNotApplicable(Model model) {
    return model instanceof MajoranaForm && model.dimension() == 0
        ? Optional.empty()
        : Optional.of(
            NAME
                + " needs a zero-dimensional Majorana model (majorana-cluster), not "
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
    double w = term.strength();
    int count = 2 * lattice.sites();
    for (int m = 0; m < count; m++) {
      for (int n = m + 1; n < count; n++) {
        MajoranaOps.addCoupling(m, n, w * random.nextGaussian(), out);
      }
    }
  }
}
