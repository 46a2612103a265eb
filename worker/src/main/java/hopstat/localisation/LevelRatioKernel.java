package hopstat.localisation;

/**
 * Adjacent-gap ratios of a spectrum, r_n = min(s_n, s_{n−1}) / max(s_n, s_{n−1}) with s_n = E_{n+1}
 * − E_n (Oganesyan &amp; Huse, PRB 75, 155111 (2007); Atas, Bogomolny, Giraud, Roux, PRL 110,
 * 084101 (2013)), binned into energy windows. No unfolding is needed: the ratio is independent of
 * the local density of states.
 *
 * <p>Reference means: Poisson 2 ln 2 − 1 ≈ 0.3863 (localised), GOE ≈ 0.5307, GUE ≈ 0.5996, GSE ≈
 * 0.6744 (Atas et al. 2013).
 *
 * <p>Spectra with a ±E symmetry (BdG particle–hole, chiral) must be reduced to E &gt; 0 first, and
 * Kramers-degenerate spectra to one level of each pair, or the ratios are dominated by the
 * symmetry: {@link #selectLevels} does both.
 */
public final class LevelRatioKernel {

  /**
   * Two levels count as a Kramers pair if they differ by at most this times the spectral width.
   * Double-precision eigensolvers resolve exact degeneracies to ~1e−14 of the matrix norm.
   */
  public static final double PAIR_TOLERANCE = 1e-9;

  private LevelRatioKernel() {}

  /**
   * Copies the levels to use into {@code out}.
   *
   * @param sortedLevels read, not modified: ascending, the first {@code n} used
   * @param n number of levels
   * @param positiveOnly keep only E &gt; 0 (spectra with a ±E symmetry)
   * @param kramersPairs if true and the (kept) levels come in exactly degenerate consecutive pairs
   *     (within {@link #PAIR_TOLERANCE}·width), keep the first of each pair; if they do not (e.g.
   *     disorder broke T), keep all
   * @param out length ≥ n; overwritten with the kept levels, ascending
   * @return the number of kept levels
   */
  public static int selectLevels(
      double[] sortedLevels, int n, boolean positiveOnly, boolean kramersPairs, double[] out) {
    if (out == sortedLevels) {
      throw new IllegalArgumentException("out must not alias the input");
    }
    int m = 0;
    for (int i = 0; i < n; i++) {
      if (!positiveOnly || sortedLevels[i] > 0) {
        out[m++] = sortedLevels[i];
      }
    }
    if (!kramersPairs || m < 2 || m % 2 != 0) {
      return m;
    }
    double tolerance = PAIR_TOLERANCE * Math.max(out[m - 1] - out[0], Double.MIN_NORMAL);
    for (int i = 0; i < m; i += 2) {
      if (out[i + 1] - out[i] > tolerance) {
        return m;
      }
    }
    for (int i = 0; i < m / 2; i++) {
      out[i] = out[2 * i];
    }
    return m / 2;
  }

  /**
   * Accumulates the ratios r_n (n = 1..m−2) into the window of their middle level E_n (the
   * neighbours E_{n±1} may lie in the next window). Ratios with s_n = s_{n−1} = 0 (exact
   * degeneracy) are skipped.
   *
   * @param levels read, not modified: ascending, first {@code m} used
   * @param m number of levels
   * @param windows read
   * @param sums length ≥ windows.count(); overwritten with Σ r per window
   * @param counts length ≥ windows.count(); overwritten with the number of ratios per window
   */
  public static void accumulate(
      double[] levels, int m, EnergyWindows windows, double[] sums, int[] counts) {
    int nw = windows.count();
    for (int w = 0; w < nw; w++) {
      sums[w] = 0.0;
      counts[w] = 0;
    }
    for (int i = 1; i + 1 < m; i++) {
      int w = windows.indexOf(levels[i]);
      if (w < 0) {
        continue;
      }
      double below = levels[i] - levels[i - 1];
      double above = levels[i + 1] - levels[i];
      double max = Math.max(below, above);
      if (!(max > 0)) {
        continue;
      }
      sums[w] += Math.min(below, above) / max;
      counts[w]++;
    }
  }
}
