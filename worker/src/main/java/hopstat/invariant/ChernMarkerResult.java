package hopstat.invariant;

/**
 * Bulk average of the Bianco–Resta local Chern marker.
 *
 * @param bulkAverage the marker averaged over the bulk region and normalised per unit cell
 *     (dimensionless; equals the Chern number C in the sign convention of {@link
 *     hopstat.model.QwzModel} when the occupied projector is local and the region is deep enough)
 * @param bulkSites number of sites in the bulk region
 */
public record ChernMarkerResult(double bulkAverage, int bulkSites) {}
