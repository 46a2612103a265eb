package hopstat.cluster;

import java.util.Locale;

/** A Slurm job (or array element) state, reduced to what a user acts on. */
public enum JobPhase {
  /** Waiting: queued, held, or waiting for a dependency. */
  PENDING,
  /** Running, or being set up or torn down on its node. */
  RUNNING,
  /** Exited with status 0. */
  COMPLETED,
  /** Exited non-zero, or its node failed, or it ran out of memory. */
  FAILED,
  /** Killed at its time limit. */
  TIMEOUT,
  /** Cancelled by a user or an administrator, or preempted. */
  CANCELLED,
  /**
   * Slurm no longer knows the job (aged out of its memory) or reports a state hopstat does not map.
   */
  UNKNOWN;

  /** Maps Slurm's state name ({@code JobState} in scontrol, {@code %T} in squeue). */
  public static JobPhase of(String slurmState) {
    return switch (slurmState.toUpperCase(Locale.ROOT)) {
      case "PENDING",
          "REQUEUED",
          "REQUEUE_HOLD",
          "REQUEUE_FED",
          "RESV_DEL_HOLD",
          "SUSPENDED",
          "STOPPED",
          "RESIZING",
          "SPECIAL_EXIT" ->
          PENDING;
      case "RUNNING",
          "CONFIGURING",
          "COMPLETING",
          "SIGNALING",
          "STAGE_OUT",
          "POWER_UP_NODE",
          "UPDATE_DB" ->
          RUNNING;
      case "COMPLETED" -> COMPLETED;
      case "FAILED", "NODE_FAIL", "BOOT_FAIL", "OUT_OF_MEMORY", "DEADLINE" -> FAILED;
      case "TIMEOUT" -> TIMEOUT;
      case "CANCELLED", "PREEMPTED", "REVOKED" -> CANCELLED;
      default -> UNKNOWN;
    };
  }

  /**
   * True while the job may still run or is running: resubmitting its shard now would duplicate
   * work.
   */
  public boolean isActive() {
    return this == PENDING || this == RUNNING;
  }

  /** Lower-case name for tables. */
  public String label() {
    return name().toLowerCase(Locale.ROOT);
  }
}
