package hopstat.model;

import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;

/**
 * Capability of a transverse-field Ising chain: fields h_j on sites and couplings J_j on bonds (j,
 * j+1), the closing bond j = L−1 → 0 on a periodic chain. Used by the {@code field-box} and {@code
 * coupling-box} disorders.
 */
public interface TransverseFieldChain {

  /** Number of bonds: L − 1 open, L periodic. */
  int bondCount(Lattice lattice);

  /** h_site → h_site + δ. */
  void addFieldShift(Lattice lattice, int site, double delta, HamiltonianBuilder out);

  /** J_bond → J_bond + δ, 0 ≤ bond &lt; {@link #bondCount}. */
  void addCouplingShift(Lattice lattice, int bond, double delta, HamiltonianBuilder out);
}
