package hopstat.linalg.internal;

/**
 * Inertia of the 1×1 and 2×2 Hermitian pivot blocks of an LDLᴴ factorisation (derived: eigenvalue
 * signs of a 2×2 Hermitian block from its determinant and trace).
 */
final class InertiaOps {

  private InertiaOps() {}

  /**
   * Adds the inertia of the 2×2 Hermitian block [[a, b], [b̄, c]] to counts = {positive, negative,
   * zero}: det &lt; 0 gives one of each; det &gt; 0 two with the sign of the trace; det = 0 one
   * zero and one with the sign of the trace (two zeros if a = c = 0).
   */
  static void addBlock(double a, double bRe, double bIm, double c, int[] counts) {
    double det = a * c - (bRe * bRe + bIm * bIm);
    double trace = a + c;
    if (det < 0) {
      counts[0]++;
      counts[1]++;
    } else if (det > 0) {
      counts[trace > 0 ? 0 : 1] += 2;
    } else {
      counts[2]++;
      if (trace > 0) {
        counts[0]++;
      } else if (trace < 0) {
        counts[1]++;
      } else {
        counts[2]++;
      }
    }
  }

  /** Adds the sign of a 1×1 pivot d to counts. */
  static void addScalar(double d, int[] counts) {
    counts[d > 0 ? 0 : d < 0 ? 1 : 2]++;
  }
}
