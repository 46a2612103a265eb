package hopstat.cluster;

/**
 * The batch system refused or failed a request (sbatch rejected a job, a command is missing, a
 * cluster run's state forbids the action). The CLI prints the message as one line and exits with
 * the runtime-failure code; the message carries the batch system's own words.
 */
public final class ClusterException extends RuntimeException {
  private static final long serialVersionUID = 1L;

  public ClusterException(String message) {
    super(message);
  }
}
