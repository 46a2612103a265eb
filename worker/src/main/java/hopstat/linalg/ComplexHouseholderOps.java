package hopstat.linalg;

import org.ejml.data.ZMatrixRMaj;

/**
 * Complex Householder QR of a tall m × n matrix (m ≥ n), pure Java, allocation-free: A = Q R with Q
 * = H_0 H_1 ⋯ H_{n−1}, H_k = 1 − 2 v_k v_k† (‖v_k‖ = 1, zero above row k) and R upper triangular
 * (Golub &amp; Van Loan, Matrix Computations, 4th ed., §5.1–5.2; the phase of R_kk is chosen as
 * −x_k/|x_k| to avoid cancellation). Gives both the thin factor and any columns of the full Q, so
 * the orthogonal complement of range(A) (the null space of A†) comes out without a separate SVD.
 */
public final class ComplexHouseholderOps {

  private ComplexHouseholderOps() {}

  /**
   * Factors {@code a} in place.
   *
   * @param a m × n, m ≥ n; overwritten: R in the upper n × n triangle, rows below the diagonal
   *     scratch
   * @param reflectors m × n; overwritten with the unit reflector vectors v_k in column k (a zero
   *     column where the sub-column was already zero, i.e. H_k = 1)
   */
  public static void factor(ZMatrixRMaj a, ZMatrixRMaj reflectors) {
    int m = a.numRows;
    int n = a.numCols;
    if (m < n || reflectors.numRows != m || reflectors.numCols != n) {
      throw new IllegalArgumentException(
          "need m >= n and an m x n reflector matrix: " + m + "x" + n);
    }
    if (a == reflectors) {
      throw new IllegalArgumentException("a and reflectors must differ");
    }
    double[] d = a.data;
    double[] v = reflectors.data;
    reflectors.zero();
    for (int k = 0; k < n; k++) {
      double norm2 = 0;
      for (int i = k; i < m; i++) {
        int ik = 2 * (i * n + k);
        norm2 += d[ik] * d[ik] + d[ik + 1] * d[ik + 1];
      }
      double norm = Math.sqrt(norm2);
      if (norm == 0) {
        continue;
      }
      int kk = 2 * (k * n + k);
      double x0r = d[kk];
      double x0i = d[kk + 1];
      double x0 = Math.hypot(x0r, x0i);
      double pr = x0 == 0 ? 1.0 : x0r / x0;
      double pi = x0 == 0 ? 0.0 : x0i / x0;
      // alpha = −phase(x0)·‖x‖; v = x − alpha e_k
      double alphaR = -pr * norm;
      double alphaI = -pi * norm;
      double vNorm2 = 0;
      for (int i = k; i < m; i++) {
        int ik = 2 * (i * n + k);
        double re = d[ik];
        double im = d[ik + 1];
        if (i == k) {
          re -= alphaR;
          im -= alphaI;
        }
        v[ik] = re;
        v[ik + 1] = im;
        vNorm2 += re * re + im * im;
      }
      double inv = 1.0 / Math.sqrt(vNorm2);
      for (int i = k; i < m; i++) {
        int ik = 2 * (i * n + k);
        v[ik] *= inv;
        v[ik + 1] *= inv;
      }
      // column k becomes alpha e_k; the later columns get H_k applied
      d[kk] = alphaR;
      d[kk + 1] = alphaI;
      for (int i = k + 1; i < m; i++) {
        int ik = 2 * (i * n + k);
        d[ik] = 0;
        d[ik + 1] = 0;
      }
      for (int j = k + 1; j < n; j++) {
        reflect(v, n, k, m, d, n, j);
      }
    }
  }

  /**
   * Writes columns {@code first}..{@code first + out.numCols − 1} of the full m × m Q = H_0 ⋯
   * H_{n−1}.
   *
   * @param reflectors from {@link #factor}; read
   * @param first first column of Q wanted, 0 ≤ first, first + out.numCols ≤ m
   * @param out m × c; overwritten
   */
  public static void formQ(ZMatrixRMaj reflectors, int first, ZMatrixRMaj out) {
    int m = reflectors.numRows;
    int n = reflectors.numCols;
    int c = out.numCols;
    if (out.numRows != m || first < 0 || first + c > m) {
      throw new IllegalArgumentException(
          "bad Q block: rows "
              + out.numRows
              + ", columns "
              + first
              + ".."
              + (first + c - 1)
              + " of "
              + m);
    }
    out.zero();
    double[] o = out.data;
    for (int j = 0; j < c; j++) {
      o[2 * ((first + j) * c + j)] = 1.0;
    }
    for (int k = n - 1; k >= 0; k--) {
      for (int j = 0; j < c; j++) {
        reflect(reflectors.data, n, k, m, o, c, j);
      }
    }
  }

  /** Column j of x (row stride xCols) ← (1 − 2 v_k v_k†) times it, rows k..m−1. */
  private static void reflect(double[] v, int vCols, int k, int m, double[] x, int xCols, int j) {
    double sr = 0;
    double si = 0;
    for (int i = k; i < m; i++) {
      int ik = 2 * (i * vCols + k);
      int ij = 2 * (i * xCols + j);
      // conj(v) · x
      sr += v[ik] * x[ij] + v[ik + 1] * x[ij + 1];
      si += v[ik] * x[ij + 1] - v[ik + 1] * x[ij];
    }
    if (sr == 0 && si == 0) {
      return;
    }
    sr *= 2;
    si *= 2;
    for (int i = k; i < m; i++) {
      int ik = 2 * (i * vCols + k);
      int ij = 2 * (i * xCols + j);
      x[ij] -= v[ik] * sr - v[ik + 1] * si;
      x[ij + 1] -= v[ik] * si + v[ik + 1] * sr;
    }
  }
}
