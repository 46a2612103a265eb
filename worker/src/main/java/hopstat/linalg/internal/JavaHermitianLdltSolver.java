package hopstat.linalg.internal;

import hopstat.linalg.HermitianLdltSolver;
import org.ejml.data.ZMatrixRMaj;

/**
 * Pure-Java Bunch–Kaufman factorisation P A Pᵀ = L D Lᴴ (Bunch &amp; Kaufman, Math. Comp. 31, 163
 * (1977); the pivot rule of LAPACK {@code zhetf2} with α = (1 + √17)/8).
 *
 * <p>Right-looking, unblocked, on a full (both triangles) row-major copy so that symmetric row and
 * column interchanges are plain swaps; interchanges are applied to whole rows, including the
 * columns of L already computed, so the result is P A Pᵀ = L D Lᴴ with one permutation P. Cost
 * about 2n³/3 complex multiply–adds (twice LAPACK's, which updates one triangle): the fallback, not
 * the hot path. Workspace grows, never shrinks; not thread-safe.
 */
final class JavaHermitianLdltSolver implements HermitianLdltSolver {

  /** Bunch–Kaufman growth-bounding constant (1 + √17)/8. */
  private static final double ALPHA = (1.0 + Math.sqrt(17.0)) / 8.0;

  private int n = -1;
  private boolean solvable;
  private final int[] counts = new int[3];

  /** Factored matrix: L below the diagonal (unit diagonal implied), D on the diagonal blocks. */
  private double[] f = new double[2];

  /** (P b)_i = b[perm[i]]. */
  private int[] perm = new int[1];

  /** 1 or 2: the size of the pivot block starting at k (0 for the second row of a 2×2 block). */
  private int[] blockSize = new int[1];

  private double[] column = new double[2];

  @Override
  public boolean factor(ZMatrixRMaj a) {
    int size = LinalgCheckOps.requireSquare(a);
    n = size;
    counts[0] = 0;
    counts[1] = 0;
    counts[2] = 0;
    if (f.length < 2 * size * size) {
      f = new double[2 * size * size];
    }
    if (perm.length < size) {
      perm = new int[size];
      blockSize = new int[size];
    }
    // Full Hermitian copy from the lower triangle.
    double[] src = a.data;
    for (int i = 0; i < size; i++) {
      for (int j = 0; j <= i; j++) {
        int ij = 2 * (i * size + j);
        int ji = 2 * (j * size + i);
        double re = src[ij];
        double im = src[ij + 1];
        f[ij] = re;
        f[ij + 1] = im;
        f[ji] = re;
        f[ji + 1] = -im;
      }
      f[2 * (i * size + i) + 1] = 0.0;
      perm[i] = i;
    }
    boolean singular = false;
    int k = 0;
    while (k < size) {
      double absakk = Math.abs(f[2 * (k * size + k)]);
      int r = k;
      double colmax = 0.0;
      for (int i = k + 1; i < size; i++) {
        double v = abs(i, k);
        if (v > colmax) {
          colmax = v;
          r = i;
        }
      }
      if (Math.max(absakk, colmax) == 0.0) {
        // Exactly zero column: D(k,k) = 0, nothing to eliminate.
        counts[2]++;
        blockSize[k] = 1;
        singular = true;
        k++;
        continue;
      }
      int step;
      int kp;
      if (absakk >= ALPHA * colmax) {
        step = 1;
        kp = k;
      } else {
        double rowmax = 0.0;
        for (int j = k; j < size; j++) {
          if (j != r) {
            rowmax = Math.max(rowmax, abs(r, j));
          }
        }
        if (absakk >= ALPHA * colmax * (colmax / rowmax)) {
          step = 1;
          kp = k;
        } else if (Math.abs(f[2 * (r * size + r)]) >= ALPHA * rowmax) {
          step = 1;
          kp = r;
        } else {
          step = 2;
          kp = r;
        }
      }
      int target = step == 1 ? k : k + 1;
      if (kp != target) {
        swap(target, kp, size);
      }
      if (step == 1) {
        eliminate1(k, size);
        blockSize[k] = 1;
        InertiaOps.addScalar(f[2 * (k * size + k)], counts);
        k++;
      } else {
        int bi = 2 * ((k + 1) * size + k);
        InertiaOps.addBlock(
            f[2 * (k * size + k)], f[bi], -f[bi + 1], f[2 * ((k + 1) * size + k + 1)], counts);
        eliminate2(k, size);
        blockSize[k] = 2;
        blockSize[k + 1] = 0;
        k += 2;
      }
    }
    solvable = !singular && counts[2] == 0;
    return solvable;
  }

  private double abs(int i, int j) {
    int ij = 2 * (i * n + j);
    return Math.hypot(f[ij], f[ij + 1]);
  }

  /** Symmetric interchange of rows and columns p and q of the full matrix (p &lt; q). */
  private void swap(int p, int q, int size) {
    for (int j = 0; j < size; j++) {
      int a = 2 * (p * size + j);
      int b = 2 * (q * size + j);
      double re = f[a];
      double im = f[a + 1];
      f[a] = f[b];
      f[a + 1] = f[b + 1];
      f[b] = re;
      f[b + 1] = im;
    }
    for (int i = 0; i < size; i++) {
      int a = 2 * (i * size + p);
      int b = 2 * (i * size + q);
      double re = f[a];
      double im = f[a + 1];
      f[a] = f[b];
      f[a + 1] = f[b + 1];
      f[b] = re;
      f[b + 1] = im;
    }
    int t = perm[p];
    perm[p] = perm[q];
    perm[q] = t;
  }

  /** 1×1 pivot at k: trailing A_ij −= A_ik conj(A_jk) / d, then column k of L = A_ik / d. */
  private void eliminate1(int k, int size) {
    double d = f[2 * (k * size + k)];
    for (int i = k + 1; i < size; i++) {
      int ik = 2 * (i * size + k);
      double lr = f[ik] / d;
      double li = f[ik + 1] / d;
      // A_ij −= l_i · conj(A_jk) over j in k+1..size−1 (full trailing block)
      int row = 2 * (i * size);
      for (int j = k + 1; j < size; j++) {
        int jk = 2 * (j * size + k);
        double ar = f[jk];
        double ai = -f[jk + 1];
        f[row + 2 * j] -= lr * ar - li * ai;
        f[row + 2 * j + 1] -= lr * ai + li * ar;
      }
    }
    for (int i = k + 1; i < size; i++) {
      int ik = 2 * (i * size + k);
      f[ik] /= d;
      f[ik + 1] /= d;
      // keep the upper copy consistent for later row scans
      int ki = 2 * (k * size + i);
      f[ki] = f[ik] * d;
      f[ki + 1] = -f[ik + 1] * d;
    }
    for (int i = k + 1; i < size; i++) {
      f[2 * (i * size + i) + 1] = 0.0;
    }
  }

  /**
   * 2×2 pivot D = [[a, b̄], [b, c]] on rows k, k+1: [l_i1, l_i2] = [A_ik, A_i,k+1] D⁻¹ and A_ij −=
   * [A_ik, A_i,k+1] D⁻¹ [A_jk, A_j,k+1]ᴴ.
   */
  private void eliminate2(int k, int size) {
    double a = f[2 * (k * size + k)];
    double c = f[2 * ((k + 1) * size + k + 1)];
    int bi = 2 * ((k + 1) * size + k);
    double br = f[bi];
    double bim = f[bi + 1];
    double det = a * c - (br * br + bim * bim);
    // D⁻¹ = (1/det) [[c, −b̄], [−b, a]]
    int m = size - k - 2;
    if (column.length < 4 * Math.max(m, 1)) {
      column = new double[4 * Math.max(m, 1)];
    }
    for (int t = 0; t < m; t++) {
      int i = k + 2 + t;
      int i1 = 2 * (i * size + k);
      int i2 = i1 + 2;
      double x1r = f[i1];
      double x1i = f[i1 + 1];
      double x2r = f[i2];
      double x2i = f[i2 + 1];
      // l1 = (x1 c − x2 b) / det, l2 = (−x1 b̄ + x2 a) / det
      double l1r = (x1r * c - (x2r * br - x2i * bim)) / det;
      double l1i = (x1i * c - (x2r * bim + x2i * br)) / det;
      double l2r = (-(x1r * br + x1i * bim) + x2r * a) / det;
      double l2i = (-(x1i * br - x1r * bim) + x2i * a) / det;
      column[4 * t] = l1r;
      column[4 * t + 1] = l1i;
      column[4 * t + 2] = l2r;
      column[4 * t + 3] = l2i;
    }
    for (int t = 0; t < m; t++) {
      int i = k + 2 + t;
      double l1r = column[4 * t];
      double l1i = column[4 * t + 1];
      double l2r = column[4 * t + 2];
      double l2i = column[4 * t + 3];
      int row = 2 * (i * size);
      for (int s = 0; s < m; s++) {
        int j = k + 2 + s;
        int j1 = 2 * (j * size + k);
        // conj(A_jk), conj(A_j,k+1)
        double y1r = f[j1];
        double y1i = -f[j1 + 1];
        double y2r = f[j1 + 2];
        double y2i = -f[j1 + 3];
        f[row + 2 * j] -= (l1r * y1r - l1i * y1i) + (l2r * y2r - l2i * y2i);
        f[row + 2 * j + 1] -= (l1r * y1i + l1i * y1r) + (l2r * y2i + l2i * y2r);
      }
    }
    for (int t = 0; t < m; t++) {
      int i = k + 2 + t;
      int i1 = 2 * (i * size + k);
      f[i1] = column[4 * t];
      f[i1 + 1] = column[4 * t + 1];
      f[i1 + 2] = column[4 * t + 2];
      f[i1 + 3] = column[4 * t + 3];
      f[2 * (i * size + i) + 1] = 0.0;
    }
  }

  @Override
  public int positiveCount() {
    return counts[0];
  }

  @Override
  public int negativeCount() {
    return counts[1];
  }

  @Override
  public int zeroCount() {
    return counts[2];
  }

  @Override
  public void solve(ZMatrixRMaj b) {
    if (n < 0 || !solvable) {
      throw new IllegalStateException(
          "solve needs a successful factorisation of a non-singular matrix");
    }
    if (b.numRows != n) {
      throw new IllegalStateException(
          "right-hand side has " + b.numRows + " rows, the factored matrix " + n);
    }
    int m = b.numCols;
    if (column.length < 2 * n) {
      column = new double[2 * Math.max(n, 2)];
    }
    double[] x = b.data;
    for (int j = 0; j < m; j++) {
      // y = P b
      for (int i = 0; i < n; i++) {
        int s = 2 * (perm[i] * m + j);
        column[2 * i] = x[s];
        column[2 * i + 1] = x[s + 1];
      }
      // L z = y (unit lower; L's columns of a 2×2 block start below the block)
      for (int k = 0; k < n; k++) {
        int top = blockSize[k] == 2 ? k + 2 : blockSize[k] == 1 ? k + 1 : -1;
        if (top < 0) {
          continue;
        }
        for (int c = k; c < (blockSize[k] == 2 ? k + 2 : k + 1); c++) {
          double zr = column[2 * c];
          double zi = column[2 * c + 1];
          for (int i = top; i < n; i++) {
            int ic = 2 * (i * n + c);
            column[2 * i] -= f[ic] * zr - f[ic + 1] * zi;
            column[2 * i + 1] -= f[ic] * zi + f[ic + 1] * zr;
          }
        }
      }
      // D w = z
      for (int k = 0; k < n; k++) {
        if (blockSize[k] == 1) {
          double d = f[2 * (k * n + k)];
          column[2 * k] /= d;
          column[2 * k + 1] /= d;
        } else if (blockSize[k] == 2) {
          double a = f[2 * (k * n + k)];
          double c = f[2 * ((k + 1) * n + k + 1)];
          int bi = 2 * ((k + 1) * n + k);
          double br = f[bi];
          double bim = f[bi + 1];
          double det = a * c - (br * br + bim * bim);
          double z1r = column[2 * k];
          double z1i = column[2 * k + 1];
          double z2r = column[2 * k + 2];
          double z2i = column[2 * k + 3];
          // D⁻¹ = (1/det) [[c, −b̄], [−b, a]]
          column[2 * k] = (c * z1r - (br * z2r + bim * z2i)) / det;
          column[2 * k + 1] = (c * z1i - (br * z2i - bim * z2r)) / det;
          column[2 * k + 2] = (-(br * z1r - bim * z1i) + a * z2r) / det;
          column[2 * k + 3] = (-(br * z1i + bim * z1r) + a * z2i) / det;
        }
      }
      // Lᴴ v = w
      for (int k = n - 1; k >= 0; k--) {
        if (blockSize[k] == 0) {
          continue;
        }
        int width = blockSize[k];
        int top = k + width;
        for (int c = k; c < k + width; c++) {
          double sr = 0.0;
          double si = 0.0;
          for (int i = top; i < n; i++) {
            int ic = 2 * (i * n + c);
            // conj(L_ic) · v_i
            sr += f[ic] * column[2 * i] + f[ic + 1] * column[2 * i + 1];
            si += f[ic] * column[2 * i + 1] - f[ic + 1] * column[2 * i];
          }
          column[2 * c] -= sr;
          column[2 * c + 1] -= si;
        }
      }
      // x = Pᵀ v
      for (int i = 0; i < n; i++) {
        int d = 2 * (perm[i] * m + j);
        x[d] = column[2 * i];
        x[d + 1] = column[2 * i + 1];
      }
    }
  }
}
