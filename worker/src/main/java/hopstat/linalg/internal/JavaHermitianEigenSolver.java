package hopstat.linalg.internal;

import hopstat.linalg.HermitianEigenSolver;
import org.ejml.data.DMatrixRMaj;
import org.ejml.data.ZMatrixRMaj;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.EigenDecomposition_F64;

/**
 * Pure-Java Hermitian eigensolver on EJML's real symmetric QR algorithm, through the real embedding
 * of A = A<sub>r</sub> + i A<sub>i</sub>:
 *
 * <pre>
 *   M = [ A_r  −A_i ]     (2n × 2n, real symmetric because A_rᵀ = A_r and A_iᵀ = −A_i)
 *       [ A_i   A_r ]
 * </pre>
 *
 * (derived) If [x; y] is a real eigenvector of M with eigenvalue λ then x + iy is an eigenvector of
 * A with the same λ; [−y; x] is then a second, orthogonal eigenvector of M, so every eigenvalue of
 * A appears twice in M. Eigenvalues are taken as the mean of each sorted pair.
 *
 * <p><b>Vectors and degeneracy.</b> The sorted spectrum of M is cut into clusters between pairs
 * whose gap exceeds {@link #CLUSTER_TOLERANCE}·‖A‖₂. A cluster of k complex eigenvalues has a
 * 2k-dimensional real eigenspace whose 2k real eigenvectors map to complex candidates x + iy that
 * span the k-dimensional complex eigenspace as a tight frame with bound 2 (derived: for unit w in
 * that space, Σⱼ |⟨w, cⱼ⟩|² = 2). Pivoted complex Gram–Schmidt (largest residual first,
 * re-orthogonalised once) therefore always finds a pivot of squared norm ≥ 1/k; a pivot below
 * {@link #MIN_PIVOT_FRACTION}/k means the pairing broke down numerically and the call returns
 * false. The tolerance √ε balances two errors of order ε·‖A‖/gap (cross-cluster orthogonality) and
 * gap (mixing of nearly degenerate vectors inside a cluster); with gaps much larger than √ε·‖A‖
 * both are at rounding level.
 *
 * <p>Only the lower triangle of {@code a} is read, and the imaginary parts of its diagonal are
 * taken as zero, as in LAPACK. This is the fallback path: it costs about 8× the flops of a complex
 * tridiagonal solver and allocates inside EJML, which is acceptable off the default hot path. Not
 * thread-safe; one instance per worker thread.
 */
final class JavaHermitianEigenSolver implements HermitianEigenSolver {

  /** Relative gap (to ‖A‖₂) below which eigenvalues are treated as one cluster: √ε. */
  static final double CLUSTER_TOLERANCE = Math.sqrt(Math.ulp(1.0));

  /** Fraction of the guaranteed minimum squared pivot (1/k) accepted in Gram–Schmidt. */
  static final double MIN_PIVOT_FRACTION = 0.25;

  private final DMatrixRMaj embedding = new DMatrixRMaj(1, 1);
  private EigenDecomposition_F64<DMatrixRMaj> valuesOnly;
  private EigenDecomposition_F64<DMatrixRMaj> withVectors;
  private int valuesOnlySize = -1;
  private int withVectorsSize = -1;
  private double[] sorted = new double[0];
  private int[] order = new int[0];

  /** Cluster candidates then, in place, their residuals: 2k rows of n complex, interleaved. */
  private double[] candidates = new double[0];

  /** Accepted orthonormal vectors of the current cluster: k rows of n complex, interleaved. */
  private double[] basis = new double[0];

  private boolean[] used = new boolean[0];

  @Override
  public boolean eigenvalues(ZMatrixRMaj a, double[] values) {
    int n = LinalgCheckOps.requireSquare(a);
    LinalgCheckOps.requireLength(values, n, "values");
    if (n == 0) {
      return true;
    }
    // A new EJML decomposition per call: EJML 0.43.1's symmetric QR fails when reused at a smaller
    // size (found by the contract test), and its exceptional shifts draw from a random generator
    // held by the instance, so a reused one gives results that depend on earlier calls (found when
    // the same realisation gave different last bits in a long run). The allocation is the price of
    // reproducibility on this fallback path.
    valuesOnly = DecompositionFactory_DDRM.eig(2 * n, false, true);
    valuesOnlySize = n;
    if (!decompose(valuesOnly, a, n)) {
      return false;
    }
    for (int p = 0; p < n; p++) {
      values[p] = 0.5 * (sorted[2 * p] + sorted[2 * p + 1]);
    }
    return true;
  }

  @Override
  public boolean eigenpairs(
      ZMatrixRMaj a, double[] values, int first, int last, ZMatrixRMaj vectors) {
    int n = LinalgCheckOps.requireSquare(a);
    LinalgCheckOps.requireLength(values, n, "values");
    LinalgCheckOps.requireRange(first, last, n);
    LinalgCheckOps.requireDistinct(a, vectors, "a", "vectors");
    int m = last - first + 1;
    vectors.reshape(n, m);
    if (n == 0) {
      return true;
    }
    withVectors =
        DecompositionFactory_DDRM.eig(2 * n, true, true); // fresh per call: see eigenvalues()
    withVectorsSize = n;
    if (!decompose(withVectors, a, n)) {
      return false;
    }
    for (int p = 0; p < n; p++) {
      values[p] = 0.5 * (sorted[2 * p] + sorted[2 * p + 1]);
    }
    if (m == 0) {
      return true;
    }
    double scale = Math.max(Math.abs(sorted[0]), Math.abs(sorted[2 * n - 1]));
    double gapTolerance = CLUSTER_TOLERANCE * Math.max(scale, Double.MIN_NORMAL);
    int start = first;
    while (start > 0 && !isBoundary(start, gapTolerance)) {
      start--;
    }
    while (start <= last) {
      int end = start;
      while (end + 1 < n && !isBoundary(end + 1, gapTolerance)) {
        end++;
      }
      if (!extractCluster(n, start, end, first, last, vectors)) {
        return false;
      }
      start = end + 1;
    }
    return true;
  }

  /** Whether a cluster boundary lies between complex eigenvalues p − 1 and p. */
  private boolean isBoundary(int p, double gapTolerance) {
    return sorted[2 * p] - sorted[2 * p - 1] > gapTolerance;
  }

  /** Builds M from the lower triangle of a, decomposes, and sorts the spectrum ascending. */
  private boolean decompose(EigenDecomposition_F64<DMatrixRMaj> eig, ZMatrixRMaj a, int n) {
    int size = 2 * n;
    embedding.reshape(size, size);
    double[] mat = embedding.data;
    double[] in = a.data;
    for (int i = 0; i < n; i++) {
      double re = in[2 * (i * n + i)];
      mat[i * size + i] = re;
      mat[(n + i) * size + n + i] = re;
      mat[(n + i) * size + i] = 0.0;
      mat[i * size + n + i] = 0.0;
      for (int j = 0; j < i; j++) {
        re = in[2 * (i * n + j)];
        double im = in[2 * (i * n + j) + 1];
        mat[i * size + j] = re;
        mat[j * size + i] = re;
        mat[(n + i) * size + n + j] = re;
        mat[(n + j) * size + n + i] = re;
        mat[(n + i) * size + j] = im; // A_i[i][j]
        mat[(n + j) * size + i] = -im; // A_i[j][i]
        mat[i * size + n + j] = -im; // -A_i[i][j]
        mat[j * size + n + i] = im; // -A_i[j][i]
      }
    }
    if (!eig.decompose(embedding)) {
      return false;
    }
    if (sorted.length < size) {
      sorted = new double[size];
      order = new int[size];
    }
    for (int k = 0; k < size; k++) {
      sorted[k] = eig.getEigenvalue(k).real;
      order[k] = k;
    }
    // Insertion sort carrying the original index; O(n²) is small beside the O(n³) solve.
    for (int k = 1; k < size; k++) {
      double v = sorted[k];
      int idx = order[k];
      int j = k - 1;
      while (j >= 0 && sorted[j] > v) {
        sorted[j + 1] = sorted[j];
        order[j + 1] = order[j];
        j--;
      }
      sorted[j + 1] = v;
      order[j + 1] = idx;
    }
    return true;
  }

  /**
   * Orthonormal complex eigenvectors for the cluster of complex indices start..end; those inside
   * first..last are written to their columns of {@code vectors}.
   */
  private boolean extractCluster(
      int n, int start, int end, int first, int last, ZMatrixRMaj vectors) {
    int k = end - start + 1;
    int rows = 2 * k;
    int rowLen = 2 * n;
    if (candidates.length < rows * rowLen) {
      candidates = new double[rows * rowLen];
    }
    if (basis.length < k * rowLen) {
      basis = new double[k * rowLen];
    }
    if (used.length < rows) {
      used = new boolean[rows];
    }
    for (int r = 0; r < rows; r++) {
      DMatrixRMaj v = withVectors.getEigenVector(order[2 * start + r]);
      if (v == null) {
        return false;
      }
      int off = r * rowLen;
      for (int i = 0; i < n; i++) {
        candidates[off + 2 * i] = v.data[i];
        candidates[off + 2 * i + 1] = v.data[n + i];
      }
      used[r] = false;
    }
    double minPivot = MIN_PIVOT_FRACTION / k;
    int m = vectors.numCols;
    double[] out = vectors.data;
    for (int step = 0; step < k; step++) {
      int pivot = -1;
      double best = -1.0;
      for (int r = 0; r < rows; r++) {
        if (!used[r]) {
          double norm2 = normSquared(candidates, r * rowLen, n);
          if (norm2 > best) {
            best = norm2;
            pivot = r;
          }
        }
      }
      if (best < minPivot) {
        return false;
      }
      used[pivot] = true;
      int q = step * rowLen;
      System.arraycopy(candidates, pivot * rowLen, basis, q, rowLen);
      // Second orthogonalisation pass against the accepted vectors ("twice is enough").
      for (int s = 0; s < step; s++) {
        project(basis, s * rowLen, basis, q, n);
      }
      double norm = Math.sqrt(normSquared(basis, q, n));
      for (int i = 0; i < rowLen; i++) {
        basis[q + i] /= norm;
      }
      for (int r = 0; r < rows; r++) {
        if (!used[r]) {
          project(basis, q, candidates, r * rowLen, n);
        }
      }
      int column = start + step - first;
      if (column >= 0 && start + step <= last) {
        for (int i = 0; i < n; i++) {
          out[2 * (i * m + column)] = basis[q + 2 * i];
          out[2 * (i * m + column) + 1] = basis[q + 2 * i + 1];
        }
      }
    }
    return true;
  }

  private static double normSquared(double[] x, int off, int n) {
    double s = 0.0;
    for (int i = 0; i < 2 * n; i++) {
      s += x[off + i] * x[off + i];
    }
    return s;
  }

  /** y ← y − q (q^H y) for unit q. */
  private static void project(double[] qArr, int qOff, double[] y, int yOff, int n) {
    double re = 0.0;
    double im = 0.0;
    for (int i = 0; i < n; i++) {
      double qr = qArr[qOff + 2 * i];
      double qi = qArr[qOff + 2 * i + 1];
      double yr = y[yOff + 2 * i];
      double yi = y[yOff + 2 * i + 1];
      re += qr * yr + qi * yi;
      im += qr * yi - qi * yr;
    }
    for (int i = 0; i < n; i++) {
      double qr = qArr[qOff + 2 * i];
      double qi = qArr[qOff + 2 * i + 1];
      y[yOff + 2 * i] -= qr * re - qi * im;
      y[yOff + 2 * i + 1] -= qr * im + qi * re;
    }
  }
}
