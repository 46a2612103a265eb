package hopstat.statistics;

/** How a phase-boundary estimate along a grid cut is defined. */
public enum BoundaryKind {
  /**
   * Where the linear interpolation of the mean invariant between adjacent grid points crosses a
   * half-integer lying between the modal values of neighbouring points (common practice).
   */
  HALF_INTEGER_CROSSING,
  /**
   * Where the across-realisation sample variance peaks: the largest interior value, refined by the
   * vertex of the parabola through it and its two neighbours (common practice; at a transition the
   * invariant fluctuates between realisations). Resolution is limited by the grid: when both
   * neighbours have equal variance (e.g. both fully quantised) the vertex is the grid point itself
   * in every bootstrap replica, and the interval collapses to that point.
   */
  VARIANCE_PEAK,
  /**
   * Where the mean-invariant curves of two consecutive system sizes L cross (finite-size crossing,
   * common practice in finite-size scaling), by linear interpolation of their difference.
   */
  SIZE_CROSSING
}
