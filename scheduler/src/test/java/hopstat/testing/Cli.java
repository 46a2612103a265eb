package hopstat.testing;

import hopstat.cli.HopstatCommand;
import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;

/** Runs the command line in-process and captures its output (tests stay silent). */
public final class Cli {

  /**
   * @param exitCode the command's exit code
   * @param out what it printed on stdout
   * @param err what it printed on stderr
   */
  public record Outcome(int exitCode, String out, String err) {}

  private Cli() {}

  public static Outcome run(String... args) {
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    ByteArrayOutputStream err = new ByteArrayOutputStream();
    int code =
        HopstatCommand.execute(
            args,
            new PrintStream(out, true, StandardCharsets.UTF_8),
            new PrintStream(err, true, StandardCharsets.UTF_8));
    return new Outcome(
        code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
  }
}
