package hopstat.invariant;

import hopstat.lattice.Lattice;
import org.ejml.data.ZMatrixRMaj;

/**
 * Bianco–Resta local Chern marker on an open two-dimensional sample (Bianco &amp; Resta, PRB 84,
 * 241106(R) (2011)):
 *
 * <pre>  c(s) = −4π Im Σ_{o on site s} ⟨s,o| P X Q Y P |s,o⟩,   Q = 1 − P,</pre>
 *
 * with P the projector on the occupied states and X, Y the position operators of the orbitals
 * ({@link Lattice#orbitalPosition}: site position plus intra-cell offset, in the lattice's
 * coordinates, in which the unit cell has unit area). The marker per unit cell is c(s) times the
 * site density ρ = sites / (extent_x extent_y); its average over a bulk region far from the edges
 * is the Chern number C in the sign convention of {@link hopstat.model.QwzModel} (checked in
 * tests). Bulk region: the sites whose coordinates lie in the central half of the sample's span in
 * each direction, |x − x_c| ≤ (x_max − x_min)/4 and likewise for y, with the span and its centre
 * x_c taken over the orbital positions (the site span when no offsets are set).
 *
 * <p>With Ψ the N × n occupied states, P X Q Y P = Ψ (Ψ†XYΨ − Ψ†XΨ Ψ†YΨ) Ψ†, so the diagonal costs
 * four N·n² products and one n³ product; positions are centred first (the marker is exactly
 * invariant under shifts, centring only reduces cancellation).
 */
public final class ChernMarkerKernel {

  private ChernMarkerKernel() {}

  /**
   * @param lattice read: positions (directions 0, 1) and extents
   * @param occupied read, not modified: N × n orthonormal occupied states
   * @param workspace scratch; after the call {@link #siteMarker} holds c(s)·ρ per site
   * @return the bulk average
   */
  public static ChernMarkerResult compute(
      Lattice lattice, ZMatrixRMaj occupied, ChernMarkerWorkspace workspace) {
    if (lattice.dimension() != 2) {
      throw new IllegalArgumentException("the Chern marker needs a two-dimensional lattice");
    }
    int rows = occupied.numRows;
    int n = occupied.numCols;
    if (rows != lattice.orbitals()) {
      throw new IllegalArgumentException(
          "occupied states have "
              + rows
              + " rows, lattice has "
              + lattice.orbitals()
              + " orbitals");
    }
    int sites = lattice.sites();
    int perSite = lattice.orbitalsPerSite();
    workspace.ensureSites(sites);
    double[] marker = workspace.siteMarker;
    double[] extent = lattice.extent();
    double density = sites / (extent[0] * extent[1]);
    double xMin = lattice.minOrbitalPosition(0);
    double xMax = lattice.maxOrbitalPosition(0);
    double yMin = lattice.minOrbitalPosition(1);
    double yMax = lattice.maxOrbitalPosition(1);
    double xc = 0.5 * (xMin + xMax);
    double yc = 0.5 * (yMin + yMax);
    if (n == 0 || n == rows) {
      java.util.Arrays.fill(marker, 0, sites, 0.0);
    } else {
      scaleRows(lattice, 0, xc, occupied, workspace.xPsi);
      scaleRows(lattice, 1, yc, occupied, workspace.yPsi);
      workspace.products.multConjTransA(occupied, workspace.xPsi, workspace.projectedX);
      workspace.products.multConjTransA(occupied, workspace.yPsi, workspace.projectedY);
      workspace.products.multConjTransA(workspace.xPsi, workspace.yPsi, workspace.projectedXy);
      workspace.products.mult(workspace.projectedX, workspace.projectedY, workspace.product);
      // product ← Ψ†XYΨ − Ψ†XΨ Ψ†YΨ
      double[] d = workspace.projectedXy.data;
      double[] p = workspace.product.data;
      for (int k = 0; k < 2 * n * n; k++) {
        p[k] = d[k] - p[k];
      }
      workspace.products.mult(occupied, workspace.product, workspace.expanded);
      double[] w = workspace.expanded.data;
      double[] psi = occupied.data;
      for (int s = 0; s < sites; s++) {
        double sum = 0.0;
        for (int o = 0; o < perSite; o++) {
          int base = 2 * (s * perSite + o) * n;
          // Im Σ_b W_ib conj(Ψ_ib)
          for (int b = 0; b < n; b++) {
            sum +=
                w[base + 2 * b + 1] * psi[base + 2 * b] - w[base + 2 * b] * psi[base + 2 * b + 1];
          }
        }
        marker[s] = -4.0 * Math.PI * density * sum;
      }
    }
    double qx = 0.25 * (xMax - xMin);
    double qy = 0.25 * (yMax - yMin);
    double total = 0.0;
    int count = 0;
    for (int s = 0; s < sites; s++) {
      if (Math.abs(lattice.position(0, s) - xc) <= qx + 1e-9
          && Math.abs(lattice.position(1, s) - yc) <= qy + 1e-9) {
        total += marker[s];
        count++;
      }
    }
    return new ChernMarkerResult(count == 0 ? Double.NaN : total / count, count);
  }

  /**
   * The per-site marker c(s)·ρ of the last {@link #compute} call with this workspace.
   *
   * @param workspace read
   * @param site 0-based site index
   */
  public static double siteMarker(ChernMarkerWorkspace workspace, int site) {
    return workspace.siteMarker[site];
  }

  /** out = diag(r_d − centre) Ψ, r_d the orbital positions. */
  private static void scaleRows(
      Lattice lattice, int d, double centre, ZMatrixRMaj psi, ZMatrixRMaj out) {
    int rows = psi.numRows;
    int cols = psi.numCols;
    out.reshape(rows, cols);
    double[] src = psi.data;
    double[] dst = out.data;
    for (int i = 0; i < rows; i++) {
      double r = lattice.orbitalPosition(d, i) - centre;
      int base = 2 * i * cols;
      for (int j = 0; j < 2 * cols; j++) {
        dst[base + j] = r * src[base + j];
      }
    }
  }
}
