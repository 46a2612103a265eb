package hopstat.invariant;

/**
 * Real-space winding number of one realisation.
 *
 * @param winding ν, unrounded; an integer up to corrections exponentially small in the distance of
 *     the window from the chain ends over the localisation length
 * @param firstCell first unit cell of the bulk window (0-based)
 * @param windowCells number of unit cells in the window
 */
public record WindingResult(double winding, int firstCell, int windowCells) {}
