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
 * {@code localizer-gap}: a certified lower bound on the smallest |eigenvalue| of the spectral
 * localizer.
 */
final class LocalizerGapObservable implements Observable {

  static final String NAME = "localizer-gap";

  /** Bisection stops when the bracket's upper end is within this factor above its lower end. */
  static final double RELATIVE_TOLERANCE = 0.05;

  /** Smallest gap resolved (energy units); below it the reported value is 0. */
  static final double FLOOR = 1e-6;

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "Smallest |eigenvalue| of the spectral localizer L_kappa (same matrix and kappa as chern-localizer), by"
        + " geometric bisection on inertia counts #eig in (-d, d) = neg(L - d) - neg(L + d): the reported value is the"
        + " lower end of the final bracket, so no eigenvalue is smaller (certified up to rounding in the counts), and the"
        + " true value is at most 5% larger; 0 when an eigenvalue lies within 1e-6. A small value means the index may"
        + " change under a perturbation of that size (Loring & Schulz-Baldes, arXiv:1701.07455). Costs about 2 log2(log(R/1e-6)/log 1.05)"
        + " ~ 18-20 slice sweeps.";
  }

  @Override
  public List<Quantity> quantities() {
    return List.of(
        new Quantity(
            "localizer-gap",
            false,
            "energy",
            "lower bound on min |eig(L_kappa)|, within 5% of it"));
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
    double[] bracket = new double[2];
    SpectralLocalizerKernel.localizerGap(
        context.terms(),
        context.lattice(),
        context.fermiEnergy(),
        kappa,
        FLOOR,
        RELATIVE_TOLERANCE,
        ws,
        bracket);
    out.put("localizer-gap", bracket[0]);
  }
}
