package hopstat.spectrum;

/**
 * Gaps of one spectrum around the Fermi energy, in the model's energy unit.
 *
 * @param below highest eigenvalue strictly below E_F (NaN if none)
 * @param above lowest eigenvalue at or above E_F (NaN if none)
 * @param gap above − below: the spectral gap that contains E_F
 * @param fermiDistance min(E_F − below, above − E_F): distance from E_F to the nearest eigenvalue
 */
public record SpectralGapResult(double below, double above, double gap, double fermiDistance) {}
