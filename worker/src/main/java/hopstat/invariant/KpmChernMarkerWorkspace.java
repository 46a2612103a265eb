package hopstat.invariant;

import hopstat.spectrum.KpmWorkspace;

/**
 * Scratch of {@link KpmChernMarkerKernel}: the KPM recursion vectors, five further complex vectors
 * of length N, the bulk orbital list and the projector coefficients. Memory ≈ 150·N bytes. Grows to
 * the largest problem seen, never shrinks; one per worker thread.
 */
public final class KpmChernMarkerWorkspace {

  final KpmWorkspace kpm = new KpmWorkspace();
  double[] probe = new double[2];
  double[] projected = new double[2];
  double[] yProjected = new double[2];
  double[] projectedTwice = new double[2];
  int[] bulk = new int[1];
  double[] coefficients = new double[2];
  double[] estimates = new double[1];

  void ensure(int n, int moments, int vectors) {
    kpm.ensure(n, moments);
    if (probe.length < 2 * n) {
      probe = new double[2 * n];
      projected = new double[2 * n];
      yProjected = new double[2 * n];
      projectedTwice = new double[2 * n];
      bulk = new int[n];
    }
    if (coefficients.length < moments) {
      coefficients = new double[moments];
    }
    if (estimates.length < vectors) {
      estimates = new double[vectors];
    }
  }

  /** Bytes held by the vectors (for memory reports). */
  public long vectorBytes() {
    return kpm.vectorBytes()
        + 8L * (probe.length + projected.length + yProjected.length + projectedTwice.length)
        + 4L * bulk.length;
  }
}
