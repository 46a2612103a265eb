package hopstat.cli;

import hopstat.cluster.ShardLock;
import hopstat.expand.MemoryCheck;
import hopstat.expand.StudyPlan;
import hopstat.pool.LocalPoolBackend;
import hopstat.pool.RunOptions;
import hopstat.pool.RunResult;
import hopstat.pool.Shard;
import hopstat.queue.JournalWriter;
import hopstat.queue.RunDirectory;
import hopstat.queue.RunDirectoryException;
import hopstat.task.InvalidInputException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

/**
 * {@code hopstat shard DIR --index K --count N --threads C} (hidden): one element of a cluster
 * run's job array. Runs the local pool on the grid points p with {@code p mod N = K}, writing the
 * journal file {@code journal/shard-KKKK-*.jsonl}; takes the shard's own lock and a shared hold on
 * the run directory, never the run-wide lock (see {@link ShardLock}).
 *
 * <p>Exit codes: 0 when the shard is complete (FAILED realisations are recorded outcomes, they show
 * in the summary), 4 when it was stopped first (e.g. SIGTERM at the time limit; the journal keeps
 * what is done), 1 on a runtime failure, 2 on bad arguments.
 *
 * <p><b>Test hook:</b> if the file {@code DIR/cluster/fault-shard-KKKK} exists, the shard prints
 * that it is failing on purpose and exits 1 before touching the journal. The cluster tests use it
 * to stand for a crashed shard; delete the file to let the shard run again.
 */
@Command(
    mixinStandardHelpOptions = true,
    name = "shard",
    hidden = true,
    description = "Run one shard of a cluster run (called by the job array script).")
final class ShardCommand implements Callable<Integer> {

  @ParentCommand HopstatCommand root;

  @Parameters(
      index = "0",
      paramLabel = "DIR",
      description = "Run directory made by `hopstat submit`.")
  Path dirPath;

  @Option(
      names = "--index",
      required = true,
      paramLabel = "K",
      description = "Shard index, 0 <= K < N.")
  int index;

  @Option(names = "--count", required = true, paramLabel = "N", description = "Number of shards.")
  int count;

  @Option(
      names = "--threads",
      paramLabel = "C",
      defaultValue = "1",
      description = "Worker threads.")
  int threads;

  @Option(
      names = "--linalg",
      paramLabel = "KIND",
      defaultValue = LinalgChoice.DEFAULT,
      description = "Dense linear algebra: auto, native, java.")
  String linalg;

  /** The file whose presence makes shard K fail on purpose (test hook). */
  static Path faultFile(Path dir, int shard) {
    return dir.resolve("cluster").resolve(String.format(Locale.ROOT, "fault-shard-%04d", shard));
  }

  @Override
  public Integer call() throws Exception {
    if (count < 1 || index < 0 || index >= count) {
      throw new InvalidInputException(
          "--index", index, "need 0 <= --index < --count (" + count + ")");
    }
    int n = RunCommand.threads(threads);
    Shard shard = new Shard(index, count);
    RunDirectory dir = RunDirectory.open(dirPath);
    StudyPlan plan = RunSummaries.plan(dir);
    String recorded = dir.runMetadata().path("specHash").asText();
    if (!recorded.equals(plan.spec().specHash())) {
      throw new RunDirectoryException(
          dir.specFile()
              + " no longer matches the spec this run started with (hash "
              + recorded
              + ")");
    }
    if (Files.exists(faultFile(dir.path(), index))) {
      root.err.println(
          "hopstat: shard "
              + index
              + ": failing on purpose before any work (test hook: "
              + faultFile(dir.path(), index)
              + " exists)");
      return ExitCode.RUNTIME_FAILURE;
    }
    MemoryCheck.require(plan, n);
    String prefix = String.format(Locale.ROOT, "shard-%04d", index);
    try (ShardLock lock = ShardLock.acquire(dir.path(), shard)) {
      LocalPoolBackend backend = new LocalPoolBackend(Clock.systemUTC());
      // Slurm sends SIGTERM at the time limit and SIGKILL KillWait (default 30 s) later:
      // STOP_GRACE (20 s) lets in-flight realisations finish and the journal close before that.
      Thread hook =
          new Thread(
              () -> {
                backend.requestStop();
                try {
                  if (!backend.awaitEnded(RunSession.STOP_GRACE)) {
                    backend.abandon();
                  }
                } catch (InterruptedException e) {
                  Thread.currentThread().interrupt();
                }
              },
              "hopstat-stop");
      Runtime.getRuntime().addShutdownHook(hook);
      RunResult result;
      try {
        result =
            backend.execute(
                plan,
                dir,
                new RunOptions(
                    n,
                    LinalgChoice.resolve(linalg),
                    prefix,
                    shard,
                    JournalWriter.DEFAULT_SYNC_INTERVAL_NANOS),
                new ConsoleProgress(root.err));
      } finally {
        try {
          Runtime.getRuntime().removeShutdownHook(hook);
        } catch (IllegalStateException shuttingDown) {
          // the JVM is already exiting: the hook is running and finishes the journal
        }
      }
      root.out.printf(
          Locale.ROOT,
          "shard %d of %d: %d realisation(s) this session; %d journaled in this shard, %d failed; journal %s%n",
          index,
          count,
          result.finishedThisSession(),
          result.finishedTotal(),
          result.failedTotal(),
          result.journalFile());
      if (result.stoppedEarly()) {
        root.err.println(
            "hopstat: shard "
                + index
                + " stopped before it was complete; `hopstat resume "
                + dir.path()
                + "` resubmits it");
        return ExitCode.INCOMPLETE;
      }
      return ExitCode.OK;
    }
  }
}
