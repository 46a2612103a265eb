package hopstat.model;

import org.ejml.data.ZMatrixRMaj;

/**
 * The diii-wire's 4 × 4 Bloch Hamiltonian written down from its physics form, independently of the
 * model's real-space entries (derived):
 *
 * <pre>  H(k) = ξ_k (1 ⊗ τ_z) + 2Δ sin k (1 ⊗ τ_y) + 2λ sin k (s_x ⊗ 1),  ξ_k = −2t cos k − μ,</pre>
 *
 * orbital order (↑p, ↑h, ↓p, ↓h), Bloch convention c_j = Σ_k e^{ikj} c_k. Eigenvalues (derived, s_x
 * commutes with the τ terms): ±2λ sin k ± √(ξ_k² + 4Δ² sin²k).
 */
public final class DiiiWireBloch {

  private DiiiWireBloch() {}

  /** H(k) as above. */
  public static ZMatrixRMaj hamiltonian(double k, double mu, double t, double delta, double lambda) {
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
  public static double[] closedFormEnergies(double k, double mu, double t, double delta, double lambda) {
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
}
