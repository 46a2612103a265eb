package hopstat.invariant;

/**
 * Bott index of one realisation.
 *
 * @param bott the unrounded index (1/2π) Σ arg λ_i, dimensionless; an integer up to numerical and
 *     finite-size error when the occupied projector is local
 * @param smallestModulus min_i |λ_i| of V_P U_P V_P† U_P†: near 1 deep in a localised phase, small
 *     when the projector is not local (a warning sign that the index is unreliable)
 * @param converged false if the eigenvalue routine did not converge (then bott is NaN)
 */
public record BottIndexResult(double bott, double smallestModulus, boolean converged) {}
