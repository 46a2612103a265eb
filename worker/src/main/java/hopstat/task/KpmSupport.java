package hopstat.task;

import hopstat.model.ParameterInfo;
import hopstat.model.ParameterValues;

/**
 * Shared parameters of the kernel-polynomial observables ({@code dos}, {@code kpm-chern-marker}).
 */
final class KpmSupport {

  static final String MOMENTS = "kpmMoments";
  static final String VECTORS = "kpmVectors";
  static final int MAX_MOMENTS = 1 << 16;
  static final int MAX_VECTORS = 1 << 12;

  static final ParameterInfo MOMENTS_PARAMETER =
      new ParameterInfo(
          MOMENTS,
          256.0,
          "number M of Chebyshev moments (kernel polynomial method, Jackson kernel); energy resolution ~ pi a / M with a the"
              + " half-width of the rescaled Gershgorin interval; integer 2.."
              + MAX_MOMENTS);
  static final ParameterInfo VECTORS_PARAMETER =
      new ParameterInfo(
          VECTORS,
          8.0,
          "number R of random-phase vectors of the stochastic trace; statistical error ~ 1/sqrt(R); integer 1.."
              + MAX_VECTORS
              + " (kpm-chern-marker needs >= 2 for its error estimate)");

  private KpmSupport() {}

  /** An integer parameter in [min, max], or InvalidInputException with the field path. */
  static int integer(ParameterValues p, ParameterInfo info, int min, int max) {
    double v = p.has(info.name()) ? p.get(info.name()) : info.defaultValue();
    if (v != Math.rint(v) || v < min || v > max) {
      throw new InvalidInputException(
          "parameters." + info.name(), v, "must be an integer in " + min + ".." + max);
    }
    return (int) v;
  }

  /**
   * KPM rescales H into [−1, 1] by its Gershgorin bounds: far-away decoupled levels (vacancies at
   * ±U, U = 10³ R) would stretch the scale by 10³ and divide the energy resolution of a fixed
   * moment count by as much.
   */
  static java.util.Optional<String> whyNotWith(
      String observable, hopstat.disorder.DisorderKind kind) {
    if (kind.hasDecoupledLevels()) {
      return java.util.Optional.of(
          observable
              + " rescales the spectrum by its Gershgorin bounds; the far-away levels of "
              + kind.name()
              + " would stretch it by ~10^3 and destroy the energy resolution: use dense observables (bott, chern-marker, gap) instead");
    }
    return java.util.Optional.empty();
  }
}
