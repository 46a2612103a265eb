package hopstat.invariant;

/**
 * Outcome of {@link DiiiZ2Kernel}.
 *
 * @param status whether z2 is defined
 * @param z2 0 trivial, 1 non-trivial; −1 unless {@code status == CONVERGED}
 * @param determinantEvaluations number of det q(φ) evaluations in the phase continuation
 * @param smallestStep smallest accepted step in φ (radians); NaN if none was taken
 * @param quantisationDefect distance (radians) of the phase of (−1)^ν from 0 or π; NaN unless the
 *     continuation reached φ = π
 */
public record DiiiZ2Result(
    Status status,
    int z2,
    int determinantEvaluations,
    double smallestStep,
    double quantisationDefect) {

  /** Why the invariant is or is not defined. */
  public enum Status {
    /** The continuation reached φ = π and (−1)^ν came out ±1. */
    CONVERGED,
    /**
     * det q(φ) or a Pfaffian vanished, or the step control hit its smallest step: the E = 0 gap of
     * the twisted ring closes (or nearly so) on [0, π].
     */
    GAP_CLOSED,
    /** The phase of (−1)^ν was further than the tolerance from 0 or π (rounding too large). */
    NOT_QUANTISED
  }

  public DiiiZ2Result {
    if (status == Status.CONVERGED ? (z2 != 0 && z2 != 1) : z2 != -1) {
      throw new IllegalArgumentException(
          "z2 must be 0 or 1 when converged, -1 otherwise: " + z2 + " (" + status + ")");
    }
  }
}
