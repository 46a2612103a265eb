package hopstat.linalg.internal;

import hopstat.linalg.GeneralEigenvalueSolver;
import org.ejml.data.ZMatrixRMaj;

/**
 * Pure-Java general complex eigenvalues; EJML has no complex eigen-decomposition, so this runs
 * {@link ComplexHessenbergQrKernel} over a per-instance workspace. Not thread-safe.
 */
final class JavaGeneralEigenvalueSolver implements GeneralEigenvalueSolver {

  private final ComplexHessenbergQrWorkspace workspace = new ComplexHessenbergQrWorkspace();

  @Override
  public boolean eigenvalues(ZMatrixRMaj a, double[] real, double[] imaginary) {
    int n = LinalgCheckOps.requireSquare(a);
    LinalgCheckOps.requireLength(real, n, "real");
    LinalgCheckOps.requireLength(imaginary, n, "imaginary");
    LinalgCheckOps.requireDistinct(real, imaginary);
    return ComplexHessenbergQrKernel.eigenvalues(a, workspace, real, imaginary);
  }
}
