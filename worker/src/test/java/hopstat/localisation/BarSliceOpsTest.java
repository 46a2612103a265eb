package hopstat.localisation;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import hopstat.lattice.Boundary;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.model.AndersonModel;
import hopstat.model.Model;
import hopstat.model.ModelCatalog;
import hopstat.model.ParameterInfo;
import hopstat.model.ParameterValues;
import java.util.HashMap;
import java.util.Map;
import org.ejml.data.ZMatrixRMaj;
import org.junit.jupiter.api.Test;

class BarSliceOpsTest {

  /** Defaults plus a value for every required parameter (1.0; p = 1, q = 3 for the flux). */
  private static ParameterValues parameters(Model model) {
    Map<String, Double> p = new HashMap<>();
    for (ParameterInfo info : model.parameters()) {
      p.put(info.name(), info.isRequired() ? 0.7 : info.defaultValue());
    }
    if (model.name().equals("flux-square")) {
      p.put("p", 1.0);
      p.put("q", 3.0);
    }
    if (model.name().equals("haldane")) {
      p.put("phi", Math.PI / 2);
    }
    return new ParameterValues(p);
  }

  /**
   * Every built-in model of d ≥ 1 is cut into nearest-neighbour slices, open and periodic (M = 3),
   * with K = M^{d−1} × (sites per cell) × (orbitals per site), a Hermitian H and a non-zero T; the
   * zero-dimensional cluster is refused.
   */
  @Test
  void everyBuiltInModelOfPositiveDimensionIsSliceable() {
    for (Model model : ModelCatalog.all()) {
      if (model.dimension() == 0) {
        assertThat(BarSliceOps.whyNotSliceable(model)).isPresent();
        continue;
      }
      for (Boundary b : Boundary.values()) {
        BarSlices bar = BarSliceOps.extract(model, parameters(model), 3, b);
        Lattice cell = model.lattice(1, Boundary.OPEN);
        int m = model.dimension() == 1 ? 1 : 3;
        int expected = (int) Math.pow(m, model.dimension() - 1) * cell.orbitals();
        assertThat(bar.orbitals()).as(model.name() + " " + b).isEqualTo(expected);
        ZMatrixRMaj h = bar.onSlice();
        ZMatrixRMaj hc = new ZMatrixRMaj(h.numCols, h.numRows);
        org.ejml.dense.row.CommonOps_ZDRM.transposeConjugate(h, hc);
        assertThat(org.ejml.dense.row.MatrixFeatures_ZDRM.isIdentical(h, hc, 1e-14)).isTrue();
        assertThat(org.ejml.dense.row.NormOps_ZDRM.normF(bar.coupling()))
            .as(model.name())
            .isGreaterThan(0.0);
      }
    }
  }

  /**
   * The generic cut reproduces the hand-written slice form of the anderson models (H from
   * addCleanSlice, T = −t·1), open and periodic, M = 3 and 4 (for M ≥ 3 the fold is the model's own
   * periodic sample).
   */
  @Test
  void reproducesTheAndersonSliceForm() {
    for (int d = 2; d <= 3; d++) {
      AndersonModel model = new AndersonModel(d);
      ParameterValues p = new ParameterValues(Map.of("t", 1.3));
      for (Boundary b : Boundary.values()) {
        for (int m : new int[] {3, 4}) {
          BarSlices bar = BarSliceOps.extract(model, p, m, b);
          Lattice slice = model.sliceLattice(m, b);
          HamiltonianBuilder hb = new HamiltonianBuilder();
          hb.reset(slice.orbitals());
          model.addCleanSlice(p, slice, hb);
          ZMatrixRMaj h = new ZMatrixRMaj(1, 1);
          hb.toDense(h);
          assertThat(org.ejml.dense.row.MatrixFeatures_ZDRM.isIdentical(bar.onSlice(), h, 1e-14))
              .as("d %d %s M %d", d, b, m)
              .isTrue();
          double[] t = new double[slice.orbitals() * slice.orbitals()];
          model.interSliceHopping(p, slice, t);
          ZMatrixRMaj tz = bar.coupling();
          for (int i = 0; i < slice.orbitals(); i++) {
            for (int j = 0; j < slice.orbitals(); j++) {
              assertThat(tz.getReal(i, j)).isEqualTo(t[i * slice.orbitals() + j]);
              assertThat(tz.getImag(i, j)).isEqualTo(0.0);
            }
          }
        }
      }
    }
  }

  /**
   * Flux-square: the Landau gauge depends on x only, so slices along y are translation invariant; T
   * carries the Peierls phases e^{2πi p x/q} on its diagonal (derived from the model's hopping). A
   * periodic cross-section that is not a multiple of q cannot be folded.
   */
  @Test
  void fluxSquareSlicesCarryThePeierlsPhases() {
    Model model = ModelCatalog.find("flux-square").orElseThrow();
    ParameterValues p = new ParameterValues(Map.of("p", 1.0, "q", 3.0, "t", 1.0));
    BarSlices bar = BarSliceOps.extract(model, p, 6, Boundary.PERIODIC);
    ZMatrixRMaj t = bar.coupling();
    for (int x = 0; x < 6; x++) {
      assertThat(t.getReal(x, x))
          .isCloseTo(-Math.cos(2 * Math.PI * x / 3), org.assertj.core.data.Offset.offset(1e-14));
      assertThat(t.getImag(x, x))
          .isCloseTo(-Math.sin(2 * Math.PI * x / 3), org.assertj.core.data.Offset.offset(1e-14));
    }
    assertThatThrownBy(() -> BarSliceOps.extract(model, p, 4, Boundary.PERIODIC))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("not periodic");
    // open strips need no commensurability
    assertThat(BarSliceOps.extract(model, p, 4, Boundary.OPEN).orbitals()).isEqualTo(4);
  }
}
