package hopstat.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import hopstat.invariant.BottIndexKernel;
import hopstat.invariant.BottIndexResult;
import hopstat.invariant.BottWorkspace;
import hopstat.lattice.Boundary;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.linalg.Linalg;
import hopstat.linalg.LinalgFactory;
import hopstat.linalg.LinalgKind;
import java.util.Map;
import org.ejml.data.ZMatrixRMaj;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class FluxSquareModelTest {

  private static final Linalg LINALG = LinalgFactory.create(LinalgKind.NATIVE);
  private final FluxSquareModel model = new FluxSquareModel();

  /**
   * Reference: Thouless, Kohmoto, Nightingale, den Nijs, PRL 49, 405 (1982): with E_F in the r-th
   * gap at flux p/q, the Hall conductance (Chern number of the r lowest bands) is t_r, the solution
   * of r = q s_r + p t_r with |t_r| ≤ q/2 (solved below from that equation, not tabulated). Sign
   * convention of this implementation (Landau gauge, phase e^{+2πi α x} on c†_{r+y} c_r, H = −t Σ
   * …), fixed by this test: Bott index = −t_r (e.g. −1 for the lowest band at flux 1/3; a negative
   * p flips it). Samples: L a multiple of q so the q bands hold L²/q states each; E_F between state
   * r·L²/q − 1 and r·L²/q. The finite-sample gaps here are ≥ 0.15 t (measured), so the Bott index
   * is an integer to 1e−6. Skipped: the central gap of even q, which is closed.
   */
  @ParameterizedTest
  @CsvSource({
    "1, 3, 12, 1",
    "1, 3, 12, 2",
    "1, 4, 12, 1",
    "1, 4, 12, 3",
    "2, 5, 15, 1",
    "2, 5, 15, 2",
    "2, 5, 15, 3",
    "2, 5, 15, 4",
    "-1, 3, 12, 1"
  })
  void bottIndexOfTheLowestBandsSolvesTheTknnDiophantineEquation(int p, int q, int size, int r) {
    Lattice lattice = model.lattice(size, Boundary.PERIODIC);
    HamiltonianBuilder builder = new HamiltonianBuilder();
    builder.reset(lattice.orbitals());
    model.addClean(
        new ParameterValues(Map.of("p", (double) p, "q", (double) q, "t", 1.0)), lattice, builder);
    ZMatrixRMaj h = new ZMatrixRMaj(1, 1);
    builder.toDense(h);
    int n = lattice.orbitals();
    double[] e = new double[n];
    ZMatrixRMaj vectors = new ZMatrixRMaj(1, 1);
    int occupied = r * n / q;
    assertThat(LINALG.newHermitianEigenSolver().eigenpairs(h, e, 0, occupied - 1, vectors))
        .isTrue();
    // the gap above the r lowest bands is open (source-free sanity for the band counting)
    assertThat(e[occupied] - e[occupied - 1]).isGreaterThan(0.1);
    BottIndexResult bott = BottIndexKernel.compute(lattice, vectors, new BottWorkspace(LINALG));
    assertThat(bott.converged()).isTrue();
    assertThat(bott.bott()).isCloseTo(-tknn(p, q, r), within(1e-6));
  }

  /** t_r of r = q s + p t, |t| ≤ q/2 (unique for the gaps tested). */
  private static int tknn(int p, int q, int r) {
    Integer found = null;
    for (int t = -q / 2; t <= q / 2; t++) {
      if (Math.floorMod(r - p * t, q) == 0) {
        if (found != null) {
          throw new IllegalStateException("ambiguous t_r for r = " + r + " at " + p + "/" + q);
        }
        found = t;
      }
    }
    if (found == null) {
      throw new IllegalStateException("no t_r");
    }
    return found;
  }

  /**
   * Derived (source-free): the product of hoppings counter-clockwise around every plaquette,
   * H_{r+x, r} H_{r+x+y, r+x} H_{r+y, r+x+y} H_{r, r+y} = t⁴ e^{2πi p/q}, including the plaquettes
   * that wrap.
   */
  @Test
  void everyPlaquetteCarriesFluxPOverQ() {
    int size = 6;
    Lattice lattice = model.lattice(size, Boundary.PERIODIC);
    HamiltonianBuilder builder = new HamiltonianBuilder();
    builder.reset(lattice.orbitals());
    model.addClean(new ParameterValues(Map.of("p", 1.0, "q", 3.0, "t", 1.0)), lattice, builder);
    ZMatrixRMaj h = new ZMatrixRMaj(1, 1);
    builder.toDense(h);
    for (int y = 0; y < size; y++) {
      for (int x = 0; x < size; x++) {
        int r0 = x + size * y;
        int r1 = (x + 1) % size + size * y;
        int r2 = (x + 1) % size + size * ((y + 1) % size);
        int r3 = x + size * ((y + 1) % size);
        double[] z = {1, 0};
        z = times(z, h, r1, r0);
        z = times(z, h, r2, r1);
        z = times(z, h, r3, r2);
        z = times(z, h, r0, r3);
        // H entries are −t e^{iθ}: the four minus signs cancel
        assertThat(Math.atan2(z[1], z[0])).isCloseTo(2 * Math.PI / 3, within(1e-12));
        assertThat(Math.hypot(z[0], z[1])).isCloseTo(1.0, within(1e-12));
      }
    }
  }

  private static double[] times(double[] z, ZMatrixRMaj h, int i, int j) {
    double re = h.getReal(i, j);
    double im = h.getImag(i, j);
    return new double[] {z[0] * re - z[1] * im, z[0] * im + z[1] * re};
  }

  @Test
  void validationRejectsToriThatDoNotFitTheMagneticCell() {
    ParameterValues third = new ParameterValues(Map.of("p", 1.0, "q", 3.0, "t", 1.0));
    assertThat(model.whyNotValid(third, 10, Boundary.PERIODIC))
        .hasValueSatisfying(s -> assertThat(s).contains("multiple of q = 3"));
    assertThat(model.whyNotValid(third, 12, Boundary.PERIODIC)).isEmpty();
    assertThat(model.whyNotValid(third, 10, Boundary.OPEN)).isEmpty();
    assertThat(
            model.whyNotValid(
                new ParameterValues(Map.of("p", 0.5, "q", 3.0, "t", 1.0)), 12, Boundary.PERIODIC))
        .isPresent();
    assertThat(
            model.whyNotValid(
                new ParameterValues(Map.of("p", 1.0, "q", 0.0, "t", 1.0)), 12, Boundary.PERIODIC))
        .isPresent();
  }
}
