package hopstat.queue;

import hopstat.record.RealisationRecord;
import hopstat.task.Outcome;
import hopstat.task.RealisationResult;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;

/**
 * Benchmark (not a test): cost of one journal append with fsync after every record versus at most
 * once a second. Behind the default in {@link JournalWriter#DEFAULT_SYNC_INTERVAL_NANOS}.
 *
 * <pre>
 * mvn -q -B -DskipTests install
 * java -cp scheduler/target/hopstat.jar:scheduler/target/test-classes hopstat.queue.JournalSyncBenchmark DIR
 * </pre>
 */
public final class JournalSyncBenchmark {

  private JournalSyncBenchmark() {}

  public static void main(String[] args) throws IOException {
    Path dir = Files.createTempDirectory(Path.of(args.length > 0 ? args[0] : "."), "journal-sync");
    int records = 2000;
    for (int round = 0; round < 2; round++) {
      for (long interval : new long[] {0L, JournalWriter.DEFAULT_SYNC_INTERVAL_NANOS}) {
        Path file = dir.resolve("round" + round + "-" + interval + ".jsonl");
        long start = System.nanoTime();
        try (JournalWriter w = new JournalWriter(file, interval)) {
          for (int i = 0; i < records; i++) {
            RealisationResult r =
                new RealisationResult(
                    "p0-r" + i,
                    0,
                    i,
                    i,
                    Outcome.DONE,
                    Map.of("gap", 0.1 * i, "bott", -1.0),
                    null,
                    0.01);
            w.append(
                new RealisationRecord(
                    r,
                    Map.of("W", 1.0, "L", 8.0),
                    Map.of("m", 1.0, "W", 1.0, "L", 8.0),
                    "bench",
                    "none"));
          }
        }
        double micros = (System.nanoTime() - start) / 1e3 / records;
        System.out.printf(
            Locale.ROOT,
            "round %d, fsync %s: %.1f us per record%n",
            round,
            interval == 0 ? "every record" : "at most 1/s",
            micros);
      }
    }
  }
}
