package hopstat.disorder;

import static hopstat.invariant.TestRealisation.aRealisation;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import hopstat.lattice.Boundary;
import hopstat.task.SeedOps;
import java.util.Map;
import java.util.random.RandomGenerator;
import org.ejml.data.ZMatrixRMaj;
import org.junit.jupiter.api.Test;

/**
 * Draw order and placement of the chain disorder kinds (derived from their documented conventions).
 */
class ChainDisorderTest {

  private static final double TOL = 1e-14;

  private static ZMatrixRMaj dense(hopstat.invariant.TestRealisation r) {
    ZMatrixRMaj h = new ZMatrixRMaj(1, 1);
    r.build().toDense(h);
    return h;
  }

  @Test
  void bondBoxDrawsCellByCellIntracellFirst() {
    int size = 6;
    ZMatrixRMaj h =
        dense(
            aRealisation("ssh")
                .with("v", 0.5)
                .with("w", 1.0)
                .size(size)
                .boundary(Boundary.OPEN)
                .disorder("bond-box", 0.8, Map.of("bonds", "all"))
                .seed(9));
    RandomGenerator random = SeedOps.generator(9);
    for (int j = 0; j < size; j++) {
      assertThat(h.getReal(2 * j, 2 * j + 1))
          .isCloseTo(0.5 + 0.8 * (random.nextDouble() - 0.5), within(TOL));
      if (j < size - 1) {
        assertThat(h.getReal(2 * j + 1, 2 * j + 2))
            .isCloseTo(1.0 + 0.8 * (random.nextDouble() - 0.5), within(TOL));
      }
    }
    // chiral symmetry kept: no A-A or B-B entries
    for (int i = 0; i < 2 * size; i += 2) {
      for (int k = 0; k < 2 * size; k += 2) {
        assertThat(h.getReal(i, k)).isZero();
        assertThat(h.getReal(i + 1, k + 1)).isZero();
      }
    }
  }

  @Test
  void bondBoxIntercellOnlyLeavesIntracellClean() {
    int size = 5;
    ZMatrixRMaj h =
        dense(
            aRealisation("ssh")
                .with("v", 0.5)
                .with("w", 1.0)
                .size(size)
                .boundary(Boundary.PERIODIC)
                .disorder("bond-box", 0.8, Map.of("bonds", "intercell"))
                .seed(4));
    RandomGenerator random = SeedOps.generator(4);
    for (int j = 0; j < size; j++) {
      assertThat(h.getReal(2 * j, 2 * j + 1)).isEqualTo(0.5);
      int next = 2 * ((j + 1) % size);
      assertThat(h.getReal(2 * j + 1, next))
          .isCloseTo(1.0 + 0.8 * (random.nextDouble() - 0.5), within(TOL));
    }
  }

  @Test
  void pairingBoxAndOnsiteGaussOnTheWire() {
    // H_BdG[(j+1) particle, j hole] = Δ_j; particle diagonal = −μ_j (pwave-wire convention).
    int size = 6;
    ZMatrixRMaj h =
        dense(
            aRealisation("pwave-wire")
                .with("mu", 0.3)
                .with("t", 1.0)
                .with("delta", 0.7)
                .size(size)
                .boundary(Boundary.PERIODIC)
                .disorder("pairing-box", 0.5)
                .disorder("onsite-gauss", 0.2)
                .seed(12));
    RandomGenerator random = SeedOps.generator(12);
    for (int j = 0; j < size; j++) {
      int next = (j + 1) % size;
      assertThat(h.getReal(2 * next, 2 * j + 1))
          .isCloseTo(0.7 + 0.5 * (random.nextDouble() - 0.5), within(TOL));
    }
    for (int j = 0; j < size; j++) {
      double mu = 0.3 + 0.2 * random.nextGaussian();
      assertThat(h.getReal(2 * j, 2 * j)).isCloseTo(-mu, within(TOL));
      assertThat(h.getReal(2 * j + 1, 2 * j + 1)).isCloseTo(mu, within(TOL));
    }
  }

  @Test
  void onsiteBoxShiftsTheWireChemicalPotentialUpwards() {
    // Issue convention: onsite-box gives μ_j = mu + W u_j on the p-wave wire.
    ZMatrixRMaj h =
        dense(
            aRealisation("pwave-wire")
                .with("mu", 0.3)
                .size(4)
                .boundary(Boundary.OPEN)
                .disorder("onsite-box", 2.0)
                .seed(1));
    RandomGenerator random = SeedOps.generator(1);
    for (int j = 0; j < 4; j++) {
      double mu = 0.3 + 2.0 * (random.nextDouble() - 0.5);
      assertThat(h.getReal(2 * j, 2 * j)).isCloseTo(-mu, within(TOL));
    }
  }
}
