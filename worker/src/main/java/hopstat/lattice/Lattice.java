package hopstat.lattice;

import java.util.Arrays;

/**
 * A finite sample: sites with Cartesian positions and a fixed number of orbitals per site.
 *
 * <p>Conventions: sites are numbered 0..sites−1; the matrix index of orbital {@code o} on site
 * {@code s} is {@code s * orbitalsPerSite + o}. Positions are in units of the lattice constant.
 * {@code extent[d]} is the period of the sample along direction d (used by position unitaries
 * e^{2πi x/extent}); for an open direction it is the span of positions plus one spacing.
 *
 * @param dimension spatial dimension, 0..3 (0: a cluster without positions, e.g. a quantum dot)
 * @param linearSize L, the number of unit cells along each direction
 * @param sites number of sites
 * @param orbitalsPerSite orbitals on each site
 * @param positions positions, {@code positions[d][s]}; copied in and out
 * @param extent period along each direction; copied in and out
 * @param boundary boundary condition
 */
public record Lattice(
    int dimension,
    int linearSize,
    int sites,
    int orbitalsPerSite,
    double[][] positions,
    double[] extent,
    Boundary boundary) {

  public Lattice {
    if (dimension < 0 || dimension > 3) {
      throw new IllegalArgumentException("dimension must be 0..3: " + dimension);
    }
    if (sites < 1 || orbitalsPerSite < 1 || linearSize < 1) {
      throw new IllegalArgumentException("sites, orbitals and L must be positive");
    }
    if (positions.length != dimension || extent.length != dimension) {
      throw new IllegalArgumentException("positions/extent must have one row per dimension");
    }
    double[][] copy = new double[dimension][];
    for (int d = 0; d < dimension; d++) {
      if (positions[d].length != sites) {
        throw new IllegalArgumentException("positions[" + d + "] must have one entry per site");
      }
      copy[d] = positions[d].clone();
    }
    positions = copy;
    extent = extent.clone();
  }

  /** Matrix dimension: sites × orbitals per site. */
  public int orbitals() {
    return sites * orbitalsPerSite;
  }

  /** Position of site {@code s} along direction {@code d}. */
  public double position(int d, int s) {
    return positions[d][s];
  }

  /** Smallest site position along direction {@code d}. O(sites), allocates nothing. */
  public double minPosition(int d) {
    double min = Double.POSITIVE_INFINITY;
    for (double x : positions[d]) {
      min = Math.min(min, x);
    }
    return min;
  }

  /** Largest site position along direction {@code d}. O(sites), allocates nothing. */
  public double maxPosition(int d) {
    double max = Double.NEGATIVE_INFINITY;
    for (double x : positions[d]) {
      max = Math.max(max, x);
    }
    return max;
  }

  @Override
  public double[][] positions() {
    double[][] copy = new double[dimension][];
    for (int d = 0; d < dimension; d++) {
      copy[d] = positions[d].clone();
    }
    return copy;
  }

  @Override
  public double[] extent() {
    return extent.clone();
  }

  /** A square L×L (d = 2) lattice with unit spacing, site index x + L·y. */
  public static Lattice square(int linearSize, int orbitalsPerSite, Boundary boundary) {
    int n = linearSize * linearSize;
    double[][] pos = new double[2][n];
    for (int y = 0; y < linearSize; y++) {
      for (int x = 0; x < linearSize; x++) {
        pos[0][x + linearSize * y] = x;
        pos[1][x + linearSize * y] = y;
      }
    }
    return new Lattice(2, linearSize, n, orbitalsPerSite, pos, new double[] {linearSize, linearSize}, boundary);
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof Lattice l
        && dimension == l.dimension
        && linearSize == l.linearSize
        && sites == l.sites
        && orbitalsPerSite == l.orbitalsPerSite
        && boundary == l.boundary
        && Arrays.deepEquals(positions, l.positions)
        && Arrays.equals(extent, l.extent);
  }

  @Override
  public int hashCode() {
    return Arrays.hashCode(extent) * 31 + sites;
  }

  @Override
  public String toString() {
    return "Lattice[d=" + dimension + ", L=" + linearSize + ", sites=" + sites + ", orbitals/site=" + orbitalsPerSite + ", " + boundary + "]";
  }
}
