package hopstat.cluster;

import java.util.List;
import java.util.Objects;

/**
 * One hand-off of shards to Slurm: a job array over some shard indices and the report job that runs
 * after it.
 *
 * @param number 1-based submission number within the run
 * @param submitted ISO-8601 UTC instant of submission
 * @param shards shard indices in the array (array task id = shard index), ascending
 * @param arrayJobId Slurm's id of the job array
 * @param reportJobId Slurm's id of the report job, null if its submission failed
 * @param shardScript array script, relative to the run directory
 * @param reportScript report script, relative to the run directory
 */
public record ClusterSubmission(
    int number,
    String submitted,
    List<Integer> shards,
    String arrayJobId,
    String reportJobId,
    String shardScript,
    String reportScript) {
  public ClusterSubmission {
    Objects.requireNonNull(submitted, "submitted");
    Objects.requireNonNull(arrayJobId, "arrayJobId");
    shards = List.copyOf(shards);
    if (number < 1 || shards.isEmpty()) {
      throw new IllegalArgumentException("submission needs a number >= 1 and at least one shard");
    }
  }
}
