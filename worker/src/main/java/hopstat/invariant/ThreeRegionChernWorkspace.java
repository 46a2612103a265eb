package hopstat.invariant;

import hopstat.linalg.ComplexProducts;
import hopstat.linalg.Linalg;
import org.ejml.data.ZMatrixRMaj;

/** Scratch for {@link ThreeRegionChernKernel}. Grows, never shrinks. One per worker thread. */
public final class ThreeRegionChernWorkspace {

  final ComplexProducts products;
  final ZMatrixRMaj psiA = new ZMatrixRMaj(1, 1);
  final ZMatrixRMaj psiB = new ZMatrixRMaj(1, 1);
  final ZMatrixRMaj psiC = new ZMatrixRMaj(1, 1);
  final ZMatrixRMaj pab = new ZMatrixRMaj(1, 1);
  final ZMatrixRMaj pbc = new ZMatrixRMaj(1, 1);
  final ZMatrixRMaj pca = new ZMatrixRMaj(1, 1);
  final ZMatrixRMaj pabc = new ZMatrixRMaj(1, 1);
  final int[] count = new int[3];
  int[] sector = new int[1];

  public ThreeRegionChernWorkspace(Linalg linalg) {
    this.products = linalg.newComplexProducts();
  }

  void ensureSites(int sites) {
    if (sector.length < sites) {
      sector = new int[sites];
    }
  }
}
