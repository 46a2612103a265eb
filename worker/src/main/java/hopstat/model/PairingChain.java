package hopstat.model;

import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;

/**
 * Capability of a one-dimensional BdG chain with a nearest-neighbour p-wave pairing Δ_j on bond j
 * (between sites j and j+1, the closing bond j = L−1 → 0 on a periodic chain). Used by the {@code
 * pairing-box} disorder.
 */
public interface PairingChain {

  /** Number of bonds: L − 1 open, L periodic. */
  int bondCount(Lattice lattice);

  /**
   * Adds δ to the pairing of bond {@code bond}: Δ_j → Δ_j + δ.
   *
   * @param bond 0 ≤ bond &lt; {@link #bondCount}
   */
  void addPairingShift(Lattice lattice, int bond, double delta, HamiltonianBuilder out);
}
