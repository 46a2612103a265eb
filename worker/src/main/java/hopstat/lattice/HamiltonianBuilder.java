package hopstat.lattice;

import java.util.Arrays;
import org.ejml.data.ZMatrixRMaj;

/**
 * Accumulates a Hermitian tight-binding matrix as a list of (row, column, value) terms, so that
 * models and disorder add terms without knowing whether a dense or a sparse matrix is built from
 * them. Each off-diagonal term added with {@link #addHopping} also stands for its Hermitian
 * conjugate. Mutable scratch: one per worker thread, {@link #reset} before each realisation; the
 * arrays grow to the largest realisation seen and never shrink.
 */
public final class HamiltonianBuilder {

  private int dimension;
  private int count;
  private int[] rows = new int[64];
  private int[] cols = new int[64];
  private double[] re = new double[64];
  private double[] im = new double[64];

  /** Starts a new matrix of the given dimension; keeps the storage. */
  public void reset(int matrixDimension) {
    if (matrixDimension < 1) {
      throw new IllegalArgumentException("matrix dimension must be positive: " + matrixDimension);
    }
    this.dimension = matrixDimension;
    this.count = 0;
  }

  public int dimension() {
    return dimension;
  }

  /** Number of stored terms (a hopping counts once). */
  public int termCount() {
    return count;
  }

  /** Adds a real value to the diagonal entry (i, i). */
  public void addOnsite(int i, double value) {
    check(i, i);
    append(i, i, value, 0.0);
  }

  /**
   * Adds {@code value} to H[i][j] and its conjugate to H[j][i]. For i = j only the real part is
   * used twice, so prefer {@link #addOnsite} on the diagonal.
   */
  public void addHopping(int i, int j, double valueRe, double valueIm) {
    check(i, j);
    if (i == j) {
      append(i, i, 2.0 * valueRe, 0.0);
    } else {
      append(i, j, valueRe, valueIm);
    }
  }

  /** Row of term k. */
  public int row(int k) {
    return rows[k];
  }

  /** Column of term k. */
  public int column(int k) {
    return cols[k];
  }

  public double realPart(int k) {
    return re[k];
  }

  public double imaginaryPart(int k) {
    return im[k];
  }

  /**
   * Writes the dense Hermitian matrix.
   *
   * @param out overwritten; reshaped to dimension × dimension
   */
  public void toDense(ZMatrixRMaj out) {
    out.reshape(dimension, dimension);
    out.zero();
    double[] data = out.data;
    int stride = 2 * dimension;
    for (int k = 0; k < count; k++) {
      int i = rows[k];
      int j = cols[k];
      int ij = i * stride + 2 * j;
      data[ij] += re[k];
      data[ij + 1] += im[k];
      if (i != j) {
        int ji = j * stride + 2 * i;
        data[ji] += re[k];
        data[ji + 1] -= im[k];
      }
    }
  }

  /** Multiplies every stored term by a real factor (used to rescale spectra). */
  public void scale(double factor) {
    for (int k = 0; k < count; k++) {
      re[k] *= factor;
      im[k] *= factor;
    }
  }

  /**
   * Sets to zero every stored term whose row or column is a flagged orbital, i.e. decouples those
   * orbitals completely (hoppings, pairings and onsite values). The terms stay in the list with
   * value 0, so term indices, {@link #termCount()} and the sparsity pattern do not change. Used for
   * vacancies (site dilution) without changing the matrix dimension.
   *
   * @param flagged read, not modified: {@code flagged[i]} true for orbital i; length ≥ {@link
   *     #dimension()}
   * @return number of terms set to zero
   */
  public int zeroTermsTouching(boolean[] flagged) {
    if (flagged.length < dimension) {
      throw new IllegalArgumentException(
          "flags for " + flagged.length + " orbitals, matrix has " + dimension);
    }
    int zeroed = 0;
    for (int k = 0; k < count; k++) {
      if (flagged[rows[k]] || flagged[cols[k]]) {
        re[k] = 0.0;
        im[k] = 0.0;
        zeroed++;
      }
    }
    return zeroed;
  }

  /** Multiplies stored term k (and so its Hermitian conjugate) by a real factor. */
  public void scaleTerm(int k, double factor) {
    if (k < 0 || k >= count) {
      throw new IndexOutOfBoundsException("term " + k + " of " + count);
    }
    re[k] *= factor;
    im[k] *= factor;
  }

  private void check(int i, int j) {
    if (i < 0 || j < 0 || i >= dimension || j >= dimension) {
      throw new IndexOutOfBoundsException(
          "term (" + i + ", " + j + ") outside a " + dimension + "-dimensional matrix");
    }
  }

  private void append(int i, int j, double vr, double vi) {
    if (count == rows.length) {
      int n = 2 * rows.length;
      rows = Arrays.copyOf(rows, n);
      cols = Arrays.copyOf(cols, n);
      re = Arrays.copyOf(re, n);
      im = Arrays.copyOf(im, n);
    }
    rows[count] = i;
    cols[count] = j;
    re[count] = vr;
    im[count] = vi;
    count++;
  }
}
