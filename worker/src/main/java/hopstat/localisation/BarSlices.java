package hopstat.localisation;

import hopstat.lattice.Lattice;
import org.ejml.data.ZMatrixRMaj;

/**
 * The clean slice form of a model on a quasi-one-dimensional bar, as extracted by {@link
 * BarSliceOps#extract}: the bar's Hamiltonian is the block-tridiagonal chain
 *
 * <pre>
 *   T_{n−1} ψ_{n−1} + H_n ψ_n + T_n† ψ_{n+1} = E ψ_n ,
 * </pre>
 *
 * with H_n (K × K, Hermitian) the on-slice block and T_n = H_{n+1,n} (K × K, complex, possibly
 * singular) the block that couples slice n to slice n+1 (rows: slice n+1, columns: slice n). The
 * clean H and T are the same for every n; disorder adds to them slice by slice.
 *
 * <p>Order inside a slice (0-based): cell index c = x₀ + M·x₁ (transverse cell coordinates, the
 * first direction fastest), then the sites of the cell in the model's site-index order, then the
 * orbitals: local index = (c·sitesPerCell + site)·orbitalsPerSite + orbital.
 *
 * @param orbitals K
 * @param crossSection M, transverse cells per direction (1 in d = 1)
 * @param onSlice clean H (K × K); copied in and out
 * @param coupling clean T = H_{n+1,n} (K × K); copied in and out
 * @param sliceLattice the sites of one slice, in the local order (what slice-wise disorder reads)
 * @param window the sites of two consecutive slices n (indices 0..S−1) and n+1 (S..2S−1), S =
 *     sliceLattice.sites(); for d = 1 an open chain of two cells
 */
public record BarSlices(
    int orbitals,
    int crossSection,
    ZMatrixRMaj onSlice,
    ZMatrixRMaj coupling,
    Lattice sliceLattice,
    Lattice window) {

  public BarSlices {
    if (orbitals < 1
        || onSlice.numRows != orbitals
        || onSlice.numCols != orbitals
        || coupling.numRows != orbitals
        || coupling.numCols != orbitals) {
      throw new IllegalArgumentException("H and T must be K x K, K = " + orbitals);
    }
    if (sliceLattice.orbitals() != orbitals || window.orbitals() != 2 * orbitals) {
      throw new IllegalArgumentException("slice lattice must have K orbitals and the window 2K");
    }
    onSlice = onSlice.copy();
    coupling = coupling.copy();
  }

  @Override
  public ZMatrixRMaj onSlice() {
    return onSlice.copy();
  }

  @Override
  public ZMatrixRMaj coupling() {
    return coupling.copy();
  }

  /** Sites of one slice. */
  public int sliceSites() {
    return sliceLattice.sites();
  }

  /** Writes the clean H into {@code out} (reshaped to K × K). No allocation. */
  public void copyOnSlice(ZMatrixRMaj out) {
    out.setTo(onSlice);
  }

  /** Writes the clean T into {@code out} (reshaped to K × K). No allocation. */
  public void copyCoupling(ZMatrixRMaj out) {
    out.setTo(coupling);
  }
}
