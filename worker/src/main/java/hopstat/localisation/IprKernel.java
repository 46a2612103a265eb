package hopstat.localisation;

import org.ejml.data.ZMatrixRMaj;

/**
 * Inverse participation ratio P = Σ_i |ψ_i|⁴ / (Σ_i |ψ_i|²)² of a state, summed over matrix indices
 * i, i.e. over orbitals (per-orbital amplitude convention: orbitals of one site are not summed
 * first). P = 1 for a state on one orbital, 1/N for a uniform state on N orbitals; a random unit
 * vector has ⟨P⟩ = 3/(N+2) (real) or 2/(N+1) (complex) (Porter–Thomas; common practice). O(N) per
 * state, no allocation.
 */
public final class IprKernel {

  private IprKernel() {}

  /**
   * @param vectors read, not modified: states as columns
   * @param column 0-based column index
   * @return the IPR of that column (normalised by its norm, so unnormalised input is fine); NaN for
   *     a zero column
   */
  public static double ipr(ZMatrixRMaj vectors, int column) {
    int n = vectors.numRows;
    int cols = vectors.numCols;
    if (column < 0 || column >= cols) {
      throw new IndexOutOfBoundsException("column " + column + " of " + cols);
    }
    double[] d = vectors.data;
    double norm2 = 0;
    double fourth = 0;
    for (int i = 0; i < n; i++) {
      int k = 2 * (i * cols + column);
      double p = d[k] * d[k] + d[k + 1] * d[k + 1];
      norm2 += p;
      fourth += p * p;
    }
    return fourth / (norm2 * norm2);
  }

  /**
   * The IPR of a real vector.
   *
   * @param psi read, not modified; the first {@code n} entries
   */
  public static double ipr(double[] psi, int n) {
    double norm2 = 0;
    double fourth = 0;
    for (int i = 0; i < n; i++) {
      double p = psi[i] * psi[i];
      norm2 += p;
      fourth += p * p;
    }
    return fourth / (norm2 * norm2);
  }
}
