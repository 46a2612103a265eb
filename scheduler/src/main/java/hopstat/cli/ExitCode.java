package hopstat.cli;

/** Process exit codes of the {@code hopstat} command (documented in the README). */
public final class ExitCode {
  /** Everything asked for was done. */
  public static final int OK = 0;

  /**
   * A runtime failure: I/O error, run directory in use, corrupt journal, native library missing.
   */
  public static final int RUNTIME_FAILURE = 1;

  /** Bad input: the spec or the command line; the message names the field. */
  public static final int BAD_INPUT = 2;

  /** The run finished but some realisations are journaled as FAILED (see the summary). */
  public static final int SOME_FAILED = 3;

  /** The run stopped before it was complete; {@code hopstat resume DIR} continues it. */
  public static final int INCOMPLETE = 4;

  private ExitCode() {}
}
