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
 * <p><b>Orbital positions.</b> Orbital {@code o} of site {@code s} sits at {@link #orbitalPosition}
 * = {@code positions[d][s] + orbitalOffsets[d][o]}, in the same coordinates as the site positions
 * (the cell coordinates of the lattice factory; e.g. the oblique coordinates of {@link
 * HoneycombLattices}). The offsets default to zero (all orbitals of a site at the site position);
 * custom models set them from the orbitals' fractional positions ({@link #withOrbitalOffsets}).
 * Position operators of position-based invariants (Bott index, Chern markers, the Chern spectral
 * localizer) use the orbital positions; the chiral-chain windings deliberately use the cell
 * position {@link #position} (their X is the unit-cell coordinate, see RealSpaceWindingKernel).
 *
 * @param dimension spatial dimension, 0..3 (0: a cluster without positions, e.g. a quantum dot)
 * @param linearSize L, the number of unit cells along each direction
 * @param sites number of sites
 * @param orbitalsPerSite orbitals on each site
 * @param positions positions, {@code positions[d][s]}; copied in and out
 * @param extent period along each direction; copied in and out
 * @param boundary boundary condition
 * @param orbitalOffsets offset of orbital o along direction d, {@code orbitalOffsets[d][o]}, same
 *     units as the positions; copied in and out
 */
public record Lattice(
    int dimension,
    int linearSize,
    int sites,
    int orbitalsPerSite,
    double[][] positions,
    double[] extent,
    Boundary boundary,
    double[][] orbitalOffsets) {

  /** A lattice with every orbital at its site position (zero offsets). */
  public Lattice(
      int dimension,
      int linearSize,
      int sites,
      int orbitalsPerSite,
      double[][] positions,
      double[] extent,
      Boundary boundary) {
    this(
        dimension,
        linearSize,
        sites,
        orbitalsPerSite,
        positions,
        extent,
        boundary,
        new double[Math.max(dimension, 0)][Math.max(orbitalsPerSite, 0)]);
  }

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
    if (orbitalOffsets.length != dimension) {
      throw new IllegalArgumentException("orbitalOffsets must have one row per dimension");
    }
    double[][] offsets = new double[dimension][];
    for (int d = 0; d < dimension; d++) {
      if (orbitalOffsets[d].length != orbitalsPerSite) {
        throw new IllegalArgumentException(
            "orbitalOffsets[" + d + "] must have one entry per orbital of a site");
      }
      for (double x : orbitalOffsets[d]) {
        if (!Double.isFinite(x)) {
          throw new IllegalArgumentException("orbital offsets must be finite: " + x);
        }
      }
      offsets[d] = orbitalOffsets[d].clone();
    }
    orbitalOffsets = offsets;
  }

  /**
   * The same lattice with these orbital offsets.
   *
   * @param offsets {@code offsets[d][o]}, one row per dimension, one entry per orbital of a site;
   *     copied
   */
  public Lattice withOrbitalOffsets(double[][] offsets) {
    return new Lattice(
        dimension, linearSize, sites, orbitalsPerSite, positions, extent, boundary, offsets);
  }

  /** Offset of orbital {@code orbital} (0 ≤ orbital &lt; orbitalsPerSite) from its site along d. */
  public double orbitalOffset(int d, int orbital) {
    return orbitalOffsets[d][orbital];
  }

  /** True if some orbital is displaced from its site position. */
  public boolean hasOrbitalOffsets() {
    for (double[] row : orbitalOffsets) {
      for (double x : row) {
        if (x != 0.0) {
          return true;
        }
      }
    }
    return false;
  }

  /**
   * Position along d of the orbital with this matrix index (site = index / orbitalsPerSite, orbital
   * = index % orbitalsPerSite): site position plus orbital offset. Allocates nothing.
   */
  public double orbitalPosition(int d, int matrixIndex) {
    return positions[d][matrixIndex / orbitalsPerSite]
        + orbitalOffsets[d][matrixIndex % orbitalsPerSite];
  }

  /** Smallest orbital position along d (= {@link #minPosition} plus the smallest offset). */
  public double minOrbitalPosition(int d) {
    double min = Double.POSITIVE_INFINITY;
    for (double x : orbitalOffsets[d]) {
      min = Math.min(min, x);
    }
    return minPosition(d) + min;
  }

  /** Largest orbital position along d (= {@link #maxPosition} plus the largest offset). */
  public double maxOrbitalPosition(int d) {
    double max = Double.NEGATIVE_INFINITY;
    for (double x : orbitalOffsets[d]) {
      max = Math.max(max, x);
    }
    return maxPosition(d) + max;
  }

  @Override
  public double[][] orbitalOffsets() {
    double[][] copy = new double[dimension][];
    for (int d = 0; d < dimension; d++) {
      copy[d] = orbitalOffsets[d].clone();
    }
    return copy;
  }

  /** Matrix dimension: sites × orbitals per site. */
  public int orbitals() {
    return sites * orbitalsPerSite;
  }

  /**
   * Position of site (cell) {@code s} along direction {@code d}; see {@link #orbitalPosition} for
   * an orbital's.
   */
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
    return new Lattice(
        2, linearSize, n, orbitalsPerSite, pos, new double[] {linearSize, linearSize}, boundary);
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
        && Arrays.equals(extent, l.extent)
        && Arrays.deepEquals(orbitalOffsets, l.orbitalOffsets);
  }

  @Override
  public int hashCode() {
    return Arrays.hashCode(extent) * 31 + sites;
  }

  @Override
  public String toString() {
    return "Lattice[d="
        + dimension
        + ", L="
        + linearSize
        + ", sites="
        + sites
        + ", orbitals/site="
        + orbitalsPerSite
        + ", "
        + boundary
        + "]";
  }
}
