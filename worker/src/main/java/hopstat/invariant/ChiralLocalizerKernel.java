package hopstat.invariant;

import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.linalg.InertiaResult;
import hopstat.spectrum.SliceInertiaKernel;

/**
 * Odd spectral-localizer index of a one-dimensional chiral chain (classes AIII, BDI, CII; Loring
 * &amp; Schulz-Baldes, arXiv:1701.07455; Loring, Ann. Phys. 356, 383 (2015)), without
 * diagonalisation.
 *
 * <p><b>Definition.</b> In the chiral basis S = diag(1, −1) (orbital 0 = sublattice A, +1; orbital
 * 1 = sublattice B, −1) the Hamiltonian is H = [[0, A], [A†, 0]] and the localizer is L_κ = [[κ(X −
 * x0), A], [A†, −κ(X − x0)]] = H + κ(X − x0)S, X the cell position and x0 the centre of the open
 * chain (the cell coordinate, not the orbital position: as for {@link RealSpaceWindingKernel} the
 * index is defined relative to the unit cell). This is an N × N Hermitian matrix (no doubling),
 * block tridiagonal cell by cell for nearest-neighbour chains, so its signature comes from {@link
 * SliceInertiaKernel#hamiltonianInertia} (Haynsworth inertia additivity + Bunch–Kaufman LDLᴴ per
 * cell block) applied to the term list of H plus the onsite terms κ(x − x0)·S.
 *
 * <p><b>Sign.</b> The returned index is −½ sig(L_κ), chosen so that it equals the {@code winding}
 * observable (ssh: +1 for |v| &lt; |w|). Derived check: for v = 0 the chain decouples into dimers
 * B_j–A_{j+1} and the two dangling ends A_0 (κ(x_0 − x0) &lt; 0) and B_{L−1} (−κ(x_{L−1} − x0) &lt;
 * 0). A dimer has determinant −κ²(x_j − x0)(x_{j+1} − x0) − |w_j|², so it contributes signature 0
 * unless it straddles x0 with κ²(x0 − x_j)(x_{j+1} − x0) &gt; |w_j|² (then +2): for κ &lt; 2|w|
 * (even L, half-integer x0) sig = −2 and the index is 1; for w = 0 only intracell dimers remain,
 * sig = 0. The straddling dimer is the usual "κ too large" breakdown.
 *
 * <p><b>Zero pivots.</b> The sweep eliminates cell after cell without pivoting across cells, so an
 * exactly singular Schur complement (e.g. v = 0 exactly with a site exactly at x0, odd L) is
 * reported as undefined even if L_κ itself is invertible; generic disordered chains never hit it.
 *
 * <p>Cost: that of the slice sweep, O(L · n_cell³) with n_cell = 2 for ssh; memory O(N).
 */
public final class ChiralLocalizerKernel {

  private ChiralLocalizerKernel() {}

  /**
   * The odd localizer index −½ sig(H + κ(X − x0)S).
   *
   * @param terms read, not modified: H, every nonzero term joining orbital 0 and orbital 1 of cells
   * @param lattice read: a d = 1 lattice with two orbitals per site and open boundary
   * @param kappa κ &gt; 0 (energy per lattice unit)
   * @param x0 the centre (lattice units)
   * @param workspace scratch
   * @return the index, or {@link Integer#MIN_VALUE} if the sweep meets an exactly singular Schur
   *     complement (L_κ singular or a zero pivot, see class Javadoc) or the signature is odd
   */
  public static int index(
      HamiltonianBuilder terms,
      Lattice lattice,
      double kappa,
      double x0,
      ChiralLocalizerWorkspace workspace) {
    if (!(kappa > 0) || !Double.isFinite(kappa)) {
      throw new IllegalArgumentException("kappa must be positive and finite: " + kappa);
    }
    if (lattice.dimension() != 1 || lattice.orbitalsPerSite() != 2) {
      throw new IllegalArgumentException(
          "the chiral localizer needs a d = 1 chain with two orbitals per cell: " + lattice);
    }
    int n = terms.dimension();
    HamiltonianBuilder l = workspace.localizer;
    l.reset(n);
    for (int k = 0; k < terms.termCount(); k++) {
      int r = terms.row(k);
      int c = terms.column(k);
      double re = terms.realPart(k);
      double im = terms.imaginaryPart(k);
      if (re == 0.0 && im == 0.0) {
        continue;
      }
      if (r % 2 == c % 2) {
        throw new IllegalArgumentException(
            "term ("
                + r
                + ", "
                + c
                + ") joins one sublattice: H is not chiral with S = diag(1, -1)");
      }
      l.addHopping(r, c, re, im);
    }
    for (int i = 0; i < n; i++) {
      double s = i % 2 == 0 ? 1.0 : -1.0;
      l.addOnsite(i, s * kappa * (lattice.position(0, i / 2) - x0));
    }
    InertiaResult in = SliceInertiaKernel.hamiltonianInertia(l, lattice, 0.0, workspace.sweep);
    int signature = in.signature();
    if (in.zero() != 0 || signature % 2 != 0) {
      return Integer.MIN_VALUE;
    }
    return -signature / 2;
  }
}
