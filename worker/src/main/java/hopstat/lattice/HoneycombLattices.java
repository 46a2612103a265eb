package hopstat.lattice;

/**
 * Honeycomb samples of L × L unit cells with two sites (sublattices A, B) per cell.
 *
 * <p>Conventions: primitive vectors a1 = (1, 0), a2 = (1/2, √3/2) in units of the lattice constant
 * (nearest-neighbour distance 1/√3). Positions are stored in the oblique coordinates (n1, n2) of
 * the basis (a1, a2), in which the unit cell has unit area: site A of cell (n1, n2) sits at (n1,
 * n2), site B at (n1 + 1/3, n2 + 1/3), i.e. at A + (a1 + a2)/3. Cartesian position = n1 a1 + n2 a2.
 * Position-based invariants (Bott index, local markers) are unchanged by this orientation-
 * preserving linear change of coordinates. Site index = 2 (n1 + L n2) + sublattice (A = 0, B = 1).
 * The extent is L along both oblique directions; an open sample is a rhombus.
 */
public final class HoneycombLattices {

  /** Sublattice offset of B in oblique coordinates. */
  public static final double B_OFFSET = 1.0 / 3.0;

  private HoneycombLattices() {}

  /** An L × L-cell honeycomb sample. */
  public static Lattice rhombus(int linearSize, int orbitalsPerSite, Boundary boundary) {
    int n = 2 * linearSize * linearSize;
    double[][] pos = new double[2][n];
    for (int n2 = 0; n2 < linearSize; n2++) {
      for (int n1 = 0; n1 < linearSize; n1++) {
        int a = siteIndex(linearSize, n1, n2, 0);
        pos[0][a] = n1;
        pos[1][a] = n2;
        pos[0][a + 1] = n1 + B_OFFSET;
        pos[1][a + 1] = n2 + B_OFFSET;
      }
    }
    return new Lattice(
        2, linearSize, n, orbitalsPerSite, pos, new double[] {linearSize, linearSize}, boundary);
  }

  /**
   * Site index of sublattice {@code sublattice} (0 = A, 1 = B) in cell (n1, n2), 0 ≤ n1, n2 &lt; L.
   */
  public static int siteIndex(int linearSize, int n1, int n2, int sublattice) {
    return 2 * (n1 + linearSize * n2) + sublattice;
  }
}
