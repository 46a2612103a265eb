package hopstat.linalg;

/**
 * Scratch for {@link ComplexDeterminantKernel}: an interleaved (re, im) copy of the matrix that the
 * LU elimination overwrites. Grows, never shrinks. One per worker thread; not thread-safe.
 */
public final class ComplexDeterminantWorkspace {

  double[] work = new double[8];

  /** Makes room for an n × n complex matrix. */
  void ensure(int n) {
    if (work.length < 2 * n * n) {
      work = new double[2 * n * n];
    }
  }
}
