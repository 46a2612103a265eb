package hopstat.model;

import hopstat.lattice.Lattice;
import org.ejml.data.ZMatrixRMaj;

/**
 * Numerical check of a declared symmetry on a built Hamiltonian: the relative Frobenius norm
 *
 * <pre>  ‖U H* U† − H‖ / ‖H‖ (T),   ‖U H* U† + H‖ / ‖H‖ (C),   ‖U H U† + H‖ / ‖H‖ (S)</pre>
 *
 * with U the block-diagonal unitary of a {@link SymmetryOperator}. A Hamiltonian assembled in
 * double precision from a symmetric model gives violations at the round-off level (~1e−16); a
 * broken symmetry gives violations of the order of the breaking term over ‖H‖.
 *
 * <p>Cost: O(N² o) for an N × N Hamiltonian with o orbitals per site; no allocation once warm.
 */
public final class SymmetryCheckKernel {

  /**
   * Default threshold on the relative violation. Round-off in building H is ~1e−15 relative; a
   * physical breaking term worth reporting is larger than 1e−9 of ‖H‖ (common practice).
   */
  public static final double TOLERANCE = 1e-9;

  private SymmetryCheckKernel() {}

  /**
   * @param hamiltonian read, not modified: N × N Hermitian, N = lattice.orbitals()
   * @param lattice read: sites and orbitals per site
   * @param operator read: local operator with the lattice's orbitals per site
   * @param tolerance threshold on the relative violation
   * @param workspace scratch
   */
  public static SymmetryCheckResult check(
      ZMatrixRMaj hamiltonian,
      Lattice lattice,
      SymmetryOperator operator,
      double tolerance,
      SymmetryCheckWorkspace workspace) {
    int o = lattice.orbitalsPerSite();
    int n = lattice.orbitals();
    if (hamiltonian.numRows != n || hamiltonian.numCols != n) {
      throw new IllegalArgumentException(
          "H is "
              + hamiltonian.numRows
              + "x"
              + hamiltonian.numCols
              + ", lattice has "
              + n
              + " orbitals");
    }
    if (operator.orbitalsPerSite() != o) {
      throw new IllegalArgumentException(
          "operator acts on "
              + operator.orbitalsPerSite()
              + " orbitals per site, lattice has "
              + o);
    }
    if (operator.siteSignCount() != 0 && operator.siteSignCount() != lattice.sites()) {
      throw new IllegalArgumentException(
          "operator has "
              + operator.siteSignCount()
              + " site signs, lattice has "
              + lattice.sites()
              + " sites");
    }
    workspace.ensure(o);
    double conj = operator.isAntiunitary() ? -1.0 : 1.0;
    double sigma = operator.expectedSign();
    double[] h = hamiltonian.data;
    int stride = 2 * n;
    double residual = 0.0;
    double norm = 0.0;
    double[] br = workspace.blockRe;
    double[] bi = workspace.blockIm;
    double[] tr = workspace.tempRe;
    double[] ti = workspace.tempIm;
    int sites = lattice.sites();
    for (int s = 0; s < sites; s++) {
      for (int q = 0; q < sites; q++) {
        double sign = operator.siteSign(s) * operator.siteSign(q);
        // temp = B u†, B the (s, q) block of H or H*: temp_ab = Σ_c B_ac conj(u_bc)
        for (int a = 0; a < o; a++) {
          int row = (s * o + a) * stride + 2 * q * o;
          for (int b = 0; b < o; b++) {
            double re = 0.0;
            double im = 0.0;
            for (int c = 0; c < o; c++) {
              double xr = h[row + 2 * c];
              double xi = conj * h[row + 2 * c + 1];
              double yr = operator.re(b, c);
              double yi = -operator.im(b, c);
              re += xr * yr - xi * yi;
              im += xr * yi + xi * yr;
            }
            tr[a * o + b] = re;
            ti[a * o + b] = im;
          }
        }
        // block = u temp
        for (int a = 0; a < o; a++) {
          for (int b = 0; b < o; b++) {
            double re = 0.0;
            double im = 0.0;
            for (int c = 0; c < o; c++) {
              double xr = operator.re(a, c);
              double xi = operator.im(a, c);
              re += xr * tr[c * o + b] - xi * ti[c * o + b];
              im += xr * ti[c * o + b] + xi * tr[c * o + b];
            }
            br[a * o + b] = sign * re;
            bi[a * o + b] = sign * im;
          }
        }
        for (int a = 0; a < o; a++) {
          int row = (s * o + a) * stride + 2 * q * o;
          for (int b = 0; b < o; b++) {
            double hr = h[row + 2 * b];
            double hi = h[row + 2 * b + 1];
            double dr = br[a * o + b] - sigma * hr;
            double di = bi[a * o + b] - sigma * hi;
            residual += dr * dr + di * di;
            norm += hr * hr + hi * hi;
          }
        }
      }
    }
    double relative = norm == 0.0 ? 0.0 : Math.sqrt(residual / norm);
    return new SymmetryCheckResult(operator.symmetry(), relative, tolerance);
  }
}
