package hopstat.invariant;

import hopstat.lattice.Lattice;
import org.ejml.data.ZMatrixRMaj;

/**
 * Kitaev's three-region formula for the Chern number (Kitaev, Ann. Phys. 321, 2 (2006), App. C):
 *
 * <pre>  ν = 12πi Σ_{j∈A, k∈B, l∈C} (P_jk P_kl P_lj − P_jl P_lk P_kj) = −24π Im Tr(P_AB P_BC P_CA),
 * </pre>
 *
 * (the second term is the complex conjugate of the first because P is Hermitian). A, B, C are the
 * three 120° sectors, counter-clockwise, of a disc of radius R centred at the middle of the sample
 * (the midpoint of the span of the positions): sector A holds angles [0, 2π/3), B [2π/3, 4π/3), C
 * [4π/3, 2π), all orbitals of a site belong to its site's sector. With counter-clockwise sectors ν
 * = −C in the convention of {@link hopstat.model.QwzModel} (checked in tests), so the kernel
 * returns −ν. Works on open and periodic samples as long as the disc stays away from the edges and
 * R &lt; L/2; the truncation error decays with R/ξ, ξ the localisation length of P.
 *
 * <p>Cost: gathering the rows of Ψ, three m·m·n products and one m³ product, m the sector size.
 */
public final class ThreeRegionChernKernel {

  private ThreeRegionChernKernel() {}

  /**
   * @param lattice read: positions (directions 0, 1)
   * @param occupied read, not modified: N × n orthonormal occupied states
   * @param radius R, in the lattice's coordinates; sites with distance ≤ R from the centre count
   * @param workspace scratch
   */
  public static ThreeRegionChernResult compute(
      Lattice lattice, ZMatrixRMaj occupied, double radius, ThreeRegionChernWorkspace workspace) {
    if (lattice.dimension() != 2) {
      throw new IllegalArgumentException(
          "the three-region formula needs a two-dimensional lattice");
    }
    if (occupied.numRows != lattice.orbitals()) {
      throw new IllegalArgumentException(
          "occupied states have "
              + occupied.numRows
              + " rows, lattice has "
              + lattice.orbitals()
              + " orbitals");
    }
    if (!(radius > 0)) {
      throw new IllegalArgumentException("radius must be positive: " + radius);
    }
    int sites = lattice.sites();
    workspace.ensureSites(sites);
    double xMin = lattice.minPosition(0);
    double xMax = lattice.maxPosition(0);
    double yMin = lattice.minPosition(1);
    double yMax = lattice.maxPosition(1);
    double xc = 0.5 * (xMin + xMax);
    double yc = 0.5 * (yMin + yMax);
    int[] count = workspace.count;
    java.util.Arrays.fill(count, 0);
    for (int s = 0; s < sites; s++) {
      double dx = lattice.position(0, s) - xc;
      double dy = lattice.position(1, s) - yc;
      if (Math.hypot(dx, dy) > radius) {
        workspace.sector[s] = -1;
        continue;
      }
      double angle = Math.atan2(dy, dx);
      if (angle < 0) {
        angle += 2.0 * Math.PI;
      }
      int k = Math.min(2, (int) Math.floor(angle / (2.0 * Math.PI / 3.0)));
      workspace.sector[s] = k;
      count[k]++;
    }
    int smallest = Math.min(count[0], Math.min(count[1], count[2]));
    if (smallest == 0 || occupied.numCols == 0) {
      return new ThreeRegionChernResult(0.0, smallest);
    }
    gather(lattice, occupied, workspace.sector, 0, count[0], workspace.psiA);
    gather(lattice, occupied, workspace.sector, 1, count[1], workspace.psiB);
    gather(lattice, occupied, workspace.sector, 2, count[2], workspace.psiC);
    workspace.products.multConjTransB(workspace.psiA, workspace.psiB, workspace.pab);
    workspace.products.multConjTransB(workspace.psiB, workspace.psiC, workspace.pbc);
    workspace.products.multConjTransB(workspace.psiC, workspace.psiA, workspace.pca);
    workspace.products.mult(workspace.pab, workspace.pbc, workspace.pabc);
    // Im Tr(PABC · PCA) = Σ_{a,c} Im(PABC_ac PCA_ca)
    int ma = workspace.pabc.numRows;
    int mc = workspace.pabc.numCols;
    double[] x = workspace.pabc.data;
    double[] y = workspace.pca.data;
    double imTrace = 0.0;
    for (int a = 0; a < ma; a++) {
      for (int c = 0; c < mc; c++) {
        double xr = x[2 * (a * mc + c)];
        double xi = x[2 * (a * mc + c) + 1];
        double yr = y[2 * (c * ma + a)];
        double yi = y[2 * (c * ma + a) + 1];
        imTrace += xr * yi + xi * yr;
      }
    }
    double nu = -24.0 * Math.PI * imTrace;
    return new ThreeRegionChernResult(-nu, smallest);
  }

  /** out = the rows of Ψ that belong to the sites of sector k, in site order. */
  private static void gather(
      Lattice lattice, ZMatrixRMaj psi, int[] sector, int k, int sectorSites, ZMatrixRMaj out) {
    int perSite = lattice.orbitalsPerSite();
    int cols = psi.numCols;
    out.reshape(sectorSites * perSite, cols);
    int row = 0;
    for (int s = 0; s < lattice.sites(); s++) {
      if (sector[s] != k) {
        continue;
      }
      for (int o = 0; o < perSite; o++) {
        System.arraycopy(
            psi.data, 2 * (s * perSite + o) * cols, out.data, 2 * row * cols, 2 * cols);
        row++;
      }
    }
  }
}
