package hopstat.queue;

/** A run directory cannot be used as asked (in use, holds another job, missing files). */
public final class RunDirectoryException extends RuntimeException {
  private static final long serialVersionUID = 1L;

  public RunDirectoryException(String message) {
    super(message);
  }
}
