package hopstat.localisation;

/**
 * {@code count} equal-width energy windows tiling [lower, upper]: window w is [lower + w·δ, lower +
 * (w+1)·δ), δ = (upper − lower)/count, 0-based, the last one closed at {@code upper}. Energies in
 * the model's unit.
 *
 * @param count number of windows, ≥ 1
 * @param lower lower edge of window 0
 * @param upper upper edge of the last window, &gt; lower
 */
public record EnergyWindows(int count, double lower, double upper) {

  public EnergyWindows {
    if (count < 1) {
      throw new IllegalArgumentException("need at least one window: " + count);
    }
    if (!Double.isFinite(lower) || !Double.isFinite(upper) || !(upper > lower)) {
      throw new IllegalArgumentException(
          "window edges must be finite with upper > lower: [" + lower + ", " + upper + "]");
    }
  }

  /** The window containing {@code energy}, or −1 outside [lower, upper]. */
  public int indexOf(double energy) {
    if (!(energy >= lower) || energy > upper) {
      return -1;
    }
    int w = (int) Math.floor((energy - lower) / (upper - lower) * count);
    return Math.min(w, count - 1);
  }

  /** Centre energy of window w. */
  public double centre(int window) {
    return lower + (window + 0.5) * (upper - lower) / count;
  }

  /** Lower edge of window w. */
  public double lowerEdge(int window) {
    return lower + window * (upper - lower) / count;
  }
}
