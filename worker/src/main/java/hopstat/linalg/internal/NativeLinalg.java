package hopstat.linalg.internal;

import hopstat.linalg.ComplexProducts;
import hopstat.linalg.GeneralEigenvalueSolver;
import hopstat.linalg.HermitianEigenSolver;
import hopstat.linalg.Linalg;
import hopstat.linalg.LinalgKind;

/**
 * Native OpenBLAS/LAPACK backend (bytedeco presets), pinned to one BLAS thread. Stateless and
 * thread-safe; solvers it creates are not. Obtain through {@code LinalgFactory}; the factory checks
 * that the library loaded before handing this out.
 */
public final class NativeLinalg implements Linalg {

  /** The single instance; using it before a successful load fails in the solver constructors. */
  public static final NativeLinalg INSTANCE = new NativeLinalg();

  private NativeLinalg() {}

  @Override
  public LinalgKind kind() {
    return LinalgKind.NATIVE;
  }

  @Override
  public String describe() {
    return "native openblas " + NativeLibrary.version() + " (1 thread)";
  }

  @Override
  public HermitianEigenSolver newHermitianEigenSolver() {
    return new NativeHermitianEigenSolver();
  }

  @Override
  public GeneralEigenvalueSolver newGeneralEigenvalueSolver() {
    return new NativeGeneralEigenvalueSolver();
  }

  @Override
  public ComplexProducts newComplexProducts() {
    return new NativeComplexProducts();
  }
}
