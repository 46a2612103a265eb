package hopstat.cluster;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Slurm's client commands, as hopstat uses them: {@code sbatch} to submit, {@code squeue} for
 * states (works without job accounting, unlike sacct) and {@code scontrol show job} for exit codes
 * and times. Output formats were checked against Slurm 22.05.
 */
public final class SlurmClient {

  private static final Pattern JOB_ID = Pattern.compile("(\\d+)(;.*)?");
  private static final Pattern SQUEUE_ID = Pattern.compile("(\\d+)(?:_(\\d+))?");
  private static final Pattern FIELD =
      Pattern.compile(
          "(?:^|\\s)(JobId|ArrayJobId|ArrayTaskId|JobState|Reason|ExitCode|StartTime|EndTime)=(\\S*)");

  private final CommandRunner runner;

  public SlurmClient(CommandRunner runner) {
    this.runner = runner;
  }

  /**
   * {@code sbatch --parsable OPTIONS SCRIPT}; returns the job id.
   *
   * @throws ClusterException with sbatch's message if sbatch refuses
   */
  public String submit(Path script, List<String> options) throws IOException, InterruptedException {
    List<String> argv = submitCommand(script, options);
    CommandOutput out = runner.run(argv);
    if (!out.isSuccess()) {
      throw new ClusterException(
          "sbatch refused the job (exit " + out.exitCode() + "): " + out.message());
    }
    Matcher m = JOB_ID.matcher(out.stdout().strip());
    if (!m.matches()) {
      throw new ClusterException("sbatch printed no job id: " + out.message());
    }
    return m.group(1);
  }

  /** The sbatch command line {@link #submit} runs. */
  public static List<String> submitCommand(Path script, List<String> options) {
    List<String> argv = new ArrayList<>();
    argv.add("sbatch");
    argv.add("--parsable");
    argv.addAll(options);
    argv.add(script.toString());
    return argv;
  }

  /**
   * States of the given jobs, one entry per array element ({@code squeue -h -t all -r}), merged
   * with exit codes and times from {@code scontrol -o show job}. Jobs that Slurm no longer
   * remembers (older than its MinJobAge) are simply absent.
   */
  public List<SlurmJobState> states(Collection<String> jobIds)
      throws IOException, InterruptedException {
    if (jobIds.isEmpty()) {
      return List.of();
    }
    CommandOutput q =
        runner.run(
            List.of(
                "squeue",
                "-h",
                "-t",
                "all",
                "-r",
                "-j",
                String.join(",", jobIds),
                "-o",
                "%i %T %r"));
    if (!q.isSuccess()) {
      if (q.message().contains("Invalid job id")) {
        return List.of();
      }
      throw new ClusterException("squeue failed (exit " + q.exitCode() + "): " + q.message());
    }
    Map<String, SlurmJobState> details = new HashMap<>();
    for (String id : jobIds) {
      CommandOutput s = runner.run(List.of("scontrol", "-o", "show", "job", id));
      if (s.isSuccess()) {
        for (SlurmJobState d : parseShowJob(s.stdout())) {
          details.put(d.displayId(), d);
        }
      } else if (!s.message().contains("Invalid job id")) {
        throw new ClusterException(
            "scontrol show job " + id + " failed (exit " + s.exitCode() + "): " + s.message());
      }
    }
    List<SlurmJobState> result = new ArrayList<>();
    for (SlurmJobState fromQueue : parseSqueue(q.stdout())) {
      SlurmJobState d = details.get(fromQueue.displayId());
      result.add(
          d == null
              ? fromQueue
              : new SlurmJobState(
                  fromQueue.jobId(),
                  fromQueue.arrayIndex(),
                  fromQueue.slurmState(),
                  fromQueue.reason(),
                  d.exitCode(),
                  d.startTime(),
                  d.endTime()));
    }
    return result;
  }

  /** Parses {@code squeue -h -r -o '%i %T %r'} lines ({@code 123_4 FAILED NonZeroExitCode}). */
  static List<SlurmJobState> parseSqueue(String text) {
    List<SlurmJobState> states = new ArrayList<>();
    for (String line : text.lines().map(String::strip).filter(l -> !l.isEmpty()).toList()) {
      String[] parts = line.split("\\s+", 3);
      Matcher m = SQUEUE_ID.matcher(parts[0]);
      if (parts.length < 2 || !m.matches()) {
        throw new ClusterException("unexpected squeue output line: " + line);
      }
      int index = m.group(2) == null ? -1 : Integer.parseInt(m.group(2));
      states.add(
          new SlurmJobState(
              m.group(1), index, parts[1], parts.length > 2 ? parts[2] : "", "", null, null));
    }
    return states;
  }

  /**
   * Parses {@code scontrol -o show job} (one line per job or array element). For an array, each
   * element that has started has its own line ({@code ArrayJobId=..., ArrayTaskId=k}); elements
   * still pending share one line whose ArrayTaskId is a range list ({@code 1-3,5}, maybe with a
   * {@code %limit}); such lines are expanded to one state per element.
   */
  static List<SlurmJobState> parseShowJob(String text) {
    List<SlurmJobState> states = new ArrayList<>();
    for (String line : text.lines().map(String::strip).filter(l -> !l.isEmpty()).toList()) {
      Map<String, String> f = new LinkedHashMap<>();
      Matcher m = FIELD.matcher(line);
      while (m.find()) {
        f.putIfAbsent(m.group(1), m.group(2));
      }
      if (!f.containsKey("JobId") || !f.containsKey("JobState")) {
        throw new ClusterException("unexpected scontrol output line: " + line);
      }
      String arrayJob = f.get("ArrayJobId");
      String tasks = f.get("ArrayTaskId");
      if (arrayJob == null || tasks == null) {
        states.add(
            new SlurmJobState(
                f.get("JobId"),
                -1,
                f.get("JobState"),
                f.get("Reason"),
                f.get("ExitCode"),
                f.get("StartTime"),
                f.get("EndTime")));
        continue;
      }
      for (int index : expandIndices(tasks)) {
        states.add(
            new SlurmJobState(
                arrayJob,
                index,
                f.get("JobState"),
                f.get("Reason"),
                f.get("ExitCode"),
                f.get("StartTime"),
                f.get("EndTime")));
      }
    }
    return states;
  }

  /** Expands Slurm's index list {@code 0-3,5,7-11:2%4} to the indices it names. */
  static List<Integer> expandIndices(String list) {
    String body = list.contains("%") ? list.substring(0, list.indexOf('%')) : list;
    List<Integer> out = new ArrayList<>();
    for (String part : body.split(",")) {
      int step = 1;
      String range = part;
      if (part.contains(":")) {
        step = Integer.parseInt(part.substring(part.indexOf(':') + 1));
        range = part.substring(0, part.indexOf(':'));
      }
      if (range.contains("-")) {
        int from = Integer.parseInt(range.substring(0, range.indexOf('-')));
        int to = Integer.parseInt(range.substring(range.indexOf('-') + 1));
        for (int i = from; i <= to; i += step) {
          out.add(i);
        }
      } else {
        out.add(Integer.parseInt(range));
      }
    }
    return out;
  }

  /** Compresses ascending indices to Slurm's array syntax: {@code [0,1,2,5]} → {@code 0-2,5}. */
  public static String indexList(List<Integer> ascending) {
    StringBuilder sb = new StringBuilder();
    int i = 0;
    while (i < ascending.size()) {
      int j = i;
      while (j + 1 < ascending.size() && ascending.get(j + 1) == ascending.get(j) + 1) {
        j++;
      }
      if (sb.length() > 0) {
        sb.append(',');
      }
      sb.append(ascending.get(i));
      if (j > i) {
        sb.append('-').append(ascending.get(j));
      }
      i = j + 1;
    }
    return sb.toString();
  }
}
