package hopstat.linalg.internal;

/**
 * Scratch for {@link ComplexHessenbergQrKernel}: the working matrix (split real and imaginary
 * parts, row-major) and Householder/Givens scratch. Grows to the largest n seen, never shrinks. One
 * per worker thread.
 */
final class ComplexHessenbergQrWorkspace {

  double[] re = new double[0];
  double[] im = new double[0];
  double[] vRe = new double[0];
  double[] vIm = new double[0];
  double[] cos = new double[0];
  double[] sinRe = new double[0];
  double[] sinIm = new double[0];

  void ensure(int n) {
    if (re.length < n * n) {
      re = new double[n * n];
      im = new double[n * n];
    }
    if (vRe.length < n) {
      vRe = new double[n];
      vIm = new double[n];
      cos = new double[n];
      sinRe = new double[n];
      sinIm = new double[n];
    }
  }
}
