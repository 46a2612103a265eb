package hopstat.disorder;

import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.model.ChiralChain;
import hopstat.model.Model;
import hopstat.model.ParameterValues;
import hopstat.model.Symmetry;
import java.util.Map;
import java.util.Set;
import java.util.random.RandomGenerator;

/**
 * Independent Gaussian onsite potential V_s = W·g_s, g_s standard normal ({@link
 * RandomGenerator#nextGaussian()}), so W is the standard deviation; one draw per site in site-index
 * order, applied through {@link Model#addOnsitePotential} (a scalar potential, or a
 * chemical-potential/field shift for models that say so).
 */
public final class OnsiteGaussDisorder implements DisorderKind, SliceDisorder {

  public static final String NAME = "onsite-gauss";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "Gaussian onsite potential W*g, g ~ N(0,1) (W = standard deviation), one draw per site in site order,"
        + " through the model's onsite coupling (scalar potential, or chemical-potential/field shift where the model says so)";
  }

  /** As {@code onsite-box}: keeps T and, on BdG models, C; on a chiral chain only T. */
  @Override
  public Set<Symmetry> keptSymmetries(Model model) {
    if (model instanceof ChiralChain) {
      return Set.of(Symmetry.TIME_REVERSAL);
    }
    return Set.of(Symmetry.TIME_REVERSAL, Symmetry.PARTICLE_HOLE);
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
    for (int s = 0; s < lattice.sites(); s++) {
      model.addOnsitePotential(lattice, s, w * random.nextGaussian(), out);
    }
  }

  /** Slice n: one draw per site of the slice, in the slice's site order, as {@link #apply}. */
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
    for (int s = 0; s < sliceSites; s++) {
      model.addOnsitePotential(window, s, w * random.nextGaussian(), out);
    }
  }
}
