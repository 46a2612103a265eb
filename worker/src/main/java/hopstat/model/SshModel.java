package hopstat.model;

import hopstat.lattice.Boundary;
import hopstat.lattice.ChainLattices;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import java.util.List;

/**
 * Su–Schrieffer–Heeger chain (Su, Schrieffer, Heeger, PRL 42, 1698 (1979)) with real hoppings:
 *
 * <pre>  H = Σ_j [ v c†_{A,j} c_{B,j} + w c†_{B,j} c_{A,j+1} + h.c. ]</pre>
 *
 * v intracell, w intercell; orbital 0 = A, orbital 1 = B (see {@link ChiralChain}). Sublattice
 * symmetry S = diag(+1 on A, −1 on B); with real hoppings also T = K, hence class BDI. Complex
 * hoppings (class AIII) come from the {@code bond-phase} disorder: the declared class of a model is
 * fixed, and uniform clean phases on the open chain would be a pure gauge. Clean winding ν = 1 iff
 * |v| &lt; |w|, else 0, with the sign convention of the {@code winding} observable. An onsite
 * potential is a scalar (same value on A and B) and breaks the chiral symmetry.
 */
public final class SshModel implements Model, ChiralChain {

  public static final String NAME = "ssh";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "Su-Schrieffer-Heeger chain (Su, Schrieffer, Heeger, PRL 42, 1698 (1979)), real hoppings:"
        + " H = sum_j [v c+_Aj c_Bj + w c+_Bj c_Aj+1 + h.c.], orbital 0 = A, 1 = B; class BDI (AIII realisations with bond-phase disorder)."
        + " Clean winding 1 iff |v| < |w|.";
  }

  @Override
  public SymmetryClass symmetryClass() {
    return SymmetryClass.BDI;
  }

  /**
   * T = K, C = S·K and S = diag(1, −1) on (A, B) of every cell (BDI with T² = C² = +1): a real
   * Hamiltonian with A–B hoppings only satisfies all three; an onsite term breaks C and S, a
   * complex hopping ({@code bond-phase}) breaks T and C.
   */
  @Override
  public SymmetryOperators symmetryOperators() {
    return lattice -> OPERATORS;
  }

  private static final double[][] ZERO = {{0, 0}, {0, 0}};
  private static final List<SymmetryOperator> OPERATORS =
      List.of(
          SymmetryOperator.local(Symmetry.TIME_REVERSAL, new double[][] {{1, 0}, {0, 1}}, ZERO),
          SymmetryOperator.local(Symmetry.PARTICLE_HOLE, new double[][] {{1, 0}, {0, -1}}, ZERO),
          SymmetryOperator.local(Symmetry.CHIRAL, new double[][] {{1, 0}, {0, -1}}, ZERO));

  @Override
  public int dimension() {
    return 1;
  }

  @Override
  public List<ParameterInfo> parameters() {
    return List.of(
        new ParameterInfo("v", null, "intracell hopping v (energy unit), A_j-B_j"),
        new ParameterInfo("w", 1.0, "intercell hopping w (energy unit), B_j-A_j+1"));
  }

  @Override
  public Lattice lattice(int linearSize, Boundary boundary) {
    return ChainLattices.chain(linearSize, 2, boundary);
  }

  @Override
  public void addClean(ParameterValues parameters, Lattice lattice, HamiltonianBuilder out) {
    double v = parameters.get("v");
    double w = parameters.get("w");
    for (int j = 0; j < lattice.sites(); j++) {
      addIntracellShift(lattice, j, v, out);
    }
    for (int bond = 0; bond < intercellBondCount(lattice); bond++) {
      addIntercellShift(lattice, bond, w, out);
    }
  }

  @Override
  public int intercellBondCount(Lattice lattice) {
    return lattice.boundary() == Boundary.PERIODIC ? lattice.sites() : lattice.sites() - 1;
  }

  @Override
  public void addIntracellShift(Lattice lattice, int cell, double delta, HamiltonianBuilder out) {
    out.addHopping(2 * cell, 2 * cell + 1, delta, 0.0);
  }

  @Override
  public void addIntercellShift(Lattice lattice, int bond, double delta, HamiltonianBuilder out) {
    int next = (bond + 1) % lattice.sites();
    out.addHopping(2 * bond + 1, 2 * next, delta, 0.0);
  }
}
