package hopstat.pool;

import hopstat.linalg.LinalgKind;
import java.util.Objects;

/**
 * How a run executes (not what it computes: that is the spec).
 *
 * @param threads worker threads, ≥ 1
 * @param linalg dense linear-algebra backend
 * @param journalPrefix prefix of this session's journal file, e.g. {@code part} or {@code
 *     shard-0003}
 * @param shard which tasks this process runs
 * @param syncIntervalNanos journal fsync interval
 */
public record RunOptions(
    int threads, LinalgKind linalg, String journalPrefix, Shard shard, long syncIntervalNanos) {
  public RunOptions {
    Objects.requireNonNull(linalg, "linalg");
    Objects.requireNonNull(journalPrefix, "journalPrefix");
    Objects.requireNonNull(shard, "shard");
    if (threads < 1) {
      throw new IllegalArgumentException("threads must be >= 1");
    }
  }
}
