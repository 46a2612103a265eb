package hopstat.task;

import hopstat.invariant.ChiralLocalizerKernel;
import hopstat.invariant.ChiralLocalizerWorkspace;
import hopstat.invariant.SpectralLocalizerKernel;
import hopstat.lattice.Boundary;
import hopstat.model.ChiralChain;
import hopstat.model.CustomModel;
import hopstat.model.Model;
import hopstat.model.ParameterInfo;
import hopstat.model.SymmetryClass;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * {@code winding-localizer}: the winding number of a chiral chain from the odd spectral localizer
 * (no diagonalisation).
 */
final class LocalizerWindingObservable implements Observable {

  static final String NAME = "winding-localizer";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "winding number of a chiral chain from the odd spectral localizer (Loring & Schulz-Baldes, arXiv:1701.07455;"
        + " Loring, Ann. Phys. 356, 383 (2015)) on the OPEN chain at the chiral point: -sig(L_kappa)/2 with"
        + " L_kappa = [[kappa(X-x0), A], [A^H, -kappa(X-x0)]] = H + kappa(X-x0)S in the chiral basis S = diag(1, -1)"
        + " (orbital 0 = A, 1 = B), X the cell position, x0 the chain centre; same sign as winding (ssh: +1 for |v| < |w|)."
        + " The signature is counted by an LDL^H (Bunch-Kaufman) sweep cell by cell (Haynsworth inertia additivity), O(L),"
        + " no dense N x N matrix. winding-localizer-kappa: the kappa used (parameter kappa, 0 = automatic ||H||_G / L,"
        + " the Gershgorin bound of H over the number of cells).";
  }

  @Override
  public List<Quantity> quantities() {
    return List.of(
        new Quantity(
            "winding-localizer",
            true,
            "1",
            "-sig(L_kappa)/2, the winding number in the sign convention of winding"),
        new Quantity(
            "winding-localizer-kappa",
            false,
            "energy per lattice unit",
            "kappa used for this realisation"));
  }

  @Override
  public List<ParameterInfo> parameters() {
    return List.of(LocalizerSupport.KAPPA_PARAMETER);
  }

  @Override
  public boolean needsOccupiedStates() {
    return false;
  }

  @Override
  public boolean needsDenseMatrix() {
    return false;
  }

  @Override
  public Optional<String> whyNotApplicable(
      Model model, Boundary boundary, SymmetryClass effectiveClass) {
    boolean sublatticeChain =
        model instanceof ChiralChain || (model instanceof CustomModel c && c.isSublatticeChain());
    if (!sublatticeChain || model.dimension() != 1) {
      return Optional.of(
          "the localizer winding is implemented for one-dimensional chiral chains (ssh, or a custom chain with two"
              + " orbitals and S = diag(1, -1)); "
              + model.name()
              + " is not one");
    }
    if (!effectiveClass.hasChiral()) {
      return Optional.of(
          "the localizer winding needs chiral symmetry; the disorder leaves class "
              + effectiveClass);
    }
    String group = effectiveClass.invariantGroup(1);
    if (!group.equals("Z") && !group.equals("2Z")) {
      return Optional.of(
          "class " + effectiveClass + " has no integer invariant in d = 1 (group " + group + ")");
    }
    if (boundary != Boundary.OPEN) {
      return Optional.of(
          "the spectral localizer works on open samples: use \"boundary\": \"open\"");
    }
    return Optional.empty();
  }

  @Override
  public Optional<String> whyNotApplicableWith(
      hopstat.disorder.DisorderKind kind, Map<String, List<Double>> parameters) {
    return LocalizerSupport.whyNotWith(name(), kind, parameters);
  }

  @Override
  public void compute(RealisationContext context, Map<String, Double> out) {
    if (context.fermiEnergy() != 0.0) {
      throw new IllegalStateException(
          "the localizer winding is defined at the chiral point: fermiEnergy must be 0, got "
              + context.fermiEnergy());
    }
    double kappa = LocalizerSupport.kappa(context);
    ChiralLocalizerWorkspace ws =
        context.workspace().scratch(ChiralLocalizerWorkspace.class, ChiralLocalizerWorkspace::new);
    double x0 = SpectralLocalizerKernel.centre(context.lattice(), 0);
    int nu = ChiralLocalizerKernel.index(context.terms(), context.lattice(), kappa, x0, ws);
    if (nu == Integer.MIN_VALUE) {
      throw new ConvergenceFailure(
          "the cell-by-cell LDL^H sweep of the chiral localizer met an exactly singular Schur complement: index undefined");
    }
    out.put("winding-localizer", (double) nu);
    out.put("winding-localizer-kappa", kappa);
  }
}
