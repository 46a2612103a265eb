package hopstat.disorder;

import static hopstat.invariant.TestRealisation.aRealisation;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import hopstat.invariant.TestRealisation;
import hopstat.lattice.Boundary;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.linalg.HermitianEigenSolver;
import hopstat.linalg.LinalgFactory;
import hopstat.linalg.LinalgKind;
import hopstat.model.Model;
import hopstat.model.ModelCatalog;
import hopstat.model.Symmetry;
import hopstat.model.SymmetryCheckKernel;
import hopstat.model.SymmetryCheckResult;
import hopstat.model.SymmetryClass;
import hopstat.task.SeedOps;
import hopstat.task.SymmetryCheckOps;
import hopstat.task.SymmetryCheckReport;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.random.RandomGenerator;
import org.ejml.data.ZMatrixRMaj;
import org.junit.jupiter.api.Test;

/** {@code bond-phase}: random hopping phases on the chiral chain (class AIII realisations). */
class BondPhaseDisorderTest {

  private static final double TWO_PI = 2.0 * Math.PI;

  private static ZMatrixRMaj dense(HamiltonianBuilder terms) {
    ZMatrixRMaj h = new ZMatrixRMaj(1, 1);
    terms.toDense(h);
    return h;
  }

  private static double re(ZMatrixRMaj h, int i, int j) {
    return h.data[2 * (i * h.numCols + j)];
  }

  private static double im(ZMatrixRMaj h, int i, int j) {
    return h.data[2 * (i * h.numCols + j) + 1];
  }

  /**
   * Documented convention (direct check): replaying the generator, H[A_j][B_j] = v e^{iθ_j} and
   * H[A_{j+1}][B_j] = w e^{iθ'_j}, θ = W(u − 1/2), drawn cell by cell, intracell first; the open
   * chain has L − 1 intercell bonds, so 2L − 1 draws.
   */
  @Test
  void phasesFollowTheDocumentedConventionAndDrawOrder() {
    double width = 2.5;
    int size = 7;
    TestRealisation realisation =
        aRealisation("ssh")
            .with("v", 0.6)
            .with("w", -1.1)
            .size(size)
            .boundary(Boundary.OPEN)
            .seed(11)
            .disorder("bond-phase", width);
    ZMatrixRMaj h = dense(realisation.build());
    RandomGenerator replay = SeedOps.generator(11);
    for (int j = 0; j < size; j++) {
      double alpha = width * (replay.nextDouble() - 0.5);
      assertThat(re(h, 2 * j, 2 * j + 1)).isCloseTo(0.6 * Math.cos(alpha), within(1e-14));
      assertThat(im(h, 2 * j, 2 * j + 1)).isCloseTo(0.6 * Math.sin(alpha), within(1e-14));
      if (j < size - 1) {
        double beta = width * (replay.nextDouble() - 0.5);
        assertThat(re(h, 2 * j + 2, 2 * j + 1)).isCloseTo(-1.1 * Math.cos(beta), within(1e-14));
        assertThat(im(h, 2 * j + 2, 2 * j + 1)).isCloseTo(-1.1 * Math.sin(beta), within(1e-14));
      }
    }
    // Hermitian conjugate entries follow.
    assertThat(im(h, 1, 0)).isCloseTo(-im(h, 0, 1), within(1e-15));
  }

  /**
   * Option bonds = intercell leaves the intracell hoppings real; the phase multiplies the hopping
   * accumulated so far, so after bond-box the modulus is |w + W u| exactly (derived: |e^{iθ}| = 1).
   */
  @Test
  void phaseAfterBondBoxKeepsTheModulusOfEveryHopping() {
    Map<String, String> inter = Map.of("bonds", "intercell");
    HamiltonianBuilder real =
        aRealisation("ssh")
            .with("v", 0.8)
            .size(9)
            .boundary(Boundary.OPEN)
            .seed(5)
            .disorder("bond-box", 1.3)
            .build();
    HamiltonianBuilder complex =
        aRealisation("ssh")
            .with("v", 0.8)
            .size(9)
            .boundary(Boundary.OPEN)
            .seed(5)
            .disorder("bond-box", 1.3)
            .disorder("bond-phase", TWO_PI, inter)
            .build();
    ZMatrixRMaj a = dense(real);
    ZMatrixRMaj b = dense(complex);
    double largestIm = 0;
    for (int i = 0; i < 18; i++) {
      for (int j = 0; j < 18; j++) {
        assertThat(Math.hypot(re(b, i, j), im(b, i, j)))
            .isCloseTo(Math.hypot(re(a, i, j), im(a, i, j)), within(1e-14));
        largestIm = Math.max(largestIm, Math.abs(im(b, i, j)));
      }
      if (i % 2 == 0) {
        assertThat(im(b, i, i + 1)).as("intracell bond %d stays real", i / 2).isZero();
      }
    }
    assertThat(largestIm).as("the phases are really complex").isGreaterThan(0.1);
  }

  /**
   * Periodic ring (derived): every set of bond phases is gauge-equivalent to a uniform flux Φ = Σ_j
   * (θ'_j − θ_j) through the ring, so the spectrum is ±|v + w e^{i(2πm + Φ)/L}|, m = 0..L−1
   * (Bloch's theorem with a twisted boundary condition). A dropped imaginary part or a missed wrap
   * bond would change it; the zero-flux spectrum is checked to differ, so the test can fail.
   */
  @Test
  void ringSpectrumIsTheBlochSpectrumShiftedByTheTotalFlux() {
    int size = 12;
    double v = 0.7;
    double w = 1.2;
    long seed = 23;
    ZMatrixRMaj h =
        dense(
            aRealisation("ssh")
                .with("v", v)
                .with("w", w)
                .size(size)
                .boundary(Boundary.PERIODIC)
                .seed(seed)
                .disorder("bond-phase", TWO_PI)
                .build());
    RandomGenerator replay = SeedOps.generator(seed);
    double flux = 0;
    for (int j = 0; j < size; j++) {
      flux -= TWO_PI * (replay.nextDouble() - 0.5);
      flux += TWO_PI * (replay.nextDouble() - 0.5);
    }
    double[] expected = blochSpectrum(v, w, size, flux);
    double[] actual = new double[2 * size];
    HermitianEigenSolver solver = LinalgFactory.create(LinalgKind.JAVA).newHermitianEigenSolver();
    assertThat(solver.eigenvalues(h, actual)).isTrue();
    for (int k = 0; k < 2 * size; k++) {
      assertThat(actual[k]).as("level %d", k).isCloseTo(expected[k], within(1e-10));
    }
    double[] zeroFlux = blochSpectrum(v, w, size, 0.0);
    double difference = 0;
    for (int k = 0; k < 2 * size; k++) {
      difference = Math.max(difference, Math.abs(zeroFlux[k] - expected[k]));
    }
    assertThat(difference).as("this seed's flux changes the spectrum").isGreaterThan(1e-3);
  }

  private static double[] blochSpectrum(double v, double w, int size, double flux) {
    double[] e = new double[2 * size];
    for (int m = 0; m < size; m++) {
      double k = (TWO_PI * m + flux) / size;
      double modulus = Math.hypot(v + w * Math.cos(k), w * Math.sin(k));
      e[2 * m] = modulus;
      e[2 * m + 1] = -modulus;
    }
    Arrays.sort(e);
    return e;
  }

  /**
   * Symmetry bookkeeping: BDI restricted to S alone is AIII (Altland &amp; Zirnbauer, PRB 55, 1142
   * (1997); Schnyder et al., PRB 78, 195125 (2008): the chiral class without T and C). The built
   * realisation satisfies the declared S = diag(1, −1) and violates T = K and C = S·K when they are
   * claimed.
   */
  @Test
  void keepsOnlyTheChiralSymmetryAndTheCheckCatchesAClaimedTimeReversal() {
    Model ssh = ModelCatalog.find("ssh").orElseThrow();
    List<DisorderTerm> disorder =
        List.of(
            new DisorderTerm("bond-box", 0.5, Map.of()),
            new DisorderTerm("bond-phase", TWO_PI, Map.of()));
    assertThat(SymmetryCheckOps.effectiveClass(ssh, disorder)).isEqualTo(SymmetryClass.AIII);
    assertThat(SymmetryClass.BDI.restrictTo(false, false, true)).isEqualTo(SymmetryClass.AIII);

    TestRealisation realisation =
        aRealisation("ssh")
            .with("v", 0.5)
            .size(10)
            .boundary(Boundary.OPEN)
            .seed(3)
            .disorder("bond-box", 0.5)
            .disorder("bond-phase", TWO_PI);
    Lattice lattice = realisation.lattice();
    ZMatrixRMaj h = dense(realisation.build());
    SymmetryCheckReport asAiii =
        SymmetryCheckOps.checkClaimed(
            ssh, lattice, h, SymmetryClass.AIII, SymmetryCheckKernel.TOLERANCE);
    assertThat(asAiii.checks())
        .extracting(SymmetryCheckResult::symmetry)
        .containsExactly(Symmetry.CHIRAL);
    assertThat(asAiii.violations()).isEmpty();

    SymmetryCheckReport asBdi =
        SymmetryCheckOps.checkClaimed(
            ssh, lattice, h, SymmetryClass.BDI, SymmetryCheckKernel.TOLERANCE);
    assertThat(asBdi.violations())
        .extracting(SymmetryCheckResult::symmetry)
        .containsExactlyInAnyOrder(Symmetry.TIME_REVERSAL, Symmetry.PARTICLE_HOLE);
    assertThat(asBdi.violations().get(0).relativeViolation()).isGreaterThan(0.1);

    // The real chain (W = 0 phases) passes all three declared BDI operators.
    ZMatrixRMaj real =
        dense(
            aRealisation("ssh")
                .with("v", 0.5)
                .size(10)
                .boundary(Boundary.OPEN)
                .seed(3)
                .disorder("bond-box", 0.5)
                .build());
    SymmetryCheckReport realBdi =
        SymmetryCheckOps.checkClaimed(
            ssh, lattice, real, SymmetryClass.BDI, SymmetryCheckKernel.TOLERANCE);
    assertThat(realBdi.checks()).hasSize(3);
    assertThat(realBdi.violations()).isEmpty();
  }

  @Test
  void applicableToChiralChainsOnly() {
    DisorderKind kind = DisorderCatalog.find("bond-phase").orElseThrow();
    assertThat(kind.whyNotApplicable(ModelCatalog.find("ssh").orElseThrow())).isEmpty();
    assertThat(kind.whyNotApplicable(ModelCatalog.find("qwz").orElseThrow()))
        .hasValueSatisfying(r -> assertThat(r).contains("chiral chain"));
    assertThat(kind.options()).containsOnlyKeys("bonds");
  }
}
