package hopstat.task;

/**
 * A numerical routine did not converge on this realisation. It is an outcome, not an input error:
 * the runner journals the realisation as FAILED with this message and the run goes on.
 */
public final class ConvergenceFailure extends RuntimeException {
  private static final long serialVersionUID = 1L;

  public ConvergenceFailure(String message) {
    super(message);
  }
}
