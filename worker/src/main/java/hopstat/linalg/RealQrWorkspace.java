package hopstat.linalg;

/**
 * Thin Householder QR of a dense real matrix, with the orthonormal factor formed explicitly and the
 * diagonal of R returned: the re-orthogonalisation step of transfer-matrix Lyapunov calculations,
 * and small real inverses. Pure Java (no EJML, no native call): the matrices are small (2K × K with
 * K the orbitals of one slice) and the call sits in a loop where the JNI overhead would dominate.
 *
 * <p>Storage is a plain row-major {@code double[]} so that callers can keep their blocks in flat
 * arrays. The workspace grows to the largest size seen and never shrinks; once warm, a call
 * allocates nothing. Not thread-safe: one per worker thread. Cost: about 4·rows·cols² flops.
 */
public final class RealQrWorkspace {

  private double[] reflectors = new double[1];
  private double[] tau = new double[1];
  private double[] columnSums = new double[1];

  /**
   * Overwrites the {@code rows × cols} matrix {@code a} (row-major, rows ≥ cols) with the thin
   * orthonormal factor Q of a = Q R and writes the diagonal of R. The signs follow the Householder
   * convention (R_kk = −sign(a_kk)·‖column‖); callers that need growth rates use ln|R_kk|.
   *
   * @param a overwritten: on entry the matrix, on exit Q (orthonormal columns)
   * @param rows number of rows, ≥ cols
   * @param cols number of columns, ≥ 1
   * @param rDiagonal length ≥ cols; overwritten with R_kk
   * @return false if a column became exactly zero (rank-deficient input; Q is then undefined)
   */
  public boolean orthonormalise(double[] a, int rows, int cols, double[] rDiagonal) {
    if (cols < 1 || rows < cols) {
      throw new IllegalArgumentException("need rows >= cols >= 1: " + rows + " x " + cols);
    }
    if (a.length < rows * cols || rDiagonal.length < cols) {
      throw new IllegalArgumentException("arrays too short for " + rows + " x " + cols);
    }
    ensure(rows, cols);
    double[] v = reflectors;
    for (int k = 0; k < cols; k++) {
      double norm2 = 0;
      for (int i = k; i < rows; i++) {
        double x = a[i * cols + k];
        norm2 += x * x;
      }
      if (!(norm2 > 0) || !Double.isFinite(norm2)) {
        return false;
      }
      double norm = Math.sqrt(norm2);
      double akk = a[k * cols + k];
      double alpha = akk >= 0 ? -norm : norm;
      // v = x − alpha e_k, |v|² = 2 norm (norm + |a_kk|)
      for (int i = k; i < rows; i++) {
        v[i * cols + k] = a[i * cols + k];
      }
      v[k * cols + k] = akk - alpha;
      double tk = 1.0 / (norm * (norm + Math.abs(akk)));
      tau[k] = tk;
      rDiagonal[k] = alpha;
      applyReflector(a, v, rows, cols, k, k + 1, tk);
    }
    // Q = H_0 … H_{cols−1} [I; 0], applied from the last reflector back
    for (int i = 0; i < rows * cols; i++) {
      a[i] = 0.0;
    }
    for (int k = 0; k < cols; k++) {
      a[k * cols + k] = 1.0;
    }
    for (int k = cols - 1; k >= 0; k--) {
      applyReflector(a, v, rows, cols, k, k, tau[k]);
    }
    return true;
  }

  /**
   * Inverts a square real matrix through its QR decomposition: a⁻¹ = R⁻¹ Qᵀ. Cost O(n⁴) as written
   * (R's entries are recomputed from Qᵀa during back substitution); meant for small n, once per
   * task (e.g. the inter-slice hopping of a transfer-matrix run).
   *
   * @param a n×n row-major; read, not modified
   * @param n order
   * @param inverse length ≥ n²; overwritten with a⁻¹ (row-major); must not alias {@code a}
   * @param scratch length ≥ n²; scratch
   * @param rDiagonalScratch length ≥ n; scratch
   * @return false if a is singular to working precision (|R_kk| ≤ 1e−14·max|R_jj|)
   */
  public boolean invert(
      double[] a, int n, double[] inverse, double[] scratch, double[] rDiagonalScratch) {
    if (a == inverse || a == scratch || inverse == scratch) {
      throw new IllegalArgumentException(
          "inverse and scratch must not alias the input or each other");
    }
    System.arraycopy(a, 0, scratch, 0, n * n);
    if (!orthonormalise(scratch, n, n, rDiagonalScratch)) {
      return false;
    }
    double rMax = 0;
    for (int k = 0; k < n; k++) {
      rMax = Math.max(rMax, Math.abs(rDiagonalScratch[k]));
    }
    for (int k = 0; k < n; k++) {
      if (Math.abs(rDiagonalScratch[k]) <= 1e-14 * rMax) {
        return false;
      }
    }
    // R = Qᵀ a; a⁻¹ = R⁻¹ Qᵀ by back substitution on each column of Qᵀ
    double[] q = scratch;
    for (int col = 0; col < n; col++) {
      // solve R x = Qᵀ e_col, i.e. right-hand side b_i = Q[col][i]
      for (int i = n - 1; i >= 0; i--) {
        double s = q[col * n + i];
        for (int j = i + 1; j < n; j++) {
          s -= rEntry(a, q, n, i, j) * inverse[j * n + col];
        }
        inverse[i * n + col] = s / rDiagonalScratch[i];
      }
    }
    return true;
  }

  /** R_ij = (Qᵀ a)_ij = Σ_k Q_ki a_kj. */
  private static double rEntry(double[] a, double[] q, int n, int i, int j) {
    double s = 0;
    for (int k = 0; k < n; k++) {
      s += q[k * n + i] * a[k * n + j];
    }
    return s;
  }

  /**
   * Applies I − tau v vᵀ (v = column k of the reflector store, rows ≥ k) to columns firstCol.. of
   * a.
   */
  private void applyReflector(
      double[] a, double[] v, int rows, int cols, int k, int firstCol, double tk) {
    if (firstCol >= cols) {
      return;
    }
    double[] s = columnSums;
    for (int j = firstCol; j < cols; j++) {
      s[j] = 0.0;
    }
    for (int i = k; i < rows; i++) {
      double vi = v[i * cols + k];
      int row = i * cols;
      for (int j = firstCol; j < cols; j++) {
        s[j] += vi * a[row + j];
      }
    }
    for (int i = k; i < rows; i++) {
      double vi = tk * v[i * cols + k];
      int row = i * cols;
      for (int j = firstCol; j < cols; j++) {
        a[row + j] -= vi * s[j];
      }
    }
  }

  private void ensure(int rows, int cols) {
    if (reflectors.length < rows * cols) {
      reflectors = new double[rows * cols];
    }
    if (tau.length < cols) {
      tau = new double[cols];
      columnSums = new double[cols];
    }
  }
}
