package hopstat.invariant;

import static hopstat.invariant.TestRealisation.aRealisation;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import hopstat.lattice.Boundary;
import hopstat.linalg.PfaffianResult;
import hopstat.model.MajoranaForm;
import hopstat.task.SeedOps;
import java.util.random.RandomGenerator;
import org.ejml.data.DMatrixRMaj;
import org.ejml.data.ZMatrixRMaj;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.EigenDecomposition_F64;
import org.junit.jupiter.api.Test;

class MajoranaKernelTest {

  private final MajoranaWorkspace workspace = new MajoranaWorkspace();

  private int z2(TestRealisation r) {
    MajoranaNumberResult q =
        MajoranaKernel.majoranaNumber((MajoranaForm) r.model(), r.lattice(), r.build(), workspace);
    assertThat(q.q()).as("Majorana number defined").isNotZero();
    return q.q() == -1 ? 1 : 0;
  }

  @Test
  void cleanPwaveWireIsTopologicalIffMuBelowTwoT() {
    // Kitaev, Phys.-Usp. 44, 131 (2001): topological iff |μ| < 2|t| (Δ ≠ 0). Δ ≠ t included, since
    // a
    // slipped Pfaffian index still passes Δ = t (REFERENCE pitfall). L even: the periodic Pfaffian
    // changes sign exactly at |μ| = 2|t| (k = 0, π), the antiperiodic one never.
    double[][] tDelta = {{1, 1}, {1, 0.3}, {1, 2.5}, {-0.7, 0.4}, {1, -0.5}, {1.3, -2.0}};
    double[] muOverT = {-3, -2.1, -1.9, -1, -0.2, 0, 0.7, 1.5, 1.95, 2.05, 4};
    for (double[] td : tDelta) {
      for (double m : muOverT) {
        double mu = m * Math.abs(td[0]);
        int expected = Math.abs(mu) < 2 * Math.abs(td[0]) ? 1 : 0;
        TestRealisation r =
            aRealisation("pwave-wire")
                .with("mu", mu)
                .with("t", td[0])
                .with("delta", td[1])
                .size(40);
        assertThat(z2(r)).as("t=%s delta=%s mu=%s", td[0], td[1], mu).isEqualTo(expected);
      }
    }
  }

  @Test
  void pwaveWireAtDeltaEqualsTFollowsTheProductCriterion() {
    // Derived (REFERENCE; consistent with Motrunich, Damle, Huse, PRB 63, 224204 (2001)): at Δ = t
    // the
    // Majorana ring has Pf(A_±) = Π(−μ_j) ∓ Π(2t), so per realisation z2 = 1 ⇔ Σ ln|μ_j| < L
    // ln|2t|.
    // μ_j = mu + W u_j is regenerated from the seed exactly as onsite-box draws it (site order).
    // Parameters near ⟨ln|μ|⟩ = ln|2t| so that both outcomes occur.
    double[][] cases = {{1.0, 0.5, 10.0}, {-1.5, 0.0, 16.0}};
    int size = 24;
    for (double[] c : cases) {
      double t = c[0];
      int nonTrivial = 0;
      int trivial = 0;
      for (long seed = 1; seed <= 150; seed++) {
        TestRealisation r =
            aRealisation("pwave-wire")
                .with("mu", c[1])
                .with("t", t)
                .with("delta", t)
                .size(size)
                .disorder("onsite-box", c[2])
                .seed(seed);
        RandomGenerator random = SeedOps.generator(seed);
        double sumLog = 0;
        for (int j = 0; j < size; j++) {
          sumLog += Math.log(Math.abs(c[1] + c[2] * (random.nextDouble() - 0.5)));
        }
        int expected = sumLog < size * Math.log(Math.abs(2 * t)) ? 1 : 0;
        int actual = z2(r);
        assertThat(actual).as("t=%s seed=%d", t, seed).isEqualTo(expected);
        if (actual == 1) {
          nonTrivial++;
        } else {
          trivial++;
        }
      }
      assertThat(nonTrivial).as("both phases sampled").isGreaterThan(15);
      assertThat(trivial).as("both phases sampled").isGreaterThan(15);
    }
  }

  /**
   * Lyapunov exponent at E = 0 of the normal chain t'(ψ_{j+1} + ψ_{j−1}) + μ_j ψ_j = 0 with μ_j = W
   * u_j, by the renormalised transfer-matrix product over {@code steps} sites (common practice).
   */
  static double normalChainLyapunov(double w, double hopping, int steps) {
    java.util.SplittableRandom random = new java.util.SplittableRandom(99);
    double current = 1;
    double previous = 0;
    double sum = 0;
    for (int j = 0; j < steps; j++) {
      double mu = w * (random.nextDouble() - 0.5);
      double next = -(mu * current + hopping * previous) / hopping;
      previous = current;
      current = next;
      double norm = Math.hypot(current, previous);
      sum += Math.log(norm);
      current /= norm;
      previous /= norm;
    }
    return sum / steps;
  }

  @Test
  void disorderedWireWithDeltaBelowTFollowsTheLyapunovCriterion() {
    // REFERENCE (derived; consistent with DeGottardi, Sen, Vishveshwara, PRL 110, 146404 (2013)):
    // for 0 < Δ < t the wire is topological iff γ_N(0) < artanh(Δ/t), γ_N the Lyapunov exponent of
    // the normal chain with hopping √(t² − Δ²) and onsite μ_j. Here t = 1, Δ = 0.5, μ_j = W u_j.
    double t = 1.0;
    double delta = 0.5;
    double hopping = Math.sqrt(t * t - delta * delta);
    int steps = 200_000;
    // Check of the Lyapunov helper: band-centre anomaly γ(0) = (W/t')²/105.045 (Kappus & Wegner,
    // Z. Phys. B 45, 15 (1981), constant from memory, REFERENCE). At W = 1 the weak-disorder
    // formula holds to O(W⁴); 3% covers that and the statistical error of 2e5 steps.
    assertThat(normalChainLyapunov(1.0, hopping, steps))
        .isCloseTo(
            1.0 / (hopping * hopping * 105.045), within(0.03 / (hopping * hopping * 105.045)));
    double target = 0.5 * Math.log((t + delta) / (t - delta)); // artanh(Δ/t)
    double lo = 0.5;
    double hi = 20;
    for (int i = 0; i < 30; i++) {
      double mid = 0.5 * (lo + hi);
      if (normalChainLyapunov(mid, hopping, steps) < target) {
        lo = mid;
      } else {
        hi = mid;
      }
    }
    double critical = 0.5 * (lo + hi); // ≈ 7.14
    // Well inside each phase (0.7 W_c, 1.4 W_c) at L = 150 the ring is (non-)topological in all but
    // rare realisations (measured: 30/30 at 0.8 W_c, 0/30 at 1.25 W_c; 18/30 at W_c).
    int n = 20;
    int inside = 0;
    int outside = 0;
    for (long seed = 1; seed <= n; seed++) {
      inside +=
          z2(
              aRealisation("pwave-wire")
                  .with("mu", 0.0)
                  .with("t", t)
                  .with("delta", delta)
                  .size(150)
                  .disorder("onsite-box", 0.7 * critical)
                  .seed(seed));
      outside +=
          z2(
              aRealisation("pwave-wire")
                  .with("mu", 0.0)
                  .with("t", t)
                  .with("delta", delta)
                  .size(150)
                  .disorder("onsite-box", 1.4 * critical)
                  .seed(seed));
    }
    assertThat(inside).isGreaterThanOrEqualTo(n - 1);
    assertThat(outside).isLessThanOrEqualTo(1);
  }

  @Test
  void cleanIsingChainIsOrderedIffFieldBelowCoupling() {
    // Pfeuty, Ann. Phys. 57, 79 (1970): ordered iff |h| < |J|; z2 = 1 is the ordered phase.
    for (double coupling : new double[] {1.0, -0.8}) {
      for (double ratio : new double[] {0, 0.5, 0.95, -0.95, 1.05, -1.05, 2}) {
        double field = ratio * Math.abs(coupling);
        TestRealisation r =
            aRealisation("ising-chain").with("J", coupling).with("h", field).size(30);
        assertThat(z2(r))
            .as("J=%s h=%s", coupling, field)
            .isEqualTo(Math.abs(field) < Math.abs(coupling) ? 1 : 0);
      }
    }
  }

  @Test
  void randomIsingChainIsOrderedIffSumLogFieldBelowSumLogCoupling() {
    // Derived (same ring argument as Δ = t): Pf(A_±) = Π(−2h_j) ∓ Π(−2J_j) over all L sites and the
    // L bonds of the ring, so z2 = 1 ⇔ Σ ln|h_j| < Σ ln|J_j| per realisation, exactly; this is the
    // finite-ring form of Fisher's criterion (PRB 51, 6411 (1995)). Draws: field-box (L, site
    // order)
    // then coupling-box (L bonds, closing bond last).
    int size = 20;
    int ordered = 0;
    int disordered = 0;
    for (long seed = 1; seed <= 150; seed++) {
      TestRealisation r =
          aRealisation("ising-chain")
              .with("J", 1.0)
              .with("h", 1.0)
              .size(size)
              .disorder("field-box", 1.4)
              .disorder("coupling-box", 1.0)
              .seed(seed);
      RandomGenerator random = SeedOps.generator(seed);
      double sumLogH = 0;
      for (int j = 0; j < size; j++) {
        sumLogH += Math.log(Math.abs(1.0 + 1.4 * (random.nextDouble() - 0.5)));
      }
      double sumLogJ = 0;
      for (int j = 0; j < size; j++) {
        sumLogJ += Math.log(Math.abs(1.0 + 1.0 * (random.nextDouble() - 0.5)));
      }
      int expected = sumLogH < sumLogJ ? 1 : 0;
      int actual = z2(r);
      assertThat(actual).as("seed %d", seed).isEqualTo(expected);
      if (actual == 1) {
        ordered++;
      } else {
        disordered++;
      }
    }
    assertThat(ordered).isGreaterThan(15);
    assertThat(disordered).isGreaterThan(15);
  }

  /** REFERENCE (derived): ⟨ln|a + W u|⟩ for u uniform in [−1/2, 1/2]. */
  static double meanLogAbs(double a, double w) {
    double p = a + w / 2;
    double m = a - w / 2;
    return (xLogAbsX(p) - xLogAbsX(m)) / w - 1;
  }

  private static double xLogAbsX(double x) {
    return x == 0 ? 0 : x * Math.log(Math.abs(x));
  }

  @Test
  void randomIsingEnsembleTransitionAtEqualMeanLogs() {
    // Fisher, PRB 51, 6411 (1995): the random transverse-field Ising chain orders iff [ln h] < [ln
    // J].
    // J = 1 clean, h_j = h + 2u_j: the critical h solves ⟨ln|h + 2u|⟩ = 0 (closed form above,
    // bisection). Well inside each phase (h_c ∓ 0.4) at L = 120 the ordered fraction must be ~1 /
    // ~0:
    // Σ(ln h − ln J) has mean ∓0.3·L ≈ ∓36 against a spread ≈ √L·0.6 ≈ 7.
    double lo = 1.0;
    double hi = 2.0;
    assertThat(meanLogAbs(lo, 2)).isNegative();
    assertThat(meanLogAbs(hi, 2)).isPositive();
    for (int i = 0; i < 60; i++) {
      double mid = 0.5 * (lo + hi);
      if (meanLogAbs(mid, 2) < 0) {
        lo = mid;
      } else {
        hi = mid;
      }
    }
    double critical = 0.5 * (lo + hi);
    for (double shift : new double[] {-0.4, 0.4}) {
      int ordered = 0;
      int n = 30;
      for (long seed = 1; seed <= n; seed++) {
        ordered +=
            z2(
                aRealisation("ising-chain")
                    .with("J", 1.0)
                    .with("h", critical + shift)
                    .size(120)
                    .disorder("field-box", 2.0)
                    .seed(seed));
      }
      if (shift < 0) {
        assertThat(ordered)
            .as("ordered side, h = %s", critical + shift)
            .isGreaterThanOrEqualTo(n - 1);
      } else {
        assertThat(ordered).as("disordered side, h = %s", critical + shift).isLessThanOrEqualTo(1);
      }
    }
  }

  @Test
  void clusterParityMatchesManyBodyGroundState() {
    // Source-free: the parity of the many-body ground state, found by exact diagonalisation of the
    // 2^L Fock space sector by sector, against sign Pf(A) (Kitaev 2001 convention, + = even).
    int size = 4;
    int odd = 0;
    for (long seed = 1; seed <= 16; seed++) {
      TestRealisation r =
          aRealisation("majorana-cluster")
              .with("mu", 0.3)
              .size(size)
              .boundary(Boundary.OPEN)
              .disorder("majorana-gauss", 1.0)
              .seed(seed);
      var terms = r.build();
      PfaffianResult pf =
          MajoranaKernel.groundStateParity((MajoranaForm) r.model(), r.lattice(), terms, workspace);
      ZMatrixRMaj h = new ZMatrixRMaj(1, 1);
      terms.toDense(h);
      double even = groundEnergy(h, size, 0);
      double oddEnergy = groundEnergy(h, size, 1);
      assertThat(Math.abs(even - oddEnergy)).as("non-degenerate").isGreaterThan(1e-6);
      int expected = oddEnergy < even ? 1 : 0;
      assertThat(pf.sign() < 0 ? 1 : 0).as("seed %d", seed).isEqualTo(expected);
      odd += expected;
    }
    assertThat(odd).as("both parities sampled").isBetween(2, 14);
  }

  @Test
  void clusterWithLargeChemicalPotentialIsFilled() {
    // Derived: for μ ≫ W every mode is occupied, parity = L mod 2.
    for (int size : new int[] {4, 5}) {
      TestRealisation r =
          aRealisation("majorana-cluster")
              .with("mu", 3.0)
              .size(size)
              .boundary(Boundary.OPEN)
              .disorder("majorana-gauss", 0.05)
              .seed(3);
      PfaffianResult pf =
          MajoranaKernel.groundStateParity(
              (MajoranaForm) r.model(), r.lattice(), r.build(), workspace);
      assertThat(pf.sign()).isEqualTo(size % 2 == 0 ? 1 : -1);
    }
  }

  /**
   * Lowest eigenvalue of H = ½ Σ_pq Ψ†_p H_pq Ψ_q in the Fock sector of the given parity
   * (Jordan–Wigner c_s on bit s), via the real form [[R, −I], [I, R]] of the Hermitian block.
   */
  static double groundEnergy(ZMatrixRMaj bdg, int modes, int parity) {
    int dim = 1 << modes;
    double[][][] c = new double[modes][dim][dim];
    for (int s = 0; s < modes; s++) {
      for (int state = 0; state < dim; state++) {
        if (((state >> s) & 1) == 1) {
          int below = Integer.bitCount(state & ((1 << s) - 1));
          c[s][state ^ (1 << s)][state] = below % 2 == 0 ? 1 : -1;
        }
      }
    }
    double[][] re = new double[dim][dim];
    double[][] im = new double[dim][dim];
    for (int p = 0; p < 2 * modes; p++) {
      for (int q = 0; q < 2 * modes; q++) {
        double hr = bdg.getReal(p, q);
        double hi = bdg.getImag(p, q);
        if (hr == 0 && hi == 0) {
          continue;
        }
        // Ψ_p = c_s (p even) or c†_s (p odd); Ψ†_p the adjoint.
        double[][] left = p % 2 == 0 ? transpose(c[p / 2]) : c[p / 2];
        double[][] right = q % 2 == 0 ? c[q / 2] : transpose(c[q / 2]);
        double[][] prod = multiply(left, right);
        for (int i = 0; i < dim; i++) {
          for (int j = 0; j < dim; j++) {
            re[i][j] += 0.5 * hr * prod[i][j];
            im[i][j] += 0.5 * hi * prod[i][j];
          }
        }
      }
    }
    int[] sector = new int[dim / 2];
    int k = 0;
    for (int state = 0; state < dim; state++) {
      if (Integer.bitCount(state) % 2 == parity) {
        sector[k++] = state;
      }
    }
    int n = sector.length;
    DMatrixRMaj real = new DMatrixRMaj(2 * n, 2 * n);
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        double r = re[sector[i]][sector[j]];
        double m = im[sector[i]][sector[j]];
        real.set(i, j, r);
        real.set(i + n, j + n, r);
        real.set(i, j + n, -m);
        real.set(i + n, j, m);
      }
    }
    EigenDecomposition_F64<DMatrixRMaj> eig = DecompositionFactory_DDRM.eig(2 * n, false, true);
    assertThat(eig.decompose(real)).isTrue();
    double min = Double.POSITIVE_INFINITY;
    for (int i = 0; i < 2 * n; i++) {
      min = Math.min(min, eig.getEigenvalue(i).real);
    }
    return min;
  }

  private static double[][] transpose(double[][] a) {
    int n = a.length;
    double[][] t = new double[n][n];
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        t[j][i] = a[i][j];
      }
    }
    return t;
  }

  private static double[][] multiply(double[][] a, double[][] b) {
    int n = a.length;
    double[][] c = new double[n][n];
    for (int i = 0; i < n; i++) {
      for (int k = 0; k < n; k++) {
        if (a[i][k] == 0) {
          continue;
        }
        for (int j = 0; j < n; j++) {
          c[i][j] += a[i][k] * b[k][j];
        }
      }
    }
    return c;
  }
}
