package hopstat.invariant;

/**
 * Bulk average of the Bianco–Resta local Chern marker estimated by the kernel polynomial method
 * ({@link KpmChernMarkerKernel}).
 *
 * @param bulkAverage mean over the random vectors of the per-vector estimates of the bulk-averaged
 *     marker per unit cell (dimensionless; same sign convention as {@link ChernMarkerKernel})
 * @param standardError sample standard deviation of the per-vector estimates over √R (the
 *     stochastic-trace error; the truncation error of the polynomial projector is not included)
 * @param vectors R, the number of random vectors
 * @param bulkSites sites in the bulk region
 * @param moments M, the number of Chebyshev terms of the projector
 */
public record KpmChernMarkerResult(
    double bulkAverage, double standardError, int vectors, int bulkSites, int moments) {}
