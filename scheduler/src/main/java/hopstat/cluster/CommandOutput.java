package hopstat.cluster;

import java.util.Objects;

/**
 * What an external command printed and how it exited.
 *
 * @param exitCode the process exit status (0 = success)
 * @param stdout standard output, UTF-8
 * @param stderr standard error, UTF-8
 */
public record CommandOutput(int exitCode, String stdout, String stderr) {
  public CommandOutput {
    Objects.requireNonNull(stdout, "stdout");
    Objects.requireNonNull(stderr, "stderr");
  }

  /** True if the command exited with status 0. */
  public boolean isSuccess() {
    return exitCode == 0;
  }

  /** Standard error, else standard output, trimmed to one line per message: for error reports. */
  public String message() {
    String text = stderr.isBlank() ? stdout : stderr;
    return String.join(
        " / ", text.strip().lines().map(String::strip).filter(s -> !s.isEmpty()).toList());
  }
}
