package hopstat.linalg;

import org.ejml.data.ZMatrixRMaj;

/**
 * Pfaffian of a dense complex antisymmetric matrix (Aᵀ = −A, no conjugation) by the Parlett–Reid
 * skew-symmetric elimination with partial pivoting (Wimmer, "Efficient numerical computation of the
 * Pfaffian for dense and banded skew-symmetric matrices", ACM TOMS 38(4), 30 (2012), Alg. 1 with
 * pivoting): the complex counterpart of {@link PfaffianKernel}, with the same step
 *
 * <pre>  Pf [[0, a, rᵀ], [−a, 0, sᵀ], [−r, −s, B]] = a · Pf(B + (s rᵀ − r sᵀ)/a)   (derived)</pre>
 *
 * and the same pivot rule (largest |A[i][k]|, i ≥ k+1, swapped into row and column k+1; each swap
 * flips the sign). The Pfaffian is a polynomial in the entries, so no entry is conjugated.
 *
 * <p>Cost ≈ 4n³/3 real flops, 2n² doubles of scratch; pure Java (the matrices here are the order-2L
 * chiral blocks of one-dimensional rings, small enough). The result is returned as logarithm of the
 * modulus plus phase, so it neither overflows nor underflows.
 */
public final class ComplexPfaffianKernel {

  /** Relative antisymmetry defect max|A + Aᵀ| / max|A| above which the input is rejected. */
  public static final double ANTISYMMETRY_TOLERANCE = 1e-12;

  private ComplexPfaffianKernel() {}

  /**
   * Pf(A) of a complex antisymmetric n × n matrix.
   *
   * @param a read, not modified; square, antisymmetric to {@link #ANTISYMMETRY_TOLERANCE}
   *     (relative); only entries off the diagonal are used, the diagonal is taken as zero
   * @param workspace scratch
   * @return ln|Pf|, arg Pf; exactly zero (logAbs = −∞) for odd n or a zero pivot column
   * @throws IllegalArgumentException if {@code a} is not square or not antisymmetric
   */
  public static ComplexLogResult compute(ZMatrixRMaj a, ComplexPfaffianWorkspace workspace) {
    int n = a.numRows;
    if (a.numCols != n) {
      throw new IllegalArgumentException(
          "the Pfaffian needs a square matrix, got " + n + "x" + a.numCols);
    }
    double maxAbs = checkAntisymmetric(a);
    if (n == 0) {
      return new ComplexLogResult(0.0, 0.0, 1.0);
    }
    if (n % 2 == 1 || maxAbs == 0.0) {
      return ComplexLogResult.zero();
    }
    workspace.ensure(n);
    double[] w = workspace.work;
    System.arraycopy(a.data, 0, w, 0, 2 * n * n);
    double phase = 0.0;
    double logAbs = 0.0;
    double smallestPivot = Double.POSITIVE_INFINITY;
    for (int k = 0; k < n - 1; k += 2) {
      int pivot = k + 1;
      double best = abs2(w, (k + 1) * n + k);
      for (int i = k + 2; i < n; i++) {
        double v = abs2(w, i * n + k);
        if (v > best) {
          best = v;
          pivot = i;
        }
      }
      if (best == 0.0) {
        return ComplexLogResult.zero();
      }
      if (pivot != k + 1) {
        swapRowsAndColumns(w, n, k, k + 1, pivot);
        phase += Math.PI;
      }
      int ak = 2 * (k * n + k + 1);
      double ar = w[ak];
      double ai = w[ak + 1];
      double mod2 = ar * ar + ai * ai;
      logAbs += 0.5 * Math.log(mod2);
      phase += Math.atan2(ai, ar);
      smallestPivot = Math.min(smallestPivot, Math.sqrt(mod2));
      // 1/a
      double ir = ar / mod2;
      double ii = -ai / mod2;
      int rowK = k * n;
      int rowK1 = (k + 1) * n;
      for (int i = k + 2; i < n; i++) {
        // ρ_i = r_i / a, σ_i = s_i
        double rr = w[2 * (rowK + i)];
        double ri = w[2 * (rowK + i) + 1];
        double rhoR = rr * ir - ri * ii;
        double rhoI = rr * ii + ri * ir;
        double sR = w[2 * (rowK1 + i)];
        double sI = w[2 * (rowK1 + i) + 1];
        // σ_i / a
        double sigR = sR * ir - sI * ii;
        double sigI = sR * ii + sI * ir;
        int rowI = i * n;
        for (int j = k + 2; j < n; j++) {
          double rjR = w[2 * (rowK + j)];
          double rjI = w[2 * (rowK + j) + 1];
          double sjR = w[2 * (rowK1 + j)];
          double sjI = w[2 * (rowK1 + j) + 1];
          int idx = 2 * (rowI + j);
          // += (s_i/a) r_j − (r_i/a) s_j
          w[idx] += sigR * rjR - sigI * rjI - (rhoR * sjR - rhoI * sjI);
          w[idx + 1] += sigR * rjI + sigI * rjR - (rhoR * sjI + rhoI * sjR);
        }
      }
    }
    return new ComplexLogResult(logAbs, ComplexLogResult.wrap(phase), smallestPivot / maxAbs);
  }

  private static double abs2(double[] w, int index) {
    double re = w[2 * index];
    double im = w[2 * index + 1];
    return re * re + im * im;
  }

  /** Swaps rows p, q and columns p, q from index {@code from} on. */
  private static void swapRowsAndColumns(double[] w, int n, int from, int p, int q) {
    for (int j = from; j < n; j++) {
      for (int c = 0; c < 2; c++) {
        double t = w[2 * (p * n + j) + c];
        w[2 * (p * n + j) + c] = w[2 * (q * n + j) + c];
        w[2 * (q * n + j) + c] = t;
      }
    }
    for (int i = from; i < n; i++) {
      for (int c = 0; c < 2; c++) {
        double t = w[2 * (i * n + p) + c];
        w[2 * (i * n + p) + c] = w[2 * (i * n + q) + c];
        w[2 * (i * n + q) + c] = t;
      }
    }
  }

  /** Checks antisymmetry; returns max |A_ij|. */
  private static double checkAntisymmetric(ZMatrixRMaj a) {
    int n = a.numRows;
    double max = 0.0;
    double defect = 0.0;
    for (int i = 0; i < n; i++) {
      for (int j = i; j < n; j++) {
        int ij = 2 * (i * n + j);
        int ji = 2 * (j * n + i);
        max =
            Math.max(
                max,
                Math.max(
                    Math.hypot(a.data[ij], a.data[ij + 1]),
                    Math.hypot(a.data[ji], a.data[ji + 1])));
        defect =
            Math.max(defect, Math.hypot(a.data[ij] + a.data[ji], a.data[ij + 1] + a.data[ji + 1]));
      }
    }
    if (defect > ANTISYMMETRY_TOLERANCE * max) {
      throw new IllegalArgumentException(
          "matrix is not antisymmetric: max |A + A^T| = " + defect + " for max |A| = " + max);
    }
    return max;
  }
}
