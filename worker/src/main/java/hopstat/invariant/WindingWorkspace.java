package hopstat.invariant;

import hopstat.linalg.ComplexProducts;
import hopstat.linalg.Linalg;
import org.ejml.data.ZMatrixRMaj;

/**
 * Scratch for {@link RealSpaceWindingKernel}: the sublattice rows of the occupied states and the
 * A–B block of the projector. Grows, never shrinks. One per worker thread.
 */
public final class WindingWorkspace {

  final ComplexProducts products;
  final ZMatrixRMaj statesA = new ZMatrixRMaj(1, 1);
  final ZMatrixRMaj statesB = new ZMatrixRMaj(1, 1);
  final ZMatrixRMaj projectorAB = new ZMatrixRMaj(1, 1);

  public WindingWorkspace(Linalg linalg) {
    this.products = linalg.newComplexProducts();
  }
}
