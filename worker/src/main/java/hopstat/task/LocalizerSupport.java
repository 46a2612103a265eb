package hopstat.task;

import hopstat.invariant.SpectralLocalizerKernel;
import hopstat.lattice.Boundary;
import hopstat.model.Model;
import hopstat.model.ParameterInfo;
import java.util.Optional;

/** Shared rules of the localizer observables: the {@code kappa} parameter and applicability. */
final class LocalizerSupport {

  static final String KAPPA = "kappa";

  static final ParameterInfo KAPPA_PARAMETER =
      new ParameterInfo(
          KAPPA,
          0.0,
          "spectral-localizer kappa (energy per lattice unit); 0 = automatic: kappa = ||H - E_F||_G / L (Gershgorin bound over"
              + " the linear size), which keeps kappa times the sample radius fixed; must be >= 0");

  private LocalizerSupport() {}

  static Optional<String> whyNotApplicable(Model model, Boundary boundary) {
    if (model.dimension() != 2) {
      return Optional.of(
          "the spectral localizer Chern number is defined here for d = 2 models; "
              + model.name()
              + " has d = "
              + model.dimension());
    }
    if (boundary != Boundary.OPEN) {
      return Optional.of(
          "the spectral localizer works on open samples: use \"boundary\": \"open\"");
    }
    return Optional.empty();
  }

  /** The κ of this realisation: the spec's value, or the automatic rule when it is 0. */
  static double kappa(RealisationContext context) {
    double given =
        context.point().parameters().has(KAPPA) ? context.point().parameters().get(KAPPA) : 0.0;
    if (given < 0 || !Double.isFinite(given)) {
      throw new InvalidInputException(
          "parameters." + KAPPA, given, "must be a finite number >= 0 (0 = automatic)");
    }
    if (given > 0) {
      return given;
    }
    return SpectralLocalizerKernel.automaticKappa(
        context.terms(),
        context.lattice(),
        context.fermiEnergy(),
        new double[2 * context.dimension()]);
  }

  /**
   * The automatic κ scales with the Gershgorin bound of H, which the far-away decoupled levels of
   * vacancies inflate by ~10³; a fixed positive κ is unaffected (a decoupled level adds a block of
   * zero signature to the localizer).
   */
  static Optional<String> whyNotWith(
      String observable,
      hopstat.disorder.DisorderKind kind,
      java.util.Map<String, java.util.List<Double>> parameters) {
    if (!kind.hasDecoupledLevels()) {
      return Optional.empty();
    }
    java.util.List<Double> values = parameters.getOrDefault(KAPPA, java.util.List.of(0.0));
    if (values.stream().anyMatch(v -> !(v > 0))) {
      return Optional.of(
          observable
              + " with automatic kappa (kappa = 0) scales kappa by the Gershgorin bound, which the far-away levels of "
              + kind.name()
              + " inflate ~10^3-fold: give \"kappa\" > 0");
    }
    return Optional.empty();
  }
}
