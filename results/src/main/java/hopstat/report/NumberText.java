package hopstat.report;

/** Locale-free number text for machine-readable outputs. */
final class NumberText {

  private NumberText() {}

  /**
   * Shortest text that reads back to the same double ({@link Double#toString}, which ignores the
   * locale); empty for NaN, so spreadsheet tools see a missing value.
   */
  static String of(double x) {
    if (Double.isNaN(x)) {
      return "";
    }
    if (x == Math.rint(x) && Math.abs(x) < 1e15) {
      return Long.toString((long) x) + ".0";
    }
    return Double.toString(x);
  }
}
