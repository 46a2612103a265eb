package hopstat.cli;

import hopstat.cluster.ClusterException;
import hopstat.cluster.ClusterRun;
import hopstat.cluster.ClusterSubmission;
import hopstat.cluster.JobPhase;
import hopstat.cluster.ShardProgress;
import hopstat.cluster.SlurmBackend;
import hopstat.cluster.SlurmJobState;
import java.io.IOException;
import java.io.PrintStream;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/** The cluster part of {@code status} and the checks {@code resume} makes before resubmitting. */
final class ClusterView {

  private ClusterView() {}

  /** Slurm's states of the run's jobs, or null (with a note printed) when Slurm cannot be asked. */
  static List<SlurmJobState> states(SlurmBackend backend, ClusterRun run, PrintStream out)
      throws IOException, InterruptedException {
    try {
      return backend.states(run);
    } catch (ClusterException e) {
      out.println("slurm: cannot ask for job states: " + e.getMessage());
      return null;
    }
  }

  /** Jobs of the run that are queued or running, as {@code 12_3 (running)}. */
  static List<String> active(List<SlurmJobState> states) {
    List<String> active = new ArrayList<>();
    for (SlurmJobState s : states) {
      if (s.phase().isActive()) {
        active.add(s.displayId() + " (" + s.phase().label() + ")");
      }
    }
    return active;
  }

  /** Prints the per-shard table and the report jobs. */
  static void print(
      PrintStream out,
      ClusterRun run,
      List<ShardProgress> progress,
      List<SlurmJobState> states,
      List<Integer> heldShards) {
    Map<String, SlurmJobState> byId = new HashMap<>();
    if (states != null) {
      for (SlurmJobState s : states) {
        byId.put(s.displayId(), s);
      }
    }
    out.printf(
        Locale.ROOT,
        "cluster (%s): %d shard(s), %d submission(s)%n",
        run.backend(),
        run.shardCount(),
        run.submissions().size());
    out.println(
        "shard  points  done/scheduled  failed  complete  job         state      exit  reason");
    for (ShardProgress p : progress) {
      ClusterSubmission sub = run.latestFor(p.shard());
      String job = sub == null ? "-" : sub.arrayJobId() + "_" + p.shard();
      SlurmJobState s = byId.get(job);
      String state =
          sub == null
              ? "not submitted"
              : s == null ? (states == null ? "?" : "forgotten") : s.phase().label();
      if (heldShards.contains(p.shard()) && (s == null || !s.phase().isActive())) {
        state += " (lock held)";
      }
      out.printf(
          Locale.ROOT,
          "%-5d  %-6d  %-14s  %-6d  %-8s  %-10s  %-9s  %-4s  %s%n",
          p.shard(),
          p.points(),
          p.finished() + "/" + p.scheduled(),
          p.failed(),
          p.complete() ? "yes" : "no",
          job,
          state,
          s == null || s.exitCode().isEmpty() || s.phase().isActive() ? "-" : s.exitCode(),
          s == null ? "" : s.reason());
    }
    for (ClusterSubmission sub : run.submissions()) {
      if (sub.reportJobId() == null) {
        out.printf(
            Locale.ROOT,
            "report job of submission %d: not submitted (run `hopstat report DIR` once the array has ended)%n",
            sub.number());
        continue;
      }
      SlurmJobState s = byId.get(sub.reportJobId());
      out.printf(
          Locale.ROOT,
          "report job of submission %d: %s %s%s%n",
          sub.number(),
          sub.reportJobId(),
          s == null ? (states == null ? "?" : "forgotten by slurm") : s.phase().label(),
          s == null || s.reason().isEmpty() || s.reason().equals("None")
              ? ""
              : " (" + s.reason() + ")");
    }
    if (states != null
        && !states.isEmpty()
        && states.stream().noneMatch(x -> x.phase().isActive())) {
      List<Integer> missing =
          progress.stream().filter(p -> !p.complete()).map(ShardProgress::shard).toList();
      if (!missing.isEmpty()) {
        out.println(
            "no job of this run is queued or running, but shard(s) "
                + missing
                + " are incomplete: `hopstat resume DIR` resubmits them");
      }
    } else if (states != null
        && states.stream()
            .anyMatch(x -> x.phase() == JobPhase.PENDING || x.phase() == JobPhase.RUNNING)) {
      out.println("jobs are queued or running; the summary is rebuilt when the report job runs");
    }
  }
}
