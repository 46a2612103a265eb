package hopstat.pool;

import static hopstat.testing.SpecJson.aQwzSpec;
import static org.assertj.core.api.Assertions.assertThat;

import hopstat.cli.ExitCode;
import hopstat.expand.GridExpander;
import hopstat.expand.StudyPlan;
import hopstat.linalg.LinalgKind;
import hopstat.queue.JournalReader;
import hopstat.queue.JournalWriter;
import hopstat.queue.RunDirectory;
import hopstat.record.RealisationRecord;
import hopstat.spec.SpecParser;
import hopstat.testing.Cli;
import hopstat.testing.SpecJson;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** End-to-end runs on the local pool: determinism, resume, adaptive sampling, failure isolation. */
class LocalRunTest {

  @TempDir Path tmp;

  private static SpecJson smallStudy() {
    return aQwzSpec().sweep("W", 0, 2, 4, 6).sizes(4, 6).realisations(5);
  }

  @Test
  void oneAndTwoThreadsGiveIdenticalRecordsAndSummaries() throws IOException {
    Path spec = smallStudy().writeTo(tmp.resolve("spec.json"));
    assertThat(
            Cli.run(
                    "run",
                    spec.toString(),
                    "--out",
                    tmp.resolve("one").toString(),
                    "--threads",
                    "1",
                    "--quiet")
                .exitCode())
        .isEqualTo(ExitCode.OK);
    assertThat(
            Cli.run(
                    "run",
                    spec.toString(),
                    "--out",
                    tmp.resolve("two").toString(),
                    "--threads",
                    "2",
                    "--quiet")
                .exitCode())
        .isEqualTo(ExitCode.OK);
    assertThat(valuesByTask(tmp.resolve("two")))
        .isEqualTo(valuesByTask(tmp.resolve("one")))
        .hasSize(40);
    assertThat(Files.readString(tmp.resolve("two/summary.csv")))
        .isEqualTo(Files.readString(tmp.resolve("one/summary.csv")));
    assertThat(Files.readString(tmp.resolve("two/summary.json")))
        .isEqualTo(Files.readString(tmp.resolve("one/summary.json")));
  }

  @Test
  void reportRegeneratesTheSameSummaryFromTheJournalAlone() throws IOException {
    Path spec = smallStudy().writeTo(tmp.resolve("spec.json"));
    Path out = tmp.resolve("run");
    Cli.run("run", spec.toString(), "--out", out.toString(), "--threads", "2", "--quiet");
    String csv = Files.readString(out.resolve("summary.csv"));
    String json = Files.readString(out.resolve("summary.json"));
    Files.delete(out.resolve("summary.csv"));
    Files.delete(out.resolve("summary.json"));
    Cli.Outcome o = Cli.run("report", out.toString());
    assertThat(o.exitCode()).isEqualTo(ExitCode.OK);
    assertThat(Files.readString(out.resolve("summary.csv"))).isEqualTo(csv);
    assertThat(Files.readString(out.resolve("summary.json"))).isEqualTo(json);
    // The original columns stay first and in order; later columns are only ever appended (pinned by
    // results' golden files).
    assertThat(csv.lines().findFirst().orElseThrow())
        .startsWith(
            "W,L,observable,n,mean,stderr,ci95_low,ci95_high,std,median,min,max,failed,modal,modal_fraction,non_quantised,max_int_distance,");
    assertThat(out.resolve("report.html")).exists();
    assertThat(out.resolve("results.h5")).exists();
    assertThat(csv.lines().count()).isEqualTo(1 + 8 * 4);
  }

  @Test
  void interruptedRunResumesToTheSameSummaryWithNothingDoneTwice() throws Exception {
    String text = smallStudy().text();
    Path whole = tmp.resolve("whole");
    Path cut = tmp.resolve("cut");
    Files.writeString(tmp.resolve("spec.json"), text);
    Cli.run(
        "run",
        tmp.resolve("spec.json").toString(),
        "--out",
        whole.toString(),
        "--threads",
        "2",
        "--quiet");

    RunDirectory dir =
        RunDirectory.create(cut, text, Map.of("specHash", SpecParser.parse(text).specHash()));
    StudyPlan plan = GridExpander.expand(SpecParser.parse(text));
    runUntilStopped(plan, dir, 13);
    assertThat(JournalReader.read(dir.journalDir()).records()).hasSizeBetween(13, 15);
    Cli.Outcome resumed = Cli.run("resume", cut.toString(), "--threads", "2", "--quiet");
    assertThat(resumed.exitCode()).as(resumed.err()).isEqualTo(ExitCode.OK);
    assertThat(Files.readString(cut.resolve("summary.json")))
        .isEqualTo(Files.readString(whole.resolve("summary.json")));
    assertThat(totalLines(cut)).isEqualTo(40);
  }

  @Test
  void adaptiveSamplingStopsAtTheTargetAndIsReproducibleAcrossThreadsAndInterruptions()
      throws Exception {
    // Points deep in a phase (W = 0, 0.5) have zero variance and stop at the minimum; points with
    // strong disorder keep sampling until the stderr target or the maximum.
    String text =
        aQwzSpec().sweep("W", 0, 0.5, 7, 9).sizes(4).adaptive(4, 24, 4, "gap", 0.05).text();
    Path a = tmp.resolve("a");
    Path b = tmp.resolve("b");
    Files.writeString(tmp.resolve("spec.json"), text);
    Cli.run(
        "run",
        tmp.resolve("spec.json").toString(),
        "--out",
        a.toString(),
        "--threads",
        "1",
        "--quiet");
    RunDirectory dir =
        RunDirectory.create(b, text, Map.of("specHash", SpecParser.parse(text).specHash()));
    runUntilStopped(GridExpander.expand(SpecParser.parse(text)), dir, 9);
    assertThat(Cli.run("resume", b.toString(), "--threads", "2", "--quiet").exitCode())
        .isEqualTo(ExitCode.OK);

    Map<String, Map<String, Double>> ra = valuesByTask(a);
    assertThat(valuesByTask(b)).isEqualTo(ra);
    Map<Integer, Long> perPoint = new TreeMap<>();
    for (String id : ra.keySet()) {
      perPoint.merge(Integer.parseInt(id.substring(1, id.indexOf('-'))), 1L, Long::sum);
    }
    assertThat(perPoint.get(0)).isEqualTo(4L);
    assertThat(perPoint.get(1)).isEqualTo(4L);
    assertThat(perPoint.get(3)).isGreaterThan(4L);
    assertThat(perPoint.values()).allSatisfy(n -> assertThat(n % 4).isZero());
    assertThat(Files.readString(b.resolve("summary.json")))
        .isEqualTo(Files.readString(a.resolve("summary.json")));
  }

  @Test
  void failingRealisationsAreIsolatedJournaledAndCounted() throws IOException {
    // E_F = 40 lies outside the spectrum (|E| <= 2 + |m| + W/2 here), so every realisation at
    // those points fails with a reason while the others complete.
    Path spec =
        aQwzSpec()
            .sweep("W", 0, 2)
            .sweep("fermiEnergy", 0, 40)
            .sizes(4)
            .realisations(3)
            .observables("gap")
            .writeTo(tmp.resolve("spec.json"));
    Path out = tmp.resolve("run");
    Cli.Outcome o =
        Cli.run("run", spec.toString(), "--out", out.toString(), "--threads", "2", "--quiet");
    assertThat(o.exitCode()).isEqualTo(ExitCode.SOME_FAILED);
    assertThat(o.err()).contains("6 realisation(s) FAILED");
    String json = Files.readString(out.resolve("summary.json"));
    assertThat(json).contains("\"failed\" : 3").contains("lies outside the spectrum");
    List<RealisationRecord> records =
        List.copyOf(JournalReader.read(out.resolve("journal")).records().values());
    assertThat(records).hasSize(12);
    assertThat(records.stream().filter(r -> r.result().failure() != null)).hasSize(6);
  }

  @Test
  void runRefusesADirectoryThatAlreadyHoldsARun() throws IOException {
    Path spec = smallStudy().realisations(1).writeTo(tmp.resolve("spec.json"));
    Path out = tmp.resolve("run");
    Cli.run("run", spec.toString(), "--out", out.toString(), "--threads", "1", "--quiet");
    Cli.Outcome again =
        Cli.run("run", spec.toString(), "--out", out.toString(), "--threads", "1", "--quiet");
    assertThat(again.exitCode()).isEqualTo(ExitCode.RUNTIME_FAILURE);
    assertThat(again.err()).contains("already holds a run").contains("hopstat resume");
  }

  @Test
  void statusShowsProgressPerPoint() throws IOException {
    Path spec = smallStudy().writeTo(tmp.resolve("spec.json"));
    Path out = tmp.resolve("run");
    Cli.run("run", spec.toString(), "--out", out.toString(), "--threads", "2", "--quiet");
    Cli.Outcome o = Cli.run("status", out.toString());
    assertThat(o.exitCode()).isEqualTo(ExitCode.OK);
    assertThat(o.out())
        .contains("40 of 40 realisations journaled (0 failed); no process is working on it")
        .contains("bott (mean ± stderr)")
        .contains("done/planned")
        .contains("  5/5  0  ");
  }

  private static void runUntilStopped(StudyPlan plan, RunDirectory dir, int stopAfter)
      throws Exception {
    LocalPoolBackend backend = new LocalPoolBackend(Clock.systemUTC());
    AtomicInteger finished = new AtomicInteger();
    RunResult r =
        backend.execute(
            plan,
            dir,
            new RunOptions(
                2, LinalgKind.NATIVE, "part", Shard.ALL, JournalWriter.DEFAULT_SYNC_INTERVAL_NANOS),
            new ProgressListener() {
              @Override
              public void finished(RealisationRecord record) {
                if (finished.incrementAndGet() == stopAfter) {
                  backend.requestStop();
                }
              }
            });
    assertThat(r.stoppedEarly()).isTrue();
  }

  private static Map<String, Map<String, Double>> valuesByTask(Path run) throws IOException {
    Map<String, Map<String, Double>> m = new TreeMap<>(Comparator.naturalOrder());
    for (RealisationRecord r : JournalReader.read(run.resolve("journal")).records().values()) {
      m.put(r.result().taskId(), r.result().values());
    }
    return m;
  }

  private static long totalLines(Path run) throws IOException {
    long n = 0;
    try (var files = Files.list(run.resolve("journal"))) {
      for (Path p : (Iterable<Path>) files::iterator) {
        n += Files.readAllLines(p).size();
      }
    }
    return n;
  }
}
