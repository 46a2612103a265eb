package hopstat.localisation;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.data.Offset.offset;

import hopstat.lattice.Boundary;
import hopstat.linalg.LinalgFactory;
import hopstat.model.DiiiWireBloch;
import hopstat.model.ModelCatalog;
import hopstat.model.ParameterValues;
import java.util.Map;
import java.util.SplittableRandom;
import org.ejml.data.ZMatrixRMaj;
import org.junit.jupiter.api.Test;

class GreenRecursionKernelTest {

  private final GreenRecursionWorkspace workspace =
      new GreenRecursionWorkspace(LinalgFactory.preferred());

  /**
   * Kitaev wire slice in the BdG basis (c_j, c†_j) of {@code PWaveWireModel}: H_j = diag(−μ_j,
   * μ_j), T = H_{j+1,j} = [[−t, Δ], [−Δ, t]] (from H_BdG entries (j p, j+1 p) = −t, (j h, j+1 h) =
   * +t, (j+1 p, j h) = +Δ, (j p, j+1 h) = −Δ, Hermitian conjugate for the lower block). Singular
   * for Δ = t.
   */
  private static void wireSlice(double mu, double t, double delta, ZMatrixRMaj h, ZMatrixRMaj c) {
    h.set(0, 0, -mu, 0);
    h.set(1, 1, mu, 0);
    c.set(0, 0, -t, 0);
    c.set(1, 1, t, 0);
    c.set(0, 1, delta, 0);
    c.set(1, 0, -delta, 0);
  }

  /**
   * Δ = t, E = 0, random μ_j = μ + W u_j: the BdG equations split into two Majorana chains with
   * α_{j+1} = (μ_j/2t) α_j (derived from H = (i/2) Σ [−μ_j a_j b_j + 2t b_j a_{j+1}],
   * REFERENCE.md), so over the counted slices γ = |mean ln|μ_j| − ln|2t|| up to boundary terms
   * O(1/N) (criterion of Motrunich, Damle, Huse, PRB 63, 224204 (2001)). The μ_j used are recorded
   * and averaged over the same slices the kernel counts (after its warm-up). Tolerance 2/N_counted
   * for the two end terms. Both phases: mean μ = 1 (topological, ‖G_1N‖ grows) and mean μ = 3
   * (trivial, it decays).
   */
  @Test
  void kitaevWireAtDeltaEqualsTMatchesTheMajoranaRecursion() {
    for (double mean : new double[] {1.0, 3.0}) {
      SplittableRandom rng = new SplittableRandom(11);
      double[] logs = new double[40_000];
      int[] n = {0};
      double w = 1.5;
      LyapunovResult r =
          GreenRecursionKernel.run(
              2,
              new LyapunovSpec(0.0, 0.0, 20_000),
              (h, c) -> {
                double mu = mean + w * (rng.nextDouble() - 0.5);
                logs[n[0]++] = Math.log(Math.abs(mu));
                wireSlice(mu, 1.0, 1.0, h, c);
              },
              workspace);
      int warm = 64; // max(64, 10 K) for K = 2
      double s = 0;
      for (int j = warm; j < n[0]; j++) {
        s += logs[j];
      }
      double expected = Math.abs(s / (n[0] - warm) - Math.log(2.0));
      assertThat(r.slices()).isEqualTo(20_000);
      assertThat(r.smallestPositive()).isCloseTo(expected, offset(2.0 / (n[0] - warm) * 10));
    }
  }

  /**
   * Clean wire, E = 0, Δ ≠ t: a zero mode Σ α_j a_j needs (Δ + t) λ² ± μ λ + (t − Δ) = 0 for α_j =
   * λ^j (derived from the Majorana form above); the b-chain has the inverse roots. γ = min |ln|λ||.
   * μ = 1, t = 1, Δ = 0.5: complex roots, |λ|² = (t − Δ)/(t + Δ) = 1/3, γ = ln 3 / 2. μ = 1.8: real
   * roots (1.8 ± √0.24)/3, γ = −ln((1.8 + √0.24)/3). μ = 3 (trivial): (3 ± √6)/3, smaller |ln| from
   * the root nearer 1. A slipped sign or row in T changes these.
   */
  @Test
  void cleanWireAwayFromDeltaEqualsTFollowsTheCharacteristicRoots() {
    double[][] cases = {{1.0, 0.5}, {1.8, 0.5}, {3.0, 0.5}};
    for (double[] c : cases) {
      double mu = c[0];
      double delta = c[1];
      double disc = mu * mu - 4 * (1 - delta * delta);
      double expected;
      if (disc < 0) {
        expected = 0.5 * Math.abs(Math.log((1 - delta) / (1 + delta)));
      } else {
        double l1 = Math.abs((mu + Math.sqrt(disc)) / (2 * (1 + delta)));
        double l2 = Math.abs((mu - Math.sqrt(disc)) / (2 * (1 + delta)));
        expected = Math.min(Math.abs(Math.log(l1)), Math.abs(Math.log(l2)));
      }
      LyapunovResult r =
          GreenRecursionKernel.run(
              2,
              new LyapunovSpec(0.0, 1e-9, 4_000),
              (h, t) -> wireSlice(mu, 1.0, delta, h, t),
              workspace);
      assertThat(r.smallestPositive())
          .as("mu %s delta %s", mu, delta)
          .isCloseTo(expected, offset(2e-3 * expected + 5.0 / r.slices()));
    }
  }

  /**
   * The Green's-function engine against the real transfer-matrix kernel on the same disordered
   * anderson strip (M = 3 open, W = 4, E = 0.3; the identical draws in the same slice order): the
   * two estimators of one realisation differ by boundary terms only, so they must agree within the
   * combined stated errors (3σ).
   */
  @Test
  void agreesWithTheTransferMatrixKernelOnADisorderedStrip() {
    int m = 3;
    double w = 4.0;
    LyapunovSpec spec = new LyapunovSpec(0.3, 0.02, 2_000_000);
    SplittableRandom a = new SplittableRandom(5);
    LyapunovResult tm =
        TransferMatrixKernel.run(
            new double[] {-1, 0, 0, 0, -1, 0, 0, 0, -1},
            m,
            spec,
            h -> {
              h.addHopping(0, 1, -1, 0);
              h.addHopping(1, 2, -1, 0);
              for (int i = 0; i < m; i++) {
                h.addOnsite(i, w * (a.nextDouble() - 0.5));
              }
            },
            new TransferMatrixWorkspace());
    SplittableRandom b = new SplittableRandom(5);
    LyapunovResult rgf =
        GreenRecursionKernel.run(
            m,
            spec,
            (h, t) -> {
              h.set(0, 1, -1, 0);
              h.set(1, 0, -1, 0);
              h.set(1, 2, -1, 0);
              h.set(2, 1, -1, 0);
              for (int i = 0; i < m; i++) {
                h.set(i, i, w * (b.nextDouble() - 0.5), 0);
                t.set(i, i, -1, 0);
              }
            },
            workspace);
    assertThat(tm.converged()).isTrue();
    assertThat(rgf.converged()).isTrue();
    double sigma =
        Math.hypot(
            tm.relativeError() * tm.smallestPositive(),
            rgf.relativeError() * rgf.smallestPositive());
    assertThat(rgf.smallestPositive()).isCloseTo(tm.smallestPositive(), offset(3 * sigma));
  }

  private static LyapunovResult disorderedStrip(int m, GreenRecursionWorkspace ws) {
    SplittableRandom rng = new SplittableRandom(11L * m);
    return GreenRecursionKernel.run(
        m,
        new LyapunovSpec(0.5, 0.0, 2_000),
        (h, t) -> {
          for (int i = 0; i + 1 < m; i++) {
            h.set(i, i + 1, -1, 0.1);
            h.set(i + 1, i, -1, -0.1);
          }
          for (int i = 0; i < m; i++) {
            h.set(i, i, 4 * (rng.nextDouble() - 0.5), 0);
            t.set(i, i, -1, 0);
          }
          t.set(0, m - 1, 0.3, 0.2);
        },
        ws);
  }

  /**
   * Bit-for-bit reproducibility (common practice for this tool, see design notes): the same complex
   * strip gives identical bits in a fresh workspace and in one that has first run a strip of
   * another width (the workspace swaps its blocks internally, which must leave no history).
   */
  @Test
  void sameInputGivesTheSameBitsWhateverTheWorkspaceHistory() {
    LyapunovResult fresh =
        disorderedStrip(4, new GreenRecursionWorkspace(LinalgFactory.preferred()));
    GreenRecursionWorkspace used = new GreenRecursionWorkspace(LinalgFactory.preferred());
    disorderedStrip(4, used);
    disorderedStrip(6, used);
    LyapunovResult again = disorderedStrip(4, used);
    assertThat(fresh.smallestPositive()).isPositive();
    assertThat(Double.doubleToRawLongBits(again.smallestPositive()))
        .isEqualTo(Double.doubleToRawLongBits(fresh.smallestPositive()));
    assertThat(Double.doubleToRawLongBits(again.relativeError()))
        .isEqualTo(Double.doubleToRawLongBits(fresh.relativeError()));
    assertThat(again.slices()).isEqualTo(fresh.slices());
  }

  /**
   * Band-centre anomaly of the 1D Anderson chain through the Green's-function engine: γ(0) =
   * W²/105.045 (Kappus &amp; Wegner, Z. Phys. B 45, 15 (1981) — constant from memory,
   * REFERENCE.md). W = 1.5, 2 % target; tolerance 3 × error + 3 % (weak-disorder corrections), as
   * the transfer-matrix test.
   */
  @Test
  void bandCentreChainFollowsKappusWegner() {
    SplittableRandom rng = new SplittableRandom(3);
    double w = 1.5;
    LyapunovResult r =
        GreenRecursionKernel.run(
            1,
            new LyapunovSpec(0.0, 0.02, 5_000_000),
            (h, t) -> {
              h.set(0, 0, w * (rng.nextDouble() - 0.5), 0);
              t.set(0, 0, -1, 0);
            },
            workspace);
    double expected = w * w / 105.045;
    assertThat(r.converged()).isTrue();
    assertThat(r.smallestPositive())
        .isCloseTo(expected, offset(expected * (3 * r.relativeError() + 0.03)));
  }

  /**
   * diii-wire slices cut by {@link BarSliceOps} from the model's own clean Hamiltonian (Δ = t = 1).
   */
  private static BarSlices diiiSlices(double mu, double lambda) {
    return BarSliceOps.extract(
        ModelCatalog.find("diii-wire").orElseThrow(),
        new ParameterValues(Map.of("mu", mu, "t", 1.0, "delta", 1.0, "lambda", lambda)),
        1,
        Boundary.OPEN);
  }

  /**
   * diii-wire (class DIII, K = 4, a Kramers pair of Majorana zero modes per end) at λ = 0, Δ = t, E
   * = 0 with random μ_j = μ + W u_j (onsite, both spins): the two spin blocks are Kitaev chains, so
   * γ = |⟨ln|μ_j|⟩ − ln|2t|| (derived Majorana recursion as above; criterion of Motrunich, Damle,
   * Huse, PRB 63, 224204 (2001)), averaged over the counted slices. Both phases (μ = 0.5
   * topological, μ = 3 trivial). Tolerance 20/N_counted for the boundary terms, as above.
   */
  @Test
  void diiiWireWithoutSpinOrbitIsTwoKitaevChains() {
    for (double mean : new double[] {0.5, 3.0}) {
      BarSlices bar = diiiSlices(mean, 0.0);
      SplittableRandom rng = new SplittableRandom(7);
      double[] logs = new double[20_000];
      int[] n = {0};
      double w = 1.0;
      LyapunovResult r =
          GreenRecursionKernel.run(
              4,
              new LyapunovSpec(0.0, 0.0, 12_000),
              (h, c) -> {
                double v = w * (rng.nextDouble() - 0.5);
                bar.copyOnSlice(h);
                bar.copyCoupling(c);
                for (int o = 0; o < 4; o++) {
                  h.set(o, o, h.getReal(o, o) + (o % 2 == 0 ? -v : v), 0);
                }
                logs[n[0]++] = Math.log(Math.abs(mean + v));
              },
              workspace);
      int warm = 64; // max(64, 10 K) for K = 4
      double s = 0;
      for (int j = warm; j < n[0]; j++) {
        s += logs[j];
      }
      double expected = Math.abs(s / (n[0] - warm) - Math.log(2.0));
      assertThat(r.smallestPositive())
          .as("mu %s", mean)
          .isCloseTo(expected, offset(20.0 / (n[0] - warm)));
    }
  }

  /**
   * Clean diii-wire at E = 0 with spin–orbit coupling λ ≠ 0 (the case that used to break down): γ
   * is the slowest evanescent decay of the 4 × 4 Bloch problem, from the roots of det H(z) = 0, z =
   * e^{ik} continued off the unit circle, with H(k) = ξ_k τ_z + 2Δ sin k τ_y + 2λ sin k s_x, ξ_k =
   * −2t cos k − μ (derived; Bloch form independent of the model's real-space entries and of the
   * kernel: {@link DiiiWireBloch#continued}, {@link EvanescentRoots}). Topological (|μ| &lt; 2t)
   * and trivial points. A deterministic clean run: tolerance 2e-3 γ + 5/N as in the Kitaev test
   * above.
   */
  @Test
  void cleanDiiiWireWithSpinOrbitFollowsTheBlochRoots() {
    double[][] cases = {{0.5, 0.3}, {1.0, 0.6}, {-1.2, 0.8}, {3.0, 0.3}};
    for (double[] c : cases) {
      double mu = c[0];
      double lambda = c[1];
      double expected =
          EvanescentRoots.slowestDecay(
              4, (z, h) -> DiiiWireBloch.continued(z, mu, 1.0, 1.0, lambda, h));
      BarSlices bar = diiiSlices(mu, lambda);
      LyapunovResult r =
          GreenRecursionKernel.run(
              4,
              new LyapunovSpec(0.0, 1e-9, 4_000),
              (h, t) -> {
                bar.copyOnSlice(h);
                bar.copyCoupling(t);
              },
              workspace);
      assertThat(expected).isFinite().isPositive();
      assertThat(r.smallestPositive())
          .as("mu %s lambda %s", mu, lambda)
          .isCloseTo(expected, offset(2e-3 * expected + 5.0 / r.slices()));
    }
  }

  /**
   * Two SSH chains (class BDI) side by side, K = 4 (A1, B1, A2, B2), E = 0, random bonds v_{i,n} =
   * v_i + W u, w_{i,n} = w_i + W u: each channel has γ_i = |⟨ln|w_i|⟩ − ⟨ln|v_i|⟩| (derived: the E
   * = 0 equations of a bipartite chain give ψ_A(n+1) = −(v_n/w_n) ψ_A(n); criterion of
   * Mondragon-Shem, Hughes, Song, Prodan, PRL 113, 046802 (2014)), and the smallest positive
   * exponent is the smaller γ_i (derived: decoupled channels). Winding 2 (both chains topological,
   * two zero modes per end with different decay lengths) and a mixed pair (one topological, one
   * trivial, the trivial one slower): in both an end-to-end growth rate would report the faster
   * topological channel. Tolerance 20/N_counted for the boundary terms.
   */
  @Test
  void twoSshChainsGiveTheSlowerChannelWhateverTheirWinding() {
    double[][] cases = {{0.3, 1.0, 0.7, 1.0}, {0.3, 1.0, 1.4, 1.0}};
    for (double[] c : cases) {
      SplittableRandom rng = new SplittableRandom(13);
      double w = 0.2;
      double[][] logs = new double[4][12_000];
      int[] n = {0};
      LyapunovResult r =
          GreenRecursionKernel.run(
              4,
              new LyapunovSpec(0.0, 0.0, 8_000),
              (h, t) -> {
                for (int ch = 0; ch < 2; ch++) {
                  double v = c[2 * ch] + w * (rng.nextDouble() - 0.5);
                  double hop = c[2 * ch + 1] + w * (rng.nextDouble() - 0.5);
                  int a = 2 * ch;
                  h.set(a, a + 1, v, 0);
                  h.set(a + 1, a, v, 0);
                  t.set(a, a + 1, hop, 0); // A of slice n+1 to B of slice n
                  logs[2 * ch][n[0]] = Math.log(Math.abs(v));
                  logs[2 * ch + 1][n[0]] = Math.log(Math.abs(hop));
                }
                n[0]++;
              },
              workspace);
      int warm = 64;
      double expected = Double.POSITIVE_INFINITY;
      for (int ch = 0; ch < 2; ch++) {
        double s = 0;
        for (int j = warm; j < n[0]; j++) {
          s += logs[2 * ch + 1][j] - logs[2 * ch][j];
        }
        expected = Math.min(expected, Math.abs(s / (n[0] - warm)));
      }
      assertThat(r.smallestPositive())
          .as("v/w %s", java.util.Arrays.toString(c))
          .isCloseTo(expected, offset(20.0 / (n[0] - warm)));
    }
  }

  /**
   * Two clean SSH chains coupled by BDI-preserving A–B hoppings (u inside a cell, u' between
   * cells), so the channels mix, both topological (winding 2): γ = the slowest evanescent root of
   * det[H + T/z + T† z] = 0 (derived, {@link EvanescentRoots}). Tolerance as in the clean wire
   * tests.
   */
  @Test
  void coupledSshChainsWithWindingTwoFollowTheBlochRoots() {
    double v1 = 0.3;
    double w1 = 1.0;
    double v2 = 0.5;
    double w2 = 1.2;
    double u = 0.15;
    double up = 0.1;
    double[] hm = new double[16];
    double[] tm = new double[16];
    hm[0 * 4 + 1] = v1;
    hm[1 * 4 + 0] = v1;
    hm[2 * 4 + 3] = v2;
    hm[3 * 4 + 2] = v2;
    hm[0 * 4 + 3] = u;
    hm[3 * 4 + 0] = u;
    tm[0 * 4 + 1] = w1;
    tm[2 * 4 + 3] = w2;
    tm[2 * 4 + 1] = up;
    double expected =
        EvanescentRoots.slowestDecay(
            4,
            (z, h) -> {
              double n2 = z[0] * z[0] + z[1] * z[1];
              for (int i = 0; i < 4; i++) {
                for (int j = 0; j < 4; j++) {
                  // H + T/z + T† z (T real)
                  h[0][i * 4 + j] =
                      hm[i * 4 + j] + tm[i * 4 + j] * z[0] / n2 + tm[j * 4 + i] * z[0];
                  h[1][i * 4 + j] = -tm[i * 4 + j] * z[1] / n2 + tm[j * 4 + i] * z[1];
                }
              }
            });
    LyapunovResult r =
        GreenRecursionKernel.run(
            4,
            new LyapunovSpec(0.0, 1e-9, 4_000),
            (h, t) -> {
              for (int i = 0; i < 4; i++) {
                for (int j = 0; j < 4; j++) {
                  h.set(i, j, hm[i * 4 + j], 0);
                  t.set(i, j, tm[i * 4 + j], 0);
                }
              }
            },
            workspace);
    assertThat(expected).isFinite().isPositive();
    assertThat(r.smallestPositive())
        .isCloseTo(expected, offset(2e-3 * expected + 5.0 / r.slices()));
  }

  /** Decoupled slices (T = 0): G_1N = 0, a recorded failure (NaN), not an exception. */
  @Test
  void decoupledSlicesAreAFailureOutcome() {
    LyapunovResult r =
        GreenRecursionKernel.run(
            2,
            new LyapunovSpec(0.1, 0.01, 1_000),
            (h, t) -> {
              h.set(0, 0, 1, 0);
              h.set(1, 1, -1, 0);
            },
            workspace);
    assertThat(r.converged()).isFalse();
    assertThat(r.smallestPositive()).isNaN();
  }
}
