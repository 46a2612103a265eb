package hopstat.task;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import hopstat.disorder.DisorderTerm;
import hopstat.invariant.BottIndexKernel;
import hopstat.invariant.BottIndexResult;
import hopstat.invariant.BottWorkspace;
import hopstat.invariant.ChernMarkerKernel;
import hopstat.invariant.ChernMarkerResult;
import hopstat.invariant.ChernMarkerWorkspace;
import hopstat.lattice.Boundary;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.linalg.Linalg;
import hopstat.linalg.LinalgFactory;
import hopstat.linalg.LinalgKind;
import hopstat.model.CustomModel;
import hopstat.model.CustomModelDefinition;
import hopstat.model.CustomModelDefinition.Amplitude;
import hopstat.model.CustomModelDefinition.Onsite;
import hopstat.model.CustomModelDefinition.Orbital;
import hopstat.model.CustomModelDefinition.Term;
import hopstat.model.Model;
import hopstat.model.ModelCatalog;
import hopstat.model.ParameterValues;
import hopstat.model.Symmetry;
import hopstat.model.SymmetryClass;
import hopstat.model.SymmetryOperator;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.ejml.data.ZMatrixRMaj;
import org.junit.jupiter.api.Test;

/**
 * Intra-cell orbital positions of custom models in the position operators ({@link
 * Lattice#orbitalPosition}): a custom Haldane model with the true sublattice positions against the
 * built-in {@code haldane}, and a custom SSH chain with B at the cell middle.
 */
class OrbitalPositionTest {

  private static final Linalg LINALG = LinalgFactory.create(LinalgKind.NATIVE);
  private static final double T1 = 1.0;
  private static final double T2 = 0.3;
  private static final double PHI = Math.PI / 2;
  private static final double MASS = 0.2;

  /**
   * The Haldane model (Haldane, PRL 61, 2015 (1988)) written as a custom model in the convention of
   * {@link hopstat.model.HaldaneModel}: A at fractional (0, 0), B at (1/3, 1/3) of the oblique cell
   * (or both at the origin when {@code truePositions} is false).
   */
  private static CustomModel customHaldane(boolean truePositions) {
    double b = truePositions ? 1.0 / 3.0 : 0.0;
    List<Term> hoppings = new ArrayList<>();
    // H[A(n)][B(n)], H[A(n + x)][B(n)], H[A(n + y)][B(n)] = t1 (from B at r to A at r + R)
    for (List<Integer> r : List.of(List.of(0, 0), List.of(1, 0), List.of(0, 1))) {
      hoppings.add(new Term(r, 1, 0, Amplitude.of(T1, 0.0)));
    }
    // H[A(n + v)][A(n)] = t2 e^{−iφ}, H[B(n + v)][B(n)] = t2 e^{+iφ}, v = a1, a2 − a1, −a2
    for (List<Integer> v : List.of(List.of(1, 0), List.of(-1, 1), List.of(0, -1))) {
      hoppings.add(new Term(v, 0, 0, Amplitude.of(T2 * Math.cos(PHI), -T2 * Math.sin(PHI))));
      hoppings.add(new Term(v, 1, 1, Amplitude.of(T2 * Math.cos(PHI), T2 * Math.sin(PHI))));
    }
    return new CustomModel(
        new CustomModelDefinition(
            2,
            List.of(List.of(1.0, 0.0), List.of(0.5, Math.sqrt(3) / 2)),
            List.of(new Orbital("A", List.of(0.0, 0.0)), new Orbital("B", List.of(b, b))),
            List.of(
                new Onsite(0, Amplitude.of(MASS, 0.0)), new Onsite(1, Amplitude.of(-MASS, 0.0))),
            hoppings,
            List.of(),
            SymmetryClass.A,
            List.of()));
  }

  private static ZMatrixRMaj dense(Model model, Lattice lattice, ParameterValues p) {
    HamiltonianBuilder b = new HamiltonianBuilder();
    b.reset(lattice.orbitals());
    model.addClean(p, lattice, b);
    ZMatrixRMaj h = new ZMatrixRMaj(1, 1);
    b.toDense(h);
    return h;
  }

  private static ZMatrixRMaj lowestHalf(ZMatrixRMaj h) {
    int n = h.numRows;
    double[] e = new double[n];
    ZMatrixRMaj vectors = new ZMatrixRMaj(1, 1);
    assertThat(LINALG.newHermitianEigenSolver().eigenpairs(h, e, 0, n / 2 - 1, vectors)).isTrue();
    return vectors;
  }

  private static ParameterValues haldaneParameters() {
    return new ParameterValues(Map.of("t1", T1, "t2", T2, "phi", PHI, "M", MASS));
  }

  /**
   * Same matrix, same positions (direct): the custom model's orbital positions are the built-in
   * site positions (B at A + (1/3, 1/3), HoneycombLattices), so the Bott index (Loring &amp;
   * Hastings, EPL 92, 67004 (2010)) agrees to round-off; its value is −1 for t2 sin φ &gt; 0 and
   * |M| &lt; 3√3|t2 sin φ| (Haldane 1988 phase boundary; sign of this project's convention, see
   * HaldaneModel). Without offsets the index is still −1 (an integer invariant, derived: the
   * offsets perturb e^{2πiX/L} by O(1/L)), but its unrounded value moves.
   */
  @Test
  void customHaldaneWithTruePositionsHasTheBuiltInBottIndex() {
    int size = 9;
    Model builtIn = ModelCatalog.find("haldane").orElseThrow();
    Lattice reference = builtIn.lattice(size, Boundary.PERIODIC);
    CustomModel custom = customHaldane(true);
    Lattice lattice = custom.lattice(size, Boundary.PERIODIC);
    for (int d = 0; d < 2; d++) {
      for (int i = 0; i < lattice.orbitals(); i++) {
        assertThat(lattice.orbitalPosition(d, i))
            .isCloseTo(reference.orbitalPosition(d, i), within(1e-15));
      }
    }
    ZMatrixRMaj h = dense(custom, lattice, new ParameterValues(Map.of()));
    ZMatrixRMaj hRef = dense(builtIn, reference, haldaneParameters());
    for (int k = 0; k < h.data.length; k++) {
      assertThat(h.data[k]).isCloseTo(hRef.data[k], within(1e-14));
    }
    ZMatrixRMaj psi = lowestHalf(h);
    BottIndexResult bott = BottIndexKernel.compute(lattice, psi, new BottWorkspace(LINALG));
    BottIndexResult bottRef =
        BottIndexKernel.compute(reference, lowestHalf(hRef), new BottWorkspace(LINALG));
    assertThat(bott.bott()).isCloseTo(bottRef.bott(), within(1e-9)).isCloseTo(-1.0, within(1e-6));

    CustomModel flat = customHaldane(false);
    Lattice flatLattice = flat.lattice(size, Boundary.PERIODIC);
    assertThat(flatLattice.hasOrbitalOffsets()).isFalse();
    BottIndexResult bottFlat = BottIndexKernel.compute(flatLattice, psi, new BottWorkspace(LINALG));
    assertThat(bottFlat.bott()).isCloseTo(-1.0, within(1e-6));
  }

  /**
   * Bianco–Resta marker (Bianco &amp; Resta, PRB 84, 241106(R) (2011)), open sample. Direct: the
   * custom model's marker per cell (density 1) is the mean of the built-in per-site markers of its
   * A and B sites (density 2), to round-off, because both use the same orbital positions and P.
   * Derived: the local values DO depend on the offsets (P X Q Y P changes with X), while the bulk
   * average stays close to C = −1 either way (tolerance 0.1 at L = 12 covers the finite-size
   * deviation: measured −0.9909 with and −0.9906 without offsets; largest local change 0.32).
   */
  @Test
  void localChernMarkerUsesTheOrbitalPositions() {
    int size = 12;
    Model builtIn = ModelCatalog.find("haldane").orElseThrow();
    Lattice reference = builtIn.lattice(size, Boundary.OPEN);
    ChernMarkerWorkspace wsRef = new ChernMarkerWorkspace(LINALG);
    ChernMarkerResult ref =
        ChernMarkerKernel.compute(
            reference, lowestHalf(dense(builtIn, reference, haldaneParameters())), wsRef);

    CustomModel custom = customHaldane(true);
    Lattice lattice = custom.lattice(size, Boundary.OPEN);
    ZMatrixRMaj psi = lowestHalf(dense(custom, lattice, new ParameterValues(Map.of())));
    ChernMarkerWorkspace ws = new ChernMarkerWorkspace(LINALG);
    ChernMarkerResult withOffsets = ChernMarkerKernel.compute(lattice, psi, ws);
    for (int c = 0; c < lattice.sites(); c++) {
      double expected =
          0.5
              * (ChernMarkerKernel.siteMarker(wsRef, 2 * c)
                  + ChernMarkerKernel.siteMarker(wsRef, 2 * c + 1));
      assertThat(ChernMarkerKernel.siteMarker(ws, c))
          .as("cell %d", c)
          .isCloseTo(expected, within(1e-9));
    }

    Lattice flatLattice = customHaldane(false).lattice(size, Boundary.OPEN);
    ChernMarkerWorkspace wsFlat = new ChernMarkerWorkspace(LINALG);
    ChernMarkerResult flat = ChernMarkerKernel.compute(flatLattice, psi, wsFlat);
    double largestChange = 0;
    for (int c = 0; c < lattice.sites(); c++) {
      largestChange =
          Math.max(
              largestChange,
              Math.abs(
                  ChernMarkerKernel.siteMarker(ws, c) - ChernMarkerKernel.siteMarker(wsFlat, c)));
    }
    assertThat(largestChange).as("local markers move with the offsets").isGreaterThan(1e-3);
    assertThat(ref.bulkAverage()).isCloseTo(-1.0, within(0.1));
    assertThat(withOffsets.bulkAverage())
        .isCloseTo(-1.0, within(0.1))
        .isCloseTo(ref.bulkAverage(), within(1e-9));
    assertThat(flat.bulkAverage()).isCloseTo(-1.0, within(0.1));
  }

  /**
   * A custom SSH chain, H[A_j][B_j] = v, H[A_{j+1}][B_j] = w, with B at fractional position 1/2.
   */
  private static CustomModelDefinition sshChain(double bPosition) {
    SymmetryOperator s =
        SymmetryOperator.local(Symmetry.CHIRAL, new double[][] {{1, 0}, {0, -1}}, new double[2][2]);
    return new CustomModelDefinition(
        1,
        List.of(List.of(1.0)),
        List.of(new Orbital("A", List.of(0.0)), new Orbital("B", List.of(bPosition))),
        List.of(),
        List.of(
            new Term(List.of(0), 1, 0, new Amplitude("v", 1.0, 0.0)),
            new Term(List.of(1), 1, 0, new Amplitude("w", 1.0, 0.0))),
        List.of(),
        SymmetryClass.BDI,
        List.of(s));
  }

  private static Map<String, Double> runChain(
      CustomModelDefinition chain, double v, double w, int realisation) {
    PointSpec point =
        new PointSpec(
            "custom",
            new ParameterValues(Map.of("v", v, "w", w)),
            40,
            Boundary.OPEN,
            0.0,
            List.of(new DisorderTerm("bond-phase", 2.0 * Math.PI, Map.of())),
            List.of("winding", "winding-localizer"),
            chain);
    long seed = SeedOps.realisationSeed(3, 0, realisation);
    RealisationResult r =
        RealisationRunner.run(
            new RealisationTask(RealisationTask.idOf(0, realisation), 0, realisation, seed, point),
            new RealisationWorkspace(LINALG));
    assertThat(r.outcome()).as("outcome (%s)", r.failure()).isEqualTo(Outcome.DONE);
    return r.values();
  }

  /**
   * Direct: B orbitals sit at j + 1/2, A at j. The windings (Mondragon-Shem, Hughes, Song, Prodan,
   * PRL 113, 046802 (2014); odd localizer, Loring &amp; Schulz-Baldes, arXiv:1701.07455) use the
   * unit-cell coordinate by definition, so moving B inside the cell changes neither (same
   * realisation with random bond phases, a class-AIII chain, to round-off); with B at 1/2 through X
   * the value would shift by −1/2 (derived, RealSpaceWindingKernel Javadoc), which this test would
   * catch.
   */
  @Test
  void windingIgnoresTheIntraCellPositionAndPositionsAreOffset() {
    Lattice lattice = new CustomModel(sshChain(0.5)).lattice(6, Boundary.OPEN);
    for (int j = 0; j < 6; j++) {
      assertThat(lattice.orbitalPosition(0, 2 * j)).isEqualTo(j);
      assertThat(lattice.orbitalPosition(0, 2 * j + 1)).isEqualTo(j + 0.5);
      assertThat(lattice.position(0, j)).isEqualTo(j);
    }
    assertThat(lattice.minOrbitalPosition(0)).isEqualTo(0.0);
    assertThat(lattice.maxOrbitalPosition(0)).isEqualTo(5.5);
    for (double w : new double[] {0.5, 2.0}) {
      for (int r = 0; r < 2; r++) {
        Map<String, Double> middle = runChain(sshChain(0.5), 1.0, w, r);
        Map<String, Double> origin = runChain(sshChain(0.0), 1.0, w, r);
        assertThat(middle.get("winding"))
            .isCloseTo(origin.get("winding"), within(1e-12))
            .isCloseTo(w > 1 ? 1.0 : 0.0, within(0.05));
        assertThat(middle.get("winding-localizer"))
            .isEqualTo(origin.get("winding-localizer"))
            .isEqualTo(w > 1 ? 1.0 : 0.0);
      }
    }
  }
}
