package hopstat.pool;

import hopstat.statistics.Summary;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;

/**
 * How one {@link LocalSession} over a run directory ended.
 *
 * @param run the pool's account of the session
 * @param summary the summary of the whole journal after the session
 * @param written the summary files written into the run directory
 */
public record SessionResult(RunResult run, Summary summary, List<Path> written) {
  public SessionResult {
    Objects.requireNonNull(run, "run");
    Objects.requireNonNull(summary, "summary");
    written = List.copyOf(written);
  }
}
