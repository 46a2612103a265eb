package hopstat.linalg;

import org.ejml.data.DMatrixRMaj;

/**
 * Pfaffian of a dense real antisymmetric matrix by skew-symmetric Gaussian elimination with partial
 * pivoting (the Parlett–Reid L T Lᵀ scheme as described by Wimmer, "Efficient numerical computation
 * of the Pfaffian for dense and banded skew-symmetric matrices", ACM TOMS 38(4), 30 (2012), Alg. 1
 * with pivoting).
 *
 * <p>Step k (k = 0, 2, 4, …) works on the trailing block, written as
 *
 * <pre>
 *   [  0    a    rᵀ ]
 *   [ −a    0    sᵀ ]      a = A[k][k+1], r = A[k][k+2..], s = A[k+1][k+2..]
 *   [ −r   −s    B  ]
 * </pre>
 *
 * and uses Pf = a · Pf(B + (s rᵀ − r sᵀ)/a) (derived by expanding the Pfaffian along row k and
 * checked on 4 × 4 by hand and in the tests against brute-force expansion). Before the step the
 * row/column of largest |A[i][k]|, i ≥ k+1, is swapped into position k+1 — a symmetric permutation,
 * which flips the sign of the Pfaffian — so that |r_i / a| ≤ 1 (this is the column the update must
 * use; REFERENCE pitfall: a slipped index still passes the Δ = t wire but fails Δ ≠ t).
 *
 * <p>Cost ≈ n³/3 flops and n² doubles of scratch. The modulus is accumulated as a logarithm, so
 * large matrices neither overflow nor underflow. Possible later optimisation (not implemented): for
 * a matrix of bandwidth b the same elimination with a banded pivot search costs O(n b²) (Wimmer
 * 2012, Sec. 4); open 1D chains qualify directly, closed rings after reordering the sites.
 */
public final class PfaffianKernel {

  /** Relative antisymmetry defect |A + Aᵀ|_max / |A|_max above which the input is rejected. */
  public static final double ANTISYMMETRY_TOLERANCE = 1e-12;

  private PfaffianKernel() {}

  /**
   * Pf(A) of a real antisymmetric n × n matrix.
   *
   * @param a read, not modified; must be square and antisymmetric to {@link
   *     #ANTISYMMETRY_TOLERANCE} (relative); only entries strictly above and below the diagonal are
   *     used, the diagonal is taken as zero
   * @param workspace scratch
   * @return sign and ln|Pf|; sign 0 for odd n or an exactly singular matrix
   * @throws IllegalArgumentException if {@code a} is not square or not antisymmetric
   */
  public static PfaffianResult compute(DMatrixRMaj a, PfaffianWorkspace workspace) {
    int n = a.numRows;
    if (a.numCols != n) {
      throw new IllegalArgumentException(
          "the Pfaffian needs a square matrix, got " + n + "x" + a.numCols);
    }
    double maxAbs = checkAntisymmetric(a);
    if (n == 0) {
      return new PfaffianResult(1, 0.0, 1.0);
    }
    if (n % 2 == 1) {
      return new PfaffianResult(0, Double.NEGATIVE_INFINITY, 0.0);
    }
    workspace.ensure(n);
    double[] w = workspace.work;
    System.arraycopy(a.data, 0, w, 0, n * n);
    int sign = 1;
    double logAbs = 0.0;
    double smallestPivot = Double.POSITIVE_INFINITY;
    for (int k = 0; k < n - 1; k += 2) {
      // Pivot: largest |A[i][k]| for i >= k+1 moves to row/column k+1.
      int pivot = k + 1;
      double best = Math.abs(w[(k + 1) * n + k]);
      for (int i = k + 2; i < n; i++) {
        double v = Math.abs(w[i * n + k]);
        if (v > best) {
          best = v;
          pivot = i;
        }
      }
      if (best == 0.0) {
        // Column k is zero below the diagonal, hence row k is zero: A is singular, Pf = 0.
        return new PfaffianResult(0, Double.NEGATIVE_INFINITY, 0.0);
      }
      if (pivot != k + 1) {
        swapRowsAndColumns(w, n, k, k + 1, pivot);
        sign = -sign;
      }
      double alpha = w[k * n + k + 1];
      if (alpha < 0) {
        sign = -sign;
      }
      logAbs += Math.log(Math.abs(alpha));
      smallestPivot = Math.min(smallestPivot, Math.abs(alpha));
      // B += (s rᵀ − r sᵀ)/a over the trailing block, r = row k, s = row k+1 (columns k+2..).
      int rowK = k * n;
      int rowK1 = (k + 1) * n;
      for (int i = k + 2; i < n; i++) {
        double ri = w[rowK + i] / alpha;
        double si = w[rowK1 + i];
        int rowI = i * n;
        for (int j = k + 2; j < n; j++) {
          w[rowI + j] += si * w[rowK + j] / alpha - ri * w[rowK1 + j];
        }
      }
    }
    return new PfaffianResult(sign, logAbs, smallestPivot / maxAbs);
  }

  /**
   * Swaps rows p and q and columns p and q, touching only the part the elimination still reads
   * (rows and columns from {@code from} on).
   */
  private static void swapRowsAndColumns(double[] w, int n, int from, int p, int q) {
    for (int j = from; j < n; j++) {
      double t = w[p * n + j];
      w[p * n + j] = w[q * n + j];
      w[q * n + j] = t;
    }
    for (int i = from; i < n; i++) {
      double t = w[i * n + p];
      w[i * n + p] = w[i * n + q];
      w[i * n + q] = t;
    }
  }

  /** Checks antisymmetry; returns max |A_ij|. */
  private static double checkAntisymmetric(DMatrixRMaj a) {
    int n = a.numRows;
    double max = 0.0;
    double defect = 0.0;
    for (int i = 0; i < n; i++) {
      for (int j = i; j < n; j++) {
        double aij = a.data[i * n + j];
        double aji = a.data[j * n + i];
        max = Math.max(max, Math.max(Math.abs(aij), Math.abs(aji)));
        defect = Math.max(defect, Math.abs(aij + aji));
      }
    }
    if (defect > ANTISYMMETRY_TOLERANCE * max) {
      throw new IllegalArgumentException(
          "matrix is not antisymmetric: max |A + A^T| = " + defect + " for max |A| = " + max);
    }
    return max;
  }
}
