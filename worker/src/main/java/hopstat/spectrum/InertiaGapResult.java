package hopstat.spectrum;

/**
 * Gap around E_F from eigenvalue counting (energies in the model's unit).
 *
 * @param gap upper − lower, accurate to ± the bisection tolerance; NaN if E_F is outside the
 *     spectrum
 * @param lower the highest eigenvalue below E_F (bracket midpoint)
 * @param upper the lowest eigenvalue at or above E_F (bracket midpoint)
 * @param statesBelow number of eigenvalues below E_F
 */
public record InertiaGapResult(double gap, double lower, double upper, int statesBelow) {}
