package hopstat.pool;

import static hopstat.testing.SpecJson.aQwzSpec;
import static org.assertj.core.api.Assertions.assertThat;

import hopstat.cli.ExitCode;
import hopstat.queue.JournalCodec;
import hopstat.testing.Cli;
import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A run in a child JVM is killed with SIGKILL at random moments, several times, and resumed: no
 * realisation is lost or journaled twice, and the summary equals an uninterrupted run's.
 */
class KillAndResumeTest {

  @TempDir Path tmp;

  @Test
  void killNineAtRandomMomentsLosesNothing() throws Exception {
    Path spec =
        aQwzSpec()
            .sweep("W", 0, 1, 2, 3, 4, 5)
            .sizes(6, 8)
            .realisations(16)
            .writeTo(tmp.resolve("spec.json"));
    int planned = 6 * 2 * 16;
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

    Path out = tmp.resolve("killed");
    Random random = new Random(20261201L);
    int kills = 0;
    for (int attempt = 0; attempt < 4 && kills < 3; attempt++) {
      List<String> args =
          attempt == 0
              ? List.of(
                  "run", spec.toString(), "--out", out.toString(), "--threads", "2", "--quiet")
              : List.of("resume", out.toString(), "--threads", "2", "--quiet");
      Process child = startChild(args);
      // Wait until some realisations are journaled, then a random extra delay, then SIGKILL.
      long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
      while (child.isAlive()
          && countRecords(out) < 5 + 20 * attempt
          && System.nanoTime() < deadline) {
        Thread.sleep(20);
      }
      Thread.sleep(random.nextInt(400));
      if (child.isAlive()) {
        child.destroyForcibly();
        kills++;
      }
      child.waitFor(30, TimeUnit.SECONDS);
    }
    assertThat(kills).as("the runs must have been killed mid-way").isGreaterThanOrEqualTo(2);
    assertThat(countRecords(out)).isLessThan(planned);

    Cli.Outcome last = Cli.run("resume", out.toString(), "--threads", "2", "--quiet");
    assertThat(last.exitCode()).as(last.err()).isEqualTo(ExitCode.OK);

    Set<String> ids = new HashSet<>();
    List<String> duplicates = new ArrayList<>();
    for (String line : journalLines(out)) {
      try {
        String id = JournalCodec.decode(line).result().taskId();
        if (!ids.add(id)) {
          duplicates.add(id);
        }
      } catch (IllegalArgumentException torn) {
        // a torn final line of a killed writer: dropped by the reader, redone on resume
      }
    }
    assertThat(duplicates).isEmpty();
    assertThat(ids).hasSize(planned);
    assertThat(Files.readString(out.resolve("summary.json")))
        .isEqualTo(Files.readString(reference.resolve("summary.json")));
    assertThat(Files.readString(out.resolve("summary.csv")))
        .isEqualTo(Files.readString(reference.resolve("summary.csv")));
  }

  private static Process startChild(List<String> args) throws IOException {
    String classpath =
        System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
    List<String> command = new ArrayList<>();
    command.add(Path.of(System.getProperty("java.home"), "bin", "java").toString());
    command.add("-cp");
    command.add(classpath);
    command.add("hopstat.cli.HopstatCommand");
    command.addAll(args);
    return new ProcessBuilder(command)
        .redirectOutput(ProcessBuilder.Redirect.DISCARD)
        .redirectError(ProcessBuilder.Redirect.DISCARD)
        .start();
  }

  private static long countRecords(Path run) throws IOException {
    return journalLines(run).stream().filter(l -> l.endsWith("\"}")).count();
  }

  private static List<String> journalLines(Path run) throws IOException {
    List<String> lines = new ArrayList<>();
    Path journal = run.resolve("journal");
    if (!Files.isDirectory(journal)) {
      return lines;
    }
    File[] files = journal.toFile().listFiles((d, n) -> n.endsWith(".jsonl"));
    if (files == null) {
      return lines;
    }
    for (File f : files) {
      String text = Files.readString(f.toPath());
      for (String l : text.split("\n")) {
        if (!l.isEmpty()) {
          lines.add(l);
        }
      }
    }
    return lines;
  }
}
