package hopstat.invariant;

import hopstat.linalg.ComplexProducts;
import hopstat.linalg.GeneralEigenvalueSolver;
import hopstat.linalg.Linalg;
import org.ejml.data.ZMatrixRMaj;

/**
 * Scratch for {@link BottIndexKernel}: the phase-multiplied states, the projected position
 * unitaries and their products, and the solvers. Grows, never shrinks. One per worker thread.
 */
public final class BottWorkspace {

  final ComplexProducts products;
  final GeneralEigenvalueSolver eigenvalues;
  final ZMatrixRMaj phased = new ZMatrixRMaj(1, 1);
  final ZMatrixRMaj projectedX = new ZMatrixRMaj(1, 1);
  final ZMatrixRMaj projectedY = new ZMatrixRMaj(1, 1);
  final ZMatrixRMaj product1 = new ZMatrixRMaj(1, 1);
  final ZMatrixRMaj product2 = new ZMatrixRMaj(1, 1);
  double[] real = new double[1];
  double[] imaginary = new double[1];

  public BottWorkspace(Linalg linalg) {
    this.products = linalg.newComplexProducts();
    this.eigenvalues = linalg.newGeneralEigenvalueSolver();
  }

  void ensure(int occupied) {
    if (real.length < occupied) {
      real = new double[occupied];
      imaginary = new double[occupied];
    }
  }
}
