package hopstat.invariant;

import hopstat.lattice.Lattice;
import org.ejml.data.ZMatrixRMaj;

/**
 * Bott index of a two-dimensional periodic sample (Loring &amp; Hastings, EPL 92, 67004 (2010)),
 * computed in the occupied subspace.
 *
 * <p>With Ψ the N × n orthonormal occupied states, U_P = Ψ† e^{2πi X/L_x} Ψ and V_P = Ψ† e^{2πi
 * Y/L_y} Ψ (n × n), the index is
 *
 * <pre>  Bott = (1/2π) Σ_i arg λ_i(V_P U_P V_P† U_P†),  arg in (−π, π].</pre>
 *
 * Working with n × n matrices instead of N × N saves a factor (N/n)³ over the projector form. Sign
 * convention: for the {@code qwz} model this returns the Chern number C of the filled band as
 * defined in {@link hopstat.model.QwzModel} (C = +1 for −2 &lt; m &lt; 0), checked in tests.
 *
 * <p>Cost: two N·n² products, three n³ products and one n × n general eigenvalue problem.
 */
public final class BottIndexKernel {

  private BottIndexKernel() {}

  /**
   * @param lattice read: orbital positions ({@link Lattice#orbitalPosition}) and extents
   *     (directions 0 and 1 are x and y)
   * @param occupied read, not modified: N × n matrix whose columns are orthonormal occupied states
   * @param workspace scratch
   * @return the index; {@code converged = false} when the eigenvalue routine failed
   */
  public static BottIndexResult compute(
      Lattice lattice, ZMatrixRMaj occupied, BottWorkspace workspace) {
    if (lattice.dimension() != 2) {
      throw new IllegalArgumentException("the Bott index needs a two-dimensional lattice");
    }
    int n = occupied.numCols;
    if (occupied.numRows != lattice.orbitals()) {
      throw new IllegalArgumentException(
          "occupied states have "
              + occupied.numRows
              + " rows, lattice has "
              + lattice.orbitals()
              + " orbitals");
    }
    if (n == 0 || n == occupied.numRows) {
      // Empty or full band: the projector is trivial, so is the index.
      return new BottIndexResult(0.0, 1.0, true);
    }
    projectPositionUnitary(lattice, 0, occupied, workspace, workspace.projectedX);
    projectPositionUnitary(lattice, 1, occupied, workspace, workspace.projectedY);

    // W = V U V† U†
    workspace.products.mult(workspace.projectedY, workspace.projectedX, workspace.product1);
    workspace.products.multConjTransB(workspace.product1, workspace.projectedY, workspace.product2);
    workspace.products.multConjTransB(workspace.product2, workspace.projectedX, workspace.product1);

    workspace.ensure(n);
    boolean ok =
        workspace.eigenvalues.eigenvalues(workspace.product1, workspace.real, workspace.imaginary);
    if (!ok) {
      return new BottIndexResult(Double.NaN, Double.NaN, false);
    }
    double phaseSum = 0.0;
    double smallest = Double.POSITIVE_INFINITY;
    for (int i = 0; i < n; i++) {
      phaseSum += Math.atan2(workspace.imaginary[i], workspace.real[i]);
      smallest = Math.min(smallest, Math.hypot(workspace.real[i], workspace.imaginary[i]));
    }
    return new BottIndexResult(phaseSum / (2.0 * Math.PI), smallest, true);
  }

  /**
   * out = Ψ† diag(e^{2πi r_d/extent_d}) Ψ, the projected position unitary along direction d (r:
   * orbital positions).
   */
  private static void projectPositionUnitary(
      Lattice lattice, int d, ZMatrixRMaj psi, BottWorkspace ws, ZMatrixRMaj out) {
    int rows = psi.numRows;
    int cols = psi.numCols;
    double extent = lattice.extent()[d];
    ZMatrixRMaj phased = ws.phased;
    phased.reshape(rows, cols);
    double[] src = psi.data;
    double[] dst = phased.data;
    for (int i = 0; i < rows; i++) {
      double angle = 2.0 * Math.PI * lattice.orbitalPosition(d, i) / extent;
      double c = Math.cos(angle);
      double s = Math.sin(angle);
      int base = 2 * i * cols;
      for (int j = 0; j < cols; j++) {
        double re = src[base + 2 * j];
        double im = src[base + 2 * j + 1];
        dst[base + 2 * j] = c * re - s * im;
        dst[base + 2 * j + 1] = s * re + c * im;
      }
    }
    ws.products.multConjTransA(psi, phased, out);
  }
}
