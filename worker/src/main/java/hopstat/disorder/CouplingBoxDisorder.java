package hopstat.disorder;

import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.model.Model;
import hopstat.model.TransverseFieldChain;
import java.util.Optional;

/**
 * Random Ising couplings: J_j = J + W·u_j, u_j uniform in [−1/2, 1/2), one draw per bond j = 0, 1,
 * … (L−1 bonds open, L periodic, the closing bond L−1 → 0 last). Keeps every symmetry. Slice n =
 * site n of the chain: one draw for bond n (n → n+1).
 */
public final class CouplingBoxDisorder extends ChainBoxDisorder<TransverseFieldChain> {

  public static final String NAME = "coupling-box";

  public CouplingBoxDisorder() {
    super(
        NAME,
        "transverse-field Ising chain: J_j = J + W*u_j, u uniform in [-1/2, 1/2), one draw per bond in bond order"
            + " (closing bond last on a periodic chain); keeps T, C, S",
        TransverseFieldChain.class,
        "a transverse-field chain model (ising-chain)");
  }

  @Override
  int couplingCount(TransverseFieldChain chain, Lattice lattice) {
    return chain.bondCount(lattice);
  }

  @Override
  int sliceCouplingCount(int sliceSites) {
    return 1;
  }

  @Override
  void addShift(
      TransverseFieldChain chain,
      Lattice lattice,
      int index,
      double delta,
      HamiltonianBuilder out) {
    chain.addCouplingShift(lattice, index, delta, out);
  }

  @Override
  public Optional<String> whyNotSliceable(Model model) {
    return model.dimension() == 1
        ? Optional.empty()
        : Optional.of(NAME + " is drawn slice by slice only on a chain");
  }
}
