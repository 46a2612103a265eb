package hopstat.model;

import hopstat.lattice.Boundary;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.HoneycombLattices;
import hopstat.lattice.Lattice;
import java.util.List;

/**
 * Haldane's honeycomb Chern insulator (Haldane, PRL 61, 2015 (1988)):
 *
 * <pre>  H = t1 Σ_⟨ij⟩ c†_i c_j + t2 Σ_⟨⟨ij⟩⟩ e^{i ν_ij φ} c†_i c_j + M Σ_i ε_i c†_i c_i,</pre>
 *
 * one orbital per site, ε = +1 on A and −1 on B, ν_ij = sign(d1 × d2)_z for the two
 * nearest-neighbour bonds d1, d2 that lead from j to i (Haldane's convention). Geometry as in
 * {@link HoneycombLattices}: with a1 = (1, 0), a2 = (1/2, √3/2), the A → A hops along a1, a2 − a1
 * and −a2 have ν = −1, the B → B hops along the same vectors ν = +1 (derived from the bond
 * geometry). Clean phase diagram: |C| = 1 iff |M| &lt; 3√3 |t2 sin φ|, else C = 0 (Haldane 1988);
 * in this convention C = −1 for t2 sin φ &gt; 0 and +1 for t2 sin φ &lt; 0 (fixed by a test). At φ
 * = ±π/2 the spectrum is symmetric about E = 0, so E_F = 0 lies in the gap; for other φ the gap
 * centre moves by −3 t2 cos φ.
 */
public final class HaldaneModel implements Model {

  public static final String NAME = "haldane";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "Haldane honeycomb Chern insulator (Haldane, PRL 61, 2015 (1988)): H = t1 sum_<ij> c+_i c_j"
        + " + t2 sum_<<ij>> exp(i nu_ij phi) c+_i c_j + M sum_i eps_i n_i, eps = +1 (A), -1 (B),"
        + " nu_ij = sign(d1 x d2)_z as in Haldane; L x L cells of 2 sites, positions in oblique cell coordinates;"
        + " |C| = 1 iff |M| < 3 sqrt(3) |t2 sin phi| (bott/chern-marker C = -1 for t2 sin phi > 0);"
        + " the gap centre at the Dirac points is E = -3 t2 cos phi (use it as fermiEnergy).";
  }

  @Override
  public SymmetryClass symmetryClass() {
    return SymmetryClass.A;
  }

  @Override
  public int dimension() {
    return 2;
  }

  @Override
  public List<ParameterInfo> parameters() {
    return List.of(
        new ParameterInfo("t1", 1.0, "nearest-neighbour hopping t1 (energy unit)"),
        new ParameterInfo(
            "t2", null, "next-nearest-neighbour hopping amplitude t2 (units of t1's energy)"),
        new ParameterInfo("phi", null, "phase phi of the next-nearest-neighbour hopping (radians)"),
        new ParameterInfo("M", 0.0, "sublattice mass: +M on A, -M on B (energy)"));
  }

  @Override
  public Lattice lattice(int linearSize, Boundary boundary) {
    return HoneycombLattices.rhombus(linearSize, 1, boundary);
  }

  @Override
  public void addClean(ParameterValues parameters, Lattice lattice, HamiltonianBuilder out) {
    double t1 = parameters.get("t1");
    double t2 = parameters.get("t2");
    double phi = parameters.get("phi");
    double mass = parameters.get("M");
    int size = lattice.linearSize();
    boolean periodic = lattice.boundary() == Boundary.PERIODIC;
    // Next-nearest-neighbour vectors in oblique coordinates: a1, a2 − a1, −a2 (ν = −1 on A).
    int[][] nnn = {{1, 0}, {-1, 1}, {0, -1}};
    double c2 = t2 * Math.cos(phi);
    double s2 = t2 * Math.sin(phi);
    for (int n2 = 0; n2 < size; n2++) {
      for (int n1 = 0; n1 < size; n1++) {
        int a = HoneycombLattices.siteIndex(size, n1, n2, 0);
        int b = a + 1;
        out.addOnsite(a, mass);
        out.addOnsite(b, -mass);
        // Nearest neighbours of A(n1, n2): B(n1, n2), B(n1 − 1, n2), B(n1, n2 − 1).
        out.addHopping(a, b, t1, 0.0);
        int bx = neighbour(size, n1 - 1, n2, periodic);
        if (bx >= 0) {
          out.addHopping(a, bx + 1, t1, 0.0);
        }
        int by = neighbour(size, n1, n2 - 1, periodic);
        if (by >= 0) {
          out.addHopping(a, by + 1, t1, 0.0);
        }
        for (int[] v : nnn) {
          int target = neighbour(size, n1 + v[0], n2 + v[1], periodic);
          if (target < 0) {
            continue;
          }
          // H[target][source] = t2 e^{iνφ}: ν = −1 on A, +1 on B for these three vectors.
          out.addHopping(target, a, c2, -s2);
          out.addHopping(target + 1, b, c2, s2);
        }
      }
    }
  }

  /**
   * Site index of sublattice A in cell (n1, n2), wrapped if periodic, or −1 outside an open sample.
   */
  private static int neighbour(int size, int n1, int n2, boolean periodic) {
    if (size == 1 && !periodic) {
      return -1;
    }
    if (!periodic && (n1 < 0 || n1 >= size || n2 < 0 || n2 >= size)) {
      return -1;
    }
    return HoneycombLattices.siteIndex(size, Math.floorMod(n1, size), Math.floorMod(n2, size), 0);
  }
}
