package hopstat.task;

import hopstat.localisation.EnergyWindows;
import hopstat.model.ParameterInfo;
import hopstat.model.ParameterValues;
import java.util.ArrayList;
import java.util.List;

/**
 * The energy windows shared by {@code level-ratio} and {@code ipr}: {@code windows} equal-width
 * windows between {@code windowMin} and {@code windowMax}.
 *
 * <p>Why fixed edges: with edges given in the spec every realisation (and every grid point) bins
 * the same energies, so per-window ensemble means are means at one energy. If the edges are
 * omitted, each realisation uses its own spectrum edges (lowest and highest kept level): convenient
 * for a first look, but window w then means slightly different energies in different realisations;
 * the {@code .e<w>} quantities record each realisation's window centres so the spread is visible.
 *
 * <p>Quantity names are fixed at {@link #MAX_WINDOWS} windows ({@code <prefix>.w0} …); a
 * realisation writes only the windows it has, and omits a window's mean when the window holds no
 * level (or no ratio), rather than writing NaN.
 */
final class WindowParameters {

  /** Largest allowed {@code windows}; quantity names exist for windows 0..MAX_WINDOWS−1. */
  static final int MAX_WINDOWS = 32;

  static final int DEFAULT_WINDOWS = 10;

  private WindowParameters() {}

  static List<ParameterInfo> parameters() {
    return List.of(
        new ParameterInfo(
            "windows",
            (double) DEFAULT_WINDOWS,
            "number of equal-width energy windows, 1.." + MAX_WINDOWS),
        new ParameterInfo(
            "windowMin",
            Double.NaN,
            "lower edge of window 0 (energy); default: each realisation's lowest level"),
        new ParameterInfo(
            "windowMax",
            Double.NaN,
            "upper edge of the last window (energy); default: each realisation's highest level"));
  }

  /**
   * The windows of one realisation.
   *
   * @param lowestLevel used when {@code windowMin} is absent or NaN
   * @param highestLevel used when {@code windowMax} is absent or NaN
   */
  static EnergyWindows resolve(
      ParameterValues parameters, double lowestLevel, double highestLevel) {
    double count = parameters.has("windows") ? parameters.get("windows") : DEFAULT_WINDOWS;
    if (count != Math.rint(count) || count < 1 || count > MAX_WINDOWS) {
      throw new InvalidInputException(
          "parameters.windows", count, "must be an integer in 1.." + MAX_WINDOWS);
    }
    double lower =
        parameters.has("windowMin") && !Double.isNaN(parameters.get("windowMin"))
            ? parameters.get("windowMin")
            : lowestLevel;
    double upper =
        parameters.has("windowMax") && !Double.isNaN(parameters.get("windowMax"))
            ? parameters.get("windowMax")
            : highestLevel;
    if (!(upper > lower)) {
      throw new InvalidInputException(
          "parameters.windowMax", upper, "must exceed windowMin (" + lower + ")");
    }
    return new EnergyWindows((int) count, lower, upper);
  }

  /** Quantities {@code prefix.w0..}, {@code prefix.e0..} for all possible windows. */
  static List<Quantity> windowQuantities(String prefix, String meaning, String unit) {
    List<Quantity> q = new ArrayList<>();
    for (int w = 0; w < MAX_WINDOWS; w++) {
      q.add(
          new Quantity(
              prefix + ".w" + w, false, unit, meaning + " in energy window " + w + " (0-based)"));
    }
    for (int w = 0; w < MAX_WINDOWS; w++) {
      q.add(
          new Quantity(
              prefix + ".e" + w,
              false,
              "energy",
              "centre energy of window " + w + " used by " + prefix));
    }
    return q;
  }

  /**
   * Default windows span the lowest to the highest level; far-away decoupled levels (vacancies at
   * ±U) would stretch them over ±U and the degenerate vacancy levels would enter the statistics, so
   * such disorder needs explicit {@code windowMin} and {@code windowMax} (inside the band).
   */
  static java.util.Optional<String> whyNotWith(
      String observable,
      hopstat.disorder.DisorderKind kind,
      java.util.Map<String, List<Double>> parameters) {
    if (!kind.hasDecoupledLevels()) {
      return java.util.Optional.empty();
    }
    for (String edge : List.of("windowMin", "windowMax")) {
      List<Double> values = parameters.get(edge);
      if (values == null || values.stream().anyMatch(v -> Double.isNaN(v))) {
        return java.util.Optional.of(
            observable
                + " with "
                + kind.name()
                + " needs explicit \"windowMin\" and \"windowMax\" inside the band:"
                + " the default windows would span the removed sites' levels at +-U");
      }
    }
    return java.util.Optional.empty();
  }
}
