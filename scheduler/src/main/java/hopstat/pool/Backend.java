package hopstat.pool;

import hopstat.expand.StudyPlan;
import hopstat.queue.RunDirectory;
import java.io.IOException;

/**
 * Where a study's tasks execute: the local worker pool, or a batch system. Expansion and queue code
 * do not know which.
 */
public interface Backend {

  /** Short name for logs and provenance, e.g. {@code local} or {@code slurm}. */
  String name();

  /**
   * Runs (local) or hands off (batch system) the tasks of {@code plan} that the run directory's
   * journal does not hold yet.
   */
  RunResult execute(StudyPlan plan, RunDirectory dir, RunOptions options, ProgressListener listener)
      throws IOException, InterruptedException;
}
