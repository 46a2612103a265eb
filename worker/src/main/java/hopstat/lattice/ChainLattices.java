package hopstat.lattice;

/**
 * Factories for one-dimensional chains and zero-dimensional clusters.
 *
 * <p>Chain: L sites (unit cells) at x = 0, 1, …, L−1, site index = x, extent L. A bond between
 * sites L−1 and 0 exists only for {@link Boundary#PERIODIC}; models add it (with the wrap-around
 * convention of their closure). Cluster: dimension 0, no positions, boundary {@link Boundary#OPEN}
 * (there is nothing to close).
 */
public final class ChainLattices {

  private ChainLattices() {}

  /** A chain of {@code linearSize} unit cells, each with {@code orbitalsPerSite} orbitals. */
  public static Lattice chain(int linearSize, int orbitalsPerSite, Boundary boundary) {
    double[][] pos = new double[1][linearSize];
    for (int x = 0; x < linearSize; x++) {
      pos[0][x] = x;
    }
    return new Lattice(
        1, linearSize, linearSize, orbitalsPerSite, pos, new double[] {linearSize}, boundary);
  }

  /** A d = 0 cluster of {@code sites} sites; {@code linearSize} records the spec's L. */
  public static Lattice cluster(int linearSize, int sites, int orbitalsPerSite) {
    return new Lattice(
        0, linearSize, sites, orbitalsPerSite, new double[0][], new double[0], Boundary.OPEN);
  }

  /**
   * True if the bond between sites i and j of a periodic chain is the closing bond (it joins the
   * two ends, |i − j| = L − 1). Needs L ≥ 3 to be unambiguous; for L ≤ 2 the closing bond and the
   * ordinary bond join the same pair of sites.
   */
  public static boolean isClosingBond(Lattice chain, int i, int j) {
    return chain.linearSize() >= 3 && Math.abs(i - j) == chain.linearSize() - 1;
  }
}
