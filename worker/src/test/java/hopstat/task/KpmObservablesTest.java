package hopstat.task;

import static hopstat.task.Points2d.aPoint;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import hopstat.disorder.DisorderCatalog;
import hopstat.disorder.DisorderTerm;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.model.Model;
import hopstat.model.ModelCatalog;
import hopstat.spectrum.ChebyshevScale;
import hopstat.spectrum.CsrHermitianMatrix;
import hopstat.spectrum.KpmKernel;
import hopstat.spectrum.KpmWorkspace;
import java.util.Map;
import java.util.random.RandomGenerator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The kernel-polynomial observables through the realisation runner. */
class KpmObservablesTest {

  private static final long SEED = 20261202L;

  /**
   * kpm-chern-marker against chern-marker on the same open realisation (same seed: the dense marker
   * draws nothing, the KPM vectors are drawn after the disorder). Chern numbers from Qi, Wu, Zhang,
   * PRB 74, 085308 (2006): +1 for −2 &lt; m &lt; 0, −1 for 0 &lt; m &lt; 2, 0 for m = 3. Tolerance:
   * 4 reported standard errors plus the truncation tolerance 1e−3 at M = 256
   * (KpmChernMarkerKernelTest).
   */
  @ParameterizedTest(name = "m={0}")
  @CsvSource({"-1.0, 1", "1.0, -1", "3.0, 0"})
  void kpmMarkerAgreesWithTheDenseMarker(double m, int chern) {
    Points2d p =
        aPoint("qwz")
            .with("m", m)
            .with("t", 1.0)
            .with("kpmMoments", 256)
            .with("kpmVectors", 8)
            .size(18)
            .open()
            .boxDisorder(1.0, Map.of())
            .observing("chern-marker", "kpm-chern-marker");
    Map<String, Double> v = p.values(SEED);
    double error = v.get("kpm-chern-marker-error");
    assertThat(error).isGreaterThan(0.0).isLessThan(0.2);
    assertThat(v.get("kpm-chern-marker"))
        .isCloseTo(v.get("chern-marker"), within(4 * error + 1e-3));
    assertThat(v.get("chern-marker")).isCloseTo(chern, within(0.05));
  }

  /**
   * Documented draw order: the dos vectors come from the realisation's generator after the disorder
   * draws, vector after vector, entry by entry. Rebuilding the realisation by hand and calling the
   * kernel with a generator in the same state gives bitwise the same densities; the energies are
   * E_k = min + k (max − min)/(count − 1).
   */
  @Test
  void dosDrawsItsVectorsAfterTheDisorder() {
    Points2d p =
        aPoint("qwz")
            .with("m", 1.0)
            .with("t", 1.0)
            .with("kpmMoments", 64)
            .with("kpmVectors", 3)
            .with("dosEnergyMin", -3.0)
            .with("dosEnergyMax", 3.0)
            .with("dosEnergies", 5)
            .size(6)
            .open()
            .boxDisorder(2.0, Map.of())
            .observing("dos");
    Map<String, Double> v = p.values(SEED);
    PointSpec point = p.build();
    Model model = ModelCatalog.find("qwz").orElseThrow();
    Lattice lattice = model.lattice(point.linearSize(), point.boundary());
    HamiltonianBuilder b = new HamiltonianBuilder();
    b.reset(lattice.orbitals());
    model.addClean(point.parameters(), lattice, b);
    RandomGenerator random = SeedOps.generator(SEED);
    for (DisorderTerm term : point.disorder()) {
      DisorderCatalog.find(term.type())
          .orElseThrow()
          .apply(term, model, point.parameters(), lattice, random, b);
    }
    CsrHermitianMatrix h = new CsrHermitianMatrix();
    h.assemble(b);
    ChebyshevScale scale = KpmKernel.scale(h);
    double[] mu = new double[64];
    KpmKernel.stochasticMoments(h, scale, 64, 3, random, new KpmWorkspace(), mu);
    double[] g = new double[64];
    KpmKernel.jacksonKernel(64, g);
    for (int k = 0; k < 5; k++) {
      double e = -3.0 + 1.5 * k;
      assertThat(v.get("dos@E" + k + ".energy")).isEqualTo(e);
      assertThat(v.get("dos@E" + k)).isEqualTo(KpmKernel.density(mu, g, 64, scale, e));
    }
    assertThat(v).doesNotContainKey("dos@E5");
  }

  /** Bad parameters are input errors with the field path; the marker needs open d = 2 samples. */
  @Test
  void badParametersAndSamplesAreRejected() {
    RealisationResult r =
        aPoint("qwz")
            .with("m", 1.0)
            .with("t", 1.0)
            .with("kpmMoments", 1)
            .size(6)
            .open()
            .observing("kpm-chern-marker")
            .run(SEED);
    assertThat(r.outcome()).isEqualTo(Outcome.FAILED);
    assertThat(r.failure()).contains("kpmMoments");
    RealisationResult d =
        aPoint("qwz").with("m", 1.0).with("t", 1.0).size(6).open().observing("dos").run(SEED);
    assertThat(d.failure()).contains("dosEnergyMin");
    Observable o = ObservableCatalog.find("kpm-chern-marker").orElseThrow();
    Model qwz = ModelCatalog.find("qwz").orElseThrow();
    assertThat(o.whyNotApplicable(qwz, hopstat.lattice.Boundary.PERIODIC, qwz.symmetryClass()))
        .isPresent();
    assertThat(o.needsDenseMatrix()).isFalse();
    assertThat(ObservableCatalog.find("dos").orElseThrow().needsDenseMatrix()).isFalse();
  }

  /**
   * RealisationCost of a KPM-only point grows linearly in N (no slice block, no N² matrix): at L =
   * 400 (N = 320 000) below 1.5 kB per orbital, and L = 200 → 400 (N × 4) multiplies it by exactly
   * 4 (derived from the per-orbital constants); adding chern-localizer brings back the slice
   * blocks.
   */
  @Test
  void costOfKpmRunsIsLinearInTheDimension() {
    var kpm400 =
        aPoint("qwz").with("m", 1.0).size(400).open().observing("kpm-chern-marker", "dos").build();
    var kpm200 =
        aPoint("qwz").with("m", 1.0).size(200).open().observing("kpm-chern-marker", "dos").build();
    RealisationCost c400 = RealisationCost.of(kpm400);
    RealisationCost c200 = RealisationCost.of(kpm200);
    assertThat(c400.matrixDimension()).isEqualTo(320_000);
    long total400 = c400.heapBytes() + c400.nativeBytes();
    assertThat(total400).isLessThan(1500L * 320_000);
    assertThat(total400).isEqualTo(4 * (c200.heapBytes() + c200.nativeBytes()));
    var mixed =
        aPoint("qwz")
            .with("m", 1.0)
            .size(400)
            .open()
            .observing("kpm-chern-marker", "chern-localizer")
            .build();
    assertThat(RealisationCost.of(mixed).heapBytes())
        .isGreaterThan(c400.heapBytes() + 3L * 16 * 3200 * 3200 - 1);
  }
}
