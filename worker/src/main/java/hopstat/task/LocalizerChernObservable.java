package hopstat.task;

import hopstat.invariant.SpectralLocalizerKernel;
import hopstat.lattice.Boundary;
import hopstat.model.Model;
import hopstat.model.ParameterInfo;
import hopstat.model.SymmetryClass;
import hopstat.spectrum.SliceInertiaWorkspace;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * {@code chern-localizer}: the Chern number from the signature of the spectral localizer (no
 * diagonalisation).
 */
final class LocalizerChernObservable implements Observable {

  static final String NAME = "chern-localizer";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "Chern number from the spectral localizer (Loring, Ann. Phys. 356, 383 (2015); Loring & Schulz-Baldes,"
        + " arXiv:1701.07455) on the OPEN sample: -sig(L_kappa)/2 with L_kappa = [[H-E_F, kappa(X-iY)], [kappa(X+iY), -(H-E_F)]],"
        + " X, Y centred on the sample; same sign as bott (qwz: +1 for -2<m<0). The signature is counted by a block"
        + " LDL^H (Bunch-Kaufman) sweep over x-slices (Haynsworth inertia additivity), O(L n_slice^3), no dense N x N"
        + " matrix. localizer-kappa: the kappa used (parameter kappa, 0 = automatic ||H-E_F||_G / L).";
  }

  @Override
  public List<Quantity> quantities() {
    return List.of(
        new Quantity(
            "chern-localizer",
            true,
            "1",
            "-sig(L_kappa)/2, the Chern number in the Bott-index sign convention"),
        new Quantity(
            "localizer-kappa",
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
    return LocalizerSupport.whyNotApplicable(model, boundary);
  }

  @Override
  public Optional<String> whyNotApplicableWith(
      hopstat.disorder.DisorderKind kind, Map<String, List<Double>> parameters) {
    return LocalizerSupport.whyNotWith(name(), kind, parameters);
  }

  @Override
  public void compute(RealisationContext context, Map<String, Double> out) {
    double kappa = LocalizerSupport.kappa(context);
    SliceInertiaWorkspace ws =
        context.workspace().scratch(SliceInertiaWorkspace.class, SliceInertiaWorkspace::new);
    int c =
        SpectralLocalizerKernel.chern(
            context.terms(), context.lattice(), context.fermiEnergy(), kappa, ws);
    if (c == Integer.MIN_VALUE) {
      throw new ConvergenceFailure(
          "a Schur complement of the spectral localizer is exactly singular (index undefined)");
    }
    out.put("chern-localizer", (double) c);
    out.put("localizer-kappa", kappa);
  }
}
