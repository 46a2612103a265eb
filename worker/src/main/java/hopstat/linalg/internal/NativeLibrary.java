package hopstat.linalg.internal;

import org.bytedeco.javacpp.Loader;
import org.bytedeco.openblas.global.openblas;
import org.bytedeco.openblas.presets.openblas_nolapack;

/**
 * Loads the bundled OpenBLAS/LAPACK once per JVM and pins it to one thread. Holds the outcome so
 * that a failed load is reported with its cause rather than retried.
 */
public final class NativeLibrary {

  private NativeLibrary() {}

  /** Lazy holder: the load runs on first access from any thread, exactly once. */
  private static final class State {
    static final Throwable FAILURE = load();
    static final String VERSION = version();

    private static Throwable load() {
      try {
        Loader.load(openblas.class);
        // One BLAS thread per caller: realisations already run in parallel, one per core.
        openblas_nolapack.blas_set_num_threads(1);
        return null;
      } catch (LinkageError e) {
        // UnsatisfiedLinkError, NoClassDefFoundError, ExceptionInInitializerError: no usable
        // native library on this platform. Kept as the reported cause, not swallowed.
        return e;
      }
    }

    private static String version() {
      String v = openblas.class.getPackage().getImplementationVersion();
      return v == null ? "unknown version" : v;
    }
  }

  /** Whether the native library is loaded and usable; triggers the load on first call. */
  public static boolean isLoaded() {
    return State.FAILURE == null;
  }

  /** The load failure, or null if the library loaded. */
  public static Throwable failure() {
    return State.FAILURE;
  }

  /** A one-line description of the load failure, or "loaded". */
  public static String failureDescription() {
    Throwable t = State.FAILURE;
    return t == null ? "loaded" : t.getClass().getSimpleName() + ": " + t.getMessage();
  }

  /** The bytedeco preset version, e.g. {@code 0.3.31-1.5.13}. */
  public static String version() {
    return State.VERSION;
  }

  /** Requires a loaded library; for the native solvers' constructors. */
  static void requireLoaded() {
    if (!isLoaded()) {
      throw new IllegalStateException(
          "native OpenBLAS/LAPACK not loaded: " + failureDescription(), failure());
    }
  }
}
