package hopstat.linalg.internal;

import hopstat.linalg.ComplexProducts;
import hopstat.linalg.GeneralEigenvalueSolver;
import hopstat.linalg.HermitianEigenSolver;
import hopstat.linalg.Linalg;
import hopstat.linalg.LinalgKind;
import org.ejml.EjmlVersion;

/**
 * Pure-Java backend on EJML, for machines where the native library does not load. Stateless and
 * thread-safe; solvers it creates are not.
 */
public final class JavaLinalg implements Linalg {

  /** The single instance. */
  public static final JavaLinalg INSTANCE = new JavaLinalg();

  private JavaLinalg() {}

  @Override
  public LinalgKind kind() {
    return LinalgKind.JAVA;
  }

  @Override
  public String describe() {
    return "java ejml " + EjmlVersion.VERSION;
  }

  @Override
  public HermitianEigenSolver newHermitianEigenSolver() {
    return new JavaHermitianEigenSolver();
  }

  @Override
  public GeneralEigenvalueSolver newGeneralEigenvalueSolver() {
    return new JavaGeneralEigenvalueSolver();
  }

  @Override
  public ComplexProducts newComplexProducts() {
    return new JavaComplexProducts();
  }
}
