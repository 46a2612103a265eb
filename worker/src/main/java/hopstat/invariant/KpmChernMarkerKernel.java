package hopstat.invariant;

import hopstat.lattice.Lattice;
import hopstat.spectrum.ChebyshevScale;
import hopstat.spectrum.CsrHermitianMatrix;
import hopstat.spectrum.KpmKernel;
import java.util.random.RandomGenerator;

/**
 * Bulk-averaged Bianco–Resta local Chern marker (Bianco &amp; Resta, PRB 84, 241106(R) (2011)) of
 * an open two-dimensional sample without diagonalisation: the projector P = θ(E_F − H) is applied
 * to vectors as a Chebyshev series with the Jackson kernel (kernel polynomial method, Weiße,
 * Wellein, Alvermann, Fehske, RMP 78, 275 (2006); see {@link KpmKernel}) and the trace over the
 * bulk region is estimated stochastically.
 *
 * <p><b>Marker.</b> As in {@link ChernMarkerKernel}: c(s) = −4π ρ Im Σ_{o on s} ⟨s,o|P X Q Y
 * P|s,o⟩, ρ = sites/(extent_x·extent_y) the site density, X, Y the orbital positions ({@link
 * Lattice#orbitalPosition}) centred on the middle of the sample's span of orbital positions, and
 * the result is the mean of c(s) over the bulk sites: the sites with |x − x_c| ≤ (x_max − x_min)/4
 * and |y − y_c| ≤ (y_max − y_min)/4 (the central half in each direction, the same region and sign
 * convention as {@code chern-marker}: C = +1 for qwz with −2 &lt; m &lt; 0).
 *
 * <p><b>Per vector.</b> For a vector ξ, with P̃ the polynomial projector (Hermitian): ⟨ξ|P̃ X (1 −
 * P̃) Y P̃|ξ⟩ = ⟨v|X (Yv − P̃Yv)⟩, v = P̃ξ, so each vector costs two projector applications, 2(M −
 * 1) sparse products.
 *
 * <p><b>Stochastic trace.</b> Tr_B A = E⟨ξ|A|ξ⟩ for ξ with independent random phases e^{2πiu} on
 * the orbitals of the bulk sites and zero elsewhere (Weiße et al. 2006, Sec. II.D). Draws: vector
 * after vector, one {@code nextDouble()} per bulk orbital in increasing matrix index. Each vector
 * gives an unbiased estimate of the bulk average; the result is their mean, with the standard error
 * s/√R over the R per-vector estimates (R ≥ 2).
 *
 * <p><b>Truncation.</b> P̃ equals P up to a Jackson-broadened step of width ≈ π a/M in energy (a
 * the half-width of the rescaled spectrum), so the truncation error is small when the (mobility)
 * gap around E_F is wide compared to π a/M; states inside the broadened window (edge states of the
 * open sample) sit far from the bulk region. Not included in the standard error; tests bound it
 * against the dense marker.
 *
 * <p>Cost 2R(M − 1) products with H (≈ 8 nnz flops each) plus O(R·N); memory O(N) (workspace).
 */
public final class KpmChernMarkerKernel {

  private KpmChernMarkerKernel() {}

  /**
   * The stochastic bulk-averaged marker.
   *
   * @param h read, not modified: the Hamiltonian (dimension = lattice orbitals)
   * @param lattice read: d = 2 positions
   * @param scale the rescaling of H ({@link KpmKernel#scale})
   * @param fermiEnergy E_F (model energy unit)
   * @param moments M ≥ 2 Chebyshev terms of the projector
   * @param vectors R ≥ 2 random vectors
   * @param random the caller's generator; advanced by R × (bulk orbitals) draws
   * @param workspace scratch
   */
  public static KpmChernMarkerResult compute(
      CsrHermitianMatrix h,
      Lattice lattice,
      ChebyshevScale scale,
      double fermiEnergy,
      int moments,
      int vectors,
      RandomGenerator random,
      KpmChernMarkerWorkspace workspace) {
    if (vectors < 2) {
      throw new IllegalArgumentException(
          "need at least two random vectors for an error estimate: " + vectors);
    }
    int n = prepare(h, lattice, scale, fermiEnergy, moments, vectors, workspace);
    int bulkOrbitals = bulkOrbitals(lattice, workspace.bulk);
    int bulkSites = bulkOrbitals / lattice.orbitalsPerSite();
    double[] probe = workspace.probe;
    double sum = 0.0;
    for (int r = 0; r < vectors; r++) {
      java.util.Arrays.fill(probe, 0, 2 * n, 0.0);
      for (int b = 0; b < bulkOrbitals; b++) {
        double phi = 2.0 * Math.PI * random.nextDouble();
        int i = workspace.bulk[b];
        probe[2 * i] = Math.cos(phi);
        probe[2 * i + 1] = Math.sin(phi);
      }
      double v = probeValue(h, lattice, scale, moments, probe, bulkSites, workspace);
      workspace.estimates[r] = v;
      sum += v;
    }
    double mean = sum / vectors;
    double squares = 0.0;
    for (int r = 0; r < vectors; r++) {
      double d = workspace.estimates[r] - mean;
      squares += d * d;
    }
    double error = Math.sqrt(squares / (vectors - 1) / vectors);
    return new KpmChernMarkerResult(mean, error, vectors, bulkSites, moments);
  }

  /**
   * The bulk-average marker with the trace over the bulk taken exactly, one unit vector per bulk
   * orbital (no stochastic error; cost 2·(bulk orbitals)·(M − 1) products). For checks of the
   * truncation error at small sizes.
   *
   * @see #compute
   */
  public static double exactTrace(
      CsrHermitianMatrix h,
      Lattice lattice,
      ChebyshevScale scale,
      double fermiEnergy,
      int moments,
      KpmChernMarkerWorkspace workspace) {
    int n = prepare(h, lattice, scale, fermiEnergy, moments, 1, workspace);
    int bulkOrbitals = bulkOrbitals(lattice, workspace.bulk);
    int bulkSites = bulkOrbitals / lattice.orbitalsPerSite();
    double[] probe = workspace.probe;
    java.util.Arrays.fill(probe, 0, 2 * n, 0.0);
    double sum = 0.0;
    for (int b = 0; b < bulkOrbitals; b++) {
      int i = workspace.bulk[b];
      probe[2 * i] = 1.0;
      sum += probeValue(h, lattice, scale, moments, probe, bulkSites, workspace);
      probe[2 * i] = 0.0;
    }
    return sum;
  }

  /**
   * The matrix indices of the orbitals of the bulk sites (class Javadoc), ascending.
   *
   * @param lattice read; d = 2
   * @param out overwritten: the indices (length ≥ orbitals)
   * @return their number
   */
  public static int bulkOrbitals(Lattice lattice, int[] out) {
    int sites = lattice.sites();
    double xMin = lattice.minOrbitalPosition(0);
    double xMax = lattice.maxOrbitalPosition(0);
    double yMin = lattice.minOrbitalPosition(1);
    double yMax = lattice.maxOrbitalPosition(1);
    double xc = 0.5 * (xMin + xMax);
    double yc = 0.5 * (yMin + yMax);
    // Same region and tolerance as ChernMarkerKernel (checked in tests).
    double qx = 0.25 * (xMax - xMin) + 1e-9;
    double qy = 0.25 * (yMax - yMin) + 1e-9;
    int perSite = lattice.orbitalsPerSite();
    int count = 0;
    for (int s = 0; s < sites; s++) {
      if (Math.abs(lattice.position(0, s) - xc) <= qx
          && Math.abs(lattice.position(1, s) - yc) <= qy) {
        for (int o = 0; o < perSite; o++) {
          out[count++] = s * perSite + o;
        }
      }
    }
    return count;
  }

  private static int prepare(
      CsrHermitianMatrix h,
      Lattice lattice,
      ChebyshevScale scale,
      double fermiEnergy,
      int moments,
      int vectors,
      KpmChernMarkerWorkspace workspace) {
    if (lattice.dimension() != 2) {
      throw new IllegalArgumentException("the Chern marker needs a two-dimensional lattice");
    }
    int n = h.dimension();
    if (n != lattice.orbitals()) {
      throw new IllegalArgumentException(
          "matrix of dimension " + n + " does not match " + lattice.orbitals() + " orbitals");
    }
    if (moments < 2) {
      throw new IllegalArgumentException("need at least two moments: " + moments);
    }
    workspace.ensure(n, moments, vectors);
    KpmKernel.stepCoefficients(scale.rescaled(fermiEnergy), moments, workspace.coefficients);
    return n;
  }

  /** −4πρ Im⟨ξ|P̃X(1 − P̃)YP̃|ξ⟩ / bulkSites for one probe ξ. */
  private static double probeValue(
      CsrHermitianMatrix h,
      Lattice lattice,
      ChebyshevScale scale,
      int moments,
      double[] probe,
      int bulkSites,
      KpmChernMarkerWorkspace ws) {
    int n = h.dimension();
    int sites = lattice.sites();
    double xMin = lattice.minOrbitalPosition(0);
    double xMax = lattice.maxOrbitalPosition(0);
    double yMin = lattice.minOrbitalPosition(1);
    double yMax = lattice.maxOrbitalPosition(1);
    double xc = 0.5 * (xMin + xMax);
    double yc = 0.5 * (yMin + yMax);
    double[] extent = lattice.extent();
    double density = sites / (extent[0] * extent[1]);
    double[] v = ws.projected;
    double[] yv = ws.yProjected;
    double[] pyv = ws.projectedTwice;
    KpmKernel.applySeries(h, scale, ws.coefficients, moments, probe, v, ws.kpm);
    for (int i = 0; i < n; i++) {
      double y = lattice.orbitalPosition(1, i) - yc;
      yv[2 * i] = y * v[2 * i];
      yv[2 * i + 1] = y * v[2 * i + 1];
    }
    KpmKernel.applySeries(h, scale, ws.coefficients, moments, yv, pyv, ws.kpm);
    // Im ⟨v| X (Yv − P̃Yv)⟩
    double im = 0.0;
    for (int i = 0; i < n; i++) {
      double x = lattice.orbitalPosition(0, i) - xc;
      double wr = x * (yv[2 * i] - pyv[2 * i]);
      double wi = x * (yv[2 * i + 1] - pyv[2 * i + 1]);
      im += v[2 * i] * wi - v[2 * i + 1] * wr;
    }
    return -4.0 * Math.PI * density * im / bulkSites;
  }
}
