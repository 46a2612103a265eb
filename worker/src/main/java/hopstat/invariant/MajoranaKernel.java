package hopstat.invariant;

import hopstat.lattice.Boundary;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.linalg.PfaffianKernel;
import hopstat.linalg.PfaffianResult;
import hopstat.model.MajoranaForm;

/**
 * Pfaffian invariants of BdG Hamiltonians in Majorana form H = (i/4) Σ A_{mn} γ_m γ_n (Kitaev,
 * Phys.-Usp. 44, 131 (2001)):
 *
 * <ul>
 *   <li>ground-state fermion parity P = sign Pf(A) (+1 even, −1 odd; convention of {@link
 *       MajoranaForm}, checked against many-body diagonalisation in the tests);
 *   <li>Majorana number of a closed chain Q = sign Pf(A_periodic) · sign Pf(A_antiperiodic), the
 *       product of the ground-state parities with periodic and antiperiodic fermions; Q = −1 is the
 *       non-trivial phase (unpaired Majoranas at the ends of the open chain).
 * </ul>
 *
 * Cost: one (parity) or two (Majorana number) dense Pfaffians of order 2·sites, ≈ (2·sites)³/3
 * flops each, plus O(terms + sites²) to build A.
 */
public final class MajoranaKernel {

  /**
   * A Pfaffian whose smallest elimination pivot is below this fraction of max|A| is treated as
   * zero: its sign would be decided by rounding (a zero mode, e.g. the clean wire exactly at |μ| =
   * 2|t|). Roundoff in the pivots is about n·ε·max|A| ≈ 1e−13 for n = 400; chosen an order above.
   */
  public static final double SINGULAR_PIVOT_RATIO = 1e-12;

  private MajoranaKernel() {}

  private static int reliableSign(PfaffianResult pf) {
    return pf.smallestPivotRatio() < SINGULAR_PIVOT_RATIO ? 0 : pf.sign();
  }

  /**
   * Majorana number of a periodic chain.
   *
   * @param form read: the model's Majorana capability
   * @param lattice read: a periodic chain with L ≥ 3
   * @param terms read: the realised BdG terms (built with the periodic closure)
   * @param workspace scratch
   */
  public static MajoranaNumberResult majoranaNumber(
      MajoranaForm form, Lattice lattice, HamiltonianBuilder terms, MajoranaWorkspace workspace) {
    if (lattice.dimension() != 1
        || lattice.boundary() != Boundary.PERIODIC
        || lattice.linearSize() < 3) {
      throw new IllegalArgumentException(
          "the Majorana number needs a periodic chain with L >= 3, got " + lattice);
    }
    form.writeMajoranaMatrix(lattice, terms, 1, workspace.majorana, workspace.imaginary);
    PfaffianResult periodic = PfaffianKernel.compute(workspace.majorana, workspace.pfaffian);
    form.writeMajoranaMatrix(lattice, terms, -1, workspace.majorana, workspace.imaginary);
    PfaffianResult antiperiodic = PfaffianKernel.compute(workspace.majorana, workspace.pfaffian);
    return new MajoranaNumberResult(
        reliableSign(periodic) * reliableSign(antiperiodic),
        periodic.logAbs(),
        antiperiodic.logAbs());
  }

  /**
   * Pf(A) of the realised Hamiltonian as built (no change of closure); its sign is the ground-state
   * fermion parity (+1 even, −1 odd, 0 degenerate). The returned sign is 0 also when the smallest
   * pivot is below {@link #SINGULAR_PIVOT_RATIO} (degenerate up to rounding).
   *
   * @param form read
   * @param lattice read
   * @param terms read
   * @param workspace scratch
   */
  public static PfaffianResult groundStateParity(
      MajoranaForm form, Lattice lattice, HamiltonianBuilder terms, MajoranaWorkspace workspace) {
    form.writeMajoranaMatrix(lattice, terms, 1, workspace.majorana, workspace.imaginary);
    PfaffianResult pf = PfaffianKernel.compute(workspace.majorana, workspace.pfaffian);
    return reliableSign(pf) == pf.sign()
        ? pf
        : new PfaffianResult(0, Double.NEGATIVE_INFINITY, pf.smallestPivotRatio());
  }
}
