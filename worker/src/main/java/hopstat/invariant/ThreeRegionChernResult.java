package hopstat.invariant;

/**
 * Kitaev's three-region Chern number estimate.
 *
 * @param chern −ν, with ν = 12πi Σ (P_jk P_kl P_lj − P_jl P_lk P_kj) over counter-clockwise sectors
 *     A, B, C; the sign flip makes it equal the Chern number C in the sign convention of {@link
 *     hopstat.model.QwzModel} (dimensionless, unrounded)
 * @param sitesPerSector number of sites in the smallest of the three sectors
 */
public record ThreeRegionChernResult(double chern, int sitesPerSector) {}
