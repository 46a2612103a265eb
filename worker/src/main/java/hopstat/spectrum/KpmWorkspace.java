package hopstat.spectrum;

/**
 * Scratch of {@link KpmKernel} and the KPM Chern marker: four complex vectors of length N
 * (interleaved, 2N doubles each) and the per-moment coefficient arrays. Memory 64·N bytes plus
 * O(moments). Grows to the largest problem seen, never shrinks; one per worker thread.
 */
public final class KpmWorkspace {

  double[] a = new double[2];
  double[] b = new double[2];
  double[] c = new double[2];
  double[] d = new double[2];
  double[] coefficients = new double[1];
  double[] jackson = new double[1];

  /** Makes room for vectors of dimension n and the given number of moments. */
  public void ensure(int n, int moments) {
    if (a.length < 2 * n) {
      a = new double[2 * n];
      b = new double[2 * n];
      c = new double[2 * n];
      d = new double[2 * n];
    }
    if (coefficients.length < moments) {
      coefficients = new double[moments];
      jackson = new double[moments];
    }
  }

  /** Bytes held by the vectors (for memory reports). */
  public long vectorBytes() {
    return 8L * (a.length + b.length + c.length + d.length);
  }
}
