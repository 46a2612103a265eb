package hopstat.pool;

import static hopstat.testing.SpecJson.aQwzSpec;
import static org.assertj.core.api.Assertions.assertThat;

import hopstat.cli.ExitCode;
import hopstat.queue.JournalReader;
import hopstat.testing.Cli;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Ctrl-C (SIGINT) on a run in a child JVM: in-flight realisations finish, the journal stays clean,
 * resume completes.
 */
class InterruptTest {

  @TempDir Path tmp;

  @Test
  void sigintStopsCleanlyAndResumeCompletes() throws Exception {
    Path spec =
        aQwzSpec()
            .sweep("W", 0, 2, 4)
            .sizes(6, 8)
            .realisations(30)
            .writeTo(tmp.resolve("spec.json"));
    Path reference = tmp.resolve("reference");
    assertThat(
            Cli.run(
                    "run",
                    spec.toString(),
                    "--out",
                    reference.toString(),
                    "--threads",
                    "2",
                    "--quiet")
                .exitCode())
        .isEqualTo(ExitCode.OK);

    Path out = tmp.resolve("interrupted");
    List<String> command =
        new ArrayList<>(
            List.of(
                Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp",
                System.getProperty(
                    "surefire.test.class.path", System.getProperty("java.class.path")),
                "hopstat.cli.HopstatCommand",
                "run",
                spec.toString(),
                "--out",
                out.toString(),
                "--threads",
                "2",
                "--quiet"));
    Process child =
        new ProcessBuilder(command)
            .redirectOutput(ProcessBuilder.Redirect.DISCARD)
            .redirectError(ProcessBuilder.Redirect.DISCARD)
            .start();
    long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
    while (child.isAlive() && journaled(out) < 10 && System.nanoTime() < deadline) {
      Thread.sleep(20);
    }
    assertThat(child.isAlive()).as("the run must still be going when interrupted").isTrue();
    new ProcessBuilder("kill", "-INT", Long.toString(child.pid())).start().waitFor();
    assertThat(child.waitFor(40, TimeUnit.SECONDS))
        .as("the run stops within the grace period")
        .isTrue();

    JournalReader.Contents contents = JournalReader.read(out.resolve("journal"));
    assertThat(contents.tornLines()).as("a graceful stop leaves no torn line").isEmpty();
    assertThat(contents.records().size()).isBetween(10, 179);

    Cli.Outcome resumed = Cli.run("resume", out.toString(), "--threads", "2", "--quiet");
    assertThat(resumed.exitCode()).as(resumed.err()).isEqualTo(ExitCode.OK);
    assertThat(Files.readString(out.resolve("summary.json")))
        .isEqualTo(Files.readString(reference.resolve("summary.json")));
  }

  private static long journaled(Path run) throws Exception {
    Path journal = run.resolve("journal");
    if (!Files.isDirectory(journal)) {
      return 0;
    }
    long n = 0;
    try (var files = Files.list(journal)) {
      for (Path p : (Iterable<Path>) files::iterator) {
        n += Files.readString(p).chars().filter(c -> c == '\n').count();
      }
    }
    return n;
  }
}
