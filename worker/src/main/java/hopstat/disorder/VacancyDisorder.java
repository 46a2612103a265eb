package hopstat.disorder;

import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.model.ChiralChain;
import hopstat.model.CustomModel;
import hopstat.model.Model;
import hopstat.model.ParameterValues;
import hopstat.model.Symmetry;
import hopstat.task.InvalidInputException;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.random.RandomGenerator;

/**
 * Site dilution: the strength is the vacancy concentration c ∈ [0, 1); each lattice site is removed
 * independently with probability c, one draw per site in site-index order (site s is removed iff
 * {@code random.nextDouble() < c}; every site draws, so the number of draws is the number of sites
 * whatever c is).
 *
 * <p>Removal keeps the matrix dimension and the L^d lattice structure that kernels rely on: every
 * term present when the vacancies are applied (clean terms and earlier disorder) that touches an
 * orbital of a removed site is set to zero ({@link HamiltonianBuilder#zeroTermsTouching}), and the
 * removed site then gets the onsite potential U through {@link Model#addOnsitePotential}: U on
 * every orbital of a normal model, ±U on the particle/hole orbitals of a BdG model (which of the
 * two is the particle level depends on the model's potential convention: pip-square and custom
 * models add +U to particles, pwave-wire reads V as a chemical-potential shift and puts the
 * particle at −U; ising-chain reads it as a transverse-field shift, which gives ±2U), so
 * particle–hole symmetry survives. Each removed site is thus an exactly decoupled block with levels
 * at ±U only (±2U on ising-chain), and the rest of the spectrum is exactly that of the sample with
 * those sites deleted.
 *
 * <p>Rule for U: U = {@value #LEVEL_FACTOR} · R, R the Gershgorin radius max_i Σ_j |H_ij| of the
 * terms present before the removal (triangle-inequality bound, terms summed by absolute value; 1 if
 * all terms vanish). By Cauchy interlacing the diluted sample's spectrum lies in [−R, R], so the
 * vacancy levels are at least 999 R away from every other level. Observables that scale or bin by
 * the whole spectrum are rejected with this kind ({@link #hasDecoupledLevels()}): KPM (its
 * Chebyshev rescaling would stretch by 10³), level statistics and IPR without explicit windows, and
 * the localizer with automatic kappa; {@code lyapunov} too, as this kind is not drawn slice by
 * slice ({@link SliceDisorder} not implemented). Gaps at E_F, Bott/Chern/Majorana invariants are
 * unaffected: a decoupled level is an eigenvector localised on one site, which contributes nothing
 * (or the same factor to both Pfaffians of the Majorana number).
 *
 * <p>Order: terms added by later disorder terms would not be cancelled, so vacancies must be the
 * last disorder term ({@link #whyNotBefore}). Symmetry: the real potential keeps T and, with the
 * BdG sign rule, C; a site at +U on every orbital breaks a sublattice symmetry (the ssh chain's C
 * and S, a custom non-BdG model's C and S), so those keep only T.
 */
public final class VacancyDisorder implements DisorderKind {

  public static final String NAME = "vacancies";

  /** U in units of the Gershgorin radius of the sample before removal. */
  public static final double LEVEL_FACTOR = 1000.0;

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "site dilution: strength = concentration c in [0, 1); each site removed with probability c (one draw per site in site"
        + " order); a removed site's terms are cancelled and its orbitals put at +-U, U = 1000 x the Gershgorin radius (BdG sign"
        + " rule); must be the last disorder term; keeps T and C (only T on ssh and non-BdG custom models)";
  }

  @Override
  public Set<Symmetry> keptSymmetries(Model model) {
    if (model instanceof ChiralChain
        || (model instanceof CustomModel c && !c.definition().isBdg())) {
      return Set.of(Symmetry.TIME_REVERSAL);
    }
    return Set.of(Symmetry.TIME_REVERSAL, Symmetry.PARTICLE_HOLE);
  }

  @Override
  public Optional<String> whyNotApplicable(Model model) {
    return model.dimension() == 0
        ? Optional.of(
            NAME
                + " removes lattice sites; "
                + model.name()
                + " is zero-dimensional (no lattice to dilute)")
        : Optional.empty();
  }

  @Override
  public Optional<String> whyNotValidStrength(double strength) {
    return strength >= 0 && strength < 1
        ? Optional.empty()
        : Optional.of(
            "the strength of " + NAME + " is the vacancy concentration: must lie in [0, 1)");
  }

  @Override
  public Optional<String> whyNotBefore(DisorderKind later) {
    return Optional.of(
        NAME
            + " must be the last disorder term: it cancels only the terms present when it is applied, so "
            + later.name()
            + " would act on removed sites");
  }

  @Override
  public boolean hasDecoupledLevels() {
    return true;
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
    double c = term.strength();
    whyNotValidStrength(c)
        .ifPresent(
            reason -> {
              throw new InvalidInputException("disorder.strength", c, reason);
            });
    int sites = lattice.sites();
    int orbitals = lattice.orbitalsPerSite();
    boolean[] removedOrbital = new boolean[lattice.orbitals()];
    boolean[] removedSite = new boolean[sites];
    boolean any = false;
    for (int s = 0; s < sites; s++) {
      if (random.nextDouble() < c) {
        removedSite[s] = true;
        any = true;
        for (int o = 0; o < orbitals; o++) {
          removedOrbital[s * orbitals + o] = true;
        }
      }
    }
    if (!any) {
      return;
    }
    double level = LEVEL_FACTOR * gershgorinRadius(out);
    out.zeroTermsTouching(removedOrbital);
    for (int s = 0; s < sites; s++) {
      if (removedSite[s]) {
        model.addOnsitePotential(lattice, s, level, out);
      }
    }
  }

  /**
   * max_i Σ_j |H_ij| over the stored terms (each off-diagonal term counts in both rows); 1 if all
   * vanish.
   */
  static double gershgorinRadius(HamiltonianBuilder terms) {
    double[] rowSums = new double[terms.dimension()];
    for (int k = 0; k < terms.termCount(); k++) {
      double a = Math.hypot(terms.realPart(k), terms.imaginaryPart(k));
      int i = terms.row(k);
      int j = terms.column(k);
      rowSums[i] += a;
      if (i != j) {
        rowSums[j] += a;
      }
    }
    double r = 0;
    for (double v : rowSums) {
      r = Math.max(r, v);
    }
    return r > 0 ? r : 1.0;
  }
}
