package hopstat.model;

import java.util.Arrays;
import java.util.Objects;

/**
 * A local (site-diagonal) symmetry operator of the tenfold way on a finite sample, O = U or O = U K
 * with K complex conjugation in the position-orbital basis.
 *
 * <p>The unitary part is block-diagonal: on site s it is {@code siteSigns[s] · u}, with u one
 * {@code orbitalsPerSite × orbitalsPerSite} unitary matrix shared by all sites (row-major, real and
 * imaginary parts in separate arrays) and a real sign ±1 per site (all +1 unless a staggered
 * operator such as a bipartite sublattice symmetry needs it). Time reversal T and particle–hole C
 * are antiunitary (O = U K), chiral S is unitary. The defining relations checked by {@link
 * SymmetryCheckKernel} are U H* U† = H (T), U H* U† = −H (C), U H U† = −H (S).
 *
 * @param symmetry which symmetry this operator represents
 * @param orbitalsPerSite o, the size of the local matrix
 * @param matrixRe real part of u, length o², row-major; copied in and out
 * @param matrixIm imaginary part of u, length o², row-major; copied in and out
 * @param siteSigns ±1 per site, or an empty array for all +1; copied in and out
 */
public record SymmetryOperator(
    Symmetry symmetry,
    int orbitalsPerSite,
    double[] matrixRe,
    double[] matrixIm,
    double[] siteSigns) {

  /** Tolerance on ‖u u† − 1‖_max for accepting a declared local matrix as unitary. */
  public static final double UNITARITY_TOLERANCE = 1e-12;

  public SymmetryOperator {
    Objects.requireNonNull(symmetry, "symmetry");
    if (orbitalsPerSite < 1) {
      throw new IllegalArgumentException("orbitalsPerSite must be positive: " + orbitalsPerSite);
    }
    int o = orbitalsPerSite;
    if (matrixRe.length != o * o || matrixIm.length != o * o) {
      throw new IllegalArgumentException("the local matrix must have " + (o * o) + " entries");
    }
    for (double s : siteSigns) {
      if (s != 1.0 && s != -1.0) {
        throw new IllegalArgumentException("site signs must be +1 or -1: " + s);
      }
    }
    matrixRe = matrixRe.clone();
    matrixIm = matrixIm.clone();
    siteSigns = siteSigns.clone();
    for (int i = 0; i < o; i++) {
      for (int j = 0; j < o; j++) {
        double re = 0;
        double im = 0;
        for (int k = 0; k < o; k++) {
          // (u u†)_ij = Σ_k u_ik conj(u_jk)
          double ar = matrixRe[i * o + k];
          double ai = matrixIm[i * o + k];
          double br = matrixRe[j * o + k];
          double bi = -matrixIm[j * o + k];
          re += ar * br - ai * bi;
          im += ar * bi + ai * br;
        }
        if (Math.abs(re - (i == j ? 1.0 : 0.0)) > UNITARITY_TOLERANCE
            || Math.abs(im) > UNITARITY_TOLERANCE) {
          throw new IllegalArgumentException("the local matrix of " + symmetry + " is not unitary");
        }
      }
    }
  }

  /**
   * The same local matrix on every site.
   *
   * @param re real part, {@code re[i][j]}, square
   * @param im imaginary part, same shape
   */
  public static SymmetryOperator local(Symmetry symmetry, double[][] re, double[][] im) {
    int o = re.length;
    double[] r = new double[o * o];
    double[] i = new double[o * o];
    for (int a = 0; a < o; a++) {
      if (re[a].length != o || im.length != o || im[a].length != o) {
        throw new IllegalArgumentException("the local matrix must be square");
      }
      for (int b = 0; b < o; b++) {
        r[a * o + b] = re[a][b];
        i[a * o + b] = im[a][b];
      }
    }
    return new SymmetryOperator(symmetry, o, r, i, new double[0]);
  }

  /** True for T and C (O = U K), false for S. */
  public boolean isAntiunitary() {
    return symmetry != Symmetry.CHIRAL;
  }

  /** The sign σ in U H^(*) U† = σ H: +1 for T, −1 for C and S. */
  public double expectedSign() {
    return symmetry == Symmetry.TIME_REVERSAL ? 1.0 : -1.0;
  }

  /** Number of per-site signs given (0 = unstaggered, all +1). */
  public int siteSignCount() {
    return siteSigns.length;
  }

  /** The sign of site s (+1 when no staggering was given). */
  public double siteSign(int site) {
    return siteSigns.length == 0 ? 1.0 : siteSigns[site];
  }

  @Override
  public double[] matrixRe() {
    return matrixRe.clone();
  }

  @Override
  public double[] matrixIm() {
    return matrixIm.clone();
  }

  @Override
  public double[] siteSigns() {
    return siteSigns.clone();
  }

  /** Real part of u_ij without copying. */
  double re(int i, int j) {
    return matrixRe[i * orbitalsPerSite + j];
  }

  /** Imaginary part of u_ij without copying. */
  double im(int i, int j) {
    return matrixIm[i * orbitalsPerSite + j];
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof SymmetryOperator s
        && symmetry == s.symmetry
        && orbitalsPerSite == s.orbitalsPerSite
        && Arrays.equals(matrixRe, s.matrixRe)
        && Arrays.equals(matrixIm, s.matrixIm)
        && Arrays.equals(siteSigns, s.siteSigns);
  }

  @Override
  public int hashCode() {
    return Objects.hash(
        symmetry,
        orbitalsPerSite,
        Arrays.hashCode(matrixRe),
        Arrays.hashCode(matrixIm),
        Arrays.hashCode(siteSigns));
  }

  @Override
  public String toString() {
    return "SymmetryOperator["
        + symmetry
        + ", "
        + orbitalsPerSite
        + " orbitals/site"
        + (siteSigns.length == 0 ? "" : ", staggered")
        + "]";
  }
}
