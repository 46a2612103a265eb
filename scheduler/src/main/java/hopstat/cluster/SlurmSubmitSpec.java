package hopstat.cluster;

import hopstat.task.InvalidInputException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Pattern;

/**
 * The user's Slurm options for a cluster run, validated. Field paths in errors are the command line
 * options ({@code --tasks}, {@code --time}, ...). What only the cluster knows (does the partition
 * exist, is the time within its limit) is left to sbatch, whose refusal is reported with its own
 * message.
 *
 * @param tasks shards asked for, ≥ 1 (the run uses at most one shard per grid point)
 * @param partition partition name (or comma list), null for the cluster's default
 * @param time wall-time limit per shard in a Slurm time format ({@code HH:MM:SS}, {@code
 *     D-HH:MM:SS}, {@code MM}, ...), null for the partition's default
 * @param cpusPerTask CPUs per shard, which is also the shard's worker threads, 1 to 4096
 * @param mem memory per shard in Slurm's notation (number with optional K/M/G/T; plain = MiB), null
 *     for the partition's default
 * @param extra further sbatch options, one argument per element, passed to both the shard array and
 *     the report job (e.g. {@code --account=phys}, {@code --qos=short})
 */
public record SlurmSubmitSpec(
    int tasks, String partition, String time, int cpusPerTask, String mem, List<String> extra) {

  /**
   * Slurm's accepted time formats: minutes, minutes:seconds, hours:minutes:seconds,
   * days-hours[:minutes[:seconds]].
   */
  private static final Pattern TIME =
      Pattern.compile(
          "\\d+(:\\d{1,2}){0,2}|\\d+-\\d{1,2}(:\\d{1,2}){0,2}|UNLIMITED|INFINITE",
          Pattern.CASE_INSENSITIVE);

  private static final Pattern MEM = Pattern.compile("\\d+[KMGT]?", Pattern.CASE_INSENSITIVE);
  private static final Pattern PARTITION =
      Pattern.compile("[A-Za-z0-9_.\\-]+(,[A-Za-z0-9_.\\-]+)*");

  /** Options hopstat sets itself; in --extra they would silently break the run's layout. */
  private static final Set<String> RESERVED =
      Set.of(
          "-a",
          "--array",
          "-d",
          "--dependency",
          "--parsable",
          "-o",
          "--output",
          "-e",
          "--error",
          "--wrap",
          "-c",
          "--cpus-per-task",
          "-p",
          "--partition",
          "-t",
          "--time",
          "--mem",
          "-J",
          "--job-name",
          "-n",
          "--ntasks",
          "-N",
          "--nodes",
          "-D",
          "--chdir",
          "--test-only",
          "-H",
          "--hold");

  public SlurmSubmitSpec {
    extra = List.copyOf(extra == null ? List.of() : extra);
    InvalidInputException.Collector problems = new InvalidInputException.Collector();
    if (tasks < 1) {
      problems.add(
          "--tasks",
          tasks,
          "must be at least 1 (the number of shards, one Slurm array element each)");
    }
    if (cpusPerTask < 1 || cpusPerTask > 4096) {
      problems.add(
          "--cpus-per-task",
          cpusPerTask,
          "must be from 1 to 4096 (each shard runs this many worker threads)");
    }
    if (partition != null && !PARTITION.matcher(partition).matches()) {
      problems.add(
          "--partition",
          partition,
          "not a partition name (letters, digits, _ . -; several separated by commas)");
    }
    if (time != null && !TIME.matcher(time).matches()) {
      problems.add("--time", time, "not a Slurm time limit; use HH:MM:SS, D-HH:MM:SS or minutes");
    }
    if (mem != null && !MEM.matcher(mem).matches()) {
      problems.add(
          "--mem",
          mem,
          "not a Slurm memory size; use a number with an optional unit K, M, G or T (plain numbers are MiB), e.g. 4G");
    }
    for (String token : extra) {
      String option = token.contains("=") ? token.substring(0, token.indexOf('=')) : token;
      if (RESERVED.contains(option)) {
        problems.add(
            "--extra",
            token,
            "hopstat sets " + option + " itself; use the matching hopstat option or leave it out");
      }
    }
    problems.throwIfAny();
  }

  /**
   * Splits the text of {@code --extra} into sbatch arguments: whitespace separates, single or
   * double quotes group (no escapes, no variables: nothing runs through a shell).
   *
   * @throws InvalidInputException (field {@code --extra}) on an unclosed quote
   */
  public static List<String> splitExtra(String text) {
    List<String> tokens = new ArrayList<>();
    if (text == null) {
      return tokens;
    }
    StringBuilder current = new StringBuilder();
    boolean inToken = false;
    char quote = 0;
    for (int i = 0; i < text.length(); i++) {
      char c = text.charAt(i);
      if (quote != 0) {
        if (c == quote) {
          quote = 0;
        } else {
          current.append(c);
        }
      } else if (c == '\'' || c == '"') {
        quote = c;
        inToken = true;
      } else if (Character.isWhitespace(c)) {
        if (inToken) {
          tokens.add(current.toString());
          current.setLength(0);
          inToken = false;
        }
      } else {
        current.append(c);
        inToken = true;
      }
    }
    if (quote != 0) {
      throw new InvalidInputException("--extra", text, "unclosed " + quote + " quote");
    }
    if (inToken) {
      tokens.add(current.toString());
    }
    return tokens;
  }

  /** The memory request in MiB, or -1 when none was given (for the shard JVM's heap limit). */
  public long memMebibytes() {
    if (mem == null) {
      return -1;
    }
    String m = mem.toUpperCase(Locale.ROOT);
    char unit = m.charAt(m.length() - 1);
    long number = Long.parseLong(Character.isDigit(unit) ? m : m.substring(0, m.length() - 1));
    return switch (unit) {
      case 'K' -> number / 1024;
      case 'G' -> number * 1024;
      case 'T' -> number * 1024 * 1024;
      default -> number;
    };
  }

  /** This spec with the given options replaced where they are non-null (for resubmission). */
  public SlurmSubmitSpec withOverrides(
      String newPartition, String newTime, String newMem, List<String> newExtra) {
    return new SlurmSubmitSpec(
        tasks,
        newPartition != null ? newPartition : partition,
        newTime != null ? newTime : time,
        cpusPerTask,
        newMem != null ? newMem : mem,
        newExtra != null ? newExtra : extra);
  }
}
