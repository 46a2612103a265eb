package hopstat.linalg;

import org.ejml.data.ZMatrixRMaj;

/**
 * Complex Householder QR of a tall m × n matrix (m ≥ n), pure Java (allocation-free given a row
 * buffer): A = Q R with Q = H_0 H_1 ⋯ H_{n−1}, H_k = 1 − 2 v_k v_k† (‖v_k‖ = 1, zero above row k)
 * and R upper triangular (Golub &amp; Van Loan, Matrix Computations, 4th ed., §5.1–5.2; the phase
 * of R_kk is chosen as −x_k/|x_k| to avoid cancellation). The reflectors are applied row by row to
 * all later columns at once (contiguous memory); each column's sums run over the rows in the same
 * order as a column-by-column loop. Gives both the thin factor and any columns of the full Q, so
 * the orthogonal complement of range(A) (the null space of A†) comes out without a separate SVD.
 */
public final class ComplexHouseholderOps {

  private ComplexHouseholderOps() {}

  /**
   * Factors {@code a} in place; allocates one row buffer (see {@link #factor(ZMatrixRMaj,
   * ZMatrixRMaj, double[])} for the allocation-free form).
   *
   * @param a m × n, m ≥ n; overwritten: R in the upper n × n triangle, rows below the diagonal
   *     scratch
   * @param reflectors m × n; overwritten with the unit reflector vectors v_k in column k (a zero
   *     column where the sub-column was already zero, i.e. H_k = 1)
   */
  public static void factor(ZMatrixRMaj a, ZMatrixRMaj reflectors) {
    factor(a, reflectors, new double[2 * a.numCols]);
  }

  /**
   * Factors {@code a} in place, allocation-free.
   *
   * @param a m × n, m ≥ n; overwritten: R in the upper n × n triangle, rows below the diagonal
   *     scratch
   * @param reflectors m × n; overwritten with the unit reflector vectors v_k in column k (a zero
   *     column where the sub-column was already zero, i.e. H_k = 1)
   * @param row scratch of at least 2n doubles; overwritten
   */
  public static void factor(ZMatrixRMaj a, ZMatrixRMaj reflectors, double[] row) {
    int m = a.numRows;
    int n = a.numCols;
    if (m < n || reflectors.numRows != m || reflectors.numCols != n) {
      throw new IllegalArgumentException(
          "need m >= n and an m x n reflector matrix: " + m + "x" + n);
    }
    if (a == reflectors) {
      throw new IllegalArgumentException("a and reflectors must differ");
    }
    requireRow(row, n);
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
      reflectColumns(v, n, k, m, d, n, k + 1, row);
    }
  }

  /**
   * Writes columns {@code first}..{@code first + out.numCols − 1} of the full m × m Q = H_0 ⋯
   * H_{n−1}; allocates one row buffer (see {@link #formQ(ZMatrixRMaj, int, ZMatrixRMaj, double[])}
   * for the allocation-free form).
   *
   * @param reflectors from {@link #factor}; read
   * @param first first column of Q wanted, 0 ≤ first, first + out.numCols ≤ m
   * @param out m × c; overwritten
   */
  public static void formQ(ZMatrixRMaj reflectors, int first, ZMatrixRMaj out) {
    formQ(reflectors, first, out, new double[2 * out.numCols]);
  }

  /**
   * Writes columns {@code first}..{@code first + out.numCols − 1} of the full m × m Q = H_0 ⋯
   * H_{n−1}, allocation-free. Column first + j starts as the unit vector e_{first+j}, which H_k
   * leaves alone while k &gt; first + j (v_k vanishes above row k), so those products are skipped.
   *
   * @param reflectors from {@link #factor}; read
   * @param first first column of Q wanted, 0 ≤ first, first + out.numCols ≤ m
   * @param out m × c; overwritten
   * @param row scratch of at least 2c doubles; overwritten
   */
  public static void formQ(ZMatrixRMaj reflectors, int first, ZMatrixRMaj out, double[] row) {
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
    requireRow(row, c);
    out.zero();
    double[] o = out.data;
    for (int j = 0; j < c; j++) {
      o[2 * ((first + j) * c + j)] = 1.0;
    }
    for (int k = n - 1; k >= 0; k--) {
      reflectColumns(reflectors.data, n, k, m, o, c, Math.max(0, k - first), row);
    }
  }

  private static void requireRow(double[] row, int columns) {
    if (row.length < 2 * columns) {
      throw new IllegalArgumentException(
          "row scratch needs " + 2 * columns + " doubles, has " + row.length);
    }
  }

  /**
   * Columns j ≥ {@code from} of x (row stride xCols) ← (1 − 2 v_k v_k†) times them, rows k..m−1,
   * row by row: w = v_k† x accumulated over rows in increasing order (the same sums as column by
   * column), then x ← x − 2 v_k w. A zero v_k (H_k = 1) is skipped, and so are the zero rows of v_k
   * (a structurally zero block of A, e.g. below the diagonal of a triangular top block, stays zero
   * and keeps its reflector rows zero).
   */
  private static void reflectColumns(
      double[] v, int vCols, int k, int m, double[] x, int xCols, int from, double[] w) {
    if (from >= xCols) {
      return;
    }
    int kk = 2 * (k * vCols + k);
    // a non-trivial reflector has v_k[k] = phase·(|x_0| + ‖x‖) ≠ 0
    if (v[kk] == 0 && v[kk + 1] == 0) {
      return;
    }
    int lo = 2 * from;
    int hi = 2 * xCols;
    java.util.Arrays.fill(w, lo, hi, 0.0);
    for (int i = k; i < m; i++) {
      int ik = 2 * (i * vCols + k);
      double vr = v[ik];
      double vi = v[ik + 1];
      if (vr == 0 && vi == 0) {
        continue;
      }
      int base = 2 * i * xCols;
      // conj(v) · x
      for (int j = lo; j < hi; j += 2) {
        double xr = x[base + j];
        double xi = x[base + j + 1];
        w[j] += vr * xr + vi * xi;
        w[j + 1] += vr * xi - vi * xr;
      }
    }
    for (int j = lo; j < hi; j++) {
      w[j] *= 2;
    }
    for (int i = k; i < m; i++) {
      int ik = 2 * (i * vCols + k);
      double vr = v[ik];
      double vi = v[ik + 1];
      if (vr == 0 && vi == 0) {
        continue;
      }
      int base = 2 * i * xCols;
      for (int j = lo; j < hi; j += 2) {
        double sr = w[j];
        double si = w[j + 1];
        x[base + j] -= vr * sr - vi * si;
        x[base + j + 1] -= vr * si + vi * sr;
      }
    }
  }
}
