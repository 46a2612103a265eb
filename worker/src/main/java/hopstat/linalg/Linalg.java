package hopstat.linalg;

/**
 * The one room through which dense linear algebra is done. Obtain it from {@link LinalgFactory}; it
 * is thread-safe and shared, while the solvers it creates are per worker thread.
 */
public interface Linalg {

  /** Which implementation this is. */
  LinalgKind kind();

  /** Human/provenance description, e.g. {@code "native openblas 0.3.31 (1 thread)"}. */
  String describe();

  /** A new Hermitian eigensolver with its own workspace (one per worker thread). */
  HermitianEigenSolver newHermitianEigenSolver();

  /** A new general complex eigenvalue solver with its own workspace (one per worker thread). */
  GeneralEigenvalueSolver newGeneralEigenvalueSolver();

  /** A new product engine (one per worker thread). */
  ComplexProducts newComplexProducts();
}
