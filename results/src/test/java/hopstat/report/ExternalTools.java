package hopstat.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assumptions;

/**
 * Runs external checking tools (h5dump, chromium). A test needing one skips when it is absent,
 * except under CI (environment variable CI=true), where a missing tool fails the test so checks
 * cannot be skipped silently.
 */
final class ExternalTools {

  private ExternalTools() {}

  /** Skips (or, under CI, fails) unless the executable exists. */
  static void require(Path executable, String debianPackage) {
    boolean present = Files.isExecutable(executable);
    if ("true".equals(System.getenv("CI"))) {
      assertThat(present)
          .as("%s is required under CI=true (Debian package %s)", executable, debianPackage)
          .isTrue();
    }
    Assumptions.assumeTrue(
        present, executable + " not installed (Debian package " + debianPackage + ")");
  }

  /** Output of a finished process (stdout and stderr kept apart, both captured to files). */
  record Run(int exitCode, String stdout, String stderr) {}

  static Run run(Path workDir, long timeoutSeconds, String... command)
      throws IOException, InterruptedException {
    Path out = Files.createTempFile(workDir, "out", ".txt");
    Path err = Files.createTempFile(workDir, "err", ".txt");
    Process p =
        new ProcessBuilder(new ArrayList<>(List.of(command)))
            .redirectOutput(out.toFile())
            .redirectError(err.toFile())
            .start();
    if (!p.waitFor(timeoutSeconds, TimeUnit.SECONDS)) {
      p.destroyForcibly();
      throw new AssertionError(
          String.join(" ", command) + " did not finish within " + timeoutSeconds + " s");
    }
    return new Run(p.exitValue(), Files.readString(out), Files.readString(err));
  }
}
