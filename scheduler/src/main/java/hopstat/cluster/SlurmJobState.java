package hopstat.cluster;

import java.util.Objects;

/**
 * What Slurm says about one job or one array element.
 *
 * @param jobId the array's job id for array elements, else the job's id
 * @param arrayIndex the array task id (= shard index), or -1 for a job that is not an array element
 * @param slurmState Slurm's state name, e.g. {@code FAILED}
 * @param reason Slurm's reason, e.g. {@code NonZeroExitCode}, {@code Dependency}, {@code None}
 * @param exitCode {@code status:signal} as scontrol prints it, or empty if not known
 * @param startTime start time as Slurm prints it (local time, no zone), or {@code Unknown}
 * @param endTime end time as Slurm prints it, or {@code Unknown}
 */
public record SlurmJobState(
    String jobId,
    int arrayIndex,
    String slurmState,
    String reason,
    String exitCode,
    String startTime,
    String endTime) {
  public SlurmJobState {
    Objects.requireNonNull(jobId, "jobId");
    Objects.requireNonNull(slurmState, "slurmState");
    reason = reason == null ? "" : reason;
    exitCode = exitCode == null ? "" : exitCode;
    startTime = startTime == null ? "Unknown" : startTime;
    endTime = endTime == null ? "Unknown" : endTime;
  }

  public JobPhase phase() {
    return JobPhase.of(slurmState);
  }

  /** {@code 123_4} for array elements, {@code 123} otherwise: the id users pass to scancel. */
  public String displayId() {
    return arrayIndex < 0 ? jobId : jobId + "_" + arrayIndex;
  }
}
