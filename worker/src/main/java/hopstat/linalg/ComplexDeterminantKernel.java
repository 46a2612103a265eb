package hopstat.linalg;

import org.ejml.data.ZMatrixRMaj;

/**
 * Determinant of a dense complex square matrix by LU elimination with partial (row) pivoting, det A
 * = (−1)^{#swaps} Π U_kk (Golub &amp; Van Loan, Matrix Computations, Alg. 3.4.1). Returned as
 * ln|det| and arg det, so it neither overflows nor underflows; the phase is what the
 * phase-continuation of {@code hopstat.invariant.DiiiZ2Kernel} tracks.
 *
 * <p>Cost ≈ 8n³/3 real flops, 2n² doubles of scratch; pure Java (small matrices; the project's
 * native route has no complex LU).
 */
public final class ComplexDeterminantKernel {

  private ComplexDeterminantKernel() {}

  /**
   * det A of a complex n × n matrix.
   *
   * @param a read, not modified
   * @param workspace scratch
   * @return ln|det A|, arg det A; exactly zero (logAbs = −∞) when a pivot column is exactly zero
   * @throws IllegalArgumentException if {@code a} is not square
   */
  public static ComplexLogResult compute(ZMatrixRMaj a, ComplexDeterminantWorkspace workspace) {
    int n = a.numRows;
    if (a.numCols != n) {
      throw new IllegalArgumentException(
          "the determinant needs a square matrix, got " + n + "x" + a.numCols);
    }
    if (n == 0) {
      return new ComplexLogResult(0.0, 0.0, 1.0);
    }
    workspace.ensure(n);
    double[] w = workspace.work;
    System.arraycopy(a.data, 0, w, 0, 2 * n * n);
    double maxAbs = 0.0;
    for (int i = 0; i < n * n; i++) {
      maxAbs = Math.max(maxAbs, Math.hypot(w[2 * i], w[2 * i + 1]));
    }
    if (maxAbs == 0.0) {
      return ComplexLogResult.zero();
    }
    double logAbs = 0.0;
    double phase = 0.0;
    double smallestPivot = Double.POSITIVE_INFINITY;
    for (int k = 0; k < n; k++) {
      int pivot = k;
      double best = -1.0;
      for (int i = k; i < n; i++) {
        int idx = 2 * (i * n + k);
        double v = w[idx] * w[idx] + w[idx + 1] * w[idx + 1];
        if (v > best) {
          best = v;
          pivot = i;
        }
      }
      if (best == 0.0) {
        return ComplexLogResult.zero();
      }
      if (pivot != k) {
        for (int j = 2 * k; j < 2 * n; j++) {
          double t = w[2 * k * n + j];
          w[2 * k * n + j] = w[2 * pivot * n + j];
          w[2 * pivot * n + j] = t;
        }
        phase += Math.PI;
      }
      int kk = 2 * (k * n + k);
      double pr = w[kk];
      double pi = w[kk + 1];
      double mod2 = pr * pr + pi * pi;
      logAbs += 0.5 * Math.log(mod2);
      phase += Math.atan2(pi, pr);
      smallestPivot = Math.min(smallestPivot, Math.sqrt(mod2));
      double ir = pr / mod2;
      double ii = -pi / mod2;
      for (int i = k + 1; i < n; i++) {
        int ik = 2 * (i * n + k);
        // l = A[i][k] / A[k][k]
        double lr = w[ik] * ir - w[ik + 1] * ii;
        double li = w[ik] * ii + w[ik + 1] * ir;
        if (lr == 0.0 && li == 0.0) {
          continue;
        }
        for (int j = k + 1; j < n; j++) {
          int kj = 2 * (k * n + j);
          int ij = 2 * (i * n + j);
          w[ij] -= lr * w[kj] - li * w[kj + 1];
          w[ij + 1] -= lr * w[kj + 1] + li * w[kj];
        }
      }
      phase = Math.IEEEremainder(phase, 2 * Math.PI);
    }
    return new ComplexLogResult(logAbs, ComplexLogResult.wrap(phase), smallestPivot / maxAbs);
  }
}
