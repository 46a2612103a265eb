package hopstat.spectrum;

import java.util.random.RandomGenerator;

/**
 * Kernel polynomial method (Weiße, Wellein, Alvermann, Fehske, "The kernel polynomial method", RMP
 * 78, 275 (2006); equation numbers below refer to that paper) on a sparse Hermitian matrix.
 *
 * <p><b>Rescaling.</b> {@link #scale} maps the Gershgorin interval [E_lo, E_hi] of H onto [−1 + ε,
 * 1 − ε] with ε = {@link #EPSILON}: b = (E_lo + E_hi)/2, a = (E_hi − E_lo)/(2(1 − ε)), H̃ = (H −
 * b)/a (Sec. II.B). Gershgorin is a true bound, so the spectrum of H̃ lies inside [−1 + ε, 1 − ε]
 * and the Chebyshev recursion stays bounded; the margin ε keeps the Jackson-broadened features of
 * the band edges away from the ±1 singularities of the weight 1/√(1 − x²). A loose bound costs
 * resolution only (the energy resolution scales with a).
 *
 * <p><b>Moments.</b> μ_n = (1/N) Tr T_n(H̃) (eq. 27) is estimated stochastically (Sec. II.D, eq.
 * 48): Tr A ≈ (1/R) Σ_r ⟨r|A|r⟩ over R random-phase vectors r_i = e^{iφ_i}, φ_i = 2π u_i, u_i
 * uniform in [0, 1) from the caller's generator (drawn vector after vector, entry i = 0..N−1). Each
 * vector gives μ_0 = 1 exactly (|r_i| = 1); the variance of ⟨r|A|r⟩ is Σ_{i≠j} |A_ij|² ≤ N (for ‖A‖
 * ≤ 1), so the error of μ_n is at most 1/√(N R) (derived). Products use the doubling relations
 * μ_{2n} = 2⟨α_n|α_n⟩ − μ_0, μ_{2n+1} = 2⟨α_{n+1}|α_n⟩ − μ_1, |α_n⟩ = T_n(H̃)|r⟩ (eq. 34), so M
 * moments cost ≈ M/2 products per vector.
 *
 * <p><b>Kernel.</b> Jackson kernel g_n (eq. 71), whose broadening of a delta peak at x is ≈ π/M in
 * rescaled units (σ = π/M at the band centre, eq. 72), i.e. ≈ π·a/M in energy.
 *
 * <p><b>Density of states.</b> ρ(E) = [g_0 μ_0 + 2 Σ_{n≥1} g_n μ_n T_n(x)] / (π a √(1 − x²)), x =
 * (E − b)/a (eqs. 39, 40 with the change of variable to E), in states per orbital per energy unit,
 * normalised ∫ρ dE = g_0 μ_0 = 1 (∫ T_n(x)/(π√(1 − x²)) dx = δ_{n0}); ρ = 0 for |x| ≥ 1.
 *
 * <p><b>Step function.</b> θ(x_F − x) = (1 − φ_F/π) − Σ_{n≥1} (2 sin(nφ_F)/(nπ)) T_n(x), φ_F =
 * arccos x_F (derived from the Chebyshev expansion of δ(x − y), eq. 37, integrated over y ≤ x_F);
 * {@link #stepCoefficients} multiplies it by g_n, so the projector P = θ(E_F − H) is applied as a
 * polynomial of degree M − 1 in H̃ whose step is broadened by ≈ π a/M.
 *
 * <p>Kernels here keep no state, take their randomness from the caller and, once the workspace is
 * warm, allocate nothing except {@link #scale}'s small result record and bounds array.
 */
public final class KpmKernel {

  /**
   * Margin ε of the rescaled interval [−1 + ε, 1 − ε] (Weiße et al. 2006 suggest ε = 0.01 in Sec.
   * II.B; common practice).
   */
  public static final double EPSILON = 0.01;

  private KpmKernel() {}

  /**
   * The rescaling of H from its Gershgorin interval (see class Javadoc).
   *
   * @param h read, not modified
   */
  public static ChebyshevScale scale(CsrHermitianMatrix h) {
    double[] bounds = new double[2];
    h.gershgorinBounds(bounds);
    double half = 0.5 * (bounds[1] - bounds[0]);
    if (!(half > 0)) {
      // H is a multiple of the identity: any positive width holds the single eigenvalue.
      half = 1.0;
    }
    return new ChebyshevScale(0.5 * (bounds[0] + bounds[1]), half / (1.0 - EPSILON));
  }

  /**
   * Jackson kernel g_n, n = 0..M−1 (eq. 71): g_n = [(M − n + 1) cos(πn/(M + 1)) + sin(πn/(M + 1))
   * cot(π/(M + 1))] / (M + 1); g_0 = 1.
   *
   * @param moments M ≥ 1
   * @param out overwritten: entries 0..M−1
   */
  public static void jacksonKernel(int moments, double[] out) {
    if (moments < 1 || out.length < moments) {
      throw new IllegalArgumentException(
          "need moments >= 1 and out.length >= moments: " + moments + ", " + out.length);
    }
    double q = Math.PI / (moments + 1);
    double cot = Math.cos(q) / Math.sin(q);
    for (int n = 0; n < moments; n++) {
      out[n] = ((moments - n + 1) * Math.cos(q * n) + Math.sin(q * n) * cot) / (moments + 1);
    }
  }

  /**
   * Adds ⟨r|T_n(H̃)|r⟩ (real part; the imaginary part vanishes for Hermitian H̃) to acc[n], n =
   * 0..M−1, by the doubling relations (eq. 34). Cost ⌈M/2⌉ products with H.
   *
   * @param h read, not modified
   * @param scale the rescaling (must contain the spectrum in (−1, 1))
   * @param start read, not modified: the vector r (interleaved complex, length ≥ 2N)
   * @param moments M ≥ 2
   * @param workspace scratch (vectors a, b)
   * @param acc accumulated into: entries 0..M−1
   */
  public static void accumulateMoments(
      CsrHermitianMatrix h,
      ChebyshevScale scale,
      double[] start,
      int moments,
      KpmWorkspace workspace,
      double[] acc) {
    int n = h.dimension();
    if (moments < 2 || acc.length < moments) {
      throw new IllegalArgumentException(
          "need moments >= 2 and acc.length >= moments: " + moments + ", " + acc.length);
    }
    workspace.ensure(n, moments);
    if (start == workspace.a || start == workspace.b || start.length < 2 * n) {
      throw new IllegalArgumentException(
          "start vector aliases the workspace or is shorter than 2N");
    }
    double inverse = 1.0 / scale.halfWidth();
    double shift = -scale.centre() * inverse;
    double[] previous = workspace.a;
    double[] current = workspace.b;
    System.arraycopy(start, 0, previous, 0, 2 * n);
    h.multiplyAffine(inverse, shift, previous, 0.0, null, current);
    double mu0 = dotReal(previous, previous, n);
    double mu1 = dotReal(current, previous, n);
    acc[0] += mu0;
    acc[1] += mu1;
    // previous = α_{k−1}, current = α_k
    for (int k = 1; 2 * k < moments; k++) {
      acc[2 * k] += 2.0 * dotReal(current, current, n) - mu0;
      if (2 * k + 1 < moments) {
        // α_{k+1} = 2H̃α_k − α_{k−1}, written over α_{k−1}
        h.multiplyAffine(2.0 * inverse, 2.0 * shift, current, -1.0, previous, previous);
        double[] t = previous;
        previous = current;
        current = t;
        acc[2 * k + 1] += 2.0 * dotReal(current, previous, n) - mu1;
      }
    }
  }

  /**
   * Fills r with random phases r_i = e^{2πi u_i}, i = 0..n−1, one {@code nextDouble()} per entry in
   * index order.
   *
   * @param random the caller's generator (advanced by n draws)
   * @param out overwritten: entries 0..2n−1
   */
  public static void randomPhases(RandomGenerator random, int n, double[] out) {
    for (int i = 0; i < n; i++) {
      double phi = 2.0 * Math.PI * random.nextDouble();
      out[2 * i] = Math.cos(phi);
      out[2 * i + 1] = Math.sin(phi);
    }
  }

  /**
   * Stochastic estimate of the normalised moments μ_n = (1/N) Tr T_n(H̃), n = 0..M−1, from R
   * random-phase vectors (class Javadoc). μ_0 = 1 exactly. Cost R·⌈M/2⌉ products with H; draws R·N
   * numbers from {@code random}.
   *
   * @param h read, not modified
   * @param moments M ≥ 2
   * @param vectors R ≥ 1
   * @param random the caller's generator
   * @param workspace scratch
   * @param mu overwritten: entries 0..M−1
   */
  public static void stochasticMoments(
      CsrHermitianMatrix h,
      ChebyshevScale scale,
      int moments,
      int vectors,
      RandomGenerator random,
      KpmWorkspace workspace,
      double[] mu) {
    if (vectors < 1) {
      throw new IllegalArgumentException("need at least one random vector: " + vectors);
    }
    int n = h.dimension();
    workspace.ensure(n, moments);
    java.util.Arrays.fill(mu, 0, moments, 0.0);
    for (int r = 0; r < vectors; r++) {
      randomPhases(random, n, workspace.c);
      accumulateMoments(h, scale, workspace.c, moments, workspace, mu);
    }
    double norm = 1.0 / ((double) n * vectors);
    for (int k = 0; k < moments; k++) {
      mu[k] *= norm;
    }
  }

  /**
   * The KPM density of states at one energy (class Javadoc), states per orbital per energy unit.
   *
   * @param mu read: normalised moments 0..M−1
   * @param jackson read: kernel g_n, 0..M−1 ({@link #jacksonKernel})
   * @param moments M
   * @param scale the rescaling the moments were computed with
   * @param energy E in the model's energy unit
   * @return ρ(E) (0 outside the rescaled interval)
   */
  public static double density(
      double[] mu, double[] jackson, int moments, ChebyshevScale scale, double energy) {
    double x = scale.rescaled(energy);
    if (!(Math.abs(x) < 1.0)) {
      return 0.0;
    }
    double theta = Math.acos(x);
    double sum = jackson[0] * mu[0];
    for (int k = 1; k < moments; k++) {
      sum += 2.0 * jackson[k] * mu[k] * Math.cos(k * theta);
    }
    return sum / (Math.PI * scale.halfWidth() * Math.sqrt(1.0 - x * x));
  }

  /**
   * Chebyshev coefficients c_n = g_n·s_n of the step θ(x_F − x) with the Jackson kernel (class
   * Javadoc): s_0 = 1 − φ_F/π, s_n = −2 sin(nφ_F)/(nπ), φ_F = arccos x_F; x_F is clamped to [−1,
   * 1].
   *
   * @param fermi x_F, the rescaled Fermi energy
   * @param moments M ≥ 1
   * @param out overwritten: entries 0..M−1
   */
  public static void stepCoefficients(double fermi, int moments, double[] out) {
    jacksonKernel(moments, out);
    double phi = Math.acos(Math.max(-1.0, Math.min(1.0, fermi)));
    out[0] *= 1.0 - phi / Math.PI;
    for (int k = 1; k < moments; k++) {
      out[k] *= -2.0 * Math.sin(k * phi) / (k * Math.PI);
    }
  }

  /**
   * y = Σ_{n&lt;M} c_n T_n(H̃) x by the three-term recursion (eq. 11). Cost M − 1 products with H.
   *
   * @param h read, not modified
   * @param coefficients read: c_0..c_{M−1}
   * @param moments M ≥ 2
   * @param x read, not modified
   * @param y overwritten; must not alias x or the workspace
   * @param workspace scratch (vectors a, b)
   */
  public static void applySeries(
      CsrHermitianMatrix h,
      ChebyshevScale scale,
      double[] coefficients,
      int moments,
      double[] x,
      double[] y,
      KpmWorkspace workspace) {
    int n = h.dimension();
    if (moments < 2) {
      throw new IllegalArgumentException("need moments >= 2: " + moments);
    }
    workspace.ensure(n, moments);
    if (x == y || x == workspace.a || x == workspace.b || y == workspace.a || y == workspace.b) {
      throw new IllegalArgumentException("x, y and the workspace vectors must not alias");
    }
    double inverse = 1.0 / scale.halfWidth();
    double shift = -scale.centre() * inverse;
    double[] previous = workspace.a;
    double[] current = workspace.b;
    System.arraycopy(x, 0, previous, 0, 2 * n);
    h.multiplyAffine(inverse, shift, previous, 0.0, null, current);
    double c0 = coefficients[0];
    double c1 = coefficients[1];
    for (int i = 0; i < 2 * n; i++) {
      y[i] = c0 * previous[i] + c1 * current[i];
    }
    for (int k = 2; k < moments; k++) {
      h.chebyshevStep(2.0 * inverse, 2.0 * shift, current, previous, coefficients[k], y);
      double[] t = previous;
      previous = current;
      current = t;
    }
  }

  /** Re ⟨u|v⟩ over n complex entries. */
  static double dotReal(double[] u, double[] v, int n) {
    double s = 0.0;
    for (int i = 0; i < 2 * n; i++) {
      s += u[i] * v[i];
    }
    return s;
  }
}
