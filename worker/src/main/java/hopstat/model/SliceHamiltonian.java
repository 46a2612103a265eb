package hopstat.model;

import hopstat.lattice.Boundary;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;

/**
 * Optional model capability: the Hamiltonian of a quasi-one-dimensional bar (a strip in d = 2, a
 * bar of square cross-section in d = 3, a chain in d = 1) written as a nearest-slice chain,
 *
 * <pre>
 *   T_{n−1}ᵀ ψ_{n−1} + H_n ψ_n + T_n ψ_{n+1} = E ψ_n ,
 * </pre>
 *
 * where ψ_n holds the K amplitudes of slice n (K = sites of a slice × orbitals per site), H_n is
 * the on-slice Hamiltonian (clean part from {@link #addCleanSlice}, disorder drawn per slice on
 * {@link #sliceLattice}) and T = H_{n,n+1} is the clean inter-slice hopping block, the same for
 * every n. This is what the transfer-matrix method needs (MacKinnon &amp; Kramer, PRL 47, 1546
 * (1981)): T must be invertible.
 *
 * <p>This version is <b>real</b>: H_n and T are real matrices, which covers classes AI and BDI/D
 * models with real BdG matrices. A complex variant (class A, AII) is not written yet. Models
 * implementing it: {@code anderson-1d/2d/3d}.
 *
 * <p>Slices are stacked along the last lattice direction (x for d = 1, y for d = 2, z for d = 3);
 * the slice lattice is the (d−1)-dimensional cross-section of linear size M, with the boundary
 * condition given for the transverse directions (a single site for d = 1).
 */
public interface SliceHamiltonian {

  /**
   * The lattice of one slice: M^{d−1} sites (one site for d = 1) with this model's orbitals.
   * Disorder kinds are applied to it slice after slice, so they must only add onsite or on-slice
   * terms.
   *
   * @param crossSection M ≥ 1
   * @param transverse boundary of the transverse directions
   */
  Lattice sliceLattice(int crossSection, Boundary transverse);

  /**
   * Adds the clean on-slice terms of H_n.
   *
   * @param parameters read, not modified
   * @param slice read, from {@link #sliceLattice}
   * @param out terms appended; reset to {@code slice.orbitals()} by the caller
   */
  void addCleanSlice(ParameterValues parameters, Lattice slice, HamiltonianBuilder out);

  /**
   * Writes the inter-slice hopping block T = H_{n,n+1} (K × K, row-major, real).
   *
   * @param parameters read, not modified
   * @param slice read, from {@link #sliceLattice}
   * @param out length ≥ K²; overwritten
   */
  void interSliceHopping(ParameterValues parameters, Lattice slice, double[] out);
}
