package hopstat.cluster;

import hopstat.task.InvalidInputException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Writes hopstat's Slurm batch scripts (our own layout). The shard script is one job array whose
 * element k runs {@code hopstat shard DIR --index k}; the report script runs {@code hopstat report
 * DIR}. Resource requests are {@code #SBATCH} lines, so the script documents what was asked for;
 * the array range, the dependency and the user's {@code --extra} options go on the sbatch command
 * line because they change between submissions.
 */
public final class BatchScriptOps {

  /** Job logs, relative to the run directory. */
  public static final String LOG_DIR = "cluster/logs";

  private BatchScriptOps() {}

  /**
   * Checks that a run directory path can appear unquoted in {@code #SBATCH} lines and in Slurm's
   * file-name patterns ({@code %} is a pattern character there).
   *
   * @throws InvalidInputException (field {@code --out}) otherwise
   */
  public static void requireSafePath(Path dir) {
    String s = dir.toString();
    for (char c : s.toCharArray()) {
      if (Character.isWhitespace(c)
          || c == '%'
          || c == '\''
          || c == '"'
          || c == '\\'
          || c == '$'
          || c == '`') {
        throw new InvalidInputException(
            "--out",
            s,
            "a cluster run directory's path must not contain whitespace, quotes, %, $, ` or backslashes"
                + " (Slurm reads it in #SBATCH lines and file-name patterns)");
      }
    }
  }

  /** The job array script: element {@code $SLURM_ARRAY_TASK_ID} runs that shard. */
  public static String shardScript(String jobName, Path dir, ClusterRun run, int submission) {
    SlurmSubmitSpec o = run.options();
    List<String> lines =
        header(
            jobName,
            "shards of "
                + dir
                + ", submission "
                + submission
                + "; element k runs shard k of "
                + run.shardCount()
                + " (the grid points p with p mod "
                + run.shardCount()
                + " = k)");
    lines.add("#SBATCH --output=" + dir.resolve(LOG_DIR) + "/shard-%4a-job%A.out");
    lines.add("#SBATCH --nodes=1");
    lines.add("#SBATCH --ntasks=1");
    lines.add("#SBATCH --cpus-per-task=" + o.cpusPerTask());
    resources(lines, o);
    lines.add("");
    lines.add(
        "exec "
            + shellCommand(
                run.launcher().command(run.jvmOptions(), List.of("shard", dir.toString())))
            + " --index \"${SLURM_ARRAY_TASK_ID}\" --count "
            + run.shardCount()
            + " --threads "
            + o.cpusPerTask()
            + " --linalg "
            + run.linalg());
    return String.join("\n", lines) + "\n";
  }

  /** The report script: rebuilds summary.csv/json from whatever the journal holds. */
  public static String reportScript(String jobName, Path dir, ClusterRun run, int submission) {
    List<String> lines =
        header(
            jobName + "-report",
            "summary of "
                + dir
                + " after the shard array of submission "
                + submission
                + " has ended (whatever its outcome, so that a gap shows in the summary)");
    lines.add("#SBATCH --output=" + dir.resolve(LOG_DIR) + "/report-job%j.out");
    lines.add("#SBATCH --nodes=1");
    lines.add("#SBATCH --ntasks=1");
    lines.add("#SBATCH --cpus-per-task=1");
    resources(lines, run.options());
    lines.add("");
    lines.add(
        "exec "
            + shellCommand(
                run.launcher().command(run.jvmOptions(), List.of("report", dir.toString()))));
    return String.join("\n", lines) + "\n";
  }

  /** A Slurm job name from the spec name: letters, digits, {@code . _ -}, at most 40 characters. */
  public static String jobName(String specName) {
    String cleaned = specName.replaceAll("[^A-Za-z0-9._-]", "_");
    return "hopstat-" + (cleaned.length() > 40 ? cleaned.substring(0, 40) : cleaned);
  }

  /** POSIX shell single-quoting of each argument (plain words stay as they are). */
  public static String shellCommand(List<String> argv) {
    List<String> quoted = new ArrayList<>();
    for (String a : argv) {
      quoted.add(a.matches("[A-Za-z0-9_./:=@+,-]+") ? a : "'" + a.replace("'", "'\\''") + "'");
    }
    return String.join(" ", quoted);
  }

  private static List<String> header(String jobName, String what) {
    List<String> lines = new ArrayList<>();
    lines.add("#!/bin/bash");
    lines.add("# hopstat batch script: " + what + ".");
    lines.add("# Written by hopstat; resubmit through `hopstat resume DIR`, not by hand.");
    lines.add("#SBATCH --job-name=" + jobName);
    return lines;
  }

  private static void resources(List<String> lines, SlurmSubmitSpec o) {
    if (o.partition() != null) {
      lines.add("#SBATCH --partition=" + o.partition());
    }
    if (o.time() != null) {
      lines.add("#SBATCH --time=" + o.time().toUpperCase(Locale.ROOT));
    }
    if (o.mem() != null) {
      lines.add("#SBATCH --mem=" + o.mem().toUpperCase(Locale.ROOT));
    }
  }
}
