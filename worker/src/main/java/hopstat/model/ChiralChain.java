package hopstat.model;

import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;

/**
 * Capability of a one-dimensional chain with sublattice (chiral) symmetry and two orbitals per unit
 * cell: orbital 0 is sublattice A (chiral eigenvalue +1), orbital 1 is sublattice B (−1); every
 * hopping joins A and B. Intracell bond j joins A_j and B_j; intercell bond j joins B_j and A_{j+1}
 * (A_0 for j = L−1 on a periodic chain). Used by {@code bond-box} disorder and the {@code winding}
 * observable.
 */
public interface ChiralChain {

  /** Number of intercell bonds: L − 1 open, L periodic. */
  int intercellBondCount(Lattice lattice);

  /** Adds a real δ to the hopping of intracell bond {@code cell}. */
  void addIntracellShift(Lattice lattice, int cell, double delta, HamiltonianBuilder out);

  /**
   * Adds a real δ to the hopping of intercell bond {@code bond}, 0 ≤ bond &lt; {@link
   * #intercellBondCount}.
   */
  void addIntercellShift(Lattice lattice, int bond, double delta, HamiltonianBuilder out);
}
