package hopstat.linalg;

import hopstat.linalg.internal.LdltSolvers;
import java.util.Objects;

/**
 * Creates {@link HermitianLdltSolver}s matching a {@link Linalg} backend: LAPACK {@code zhetrf} /
 * {@code zhetrs2} for {@link LinalgKind#NATIVE}, a pure-Java Bunch–Kaufman factorisation for {@link
 * LinalgKind#JAVA}. A separate factory (rather than a method on {@link Linalg}) so that the
 * existing interface stays unchanged.
 */
public final class HermitianLdltFactory {

  private HermitianLdltFactory() {}

  /**
   * A new solver (one per worker thread) of the same kind as {@code linalg}.
   *
   * @param linalg read; its {@link Linalg#kind()} picks the implementation
   */
  public static HermitianLdltSolver create(Linalg linalg) {
    Objects.requireNonNull(linalg, "linalg");
    return create(linalg.kind());
  }

  /**
   * A new solver of the given kind; NATIVE requires the native library (see {@link
   * LinalgFactory#create}).
   */
  public static HermitianLdltSolver create(LinalgKind kind) {
    Objects.requireNonNull(kind, "kind");
    switch (kind) {
      case NATIVE:
        LinalgFactory.create(LinalgKind.NATIVE); // fails with the load cause if unavailable
        return LdltSolvers.newNative();
      case JAVA:
        return LdltSolvers.newJava();
      default:
        throw new IllegalArgumentException("unknown linear-algebra kind " + kind);
    }
  }
}
