package hopstat.linalg.internal;

import hopstat.linalg.HermitianLdltSolver;

/**
 * Constructors of the {@link HermitianLdltSolver} implementations, for {@code
 * HermitianLdltFactory}.
 */
public final class LdltSolvers {

  private LdltSolvers() {}

  /** LAPACK {@code zhetrf}/{@code zhetrs2}; requires the native library. */
  public static HermitianLdltSolver newNative() {
    return new NativeHermitianLdltSolver();
  }

  /** Pure-Java Bunch–Kaufman. */
  public static HermitianLdltSolver newJava() {
    return new JavaHermitianLdltSolver();
  }
}
