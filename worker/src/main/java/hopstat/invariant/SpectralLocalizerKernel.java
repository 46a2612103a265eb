package hopstat.invariant;

import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.linalg.InertiaResult;
import hopstat.spectrum.SliceInertiaKernel;
import hopstat.spectrum.SliceInertiaWorkspace;

/**
 * Chern number of a d = 2 open sample from the signature of the spectral localizer, without
 * diagonalisation (Loring, Ann. Phys. 356, 383 (2015); Loring &amp; Schulz-Baldes, New York J.
 * Math. 23, 1111 (2017), arXiv:1701.07455):
 *
 * <pre>L_κ = [[H − E_F, κ(X − x0 − i(Y − y0))], [κ(X − x0 + i(Y − y0)), −(H − E_F)]]</pre>
 *
 * with (x0, y0) the sample centre (mean site position). The index ½ sig(L_κ) equals −C relative to
 * the Qi–Wu–Zhang convention (C = +1 for −2 &lt; m &lt; 0; /work/shared/REFERENCE.md conventions,
 * fixed in tests), so {@link #chern} returns −½ sig(L_κ), in the sign convention of the Bott index.
 * The signature comes from {@link SliceInertiaKernel} (block LDLᴴ over x-slices).
 *
 * <p><b>κ.</b> The index is constant for κ in a window: large enough that κ·ρ exceeds the gap scale
 * at the sample radius ρ, small enough that κ‖[H, X]‖ does not close the localizer gap (Loring
 * &amp; Schulz-Baldes 2017, Theorem 1: κ ≤ g³/(12‖H‖‖[H,X]‖) and ρ ≥ 2g/κ, sufficient, not
 * necessary). {@link #automaticKappa} takes κ = ‖H‖_G / L (‖H‖_G the Gershgorin bound of H − E_F, L
 * the linear size), so κ·ρ = ‖H‖_G/2 at ρ = L/2 for every L, and κ → 0 as L grows, inside the
 * L-independent upper bound for large samples (derived from the theorem's scaling; the window at
 * small L is checked numerically by halving and doubling κ in tests).
 *
 * <p>Cost and memory: those of the slice sweep on a 2N-dimensional matrix, O(L · (4N/L)³) and
 * O((4N/L)²) for square lattices with nearest-neighbour hopping.
 */
public final class SpectralLocalizerKernel {

  private SpectralLocalizerKernel() {}

  /** κ = ‖H − E_F‖_G / L (see class Javadoc); energy per lattice unit. */
  public static double automaticKappa(
      HamiltonianBuilder terms, Lattice lattice, double fermiEnergy, double[] scratch) {
    double radius = SliceInertiaKernel.gershgorinRadius(terms, scratch) + Math.abs(fermiEnergy);
    return radius / lattice.linearSize();
  }

  /** Centre of the sample along direction d: mean site position. */
  public static double centre(Lattice lattice, int d) {
    double sum = 0;
    for (int s = 0; s < lattice.sites(); s++) {
      sum += lattice.position(d, s);
    }
    return sum / lattice.sites();
  }

  /**
   * The localizer Chern number −½ sig(L_κ) (= C of the filled bands, Bott-index sign).
   *
   * @param terms read, not modified
   * @param lattice read; d = 2, open boundaries
   * @param fermiEnergy E_F
   * @param kappa κ &gt; 0
   * @param workspace scratch
   * @return the index, or {@code Integer.MIN_VALUE} if a Schur complement was exactly singular (E_F
   *     or 0 in the localizer spectrum: an outcome, the index is undefined)
   */
  public static int chern(
      HamiltonianBuilder terms,
      Lattice lattice,
      double fermiEnergy,
      double kappa,
      SliceInertiaWorkspace workspace) {
    requireTwoDimensional(lattice);
    InertiaResult in =
        SliceInertiaKernel.localizerInertia(
            terms,
            lattice,
            fermiEnergy,
            kappa,
            centre(lattice, 0),
            centre(lattice, 1),
            0.0,
            workspace);
    if (in.zero() > 0) {
      return Integer.MIN_VALUE;
    }
    return -in.signature() / 2;
  }

  /**
   * A certified bracket [lo, hi] on the smallest |eigenvalue| of L_κ by geometric bisection on
   * eigenvalue counts: #eig in (−δ, δ) = neg(L_κ − δ) − neg(L_κ + δ) (Sylvester), two sweeps per
   * step. Stops when hi ≤ (1 + relativeTolerance)·lo, or at lo = floor when even the floor holds an
   * eigenvalue. In exact arithmetic no eigenvalue has |λ| &lt; lo (rounding in the counts aside).
   *
   * @param floor smallest δ tried, &gt; 0 (reported as lo when an eigenvalue lies within it)
   * @param relativeTolerance &gt; 0
   * @param bracket overwritten: {lo, hi}
   */
  public static void localizerGap(
      HamiltonianBuilder terms,
      Lattice lattice,
      double fermiEnergy,
      double kappa,
      double floor,
      double relativeTolerance,
      SliceInertiaWorkspace workspace,
      double[] bracket) {
    requireTwoDimensional(lattice);
    double x0 = centre(lattice, 0);
    double y0 = centre(lattice, 1);
    double maxRadius = 0;
    for (int i = 0; i < lattice.orbitals(); i++) {
      maxRadius =
          Math.max(
              maxRadius,
              Math.hypot(lattice.orbitalPosition(0, i) - x0, lattice.orbitalPosition(1, i) - y0));
    }
    double[] scratch = new double[2 * terms.dimension()];
    double hi =
        SliceInertiaKernel.gershgorinRadius(terms, scratch)
            + Math.abs(fermiEnergy)
            + kappa * maxRadius
            + 1.0;
    double lo = floor;
    if (countWithin(terms, lattice, fermiEnergy, kappa, x0, y0, lo, workspace) > 0) {
      bracket[0] = 0.0;
      bracket[1] = lo;
      return;
    }
    while (hi > (1 + relativeTolerance) * lo) {
      double mid = Math.sqrt(lo * hi);
      if (countWithin(terms, lattice, fermiEnergy, kappa, x0, y0, mid, workspace) > 0) {
        hi = mid;
      } else {
        lo = mid;
      }
    }
    bracket[0] = lo;
    bracket[1] = hi;
  }

  private static int countWithin(
      HamiltonianBuilder terms,
      Lattice lattice,
      double e,
      double kappa,
      double x0,
      double y0,
      double delta,
      SliceInertiaWorkspace ws) {
    InertiaResult below =
        SliceInertiaKernel.localizerInertia(terms, lattice, e, kappa, x0, y0, delta, ws);
    InertiaResult belowMinus =
        SliceInertiaKernel.localizerInertia(terms, lattice, e, kappa, x0, y0, -delta, ws);
    // neg(L − δ) counts λ < δ (zero counts λ = δ); neg(L + δ) counts λ < −δ.
    return below.negative() + below.zero() - belowMinus.negative();
  }

  private static void requireTwoDimensional(Lattice lattice) {
    if (lattice.dimension() != 2) {
      throw new IllegalArgumentException("the localizer Chern number needs d = 2, got " + lattice);
    }
  }
}
