package hopstat.serve;

import static org.assertj.core.api.Assertions.assertThat;

import hopstat.cli.ExitCode;
import hopstat.cli.HopstatCommand;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;

/** What {@code hopstat run} says about a bad spec: the reference for the service's messages. */
final class CliErrors {

  private CliErrors() {}

  /**
   * The stderr lines of {@code hopstat run SPEC --out DIR} for a spec that fails validation (exit
   * 2).
   */
  static List<String> runErrorLines(Path scratch, String specText) throws IOException {
    Path spec =
        Files.writeString(scratch.resolve("cli-bad.json"), specText, StandardCharsets.UTF_8);
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    ByteArrayOutputStream err = new ByteArrayOutputStream();
    int code =
        HopstatCommand.execute(
            new String[] {
              "run",
              spec.toString(),
              "--out",
              scratch.resolve("cli-out").toString(),
              "--quiet",
              "--linalg",
              "java"
            },
            new PrintStream(out, true, StandardCharsets.UTF_8),
            new PrintStream(err, true, StandardCharsets.UTF_8));
    assertThat(code).isEqualTo(ExitCode.BAD_INPUT);
    return Arrays.asList(err.toString(StandardCharsets.UTF_8).split("\n"));
  }
}
