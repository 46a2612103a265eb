package hopstat.invariant;

import hopstat.linalg.ComplexProducts;
import hopstat.linalg.Linalg;
import org.ejml.data.ZMatrixRMaj;

/** Scratch for {@link ChernMarkerKernel}. Grows, never shrinks. One per worker thread. */
public final class ChernMarkerWorkspace {

  final ComplexProducts products;
  final ZMatrixRMaj xPsi = new ZMatrixRMaj(1, 1);
  final ZMatrixRMaj yPsi = new ZMatrixRMaj(1, 1);
  final ZMatrixRMaj projectedX = new ZMatrixRMaj(1, 1);
  final ZMatrixRMaj projectedY = new ZMatrixRMaj(1, 1);
  final ZMatrixRMaj projectedXy = new ZMatrixRMaj(1, 1);
  final ZMatrixRMaj product = new ZMatrixRMaj(1, 1);
  final ZMatrixRMaj expanded = new ZMatrixRMaj(1, 1);
  double[] siteMarker = new double[1];

  public ChernMarkerWorkspace(Linalg linalg) {
    this.products = linalg.newComplexProducts();
  }

  void ensureSites(int sites) {
    if (siteMarker.length < sites) {
      siteMarker = new double[sites];
    }
  }
}
