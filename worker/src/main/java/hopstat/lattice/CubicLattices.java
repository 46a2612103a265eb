package hopstat.lattice;

/**
 * Hypercubic lattices L^d with unit spacing, one site per unit cell: the chain (d = 1), the square
 * (d = 2) and the simple cubic lattice (d = 3).
 *
 * <p>Site index {@code x + L·y + L²·z}; positions are the integer coordinates; the extent along
 * every direction is L. {@link #forEachBond} enumerates the nearest-neighbour bonds in a fixed
 * order, with the periodic-boundary convention of this project: a wrap-around bond (L−1 → 0) is
 * added only for L ≥ 3, because for L = 2 it would coincide with the ordinary bond 0–1 and double
 * it, and for L = 1 it would be a self-loop.
 */
public final class CubicLattices {

  private CubicLattices() {}

  /** Receives one nearest-neighbour bond (each bond once). */
  @FunctionalInterface
  public interface BondVisitor {
    /**
     * @param from site index
     * @param to the neighbour of {@code from} in the +direction
     * @param direction 0 (x), 1 (y) or 2 (z)
     */
    void bond(int from, int to, int direction);
  }

  /**
   * The L^d hypercubic lattice.
   *
   * @param dimension d = 1, 2 or 3
   * @param linearSize L ≥ 1
   * @param orbitalsPerSite ≥ 1
   * @param boundary applied along every direction
   */
  public static Lattice hypercubic(
      int dimension, int linearSize, int orbitalsPerSite, Boundary boundary) {
    if (dimension < 1 || dimension > 3) {
      throw new IllegalArgumentException("dimension must be 1, 2 or 3: " + dimension);
    }
    if (linearSize < 1) {
      throw new IllegalArgumentException("L must be positive: " + linearSize);
    }
    int n = sites(dimension, linearSize);
    double[][] pos = new double[dimension][n];
    double[] extent = new double[dimension];
    for (int s = 0; s < n; s++) {
      int rest = s;
      for (int d = 0; d < dimension; d++) {
        pos[d][s] = rest % linearSize;
        rest /= linearSize;
      }
    }
    java.util.Arrays.fill(extent, linearSize);
    return new Lattice(dimension, linearSize, n, orbitalsPerSite, pos, extent, boundary);
  }

  /** L^d, checked against int overflow. */
  public static int sites(int dimension, int linearSize) {
    long n = 1;
    for (int d = 0; d < dimension; d++) {
      n *= linearSize;
    }
    if (n > Integer.MAX_VALUE) {
      throw new IllegalArgumentException("L^d too large: " + linearSize + "^" + dimension);
    }
    return (int) n;
  }

  /**
   * Visits every nearest-neighbour bond of the L^d lattice once, in site-index order and, per site,
   * in direction order x, y, z.
   *
   * @param dimension 0..3; d = 0 (a single site) has no bonds
   */
  public static void forEachBond(
      int dimension, int linearSize, Boundary boundary, BondVisitor visitor) {
    if (dimension == 0) {
      return;
    }
    int n = sites(dimension, linearSize);
    boolean wrap = boundary == Boundary.PERIODIC && linearSize >= 3;
    for (int s = 0; s < n; s++) {
      int stride = 1;
      for (int d = 0; d < dimension; d++) {
        int coordinate = (s / stride) % linearSize;
        if (coordinate + 1 < linearSize) {
          visitor.bond(s, s + stride, d);
        } else if (wrap) {
          visitor.bond(s, s - (linearSize - 1) * stride, d);
        }
        stride *= linearSize;
      }
    }
  }
}
