package hopstat.localisation;

/**
 * Lyapunov exponents of a quasi-1D bar from {@link TransferMatrixKernel}.
 *
 * <p>Convention: amplitudes, |ψ| ~ e^{−γx}; exponents are per slice, i.e. per lattice spacing, in
 * descending order γ_1 ≥ … ≥ γ_K ≥ 0 (the K non-negative members of the symplectic ±γ pairs).
 *
 * @param smallestPositive γ_K, the inverse localisation length (per lattice spacing)
 * @param relativeError estimated relative standard error of γ_K (see the kernel's Javadoc)
 * @param slices number of slices propagated, warm-up included
 * @param converged true if the target error was reached before the length guard
 * @param exponents all K exponents γ_1..γ_K, descending ({@link TransferMatrixKernel}); only γ_K
 *     ({@link GreenRecursionKernel}); copied in and out
 */
public record LyapunovResult(
    double smallestPositive,
    double relativeError,
    long slices,
    boolean converged,
    double[] exponents) {
  public LyapunovResult {
    exponents = exponents.clone();
  }

  @Override
  public double[] exponents() {
    return exponents.clone();
  }
}
