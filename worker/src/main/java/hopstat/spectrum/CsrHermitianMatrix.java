package hopstat.spectrum;

import hopstat.lattice.HamiltonianBuilder;
import java.util.Arrays;

/**
 * A complex Hermitian matrix in compressed sparse row (CSR) storage, assembled from a {@link
 * HamiltonianBuilder} term list, with a sparse matrix–vector product over caller-owned vectors.
 *
 * <p><b>Storage.</b> Both triangles are stored: each off-diagonal term (i, j, h) of the builder
 * puts h at (i, j) and conj(h) at (j, i); a diagonal term adds its real part at (i, i). Duplicate
 * positions are summed during assembly, so the stored matrix equals {@link
 * HamiltonianBuilder#toDense} exactly (same additions, possibly in another order: equal up to
 * rounding of the sums). Within a row the columns are strictly increasing. Every row stores its
 * diagonal entry (zero if no term touched it), so shifts need no extra storage. Complex vectors are
 * interleaved (re, im) arrays of length ≥ 2N, as in EJML's {@code ZMatrixRMaj}.
 *
 * <p><b>Reuse.</b> Mutable scratch: one per worker thread; {@link #assemble} overwrites the matrix
 * and keeps the arrays, which grow to the largest matrix seen and never shrink. Once warm,
 * assembling a matrix of the same size allocates nothing.
 *
 * <p>Cost: assembly O(terms + Σ_i r_i²) with r_i the entries of row i (insertion sort of short
 * rows); a product 8·nnz flops and one pass over the 20·nnz bytes of the matrix (memory bound).
 */
public final class CsrHermitianMatrix {

  private int dimension;
  private int[] rowStart = new int[2];
  private int[] columns = new int[1];
  private double[] re = new double[1];
  private double[] im = new double[1];
  private int[] fill = new int[1];

  /**
   * Assembles the matrix from a term list (overwrites this matrix).
   *
   * @param terms read, not modified
   */
  public void assemble(HamiltonianBuilder terms) {
    int n = terms.dimension();
    int count = terms.termCount();
    dimension = n;
    if (rowStart.length < n + 1) {
      rowStart = new int[n + 1];
      fill = new int[n];
    }
    // Count: one diagonal slot per row, plus each term in its row and (off-diagonal) its mirror
    // row.
    Arrays.fill(fill, 0, n, 1);
    for (int k = 0; k < count; k++) {
      int r = terms.row(k);
      int c = terms.column(k);
      if (r != c) {
        fill[r]++;
        fill[c]++;
      }
    }
    rowStart[0] = 0;
    for (int i = 0; i < n; i++) {
      rowStart[i + 1] = rowStart[i] + fill[i];
    }
    int capacity = rowStart[n];
    if (columns.length < capacity) {
      columns = new int[capacity];
      re = new double[capacity];
      im = new double[capacity];
    }
    for (int i = 0; i < n; i++) {
      int p = rowStart[i];
      columns[p] = i;
      re[p] = 0.0;
      im[p] = 0.0;
      fill[i] = p + 1;
    }
    for (int k = 0; k < count; k++) {
      int r = terms.row(k);
      int c = terms.column(k);
      double vr = terms.realPart(k);
      double vi = terms.imaginaryPart(k);
      if (r == c) {
        re[rowStart[r]] += vr;
      } else {
        int p = fill[r]++;
        columns[p] = c;
        re[p] = vr;
        im[p] = vi;
        int q = fill[c]++;
        columns[q] = r;
        re[q] = vr;
        im[q] = -vi;
      }
    }
    // Sort each row by column and sum duplicates, compacting the storage in place.
    int write = 0;
    for (int i = 0; i < n; i++) {
      int start = rowStart[i];
      int end = rowStart[i + 1];
      insertionSort(start, end);
      rowStart[i] = write;
      for (int p = start; p < end; p++) {
        if (write > rowStart[i] && columns[write - 1] == columns[p]) {
          re[write - 1] += re[p];
          im[write - 1] += im[p];
        } else {
          columns[write] = columns[p];
          re[write] = re[p];
          im[write] = im[p];
          write++;
        }
      }
    }
    rowStart[n] = write;
  }

  private void insertionSort(int start, int end) {
    for (int p = start + 1; p < end; p++) {
      int c = columns[p];
      double vr = re[p];
      double vi = im[p];
      int q = p - 1;
      while (q >= start && columns[q] > c) {
        columns[q + 1] = columns[q];
        re[q + 1] = re[q];
        im[q + 1] = im[q];
        q--;
      }
      columns[q + 1] = c;
      re[q + 1] = vr;
      im[q + 1] = vi;
    }
  }

  /** Matrix dimension N (0 before the first assembly). */
  public int dimension() {
    return dimension;
  }

  /** Number of stored entries (both triangles, diagonal included). */
  public int nonZeros() {
    return rowStart[dimension];
  }

  /** Bytes held by the storage arrays (capacity, for memory reports). */
  public long storageBytes() {
    return 4L * (rowStart.length + fill.length + columns.length) + 8L * (re.length + im.length);
  }

  /**
   * Index of the first stored entry of row i (0-based); row i holds entries rowStart(i) ..
   * rowStart(i + 1) − 1.
   */
  public int rowStart(int i) {
    return rowStart[i];
  }

  /** Column of stored entry p. */
  public int column(int p) {
    return columns[p];
  }

  /** Real part of stored entry p. */
  public double realPart(int p) {
    return re[p];
  }

  /** Imaginary part of stored entry p. */
  public double imaginaryPart(int p) {
    return im[p];
  }

  /**
   * Lower and upper Gershgorin bounds of the spectrum: every eigenvalue lies in [min_i (H_ii −
   * R_i), max_i (H_ii + R_i)], R_i = Σ_{j≠i} |H_ij| (Gershgorin circle theorem; for a Hermitian
   * matrix the discs meet the real axis in these intervals).
   *
   * @param out overwritten: out[0] lower, out[1] upper bound
   */
  public void gershgorinBounds(double[] out) {
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    for (int i = 0; i < dimension; i++) {
      double radius = 0.0;
      double diagonal = 0.0;
      for (int p = rowStart[i]; p < rowStart[i + 1]; p++) {
        if (columns[p] == i) {
          diagonal = re[p];
        } else {
          radius += Math.hypot(re[p], im[p]);
        }
      }
      lo = Math.min(lo, diagonal - radius);
      hi = Math.max(hi, diagonal + radius);
    }
    out[0] = lo;
    out[1] = hi;
  }

  /**
   * y = H x.
   *
   * @param x read, not modified: interleaved complex vector, length ≥ 2N
   * @param y overwritten: length ≥ 2N; must not be {@code x}
   */
  public void multiply(double[] x, double[] y) {
    multiplyAffine(1.0, 0.0, x, 0.0, null, y);
  }

  /**
   * y = α·H x + β·x + γ·z: one Chebyshev step T_{n+1} = 2H̃T_n − T_{n−1} with H̃ = (H − b)/a is α =
   * 2/a, β = −2b/a, γ = −1, z = T_{n−1}.
   *
   * @param x read, not modified
   * @param z read, not modified (may be {@code null} when γ = 0); may be {@code y} (read before
   *     written, entry by entry)
   * @param y overwritten; must not be {@code x}
   */
  public void multiplyAffine(
      double alpha, double beta, double[] x, double gamma, double[] z, double[] y) {
    int n = dimension;
    if (x.length < 2 * n || y.length < 2 * n || (z != null && z.length < 2 * n)) {
      throw new IllegalArgumentException("vectors must have length >= " + 2 * n);
    }
    if (x == y) {
      throw new IllegalArgumentException("x and y must not alias");
    }
    if (z == null && gamma != 0.0) {
      throw new IllegalArgumentException("z is null but gamma = " + gamma);
    }
    int[] rs = rowStart;
    int[] cs = columns;
    double[] ar = re;
    double[] ai = im;
    for (int i = 0; i < n; i++) {
      double sr = 0.0;
      double si = 0.0;
      for (int p = rs[i]; p < rs[i + 1]; p++) {
        int j = 2 * cs[p];
        double xr = x[j];
        double xi = x[j + 1];
        sr += ar[p] * xr - ai[p] * xi;
        si += ar[p] * xi + ai[p] * xr;
      }
      int k = 2 * i;
      double yr = alpha * sr + beta * x[k];
      double yi = alpha * si + beta * x[k + 1];
      if (gamma != 0.0) {
        yr += gamma * z[k];
        yi += gamma * z[k + 1];
      }
      y[k] = yr;
      y[k + 1] = yi;
    }
  }

  /**
   * One Chebyshev step with accumulation, fused in one pass: y ← α·H x + β·x − y, then acc ← acc +
   * c·y. With α = 2/a, β = −2b/a, x = T_n, y = T_{n−1} on entry this leaves T_{n+1} in y and adds
   * c_{n+1}·T_{n+1} to the series (saves one pass over three vectors per step against a separate
   * update).
   *
   * @param x read, not modified
   * @param y read and overwritten; must not be {@code x} or {@code acc}
   * @param acc accumulated into; must not be {@code x} or {@code y}
   */
  public void chebyshevStep(
      double alpha, double beta, double[] x, double[] y, double coefficient, double[] acc) {
    int n = dimension;
    if (x.length < 2 * n || y.length < 2 * n || acc.length < 2 * n) {
      throw new IllegalArgumentException("vectors must have length >= " + 2 * n);
    }
    if (x == y || x == acc || y == acc) {
      throw new IllegalArgumentException("x, y and acc must not alias");
    }
    int[] rs = rowStart;
    int[] cs = columns;
    double[] ar = re;
    double[] ai = im;
    for (int i = 0; i < n; i++) {
      double sr = 0.0;
      double si = 0.0;
      for (int p = rs[i]; p < rs[i + 1]; p++) {
        int j = 2 * cs[p];
        double xr = x[j];
        double xi = x[j + 1];
        sr += ar[p] * xr - ai[p] * xi;
        si += ar[p] * xi + ai[p] * xr;
      }
      int k = 2 * i;
      double yr = alpha * sr + beta * x[k] - y[k];
      double yi = alpha * si + beta * x[k + 1] - y[k + 1];
      y[k] = yr;
      y[k + 1] = yi;
      acc[k] += coefficient * yr;
      acc[k + 1] += coefficient * yi;
    }
  }
}
