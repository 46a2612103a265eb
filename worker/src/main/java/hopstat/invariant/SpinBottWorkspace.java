package hopstat.invariant;

import hopstat.linalg.ComplexProducts;
import hopstat.linalg.HermitianEigenSolver;
import hopstat.linalg.Linalg;
import org.ejml.data.ZMatrixRMaj;

/** Scratch for {@link SpinBottKernel}. Grows, never shrinks. One per worker thread. */
public final class SpinBottWorkspace {

  final ComplexProducts products;
  final HermitianEigenSolver eigenSolver;
  final BottWorkspace bott;
  final ZMatrixRMaj spinPsi = new ZMatrixRMaj(1, 1);
  final ZMatrixRMaj projectedSpin = new ZMatrixRMaj(1, 1);
  final ZMatrixRMaj spinVectors = new ZMatrixRMaj(1, 1);
  final ZMatrixRMaj sectorVectors = new ZMatrixRMaj(1, 1);
  final ZMatrixRMaj sectorStates = new ZMatrixRMaj(1, 1);
  double[] spinValues = new double[1];

  public SpinBottWorkspace(Linalg linalg) {
    this.products = linalg.newComplexProducts();
    this.eigenSolver = linalg.newHermitianEigenSolver();
    this.bott = new BottWorkspace(linalg);
  }

  void ensure(int occupied) {
    if (spinValues.length < occupied) {
      spinValues = new double[occupied];
    }
  }
}
