package hopstat.cluster;

import java.io.IOException;
import java.util.List;

/**
 * Runs one external command and waits for it. The batch system's commands go through this interface
 * so that tests can check the exact arguments and feed back recorded outputs without a cluster.
 */
public interface CommandRunner {

  /**
   * Runs {@code argv} (program and arguments, no shell) and returns its exit status and output.
   *
   * @throws ClusterException if the program cannot be started (not on PATH, say)
   */
  CommandOutput run(List<String> argv) throws IOException, InterruptedException;
}
