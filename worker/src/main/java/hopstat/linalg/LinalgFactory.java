package hopstat.linalg;

import hopstat.linalg.internal.JavaLinalg;
import hopstat.linalg.internal.NativeLibrary;
import hopstat.linalg.internal.NativeLinalg;
import java.util.Objects;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Picks the dense linear-algebra implementation. The returned {@link Linalg} instances are
 * thread-safe and may be shared; the solvers they create are per worker thread.
 *
 * <p>The native library is loaded at most once per JVM, on first use, and OpenBLAS is then pinned
 * to one thread: parallelism comes from running realisations side by side, and a multi-threaded
 * BLAS inside each of them would oversubscribe the cores.
 */
public final class LinalgFactory {

  private LinalgFactory() {}

  /**
   * The implementation of the given kind.
   *
   * @param kind which implementation; not null
   * @return a shared, thread-safe instance
   * @throws IllegalStateException for {@link LinalgKind#NATIVE} when the native library cannot be
   *     loaded on this machine; the message names the cause
   */
  public static Linalg create(LinalgKind kind) {
    Objects.requireNonNull(kind, "kind");
    switch (kind) {
      case NATIVE:
        if (!NativeLibrary.isLoaded()) {
          throw new IllegalStateException(
              "native OpenBLAS/LAPACK could not be loaded on this machine ("
                  + NativeLibrary.failureDescription()
                  + "); use the JAVA linear-algebra backend instead",
              NativeLibrary.failure());
        }
        return NativeLinalg.INSTANCE;
      case JAVA:
        return JavaLinalg.INSTANCE;
      default:
        throw new IllegalArgumentException("unknown linear-algebra kind " + kind);
    }
  }

  /**
   * Whether the native library loads on this machine. The first call triggers the load attempt
   * (about a second); later calls are free.
   */
  public static boolean isNativeAvailable() {
    return NativeLibrary.isLoaded();
  }

  /**
   * The native implementation where it loads, else the pure-Java one. On fallback one WARN is
   * logged per JVM, naming the cause.
   */
  public static Linalg preferred() {
    return Preferred.INSTANCE;
  }

  /** Lazy holder: decides once, so the fallback warning is logged once. */
  private static final class Preferred {
    static final Linalg INSTANCE = choose();

    private static Linalg choose() {
      if (NativeLibrary.isLoaded()) {
        return NativeLinalg.INSTANCE;
      }
      // Logger obtained only here, so a JVM that never falls back never initialises slf4j.
      Logger log = LoggerFactory.getLogger(LinalgFactory.class);
      log.warn(
          "Native OpenBLAS/LAPACK unavailable ({}); falling back to pure-Java EJML, expect slower"
              + " dense linear algebra",
          NativeLibrary.failureDescription());
      return JavaLinalg.INSTANCE;
    }
  }
}
