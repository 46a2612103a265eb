package hopstat.invariant;

import hopstat.lattice.Lattice;
import org.ejml.data.ZMatrixRMaj;

/**
 * Real-space winding number of a chiral chain (Mondragon-Shem, Hughes, Song, Prodan, PRL 113,
 * 046802 (2014), arXiv:1311.5233):
 *
 * <pre>  ν = T{ Q_{−+} [X, Q_{+−}] },   Q = 1 − 2P,</pre>
 *
 * P the projector on the occupied states (E &lt; 0), Q_{+−} = S₊ Q S₋ its block from sublattice B
 * (chiral −1) to A (+1), X the unit-cell position and T the trace per unit cell. Since the A–B
 * block of 1 vanishes, Q_{+−} = −2 P_{AB}, and
 *
 * <pre>  ν = (4/|window|) Σ_{b ∈ window} Σ_a |P_{AB}[a][b]|² (x_a − x_b)     (derived).</pre>
 *
 * Boundary and window (choice, common practice for local markers): the chain is <b>open</b>, so X
 * is an ordinary position operator, and the trace runs over the B orbitals of the central cells
 * [⌊L/4⌋, L − ⌊L/4⌋), away from the ends and their zero modes. Sign: for v = 0 (only intercell
 * bonds B_j–A_{j+1}) Q_{AB}[j+1][j] = sgn w and ν = +1 exactly (derived); the trivial dimerisation
 * gives 0. Layout: orbital 0 of each cell is A, orbital 1 is B ({@link hopstat.model.ChiralChain}).
 *
 * <p><b>X is the cell coordinate</b> ({@link Lattice#position} of the site), not the orbital
 * position ({@link Lattice#orbitalPosition}), on purpose: the winding is defined relative to the
 * choice of unit cell. Moving the B orbitals by c inside the cell (X → X + c·P_B) gives [X + cP_B,
 * Q_{+−}] = [X, Q_{+−}] − c Q_{+−} and, with T{Q_{−+}Q_{+−}} = 1 per cell in a gapped bulk, ν → ν −
 * c (derived): with true positions the value would not be an integer (ν − 1/2 for B at the cell
 * middle).
 *
 * <p>Cost: one L × n × L complex product (n occupied states) plus O(L²).
 */
public final class RealSpaceWindingKernel {

  private RealSpaceWindingKernel() {}

  /**
   * @param lattice read: an open chain with two orbitals per cell (A, B) and L ≥ 4
   * @param occupied read, not modified: 2L × n orthonormal occupied states
   * @param workspace scratch
   */
  public static WindingResult compute(
      Lattice lattice, ZMatrixRMaj occupied, WindingWorkspace workspace) {
    int cells = lattice.sites();
    if (lattice.dimension() != 1 || lattice.orbitalsPerSite() != 2 || cells < 4) {
      throw new IllegalArgumentException(
          "the winding needs a chain with two orbitals per cell and L >= 4, got " + lattice);
    }
    if (occupied.numRows != 2 * cells) {
      throw new IllegalArgumentException(
          "occupied states have "
              + occupied.numRows
              + " rows, lattice has "
              + 2 * cells
              + " orbitals");
    }
    int n = occupied.numCols;
    int first = cells / 4;
    int end = cells - cells / 4;
    if (n == 0) {
      return new WindingResult(0.0, first, end - first);
    }
    ZMatrixRMaj a = workspace.statesA;
    ZMatrixRMaj b = workspace.statesB;
    a.reshape(cells, n);
    b.reshape(cells, n);
    for (int j = 0; j < cells; j++) {
      System.arraycopy(occupied.data, 2 * (2 * j) * n, a.data, 2 * j * n, 2 * n);
      System.arraycopy(occupied.data, 2 * (2 * j + 1) * n, b.data, 2 * j * n, 2 * n);
    }
    ZMatrixRMaj pab = workspace.projectorAB;
    workspace.products.multConjTransB(a, b, pab);
    double sum = 0.0;
    for (int col = first; col < end; col++) {
      double xb = lattice.position(0, col);
      for (int row = 0; row < cells; row++) {
        int k = 2 * (row * cells + col);
        double re = pab.data[k];
        double im = pab.data[k + 1];
        sum += (re * re + im * im) * (lattice.position(0, row) - xb);
      }
    }
    return new WindingResult(4.0 * sum / (end - first), first, end - first);
  }
}
