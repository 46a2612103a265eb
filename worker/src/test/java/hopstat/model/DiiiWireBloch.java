package hopstat.model;

import org.ejml.data.ZMatrixRMaj;

/**
 * The diii-wire's 4 × 4 Bloch Hamiltonian written down from its physics form, independently of the
 * model's real-space entries (derived):
 *
 * <pre>  H(k) = ξ_k (1 ⊗ τ_z) + 2Δ sin k (1 ⊗ τ_y) + 2λ sin k (s_x ⊗ 1),  ξ_k = −2t cos k − μ,
 * </pre>
 *
 * orbital order (↑p, ↑h, ↓p, ↓h), Bloch convention c_j = Σ_k e^{ikj} c_k. Eigenvalues (derived, s_x
 * commutes with the τ terms): ±2λ sin k ± √(ξ_k² + 4Δ² sin²k).
 */
public final class DiiiWireBloch {

  private DiiiWireBloch() {}

  /** H(k) as above. */
  public static ZMatrixRMaj hamiltonian(
      double k, double mu, double t, double delta, double lambda) {
    double xi = -2 * t * Math.cos(k) - mu;
    double s = Math.sin(k);
    ZMatrixRMaj h = new ZMatrixRMaj(4, 4);
    for (int spin = 0; spin < 2; spin++) {
      int o = 2 * spin;
      h.set(o, o, xi, 0);
      h.set(o + 1, o + 1, -xi, 0);
      // 2Δ sin k τ_y = [[0, −2iΔs], [2iΔs, 0]]
      h.set(o, o + 1, 0, -2 * delta * s);
      h.set(o + 1, o, 0, 2 * delta * s);
    }
    for (int n = 0; n < 2; n++) {
      h.set(n, n + 2, 2 * lambda * s, 0);
      h.set(n + 2, n, 2 * lambda * s, 0);
    }
    return h;
  }

  /** The closed-form eigenvalues at k, unsorted. */
  public static double[] closedFormEnergies(
      double k, double mu, double t, double delta, double lambda) {
    double xi = -2 * t * Math.cos(k) - mu;
    double s = Math.sin(k);
    double root = Math.sqrt(xi * xi + 4 * delta * delta * s * s);
    double tilt = 2 * lambda * s;
    return new double[] {tilt + root, tilt - root, -tilt + root, -tilt - root};
  }

  /** min over k_n = π n / points, n = 0..2·points−1 (a grid containing 0 and π), of min |E(k)|. */
  public static double minimumGap(double mu, double t, double delta, double lambda, int points) {
    double min = Double.POSITIVE_INFINITY;
    for (int n = 0; n < 2 * points; n++) {
      for (double e : closedFormEnergies(Math.PI * n / points, mu, t, delta, lambda)) {
        min = Math.min(min, Math.abs(e));
      }
    }
    return min;
  }

  /**
   * {@link #hamiltonian} continued to complex z = e^{ik}: cos k = (z + 1/z)/2, sin k = (z − 1/z)/2i
   * (entries analytic in z, not Hermitian off the unit circle), for the evanescent roots of det
   * H(z).
   *
   * @param z (re, im)
   * @param h overwritten: {re[16], im[16]} row-major
   */
  public static void continued(
      double[] z, double mu, double t, double delta, double lambda, double[][] h) {
    double n2 = z[0] * z[0] + z[1] * z[1];
    double ir = z[0] / n2;
    double ii = -z[1] / n2;
    // cos k, sin k
    double cr = 0.5 * (z[0] + ir);
    double ci = 0.5 * (z[1] + ii);
    double dr = 0.5 * (z[0] - ir);
    double di = 0.5 * (z[1] - ii);
    double sr = di;
    double si = -dr;
    double xr = -2 * t * cr - mu;
    double xi = -2 * t * ci;
    java.util.Arrays.fill(h[0], 0);
    java.util.Arrays.fill(h[1], 0);
    for (int spin = 0; spin < 2; spin++) {
      int o = 2 * spin;
      set(h, o, o, xr, xi);
      set(h, o + 1, o + 1, -xr, -xi);
      // 2Δ sin k τ_y: (o, o+1) = −2iΔ s, (o+1, o) = +2iΔ s
      set(h, o, o + 1, 2 * delta * si, -2 * delta * sr);
      set(h, o + 1, o, -2 * delta * si, 2 * delta * sr);
    }
    for (int n = 0; n < 2; n++) {
      set(h, n, n + 2, 2 * lambda * sr, 2 * lambda * si);
      set(h, n + 2, n, 2 * lambda * sr, 2 * lambda * si);
    }
  }

  private static void set(double[][] h, int i, int j, double re, double im) {
    h[0][i * 4 + j] = re;
    h[1][i * 4 + j] = im;
  }
}
