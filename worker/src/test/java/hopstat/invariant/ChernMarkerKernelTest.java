package hopstat.invariant;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import hopstat.lattice.Boundary;
import java.util.Map;
import org.junit.jupiter.api.Test;

class ChernMarkerKernelTest {

  /**
   * Derived: Σ_r Im⟨r|PXQYP|r⟩ = Im Tr(PXQYP) = 0 on a finite open sample, because Tr(PXQYP) −
   * Tr(PYQXP) = Tr(XPYP) − Tr(YPXP) = 0 by cyclicity and [X, Y] = 0. The total marker over all
   * sites therefore vanishes (the bulk value is compensated at the edges; Bianco &amp; Resta, PRB
   * 84, 241106(R) (2011)). Round-off only: 1e−9.
   */
  @Test
  void markerSummedOverTheWholeOpenSampleVanishes() {
    OccupiedStates s = new OccupiedStates("qwz", Map.of("m", -1.0, "t", 1.0), 10, Boundary.OPEN);
    ChernMarkerWorkspace ws = new ChernMarkerWorkspace(OccupiedStates.LINALG);
    ChernMarkerResult r = ChernMarkerKernel.compute(s.lattice, s.lowest(s.countBelow(0.0)), ws);
    double total = 0;
    for (int site = 0; site < s.lattice.sites(); site++) {
      total += ChernMarkerKernel.siteMarker(ws, site);
    }
    assertThat(total).isCloseTo(0.0, within(1e-9));
    // and the bulk value is not trivially zero: qwz C = +1 at m = −1 (Qi, Wu, Zhang, PRB 74, 085308
    // (2006))
    assertThat(r.bulkAverage()).isCloseTo(1.0, within(0.05));
    // central half of a 10 × 10 span [0, 9]: |x − 4.5| ≤ 2.25 → x = 3..6, 16 sites (derived)
    assertThat(r.bulkSites()).isEqualTo(16);
  }

  /** Derived: an empty occupied space has P = 0 and a marker of exactly zero. */
  @Test
  void emptyBandGivesZero() {
    OccupiedStates s = new OccupiedStates("qwz", Map.of("m", -1.0, "t", 1.0), 6, Boundary.OPEN);
    ChernMarkerResult r =
        ChernMarkerKernel.compute(
            s.lattice, s.lowest(0), new ChernMarkerWorkspace(OccupiedStates.LINALG));
    assertThat(r.bulkAverage()).isEqualTo(0.0);
  }
}
