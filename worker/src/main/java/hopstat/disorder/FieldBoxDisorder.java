package hopstat.disorder;

import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.model.TransverseFieldChain;

/**
 * Random transverse field of an Ising chain: h_j = h + W·u_j, u_j uniform in [−1/2, 1/2), one draw
 * per site j = 0, 1, …, L−1. Real, so it keeps every symmetry of the chain. Slice n = site n: one
 * draw per site of the slice.
 */
public final class FieldBoxDisorder extends ChainBoxDisorder<TransverseFieldChain> {

  public static final String NAME = "field-box";

  public FieldBoxDisorder() {
    super(
        NAME,
        "transverse-field Ising chain: h_j = h + W*u_j, u uniform in [-1/2, 1/2), one draw per site in site order; keeps T, C, S",
        TransverseFieldChain.class,
        "a transverse-field chain model (ising-chain)");
  }

  @Override
  int couplingCount(TransverseFieldChain chain, Lattice lattice) {
    return lattice.sites();
  }

  @Override
  int sliceCouplingCount(int sliceSites) {
    return sliceSites;
  }

  @Override
  void addShift(
      TransverseFieldChain chain,
      Lattice lattice,
      int index,
      double delta,
      HamiltonianBuilder out) {
    chain.addFieldShift(lattice, index, delta, out);
  }
}
