package hopstat.disorder;

import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.model.Model;
import hopstat.model.PairingChain;
import java.util.Optional;

/**
 * Random real p-wave pairing: Δ_j = delta + W·u_j, u_j uniform in [−1/2, 1/2), one draw per bond j
 * = 0, 1, … (closing bond last on a periodic chain). Real, so it keeps every symmetry. Slice n =
 * site n of the chain: one draw for bond n (n → n+1).
 */
public final class PairingBoxDisorder extends ChainBoxDisorder<PairingChain> {

  public static final String NAME = "pairing-box";

  public PairingBoxDisorder() {
    super(
        NAME,
        "BdG wire: delta_j = delta + W*u_j, u uniform in [-1/2, 1/2), one draw per bond in bond order; keeps T, C, S",
        PairingChain.class,
        "a BdG wire with bond pairing (pwave-wire)");
  }

  @Override
  int couplingCount(PairingChain chain, Lattice lattice) {
    return chain.bondCount(lattice);
  }

  @Override
  int sliceCouplingCount(int sliceSites) {
    return 1;
  }

  @Override
  void addShift(
      PairingChain chain, Lattice lattice, int index, double delta, HamiltonianBuilder out) {
    chain.addPairingShift(lattice, index, delta, out);
  }

  @Override
  public Optional<String> whyNotSliceable(Model model) {
    return model.dimension() == 1
        ? Optional.empty()
        : Optional.of(NAME + " is drawn slice by slice only on a chain");
  }
}
