package hopstat.cluster;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * A run directory's cluster side, stored as {@code DIR/cluster.json} (format {@value #FORMAT}). The
 * shard count is fixed for the life of the run: shard k holds the grid points p with {@code p mod
 * shardCount == k}, and the journal files {@code journal/shard-KKKK-*.jsonl}.
 *
 * @param format layout version of cluster.json
 * @param backend batch system, {@code slurm}
 * @param shardCount number of shards, ≥ 1 and at most the number of grid points
 * @param linalg the {@code --linalg} choice the shards pass on (auto, native, java), resolved on
 *     the node
 * @param launcher how jobs start hopstat
 * @param jvmOptions options for the shards' JVM (e.g. a heap limit derived from --mem)
 * @param options the Slurm options of the latest submission
 * @param submissions every submission so far, oldest first
 */
public record ClusterRun(
    int format,
    String backend,
    int shardCount,
    String linalg,
    JavaLauncher launcher,
    List<String> jvmOptions,
    SlurmSubmitSpec options,
    List<ClusterSubmission> submissions) {

  /** Layout version of cluster.json. */
  public static final int FORMAT = 1;

  public ClusterRun {
    Objects.requireNonNull(backend, "backend");
    Objects.requireNonNull(linalg, "linalg");
    Objects.requireNonNull(launcher, "launcher");
    Objects.requireNonNull(options, "options");
    jvmOptions = List.copyOf(jvmOptions);
    submissions = List.copyOf(submissions);
    if (format != FORMAT) {
      throw new IllegalArgumentException(
          "cluster.json format "
              + format
              + " is not readable by this hopstat (reads "
              + FORMAT
              + ")");
    }
    if (shardCount < 1) {
      throw new IllegalArgumentException("shardCount must be >= 1");
    }
  }

  /** This run with one more submission. */
  public ClusterRun with(ClusterSubmission submission) {
    List<ClusterSubmission> all = new ArrayList<>(submissions);
    all.add(submission);
    return new ClusterRun(format, backend, shardCount, linalg, launcher, jvmOptions, options, all);
  }

  /** This run with other Slurm options (and the JVM options that follow from them). */
  public ClusterRun with(SlurmSubmitSpec newOptions, List<String> newJvmOptions) {
    return new ClusterRun(
        format, backend, shardCount, linalg, launcher, newJvmOptions, newOptions, submissions);
  }

  /** The latest submission that included {@code shard}, or null if none did. */
  public ClusterSubmission latestFor(int shard) {
    for (int i = submissions.size() - 1; i >= 0; i--) {
      if (submissions.get(i).shards().contains(shard)) {
        return submissions.get(i);
      }
    }
    return null;
  }
}
