package hopstat.linalg;

/**
 * Scratch for {@link PfaffianKernel}: a copy of the matrix that the elimination overwrites. Grows
 * to the largest dimension seen and never shrinks. One per worker thread; not thread-safe.
 */
public final class PfaffianWorkspace {

  double[] work = new double[4];

  /** Makes room for an n × n matrix. */
  void ensure(int n) {
    if (work.length < n * n) {
      work = new double[n * n];
    }
  }
}
