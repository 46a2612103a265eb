package hopstat.spectrum;

import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.linalg.InertiaResult;

/**
 * The spectral gap around E_F without diagonalisation: eigenvalue counting by inertia (Sylvester's
 * law: neg(H − E) = #eigenvalues below E) and bisection on the counts.
 *
 * <p>With n_F = #eigenvalues below E_F, the highest eigenvalue below E_F is bracketed in [−R, E_F)
 * and the lowest at or above E_F in [E_F, R] (R the Gershgorin bound), each by bisection to an
 * absolute width {@code tolerance}; the gap is reported from the bracket midpoints, so it is
 * accurate to ± tolerance (derived). Cost: 2·log₂(R/tolerance) + 1 slice sweeps of H − E.
 */
public final class InertiaGapKernel {

  private InertiaGapKernel() {}

  /**
   * @param terms read, not modified
   * @param lattice read; open boundaries along x
   * @param fermiEnergy E_F
   * @param tolerance absolute bracket width, &gt; 0
   * @param workspace scratch
   * @return the gap, its edges, n_F; gap NaN when E_F lies outside the spectrum
   */
  public static InertiaGapResult compute(
      HamiltonianBuilder terms,
      Lattice lattice,
      double fermiEnergy,
      double tolerance,
      SliceInertiaWorkspace workspace) {
    if (!(tolerance > 0)) {
      throw new IllegalArgumentException("tolerance must be positive: " + tolerance);
    }
    double radius =
        SliceInertiaKernel.gershgorinRadius(terms, new double[2 * terms.dimension()]) + 1.0;
    int n = terms.dimension();
    int nF = below(terms, lattice, fermiEnergy, workspace);
    if (nF == 0 || nF == n) {
      return new InertiaGapResult(Double.NaN, Double.NaN, Double.NaN, nF);
    }
    // highest eigenvalue below E_F: count(lo) ≤ nF − 1, count(hi) = nF
    double lo = -radius;
    double hi = fermiEnergy;
    while (hi - lo > tolerance) {
      double mid = 0.5 * (lo + hi);
      if (below(terms, lattice, mid, workspace) < nF) {
        lo = mid;
      } else {
        hi = mid;
      }
    }
    double lower = 0.5 * (lo + hi);
    // lowest eigenvalue at or above E_F: count(lo) = nF, count(hi) > nF
    lo = fermiEnergy;
    hi = radius;
    while (hi - lo > tolerance) {
      double mid = 0.5 * (lo + hi);
      if (below(terms, lattice, mid, workspace) > nF) {
        hi = mid;
      } else {
        lo = mid;
      }
    }
    double upper = 0.5 * (lo + hi);
    return new InertiaGapResult(upper - lower, lower, upper, nF);
  }

  /**
   * Number of eigenvalues strictly below E (an exactly singular H − E counts its zero as not
   * below).
   */
  public static int below(
      HamiltonianBuilder terms, Lattice lattice, double energy, SliceInertiaWorkspace workspace) {
    InertiaResult in = SliceInertiaKernel.hamiltonianInertia(terms, lattice, energy, workspace);
    return in.negative();
  }
}
