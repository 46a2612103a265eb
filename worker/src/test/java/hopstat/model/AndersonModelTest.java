package hopstat.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.data.Offset.offset;

import hopstat.lattice.Boundary;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.linalg.HermitianEigenSolver;
import hopstat.linalg.LinalgFactory;
import java.util.Arrays;
import java.util.Map;
import org.ejml.data.ZMatrixRMaj;
import org.junit.jupiter.api.Test;

/** Clean spectra of the Anderson model against the tight-binding dispersion (derived). */
class AndersonModelTest {

  private final HermitianEigenSolver solver = LinalgFactory.preferred().newHermitianEigenSolver();
  private final ParameterValues t = new ParameterValues(Map.of("t", 0.8));

  private double[] spectrum(Model model, int l, Boundary boundary) {
    Lattice lattice = model.lattice(l, boundary);
    HamiltonianBuilder b = new HamiltonianBuilder();
    b.reset(lattice.orbitals());
    model.addClean(t, lattice, b);
    ZMatrixRMaj h = new ZMatrixRMaj(1, 1);
    b.toDense(h);
    double[] e = new double[lattice.orbitals()];
    assertThat(solver.eigenvalues(h, e)).isTrue();
    return e;
  }

  /** Periodic L^3: E(k) = −2t Σ_a cos k_a, k_a = 2πn/L (derived). */
  @Test
  void periodicCubeHasTheTightBindingDispersion() {
    int l = 4;
    double[] expected = new double[l * l * l];
    int i = 0;
    for (int x = 0; x < l; x++) {
      for (int y = 0; y < l; y++) {
        for (int z = 0; z < l; z++) {
          expected[i++] =
              -2
                  * 0.8
                  * (Math.cos(2 * Math.PI * x / l)
                      + Math.cos(2 * Math.PI * y / l)
                      + Math.cos(2 * Math.PI * z / l));
        }
      }
    }
    Arrays.sort(expected);
    double[] got = spectrum(new AndersonModel(3), l, Boundary.PERIODIC);
    for (int k = 0; k < expected.length; k++) {
      assertThat(got[k]).isCloseTo(expected[k], offset(1e-10));
    }
  }

  /** Open chain of L sites: E_k = −2t cos(πk/(L+1)), k = 1..L (derived). */
  @Test
  void openChainHasStandingWaveLevels() {
    int l = 7;
    double[] got = spectrum(new AndersonModel(1), l, Boundary.OPEN);
    for (int k = 1; k <= l; k++) {
      assertThat(got[k - 1]).isCloseTo(-2 * 0.8 * Math.cos(Math.PI * k / (l + 1)), offset(1e-12));
    }
  }

  /**
   * L = 2 periodic: the wrap bond would duplicate the only bond, so the spectrum is ±t
   * (convention).
   */
  @Test
  void twoSitePeriodicChainHasNoDoubledBond() {
    double[] got = spectrum(new AndersonModel(1), 2, Boundary.PERIODIC);
    assertThat(got[0]).isCloseTo(-0.8, offset(1e-12));
    assertThat(got[1]).isCloseTo(0.8, offset(1e-12));
  }

  @Test
  void sliceFormMatchesTheModel() {
    AndersonModel model = new AndersonModel(3);
    Lattice slice = model.sliceLattice(3, Boundary.PERIODIC);
    assertThat(slice.sites()).isEqualTo(9);
    double[] hop = new double[81];
    model.interSliceHopping(t, slice, hop);
    for (int i = 0; i < 9; i++) {
      for (int j = 0; j < 9; j++) {
        assertThat(hop[i * 9 + j]).isEqualTo(i == j ? -0.8 : 0.0);
      }
    }
    HamiltonianBuilder b = new HamiltonianBuilder();
    b.reset(9);
    model.addCleanSlice(t, slice, b);
    assertThat(b.termCount()).isEqualTo(18); // 3×3 periodic square: 2 bonds per site
    assertThat(new AndersonModel(1).sliceLattice(5, Boundary.OPEN).sites()).isEqualTo(1);
    assertThat(model.name()).isEqualTo("anderson-3d");
    assertThat(ModelCatalog.find("anderson-2d")).isPresent();
  }
}
