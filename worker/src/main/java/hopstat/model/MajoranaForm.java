package hopstat.model;

import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import org.ejml.data.DMatrixRMaj;

/**
 * Capability of a Bogoliubov–de Gennes model whose Hamiltonian can be written as a real
 * antisymmetric Majorana matrix, H = (i/4) Σ_{mn} A_{mn} γ_m γ_n (Kitaev, Phys.-Usp. 44, 131
 * (2001)).
 *
 * <p>Contract (Nambu per site): orbital 0 of site s is c_s, orbital 1 is c†_s, and the matrix built
 * by the model is H_BdG with H = ½ Ψ† H_BdG Ψ, Ψ = (c_0, c†_0, c_1, c†_1, …). Majorana index 2s is
 * a_s = c_s + c†_s, index 2s+1 is b_s = −i(c_s − c†_s), so c_s = (a_s + i b_s)/2. With this
 * ordering the ground-state fermion parity is sign Pf(A) (+1 even) — see {@link MajoranaOps}. On a
 * periodic chain (d = 1) the terms between sites L−1 and 0 are the closing bonds; a closure phase
 * −1 (antiperiodic fermions) flips their sign.
 */
public interface MajoranaForm {

  /**
   * Writes the real antisymmetric A of the realised Hamiltonian {@code terms}.
   *
   * @param lattice read: the model's lattice
   * @param terms read: clean plus disorder terms in the Nambu-per-site form above
   * @param closurePhase +1 (periodic) or −1 (antiperiodic); ignored unless the lattice is a
   *     periodic chain
   * @param out overwritten; reshaped to 2·sites × 2·sites
   * @param scratch overwritten (imaginary parts, used to check particle–hole symmetry)
   * @throws IllegalStateException if the terms are not of BdG form (A would not be real)
   */
  default void writeMajoranaMatrix(
      Lattice lattice,
      HamiltonianBuilder terms,
      int closurePhase,
      DMatrixRMaj out,
      DMatrixRMaj scratch) {
    MajoranaOps.toMajoranaMatrix(lattice, terms, closurePhase, out, scratch);
  }
}
