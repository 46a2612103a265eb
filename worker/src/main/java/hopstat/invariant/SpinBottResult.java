package hopstat.invariant;

/**
 * Spin-resolved Bott indices of one realisation.
 *
 * @param bottUp Bott index of P₊, the occupied states with positive eigenvalue of P S_z P
 *     (unrounded; with S_z conserved, the Chern number C_↑ of the spin-up sector)
 * @param bottDown Bott index of P₋ (C_↓ when S_z is conserved)
 * @param spinBott (bottUp − bottDown)/2, the spin Chern number; its parity is the Z2 index
 * @param spinGap min |eigenvalue| of P S_z P in the occupied space (1 when S_z is conserved; the
 *     splitting is well defined only while this stays away from 0)
 * @param converged false if an eigen-solver failed (then the other fields are NaN)
 */
public record SpinBottResult(
    double bottUp, double bottDown, double spinBott, double spinGap, boolean converged) {

  /** The Z2 index ν ∈ {0, 1}: the parity of the rounded spin Bott index (NaN if not converged). */
  public double z2() {
    if (!converged || !Double.isFinite(spinBott)) {
      return Double.NaN;
    }
    return Math.floorMod(Math.round(spinBott), 2L);
  }
}
