package hopstat.spectrum;

/** Spectral gap around the Fermi energy from a sorted spectrum. O(log N). */
public final class SpectralGapKernel {

  private SpectralGapKernel() {}

  /**
   * @param sortedEigenvalues read, not modified: ascending eigenvalues, first {@code count} used
   * @param count number of eigenvalues, ≥ 1
   * @param fermiEnergy E_F
   * @return the gap; when E_F lies outside the spectrum, {@code gap} is NaN and {@code
   *     fermiDistance} is the distance to the spectrum's nearer edge
   */
  public static SpectralGapResult compute(
      double[] sortedEigenvalues, int count, double fermiEnergy) {
    if (count < 1 || count > sortedEigenvalues.length) {
      throw new IllegalArgumentException(
          "count must be 1.." + sortedEigenvalues.length + ": " + count);
    }
    int lo = 0;
    int hi = count;
    // first index with value >= E_F
    while (lo < hi) {
      int mid = (lo + hi) >>> 1;
      if (sortedEigenvalues[mid] < fermiEnergy) {
        lo = mid + 1;
      } else {
        hi = mid;
      }
    }
    double below = lo > 0 ? sortedEigenvalues[lo - 1] : Double.NaN;
    double above = lo < count ? sortedEigenvalues[lo] : Double.NaN;
    double gap = above - below;
    double distance;
    if (Double.isNaN(below)) {
      distance = above - fermiEnergy;
    } else if (Double.isNaN(above)) {
      distance = fermiEnergy - below;
    } else {
      distance = Math.min(fermiEnergy - below, above - fermiEnergy);
    }
    return new SpectralGapResult(below, above, gap, distance);
  }
}
